import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { DrillManageActions } from './drill-manage-actions';

const drill = { id: '5f0c8a52-3b7e-4c1d-9a55-2f1e0c6d7b10', title: 'Umber ladder' };

describe('DrillManageActions', () => {
  it('should duplicate the drill through the API and hand back the copy', async () => {
    signInAs('teacher');
    const onDuplicated = vi.fn();
    server.use(
      http.post(`*/api/drills/${drill.id}/duplicate`, () =>
        HttpResponse.json({ id: 'copy-1', title: 'Umber ladder (copy)' }, { status: 201 }),
      ),
    );
    renderApp(<DrillManageActions drill={drill} onDuplicated={onDuplicated} />);
    await userEvent.click(screen.getByRole('button', { name: 'Duplicate Umber ladder' }));
    await waitFor(() => expect(onDuplicated).toHaveBeenCalledWith(expect.objectContaining({ id: 'copy-1' })));
  });

  it('should ask, naming the drill, before deleting it', async () => {
    signInAs('teacher');
    const onDeleted = vi.fn();
    let deleted = 0;
    server.use(
      http.delete(`*/api/drills/${drill.id}`, () => {
        deleted += 1;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderApp(<DrillManageActions drill={drill} onDeleted={onDeleted} />);
    await userEvent.click(screen.getByRole('button', { name: 'Delete Umber ladder' }));
    const dialog = await screen.findByRole('dialog', { name: 'Delete “Umber ladder”?' });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(deleted).toBe(0);

    await userEvent.click(screen.getByRole('button', { name: 'Delete Umber ladder' }));
    await userEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Delete the drill' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalled());
    expect(deleted).toBe(1);
  });

  it("should show the server's message when the delete fails", async () => {
    signInAs('teacher');
    server.use(
      http.delete(`*/api/drills/${drill.id}`, () =>
        HttpResponse.json({ statusCode: 404, code: 'not_found', message: 'This drill is no longer there.' }, { status: 404 }),
      ),
    );
    renderApp(<DrillManageActions drill={drill} />);
    await userEvent.click(screen.getByRole('button', { name: 'Delete Umber ladder' }));
    await userEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Delete the drill' }));
    expect(await within(screen.getByRole('dialog')).findByText('This drill is no longer there.')).toBeInTheDocument();
  });
});
