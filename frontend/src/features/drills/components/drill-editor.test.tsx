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

  const chooseKind = async (name: string) => {
    await userEvent.click(screen.getByRole('combobox', { name: 'Kind' }));
    await userEvent.click(await screen.findByRole('option', { name }));
  };

  it('should start a new value ladder from evenly spaced greys, light to dark', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await chooseKind('Value ladder');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    const steps = screen.getAllByRole('group', { name: /^Target \d$/ });
    expect(steps).toHaveLength(5);
    const lightness = steps.map((step) => Number((within(step).getByLabelText('L*') as HTMLInputElement).value));
    expect(lightness).toEqual([90, 72.5, 55, 37.5, 20]);
    for (const step of steps) expect(within(step).getByLabelText('a*')).toHaveValue(0);
  });

  it('should start a neutral from a mid grey of zero chroma', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    await chooseKind('Neutral grey');
    const target = screen.getByRole('group', { name: 'Target 1' });
    expect(within(target).getByLabelText('L*')).toHaveValue(50);
    expect(within(target).getByLabelText('a*')).toHaveValue(0);
    expect(within(target).getByLabelText('b*')).toHaveValue(0);
    expect(within(target).getByText(/C\* 0\.0/)).toBeInTheDocument();
  });

  it('should ask before replacing targets the teacher has entered', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    const hex = within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('Hex');
    await userEvent.clear(hex);
    await userEvent.type(hex, '#336699');
    await chooseKind('Neutral grey');
    const dialog = await screen.findByRole('dialog', { name: /Replace the targets/ });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Stay a match' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Kind' })).toHaveTextContent('Match');
    expect(within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('Hex')).toHaveValue('#336699');

    await chooseKind('Neutral grey');
    await userEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Use the new defaults' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Kind' })).toHaveTextContent('Neutral grey');
    expect(within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('L*')).toHaveValue(50);
  });

  it('should keep the entered targets when the teacher chooses to', async () => {
    signInAs('teacher');
    renderApp(<DrillEditor onSaved={vi.fn()} />);
    const hex = within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('Hex');
    await userEvent.clear(hex);
    await userEvent.type(hex, '#336699');
    await chooseKind('Flat wash');
    await userEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Keep my targets' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Kind' })).toHaveTextContent('Flat wash');
    expect(within(screen.getByRole('group', { name: 'Target 1' })).getByLabelText('Hex')).toHaveValue('#336699');
  });

  it("should show the shared schema's own message for the targets", async () => {
    signInAs('teacher');
    const drill = {
      id: 'd9',
      ownerId: 'u1',
      title: 'Old wash',
      kind: 'graded-wash' as const,
      instructions: '',
      targets: [{ lab: { L: 80, a: 0, b: -10 }, enteredAs: 'lab' as const }],
      tolerance: {},
      palette: [],
      visibility: 'private' as const,
      createdAt: '2025-01-06T09:00:00.000Z',
      updatedAt: '2025-01-06T09:00:00.000Z',
    };
    renderApp(<DrillEditor drill={drill as never} onSaved={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Save the drill' }));
    expect(await screen.findByText('A graded-wash drill takes 2 targets.')).toBeInTheDocument();
    expect(screen.getByLabelText('Title')).toHaveValue('Old wash');
  });

  it("should show the server's words when a drill in use cannot change kind", async () => {
    signInAs('teacher');
    const message = 'This drill has already been assigned or attempted, so its kind can no longer change.';
    server.use(
      http.put('*/api/drills/d7', () =>
        HttpResponse.json({ statusCode: 409, code: 'drill_in_use', message, details: { kind: 'drill_in_use' } }, { status: 409 }),
      ),
    );
    const drill = {
      id: 'd7',
      ownerId: 'u1',
      title: 'Grey from complements',
      kind: 'match' as const,
      instructions: '',
      targets: [{ lab: { L: 50, a: 0, b: 0 }, enteredAs: 'lab' as const }],
      tolerance: {},
      palette: [],
      visibility: 'private' as const,
      createdAt: '2025-01-06T09:00:00.000Z',
      updatedAt: '2025-01-06T09:00:00.000Z',
    };
    renderApp(<DrillEditor drill={drill as never} onSaved={vi.fn()} />);
    await chooseKind('Neutral grey');
    await userEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Keep my targets' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    await userEvent.click(screen.getByRole('button', { name: 'Save the drill' }));
    expect(await screen.findByText(message)).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: 'Kind' })).toHaveTextContent('Neutral grey');
  });
});
