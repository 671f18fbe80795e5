import { isApiError, type ApiError } from '@mixmark/common';
import { createHttpClient, HttpError, send, type RequestConfig } from './http-client';
import { env } from '@/config/env';
import { accessToken, authStore, type SessionUser } from './auth-store';

/** The one HTTP client: same-origin `/api`, cookies included, errors in the API's one shape. */
export const api = createHttpClient({
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
  if (error instanceof HttpError) {
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

let refreshing: Promise<SessionReply | undefined> | undefined;

/**
 * Asks for a new access token with the refresh cookie. Calls made while one is on its way share
 * it: the refresh token rotates, so two requests with the same cookie would end the session.
 */
export function refreshSession(): Promise<SessionReply | undefined> {
  refreshing ??= send<SessionReply>({
    method: 'POST',
    url: `${env.VITE_APP_API_URL}/auth/refresh`,
    withCredentials: true,
    timeout: 15000,
  })
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
    await send({ method: 'POST', url: `${env.VITE_APP_API_URL}/auth/sign-out`, withCredentials: true });
  } finally {
    authStore.signOut();
  }
}

api.interceptors.request.use((config) => {
  const token = accessToken();
  return token ? { ...config, headers: { ...config.headers, Authorization: `Bearer ${token}` } } : config;
});

type RetriableConfig = RequestConfig & { _retried?: boolean };

api.interceptors.error.use(
  async (error: unknown) => {
    const config = error instanceof HttpError ? (error.config as RetriableConfig) : undefined;
    const expired =
      error instanceof HttpError &&
      error.response?.status === 401 &&
      config &&
      !config._retried &&
      !config.url?.startsWith('/auth/');
    if (expired && accessToken()) {
      // The access token ran out: refresh once and send the request again. When the refresh
      // fails the store is signed out, and the protected routes send the person to sign in.
      config._retried = true;
      const session = await refreshSession();
      if (session) return api.request(config);
    }
    const apiError = toApiError(error);
    return Promise.reject(Object.assign(new Error(apiError.message), { apiError }));
  },
);
