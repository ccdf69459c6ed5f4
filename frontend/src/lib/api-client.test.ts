import { AxiosError, AxiosHeaders, type InternalAxiosRequestConfig } from 'axios';
import { api, errorMessages, onUnauthorized } from './api-client';
import { readSession, writeSession } from './session';

const future = () => new Date(Date.now() + 3_600_000).toISOString();

function answer(status: number, data: unknown, url = '/users') {
  return (config: InternalAxiosRequestConfig) => {
    const response = { status, data, statusText: '', headers: {}, config };
    return status < 400
      ? Promise.resolve(response)
      : Promise.reject(new AxiosError('fail', String(status), { ...config, url }, null, response));
  };
}

describe('api client', () => {
  beforeEach(() => window.localStorage.clear());

  it('sends the bearer token of the session', async () => {
    writeSession({ accessToken: 'token-123', expiresAt: future() });
    let sent: string | undefined;
    await api.get('/users', {
      adapter: (config) => {
        sent = AxiosHeaders.from(config.headers).get('Authorization') as string;
        return answer(200, [])(config);
      },
    });
    expect(sent).toBe('Bearer token-123');
  });

  it('ends the session and calls the sign-in handler on 401', async () => {
    writeSession({ accessToken: 'token-123', expiresAt: future() });
    const handler = vi.fn();
    const stop = onUnauthorized(handler);
    await expect(
      api.get('/users', { adapter: answer(401, { message: ['ended'] }) }),
    ).rejects.toThrow();
    expect(handler).toHaveBeenCalledTimes(1);
    expect(readSession()).toBeNull();
    stop();
  });

  it('does not treat a failed sign-in as an ended session', async () => {
    const handler = vi.fn();
    const stop = onUnauthorized(handler);
    await expect(
      api.post(
        '/auth/login',
        {},
        { adapter: answer(401, { message: ['Email or password is incorrect'] }, '/auth/login') },
      ),
    ).rejects.toThrow();
    expect(handler).not.toHaveBeenCalled();
    stop();
  });

  it('turns server answers into messages to show', () => {
    const config = { headers: new AxiosHeaders() } as InternalAxiosRequestConfig;
    const withBody = (status: number, data: unknown) =>
      new AxiosError('x', 'x', config, null, { status, data, statusText: '', headers: {}, config });
    expect(errorMessages(withBody(400, { message: ['email must be an email address'] }))).toEqual([
      'email must be an email address',
    ]);
    expect(errorMessages(withBody(502, '<html>'))).toEqual([
      'The server answered 502. Try again, or tell your admin.',
    ]);
    expect(errorMessages(new AxiosError('Network Error'))).toEqual([
      'The server could not be reached. Check your connection and try again.',
    ]);
  });

  it('forgets an expired session', () => {
    writeSession({ accessToken: 'old', expiresAt: new Date(Date.now() - 1000).toISOString() });
    expect(readSession()).toBeNull();
  });
});

describe('readSession', () => {
  it('returns the same object while the stored session is unchanged (for useSyncExternalStore)', () => {
    writeSession({ accessToken: 'same', expiresAt: future() });
    expect(readSession()).toBe(readSession());
  });
});
