import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import InvitationRoute from '@/app/routes/invitation';
import RegisterRoute from '@/app/routes/auth/register';
import { paths } from '@/config/paths';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';
import type { InvitationPreview } from '../types';

const token = '7d3c2a10-4b5e-4f6a-8c9d-0e1f2a3b4c5d.s3cr3t';
const preview: InvitationPreview = {
  className: 'Thursday watercolour',
  teacherName: 'Marta Ocheltree',
  email: 'noor@example.test',
  expiresAt: '2026-12-10T12:00:00.000Z',
};

describe('Invitation link → register', () => {
  it('should open the register form with the invited address filled in, still editable', async () => {
    server.use(http.get('*/api/invitations/:token', () => HttpResponse.json(preview)));
    renderApp(
      <Routes>
        <Route path={paths.invitation.path} element={<InvitationRoute />} />
        <Route path={paths.auth.register.path} element={<RegisterRoute />} />
      </Routes>,
      { route: paths.invitation.getHref(token) },
    );
    await userEvent.click(await screen.findByRole('link', { name: 'Create a student account' }));
    const email = await screen.findByLabelText(/E-mail/);
    expect(email).toHaveValue('noor@example.test');
    expect(
      screen.getByText('The address your invitation was sent to; you may use another one.'),
    ).toBeInTheDocument();
    await userEvent.clear(email);
    await userEvent.type(email, 'noor.home@example.test');
    expect(email).toHaveValue('noor.home@example.test');
  });

  it('should send the person back to the invitation after registering', async () => {
    server.use(http.get('*/api/invitations/:token', () => HttpResponse.json(preview)));
    renderApp(
      <Routes>
        <Route path={paths.invitation.path} element={<InvitationRoute />} />
      </Routes>,
      { route: paths.invitation.getHref(token) },
    );
    const link = await screen.findByRole('link', { name: 'Create a student account' });
    const href = new URL(link.getAttribute('href') ?? '', 'http://mixmark.test');
    expect(href.pathname).toBe('/register');
    expect(href.searchParams.get('redirectTo')).toBe(paths.invitation.getHref(token));
    expect(href.searchParams.get('email')).toBe('noor@example.test');
  });
});
