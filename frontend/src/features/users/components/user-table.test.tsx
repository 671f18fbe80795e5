import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { UserTable } from './user-table';

const users = [
  { id: 'a1', email: 'admin@example.test', displayName: 'Ada Admin', role: 'admin', createdAt: '2025-01-01T00:00:00Z' },
  { id: 's1', email: 'pip@example.test', displayName: 'Pip Lindqvist', role: 'student', createdAt: '2025-01-02T00:00:00Z' },
];

describe('UserTable', () => {
  it("should change a user's role and not the admin's own", async () => {
    signInAs('admin', { id: 'a1' });
    let patched: unknown;
    server.use(
      http.get('*/api/admin/users', () => HttpResponse.json(users)),
      http.patch('*/api/admin/users/s1/role', async ({ request }) => {
        patched = await request.json();
        return HttpResponse.json({ ...users[1], role: 'teacher' });
      }),
    );
    renderApp(<UserTable currentUserId="a1" />);
    const own = await screen.findByRole('combobox', { name: 'Role of Ada Admin' });
    expect(own).toHaveAttribute('aria-disabled', 'true');
    await userEvent.click(screen.getByRole('combobox', { name: 'Role of Pip Lindqvist' }));
    await userEvent.click(within(screen.getByRole('listbox')).getByRole('option', { name: 'teacher' }));
    await waitFor(() => expect(patched).toEqual({ role: 'teacher' }));
  });
});
