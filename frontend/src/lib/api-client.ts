import axios, { AxiosError } from 'axios';
import type { ApiErrorBody } from '@tiermode/shared-types';
import { clearSession, readSession } from './session';

/** The one HTTP client: every request carries the bearer token; a 401 ends the session. */
export const api = axios.create({ baseURL: '/api', timeout: 30_000 });

let unauthorizedHandler: (() => void) | null = null;

/** The app registers what to do when the server says the session is over (go to sign-in). */
export function onUnauthorized(handler: () => void): () => void {
  unauthorizedHandler = handler;
  return () => {
    if (unauthorizedHandler === handler) unauthorizedHandler = null;
  };
}

api.interceptors.request.use((config) => {
  const session = readSession();
  if (session) config.headers.set('Authorization', `Bearer ${session.accessToken}`);
  return config;
});

api.interceptors.response.use(undefined, (error: unknown) => {
  const isSignIn = error instanceof AxiosError && error.config?.url === '/auth/login';
  if (error instanceof AxiosError && error.response?.status === 401 && !isSignIn) {
    clearSession();
    unauthorizedHandler?.();
  }
  return Promise.reject(error instanceof Error ? error : new Error(String(error)));
});

/** The server's messages for a failed request, ready to show; never an empty list. */
export function errorMessages(error: unknown): string[] {
  if (error instanceof AxiosError) {
    const body = error.response?.data as Partial<ApiErrorBody> | undefined;
    const message = body?.message;
    if (Array.isArray(message) && message.length > 0) return message.map(String);
    if (typeof message === 'string' && message) return [message];
    if (!error.response)
      return ['The server could not be reached. Check your connection and try again.'];
    return [`The server answered ${error.response.status}. Try again, or tell your admin.`];
  }
  return [error instanceof Error ? error.message : 'Something went wrong'];
}
