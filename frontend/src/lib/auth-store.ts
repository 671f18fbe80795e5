import { useSyncExternalStore } from 'react';

export type UserRole = 'admin' | 'teacher' | 'student';

/** The signed-in person, as the API's `PublicUser` shows them. */
export type SessionUser = {
  id: string;
  email: string;
  displayName: string;
  role: UserRole;
  createdAt: string;
};

/**
 * `restoring`: the app has just loaded and is asking for a new access token with the refresh
 * cookie; nobody knows yet whether there is a session.
 */
export type AuthState =
  | { status: 'restoring' }
  | { status: 'signed-out' }
  | { status: 'signed-in'; accessToken: string; user: SessionUser };

let state: AuthState = { status: 'restoring' };
const listeners = new Set<() => void>();

function set(next: AuthState) {
  state = next;
  for (const listener of listeners) listener();
}

/** The access token lives only here, in memory: never in localStorage, where scripts could read it. */
export const authStore = {
  get: (): AuthState => state,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  signIn: (accessToken: string, user: SessionUser) => set({ status: 'signed-in', accessToken, user }),
  signOut: () => set({ status: 'signed-out' }),
  /** The person changed their own details (a new display name): the session goes on. */
  updateUser: (user: SessionUser) => {
    if (state.status === 'signed-in') set({ ...state, user });
  },
  /** For tests: back to the state of a fresh page load. */
  reset: () => set({ status: 'restoring' }),
};

export function accessToken(): string | undefined {
  return state.status === 'signed-in' ? state.accessToken : undefined;
}

export function useAuth(): AuthState {
  return useSyncExternalStore(authStore.subscribe, authStore.get, authStore.get);
}

/** The signed-in user, or undefined. */
export function useUser(): SessionUser | undefined {
  const auth = useAuth();
  return auth.status === 'signed-in' ? auth.user : undefined;
}
