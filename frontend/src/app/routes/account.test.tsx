import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import AccountRoute from './account';
import { AppLayout } from '@/components/layouts/app-layout';
import { authStore } from '@/lib/auth-store';
import { server } from '@/testing/mocks/server';
import { renderApp, signInAs } from '@/testing/test-utils';
import { Route, Routes } from 'react-router-dom';

function meHandlers(start: { displayName: string; weeklyDigest: boolean }) {
  const sent: unknown[] = [];
  let me = {
    id: 'u1',
    email: 'pip@example.test',
    role: 'student',
    createdAt: '2025-01-06T09:00:00.000Z',
    ...start,
  };
  server.use(
    http.get('*/api/auth/me', () => HttpResponse.json(me)),
    http.patch('*/api/auth/me', async ({ request }) => {
      const body = (await request.json()) as Record<string, unknown>;
      sent.push(body);
      me = { ...me, ...body };
      return HttpResponse.json(me);
    }),
  );
  return sent;
}

const page = () => (
  <Routes>
    <Route element={<AppLayout />}>
      <Route path="/account" element={<AccountRoute />} />
    </Route>
  </Routes>
);

describe('Account page', () => {
  it('should turn the weekly e-mail off and rename, through PATCH /auth/me, and show the new name in the top bar', async () => {
    signInAs('student', { displayName: 'Pip Lindqvist' });
    const sent = meHandlers({ displayName: 'Pip Lindqvist', weeklyDigest: true });
    renderApp(page(), { route: '/account' });
    const digest = await screen.findByRole('switch', { name: 'Weekly progress e-mail' });
    expect(digest).toBeChecked();
    expect(screen.getByText('· on')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save' })).toBeDisabled();
    await userEvent.click(digest);
    expect(screen.getByText('· off')).toBeInTheDocument();
    const name = screen.getByLabelText('Display name');
    await userEvent.clear(name);
    await userEvent.type(name, 'Pip L.');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Saved.')).toBeInTheDocument();
    expect(sent).toEqual([{ displayName: 'Pip L.', weeklyDigest: false }]);
    expect(screen.getByRole('switch', { name: 'Weekly progress e-mail' })).not.toBeChecked();
    expect(authStore.get()).toMatchObject({ status: 'signed-in', user: { displayName: 'Pip L.' } });
    expect(screen.getByRole('button', { name: 'Pip L.' })).toBeInTheDocument();
  });

  it('should ask for a name before sending anything', async () => {
    signInAs('student');
    const sent = meHandlers({ displayName: 'Pip Lindqvist', weeklyDigest: true });
    renderApp(page(), { route: '/account' });
    await userEvent.clear(await screen.findByLabelText('Display name'));
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Enter the name others will see.')).toBeInTheDocument();
    expect(sent).toEqual([]);
  });

  it('should put the server’s words beside the field it refuses', async () => {
    signInAs('student');
    meHandlers({ displayName: 'Pip Lindqvist', weeklyDigest: true });
    server.use(
      http.patch('*/api/auth/me', () =>
        HttpResponse.json(
          {
            statusCode: 400,
            code: 'validation_failed',
            message: 'Check the highlighted fields.',
            details: { displayName: 'max' },
          },
          { status: 400 },
        ),
      ),
    );
    renderApp(page(), { route: '/account' });
    await userEvent.type(await screen.findByLabelText('Display name'), ' the Second');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Use at most 80 characters.')).toBeInTheDocument();
  });

  it('should open the user menu from the top bar, with account settings and sign out', async () => {
    signInAs('teacher', { displayName: 'Marta Ocheltree' });
    meHandlers({ displayName: 'Marta Ocheltree', weeklyDigest: true });
    server.use(http.post('*/api/auth/sign-out', () => new HttpResponse(null, { status: 204 })));
    renderApp(page(), { route: '/account' });
    await userEvent.click(screen.getByRole('button', { name: 'Marta Ocheltree' }));
    const menu = await screen.findByRole('menu', { name: 'Your account' });
    expect(within(menu).getByRole('menuitem', { name: 'Account settings' })).toHaveAttribute(
      'href',
      '/account',
    );
    await userEvent.click(within(menu).getByRole('menuitem', { name: 'Sign out' }));
    await waitFor(() => expect(authStore.get().status).toBe('signed-out'));
  });
});
