import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError, AxiosHeaders, type InternalAxiosRequestConfig } from 'axios';
import { api } from '@/lib/api-client';
import { readSession } from '@/lib/session';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

describe('SignInForm', () => {
  afterEach(() => {
    vi.restoreAllMocks();
    window.localStorage.clear();
  });

  it('names each missing or malformed field before sending anything', async () => {
    const post = vi.spyOn(api, 'post');
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.type(screen.getByLabelText(/email/i), 'not-an-email');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter a valid email address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });

  it("shows the server's message when the credentials are refused", async () => {
    const config = { headers: new AxiosHeaders() } as InternalAxiosRequestConfig;
    vi.spyOn(api, 'post').mockRejectedValue(
      new AxiosError('401', 'ERR', config, null, {
        status: 401,
        statusText: 'Unauthorized',
        headers: {},
        config,
        data: { statusCode: 401, message: ['Email or password is incorrect'] },
      }),
    );
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/email/i), 'designer@tiermode.test');
    await userEvent.type(screen.getByLabelText(/password/i), 'wrong-password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Email or password is incorrect');
    expect(onSignedIn).not.toHaveBeenCalled();
    expect(readSession()).toBeNull();
  });

  it('keeps the session and reports success', async () => {
    const expiresAt = new Date(Date.now() + 8 * 3_600_000).toISOString();
    const response = { accessToken: 'abc', expiresAt, user: { id: '1' } };
    vi.spyOn(api, 'post').mockResolvedValue({ data: response });
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText(/email/i), 'designer@tiermode.test');
    await userEvent.type(screen.getByLabelText(/password/i), 'tiermode-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(response));
    expect(readSession()).toEqual({ accessToken: 'abc', expiresAt });
  });
});
