import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { authStore } from '@/lib/auth-store';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';
import { SignInForm } from './sign-in-form';

const user = { id: 'u1', email: 'pip@example.test', displayName: 'Pip Lindqvist', role: 'student', createdAt: '2025-01-01T00:00:00Z' };

describe('SignInForm', () => {
  it('should ask for the e-mail and password before sending anything', async () => {
    renderApp(<SignInForm onSuccess={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter an e-mail address.')).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText(/E-mail/), 'not-an-address');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/does not look like an e-mail address/)).toBeInTheDocument();
  });

  it("should show the server's words when the password is wrong", async () => {
    server.use(
      http.post('*/api/auth/sign-in', () =>
        HttpResponse.json(
          { statusCode: 401, code: 'bad_credentials', message: 'That e-mail and password do not match an account.' },
          { status: 401 },
        ),
      ),
    );
    renderApp(<SignInForm onSuccess={vi.fn()} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'pip@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'wrong password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('That e-mail and password do not match an account.');
    expect(authStore.get().status).not.toBe('signed-in');
  });

  it('should keep the access token in memory and hand on the session', async () => {
    server.use(
      http.post('*/api/auth/sign-in', () => HttpResponse.json({ accessToken: 'abc', expiresIn: 900, user })),
    );
    const onSuccess = vi.fn();
    renderApp(<SignInForm onSuccess={onSuccess} />);
    await userEvent.type(screen.getByLabelText(/E-mail/), 'pip@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'a long enough password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSuccess).toHaveBeenCalled());
    expect(authStore.get()).toMatchObject({ status: 'signed-in', accessToken: 'abc', user: { role: 'student' } });
  });
});
