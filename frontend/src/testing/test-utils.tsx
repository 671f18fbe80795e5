import { QueryClient } from '@tanstack/react-query';
import { render, type RenderOptions } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { authStore, type SessionUser, type UserRole } from '@/lib/auth-store';

/** Renders inside the app's providers, with a fresh QueryClient that never retries. */
export function renderApp(ui: ReactElement, { route = '/', ...options }: RenderOptions & { route?: string } = {}) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return render(
    <AppProvider queryClient={queryClient}>
      <MemoryRouter initialEntries={[route]}>{ui}</MemoryRouter>
    </AppProvider>,
    options,
  );
}

/** Puts a signed-in person of a role in the auth store, as after a sign-in. */
export function signInAs(role: UserRole, overrides: Partial<SessionUser> = {}): SessionUser {
  const user: SessionUser = {
    id: '00000000-0000-4000-8000-000000000001',
    email: `${role}@example.test`,
    displayName: role === 'teacher' ? 'Marta Ocheltree' : 'Pip Lindqvist',
    role,
    createdAt: '2025-01-06T09:00:00.000Z',
    ...overrides,
  };
  authStore.signIn('test-access-token', user);
  // As the server does beside the refresh cookie (see lib/api-client's mayRestoreSession).
  document.cookie = 'mixmark_session=1; path=/';
  return user;
}
