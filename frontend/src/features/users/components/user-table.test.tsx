import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { UserTable } from './user-table';

const users = [
  {
    id: 'a1',
    email: 'admin@example.test',
    displayName: 'Ada Admin',
    role: 'admin',
    createdAt: '2025-01-01T00:00:00Z',
  },
  {
    id: 's1',
    email: 'pip@example.test',
    displayName: 'Pip Lindqvist',
    role: 'student',
    createdAt: '2025-01-02T00:00:00Z',
  },
  {
    id: 't1',
    email: 'marta@example.test',
    displayName: 'Marta Ocheltree',
    role: 'teacher',
    createdAt: '2025-01-03T00:00:00Z',
  },
];

/** The admin API as the tests need it; every PATCH body is recorded, and the list follows it. */
function serve({ fail }: { fail?: { status: number; code: string; message: string } } = {}) {
  const patched: { id: string; body: unknown }[] = [];
  let list = users.map((user) => ({ ...user }));
  server.use(
    http.get('*/api/admin/users', () => HttpResponse.json(list)),
    http.patch('*/api/admin/users/:id/role', async ({ request, params }) => {
      const body = (await request.json()) as { role: string };
      patched.push({ id: String(params.id), body });
      if (fail)
        return HttpResponse.json(
          { statusCode: fail.status, code: fail.code, message: fail.message },
          { status: fail.status },
        );
      list = list.map((user) => (user.id === params.id ? { ...user, role: body.role } : user));
      return HttpResponse.json(list.find((user) => user.id === params.id));
    }),
  );
  return patched;
}

async function choose(name: string, role: string) {
  await userEvent.click(await screen.findByRole('combobox', { name: `Role of ${name}` }));
  await userEvent.click(within(screen.getByRole('listbox')).getByRole('option', { name: role }));
}

describe('UserTable', () => {
  it('should not let the admin change their own role', async () => {
    signInAs('admin', { id: 'a1' });
    serve();
    renderApp(<UserTable currentUserId="a1" />);
    expect(await screen.findByRole('combobox', { name: 'Role of Ada Admin' })).toHaveAttribute(
      'aria-disabled',
      'true',
    );
  });

  it('should ask first, naming the person, both roles and what changes, then send the PATCH on confirm', async () => {
    signInAs('admin', { id: 'a1' });
    const patched = serve();
    renderApp(<UserTable currentUserId="a1" />);
    await choose('Pip Lindqvist', 'teacher');
    const dialog = screen.getByRole('dialog', { name: 'Make Pip Lindqvist a teacher?' });
    expect(dialog).toHaveTextContent(
      'Pip Lindqvist (pip@example.test) is a student now and would become a teacher.',
    );
    expect(dialog).toHaveTextContent('They will be able to make classes and drills');
    expect(dialog).toHaveTextContent('They can no longer join a class or send a photo for marking');
    expect(patched).toEqual([]);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Make them a teacher' }));
    await waitFor(() => expect(patched).toEqual([{ id: 's1', body: { role: 'teacher' } }]));
    expect(await screen.findByRole('status')).toHaveTextContent('Pip Lindqvist is now a teacher.');
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Role of Pip Lindqvist' })).toHaveTextContent(
      'teacher',
    );
  });

  it('should send nothing on cancel and keep the old role in the select', async () => {
    signInAs('admin', { id: 'a1' });
    const patched = serve();
    renderApp(<UserTable currentUserId="a1" />);
    await choose('Marta Ocheltree', 'student');
    const dialog = screen.getByRole('dialog', { name: 'Make Marta Ocheltree a student?' });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep them a teacher' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Role of Marta Ocheltree' })).toHaveTextContent(
      'teacher',
    );
    expect(patched).toEqual([]);
  });

  it("should say a teacher made a student loses their classes' pages until made a teacher again", async () => {
    signInAs('admin', { id: 'a1' });
    serve();
    renderApp(<UserTable currentUserId="a1" />);
    await choose('Marta Ocheltree', 'student');
    const dialog = screen.getByRole('dialog', { name: 'Make Marta Ocheltree a student?' });
    expect(dialog).toHaveTextContent(
      'Marta Ocheltree (marta@example.test) is a teacher now and would become a student.',
    );
    expect(dialog).toHaveTextContent(
      "They lose access to their classes' pages, drills, assignments and marking until made a teacher again.",
    );
    expect(dialog).toHaveTextContent('Nothing is deleted');
  });

  it("should say that making someone an admin gives them every account's data", async () => {
    signInAs('admin', { id: 'a1' });
    serve();
    renderApp(<UserTable currentUserId="a1" />);
    await choose('Pip Lindqvist', 'admin');
    const dialog = screen.getByRole('dialog', { name: 'Make Pip Lindqvist an admin?' });
    expect(dialog).toHaveTextContent("They will see and can change every account's data");
    expect(within(dialog).getByRole('button', { name: 'Make them an admin' })).toBeInTheDocument();
  });

  it("should show the API's own words when the change fails, and keep the old role", async () => {
    signInAs('admin', { id: 'a1' });
    const patched = serve({
      fail: { status: 404, code: 'not_found', message: 'There is no user with this id.' },
    });
    renderApp(<UserTable currentUserId="a1" />);
    await choose('Pip Lindqvist', 'teacher');
    const dialog = screen.getByRole('dialog', { name: 'Make Pip Lindqvist a teacher?' });
    await userEvent.click(within(dialog).getByRole('button', { name: 'Make them a teacher' }));
    expect(await within(dialog).findByText('There is no user with this id.')).toBeInTheDocument();
    expect(patched).toHaveLength(1);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Keep them a student' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(screen.getByRole('combobox', { name: 'Role of Pip Lindqvist' })).toHaveTextContent(
      'student',
    );
    expect(screen.queryByText('There is no user with this id.')).not.toBeInTheDocument();
  });
});
