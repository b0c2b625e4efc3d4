import { fireEvent, screen, waitFor } from '@testing-library/react-native';
import { InviteForm } from '@/components/team/InviteForm';
import { api, ApiRequestError } from '@/lib/api/client';
import { demoUsers, renderWithClient } from './helpers/render';

jest.mock('@/lib/api/client', () => require('./helpers/mock-client').clientModule());
jest.mock('expo-router', () => ({ Link: ({ children }: { children: React.ReactNode }) => children }));
const post = api.post as jest.Mock;

beforeEach(() => post.mockReset());

describe('invite form', () => {
  it('refuses an address without a domain and says why, without sending', async () => {
    renderWithClient(<InviteForm />, { user: demoUsers.admin });
    fireEvent.changeText(screen.getByTestId('invite-email'), 'lena.at.tidewater');
    fireEvent.press(screen.getByTestId('invite-submit'));
    expect(await screen.findByTestId('invite-email-error')).toHaveTextContent('Enter an e-mail address like name@example.com');
    expect(post).not.toHaveBeenCalled();
  });

  it('sends the chosen role with the e-mail and confirms the invitation', async () => {
    post.mockResolvedValueOnce({ invitation: { id: 7 } });
    renderWithClient(<InviteForm />, { user: demoUsers.admin });
    fireEvent.changeText(screen.getByTestId('invite-email'), 'lena@tidewater.example');
    fireEvent.press(screen.getByTestId('invite-role-reviewer'));
    fireEvent.press(screen.getByTestId('invite-submit'));
    expect(await screen.findByTestId('invite-sent')).toHaveTextContent(/lena@tidewater.example/);
    expect(post).toHaveBeenCalledWith('/api/team/invitations', { email: 'lena@tidewater.example', role: 'reviewer' });
    await waitFor(() => expect(screen.getByTestId('invite-email').props.value).toBe(''));
  });

  it("shows the server's refusal when the person is already in the team", async () => {
    post.mockRejectedValueOnce(new ApiRequestError(409, { error: 'ravi@tidewater.example is already a member of this team.' }));
    renderWithClient(<InviteForm />, { user: demoUsers.admin });
    fireEvent.changeText(screen.getByTestId('invite-email'), 'ravi@tidewater.example');
    fireEvent.press(screen.getByTestId('invite-submit'));
    expect(await screen.findByTestId('invite-error')).toHaveTextContent(/already a member/);
  });
});
