import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { authStore } from './auth-store';
import { renderApp, signInAs } from '@/testing/test-utils';
import { RequireRole } from './authorization';

const routes = (
  <Routes>
    <Route element={<RequireRole roles={['teacher']} />}>
      <Route path="/teacher" element={<p>Teacher area</p>} />
    </Route>
    <Route path="/sign-in" element={<p>Sign-in page</p>} />
    <Route path="/student" element={<p>Student start</p>} />
  </Routes>
);

describe('RequireRole', () => {
  it('should send a signed-out visitor to sign in', async () => {
    authStore.signOut();
    renderApp(routes, { route: '/teacher' });
    expect(await screen.findByText('Sign-in page')).toBeInTheDocument();
  });

  it('should send a student to their own start page', async () => {
    signInAs('student');
    renderApp(routes, { route: '/teacher' });
    expect(await screen.findByText('Student start')).toBeInTheDocument();
  });

  it('should let a teacher in', async () => {
    signInAs('teacher');
    renderApp(routes, { route: '/teacher' });
    expect(await screen.findByText('Teacher area')).toBeInTheDocument();
  });

  it('should wait while the session is being restored', () => {
    renderApp(routes, { route: '/teacher' });
    expect(screen.getByRole('status')).toHaveTextContent('Restoring your session');
  });
});
