import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/auth/SignInForm';
import { api, ApiRequestError } from '@/lib/api/client';
import { authKeys } from '@/lib/api/auth';
import { renderWithClient, demoUsers } from './helpers/render';

jest.mock('@/lib/api/client', () => require('./helpers/mock-client').clientModule());
const post = api.post as jest.Mock;

beforeEach(() => post.mockReset());

describe('sign-in form', () => {
  it('shows inline errors under both fields and sends nothing when they are empty', async () => {
    renderWithClient(<SignInForm />, { user: null });
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(await screen.findByText('Enter an e-mail address like name@example.com')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password')).toBeOnTheScreen();
    expect(post).not.toHaveBeenCalled();
  });

  it("shows the server's own sentence when it answers 401", async () => {
    post.mockRejectedValueOnce(new ApiRequestError(401, { error: 'That e-mail and password do not match an account.' }));
    renderWithClient(<SignInForm />, { user: null });
    fireEvent.changeText(screen.getByTestId('sign-in-email'), 'maya@tidewater.example');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'not-the-password');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    const banner = await screen.findByTestId('sign-in-error');
    expect(banner).toHaveTextContent(/That e-mail and password do not match an account\./);
    expect(post).toHaveBeenCalledWith('/api/auth/sign-in', { email: 'maya@tidewater.example', password: 'not-the-password' });
  });

  it('puts field issues from a 400 under the matching field', async () => {
    post.mockRejectedValueOnce(
      new ApiRequestError(400, { error: 'The request is not valid.', issues: [{ path: 'email', message: 'This address is not accepted.' }] }),
    );
    renderWithClient(<SignInForm />, { user: null });
    fireEvent.changeText(screen.getByTestId('sign-in-email'), 'maya@tidewater.example');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'harbor-road-demo');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(await screen.findByTestId('sign-in-email-error')).toHaveTextContent('This address is not accepted.');
    expect(screen.queryByTestId('sign-in-error')).toBeNull();
  });

  it('stores the signed-in user when the server accepts, trimming and lower-casing the e-mail', async () => {
    post.mockResolvedValueOnce({ user: demoUsers.admin });
    const { client } = renderWithClient(<SignInForm />, { user: null });
    fireEvent.changeText(screen.getByTestId('sign-in-email'), '  Maya@Tidewater.example ');
    fireEvent.changeText(screen.getByTestId('sign-in-password'), 'harbor-road-demo');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    await waitFor(() => expect(client.getQueryData(authKeys.me())).toEqual(demoUsers.admin));
    expect(post).toHaveBeenCalledWith('/api/auth/sign-in', { email: 'maya@tidewater.example', password: 'harbor-road-demo' });
  });
});
