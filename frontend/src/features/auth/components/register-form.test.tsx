import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { describe, expect, it, vi } from 'vitest';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';
import { RegisterForm } from './register-form';

describe('RegisterForm', () => {
  it('should want a password of at least 10 characters', async () => {
    renderApp(<RegisterForm onSuccess={vi.fn()} />);
    await userEvent.type(screen.getByLabelText(/Your name/), 'Pip');
    await userEvent.type(screen.getByLabelText(/E-mail/), 'pip@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'short');
    await userEvent.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText('Use at least 10 characters.')).toBeInTheDocument();
  });

  it("should put the server's 400/409 details beside the field they are about", async () => {
    let sent: unknown;
    server.use(
      http.post('*/api/auth/register', async ({ request }) => {
        sent = await request.json();
        return HttpResponse.json(
          { statusCode: 409, code: 'email_taken', message: 'An account with this e-mail already exists.', details: { email: 'taken' } },
          { status: 409 },
        );
      }),
    );
    renderApp(<RegisterForm onSuccess={vi.fn()} />);
    await userEvent.click(screen.getByLabelText('A teacher'));
    await userEvent.type(screen.getByLabelText(/Your name/), 'Marta Ocheltree');
    await userEvent.type(screen.getByLabelText(/E-mail/), 'Marta@Example.test ');
    await userEvent.type(screen.getByLabelText(/Password/), 'a long enough password');
    await userEvent.click(screen.getByRole('button', { name: 'Create account' }));
    expect(await screen.findByText(/An account already uses this address/)).toBeInTheDocument();
    expect(sent).toMatchObject({ email: 'marta@example.test', role: 'teacher', displayName: 'Marta Ocheltree' });
  });
});
