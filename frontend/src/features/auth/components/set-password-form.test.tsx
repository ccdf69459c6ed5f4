import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { api } from '@/lib/api-client';
import { renderWithProviders } from '@/testing/render';
import { SetPasswordForm } from './set-password-form';

describe('SetPasswordForm', () => {
  afterEach(() => vi.restoreAllMocks());

  it('refuses two different passwords before sending anything', async () => {
    const post = vi.spyOn(api, 'post');
    renderWithProviders(<SetPasswordForm token="t" onDone={vi.fn()} />);
    await userEvent.type(screen.getByLabelText('New password'), 'quarry-lintel-7');
    await userEvent.type(screen.getByLabelText('The same again'), 'quarry-lintel-8');
    await userEvent.click(screen.getByRole('button', { name: 'Save my password' }));
    expect(await screen.findByText('The two passwords differ')).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });

  it('sends the token with the password and reports success', async () => {
    const post = vi.spyOn(api, 'post').mockResolvedValue({ data: undefined });
    const onDone = vi.fn();
    renderWithProviders(<SetPasswordForm token="tok-1" onDone={onDone} />);
    await userEvent.type(screen.getByLabelText('New password'), 'quarry-lintel-7');
    await userEvent.type(screen.getByLabelText('The same again'), 'quarry-lintel-7');
    await userEvent.click(screen.getByRole('button', { name: 'Save my password' }));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(post).toHaveBeenCalledWith('/auth/set-password', {
      token: 'tok-1',
      password: 'quarry-lintel-7',
    });
  });
});
