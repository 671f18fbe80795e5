import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { AssignmentManageActions } from './assignment-manage-actions';

const assignment = {
  id: '7a1d2c3b-4e5f-4a6b-8c7d-9e0f1a2b3c4d',
  dueAt: '2030-03-14T18:00:00.000Z',
  className: 'Tuesday watercolour',
  drill: { id: 'd1', title: 'Sienna match', kind: 'match' },
};

describe('AssignmentManageActions', () => {
  it('should send the new due date', async () => {
    signInAs('teacher');
    let sent: { dueAt?: string } | undefined;
    server.use(
      http.patch(`*/api/assignments/${assignment.id}`, async ({ request }) => {
        sent = (await request.json()) as { dueAt?: string };
        return HttpResponse.json({ ...assignment, dueAt: sent.dueAt });
      }),
    );
    renderApp(<AssignmentManageActions assignment={assignment} />);
    await userEvent.click(screen.getByRole('button', { name: 'Change the due date' }));
    const dialog = await screen.findByRole('dialog', { name: 'Change the due date' });
    fireEvent.change(within(dialog).getByLabelText('Due'), { target: { value: '2030-04-02T09:30' } });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Save the due date' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(sent?.dueAt).toBe(new Date('2030-04-02T09:30').toISOString());
  });

  it('should ask, naming the drill and class, before deleting', async () => {
    signInAs('teacher');
    const onDeleted = vi.fn();
    let deleted = 0;
    server.use(
      http.delete(`*/api/assignments/${assignment.id}`, () => {
        deleted += 1;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    renderApp(<AssignmentManageActions assignment={assignment} onDeleted={onDeleted} />);
    await userEvent.click(screen.getByRole('button', { name: 'Delete the assignment' }));
    const dialog = await screen.findByRole('dialog', { name: /Sienna match.*Tuesday watercolour/ });
    expect(deleted).toBe(0);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Delete the assignment' }));
    await waitFor(() => expect(onDeleted).toHaveBeenCalled());
    expect(deleted).toBe(1);
  });
});
