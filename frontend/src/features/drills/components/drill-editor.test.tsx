import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { DrillEditor } from './drill-editor';

describe('DrillEditor', () => {
  it('should ask for a title before saving', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Create the drill' }));
    expect(await screen.findByText('Use at least 2 characters.')).toBeInTheDocument();
  });

  it('should convert the target when switching from hex to Lab, with a live readout', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    const target = screen.getByRole('group', { name: 'Target 1' });
    const hex = within(target).getByLabelText('Hex');
    await userEvent.clear(hex);
    await userEvent.type(hex, '#777777');
    expect(await within(target).findByText(/L\* 50\.0 · C\* 0\.0/)).toBeInTheDocument();
    expect(within(target).getByText(/Value 4\.9 of 10|Value 5\.0 of 10/)).toBeInTheDocument();
    await userEvent.click(within(target).getByRole('button', { name: 'Lab' }));
    expect(within(target).getByLabelText('L*')).toHaveValue(50);
    expect(within(target).getByLabelText('a*')).toHaveValue(0);
  });

  it('should warn when a target lies outside what a screen can show', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    const target = screen.getByRole('group', { name: 'Target 1' });
    await userEvent.click(within(target).getByRole('button', { name: 'LCh' }));
    const chroma = within(target).getByLabelText('C*');
    await userEvent.clear(chroma);
    await userEvent.type(chroma, '120');
    expect(await within(target).findByText(/Outside what a screen can show/)).toBeInTheDocument();
  });

  it('should send the drill as the shared schema describes it', async () => {
    signInAs('teacher');
    let sent: Record<string, unknown> | undefined;
    server.use(
      http.post('*/api/drills', async ({ request }) => {
        sent = (await request.json()) as Record<string, unknown>;
        return HttpResponse.json({ id: 'd1', ...sent }, { status: 201 });
      }),
    );
    const onSaved = vi.fn();
    renderApp(<DrillEditor onSaved={onSaved} />);
    await userEvent.type(screen.getByLabelText('Title'), 'Sienna match');
    await userEvent.click(screen.getByRole('button', { name: 'Add a paint' }));
    await userEvent.type(screen.getByLabelText('Paint 1 name'), 'Deep yellow');
    await userEvent.type(screen.getByLabelText('Paint 1 pigments'), 'py35');
    expect(await screen.findByText('Handle with care')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Create the drill' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalled());
    expect(sent).toMatchObject({
      title: 'Sienna match',
      kind: 'match',
      targets: [{ hex: '#8a5a3c' }],
      palette: [{ name: 'Deep yellow', pigments: ['PY35'] }],
      visibility: 'private',
    });
  });
});
