import { isApiError, type ApiError } from '@mixmark/common';
import axios, { AxiosError } from 'axios';
import { env } from '@/config/env';

/** The one HTTP client: same-origin `/api`, cookies included, errors in the API's one shape. */
export const api = axios.create({ baseURL: env.VITE_APP_API_URL, withCredentials: true, timeout: 30000 });

/** Turns anything axios throws into the API's error shape, so screens word every failure alike. */
export function toApiError(error: unknown): ApiError {
  if (error instanceof AxiosError) {
    const body: unknown = error.response?.data;
    if (isApiError(body)) return body;
    if (error.response) {
      return { statusCode: error.response.status, code: 'unexpected_reply', message: `The server answered ${error.response.status}.` };
    }
    return { statusCode: 0, code: 'network_error', message: 'Mixmark cannot reach its server. Check your connection and try again.' };
  }
  return { statusCode: 0, code: 'internal_error', message: error instanceof Error ? error.message : String(error) };
}

api.interceptors.response.use(
  (response) => response,
  (error: unknown) => {
    const apiError = toApiError(error);
    return Promise.reject(Object.assign(new Error(apiError.message), { apiError }));
  },
);
