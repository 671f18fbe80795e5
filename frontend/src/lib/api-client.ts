import { isApiError, type ApiError } from '@mixmark/common';
import axios, { AxiosError, type InternalAxiosRequestConfig } from 'axios';
import { env } from '@/config/env';
import { accessToken, authStore, type SessionUser } from './auth-store';

/**
 * The one HTTP client (axios): same-origin `/api`, cookies included, the access token added to
 * every request, a 401 refreshed once in the reply interceptor below, and every failure rejected
 * in the API's one error shape.
 */
export const api = axios.create({
  baseURL: env.VITE_APP_API_URL,
  withCredentials: true,
  timeout: 30000,
});

/** What `register`, `sign-in` and `refresh` answer; the refresh token itself stays in the cookie. */
export type SessionReply = { accessToken: string; expiresIn: number; user: SessionUser };

/** An Error that carries the API's error shape, as every failed request rejects with. */
export type ApiRequestError = Error & { apiError: ApiError };

/** Turns anything a request throws into the API's error shape, so screens word every failure alike. */
export function toApiError(error: unknown): ApiError {
  if (error && typeof error === 'object' && 'apiError' in error && isApiError(error.apiError)) {
    return error.apiError;
  }
  if (error instanceof AxiosError) {
    const body: unknown = error.response?.data;
    if (isApiError(body)) return body;
    if (error.response) {
      return {
        statusCode: error.response.status,
        code: 'unexpected_reply',
        message: `The server answered ${error.response.status}.`,
      };
    }
    return {
      statusCode: 0,
      code: 'network_error',
      message: 'Mixmark cannot reach its server. Check your connection and try again.',
    };
  }
  return {
    statusCode: 0,
    code: 'internal_error',
    message: error instanceof Error ? error.message : String(error),
  };
}

/**
 * Downloads (card PDFs, CSV) ask for a Blob, so their error reply arrives as one too: read it
 * back as the API's JSON in place, so the person sees the server's sentence, not just a status.
 */
export async function readBlobReply(error: unknown): Promise<void> {
  if (!(error instanceof AxiosError) || !(error.response?.data instanceof Blob)) return;
  try {
    error.response.data = JSON.parse(await error.response.data.text());
  } catch {
    // Not JSON: toApiError words the status alone.
  }
}

/** Requests to these paths never trigger a refresh: they are how a session starts and ends. */
const sessionPaths = /^\/?auth\/(sign-in|register|refresh|sign-out|password-reset)/;

let refreshing: Promise<SessionReply | undefined> | undefined;

/**
 * Whether a session may be restored: the server sets `mixmark_session=1` beside the refresh
 * cookie (which the page cannot read) and clears both together. Without it a refresh could only
 * fail, so a visitor who is not signed in sends none.
 */
export function mayRestoreSession(): boolean {
  return /(?:^|;\s*)mixmark_session=1(?:;|$)/.test(document.cookie);
}

/**
 * Asks for a new access token with the refresh cookie. Calls made while one is on its way share
 * it: the refresh token rotates, so two requests with the same cookie would end the session.
 * With no session hint cookie nothing is sent and the store signs out at once.
 * When it fails the session is over: the store signs out (and the app clears its cache and the
 * protected routes send the person to sign in, see `app/provider.tsx` and `lib/authorization`).
 */
export function refreshSession(): Promise<SessionReply | undefined> {
  if (!refreshing && !mayRestoreSession()) {
    authStore.signOut();
    return Promise.resolve(undefined);
  }
  refreshing ??= api
    .post<SessionReply>('/auth/refresh', undefined, { timeout: 15000 })
    .then(
      ({ data }) => {
        authStore.signIn(data.accessToken, data.user);
        return data;
      },
      () => {
        authStore.signOut();
        return undefined;
      },
    )
    .finally(() => {
      refreshing = undefined;
    });
  return refreshing;
}

/** Ends the session on the server (the cookie is cleared there) and here. */
export async function signOut(): Promise<void> {
  try {
    await api.post('/auth/sign-out');
  } finally {
    authStore.signOut();
  }
}

type SessionConfig = InternalAxiosRequestConfig & {
  /** The access token this request was sent with (undefined: none). */
  _sentToken?: string;
  /** Set once the request has been sent again after a refresh: never loop. */
  _retried?: boolean;
};

api.interceptors.request.use((config: SessionConfig) => {
  const token = accessToken();
  config._sentToken = token;
  if (token) config.headers.set('Authorization', `Bearer ${token}`);
  return config;
});

api.interceptors.response.use(undefined, async (error: unknown) => {
  const config = error instanceof AxiosError ? (error.config as SessionConfig | undefined) : undefined;
  const expired =
    error instanceof AxiosError &&
    error.response?.status === 401 &&
    config !== undefined &&
    !config._retried &&
    !sessionPaths.test(config.url ?? '');
  if (expired && config._sentToken) {
    config._retried = true;
    // Another request may have refreshed while this one was on its way: then the new token is
    // already here and the request only needs sending again. Otherwise refresh (one refresh for
    // every request that is waiting) and send it again with the new token.
    if (accessToken() && accessToken() !== config._sentToken) return api.request(config);
    const session = await refreshSession();
    if (session) return api.request(config);
  }
  await readBlobReply(error);
  const apiError = toApiError(error);
  return Promise.reject(Object.assign(new Error(apiError.message), { apiError }));
});
