import { Text } from 'react-native';
import { renderRouter, screen, waitFor } from 'expo-router/testing-library';
import { QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import AppLayout from '@/app/(app)/_layout';
import AuthLayout from '@/app/(auth)/_layout';
import { api, ApiRequestError } from '@/lib/api/client';
import { useDesigns } from '@/lib/api/designs';
import { useTeam } from '@/lib/api/team';
import { createTestQueryClient, demoUsers } from './helpers/render';

jest.mock('@/lib/api/client', () => require('./helpers/mock-client').clientModule());
const get = api.get as jest.Mock;

/** The real group layouts around stand-in screens, under a root that only provides the query client. */
function routes() {
  const client = createTestQueryClient();
  return {
    _layout: () => (
      <QueryClientProvider client={client}>
        <Slot />
      </QueryClientProvider>
    ),
    '(app)/_layout': AppLayout,
    '(app)/designs/index': () => <Text>designs screen</Text>,
    '(app)/team': () => <Text>team screen</Text>,
    '(app)/fetching': FetchingScreen,
    '(auth)/_layout': AuthLayout,
    '(auth)/sign-in': () => <Text>sign-in screen</Text>,
  };
}

/** A stand-in screen that reads team data, as the real Designs and Team screens do. */
function FetchingScreen() {
  const designs = useDesigns();
  const team = useTeam();
  return <Text>{`fetching screen: ${designs.data?.designs.length ?? '-'} designs, ${team.data?.members.length ?? '-'} members`}</Text>;
}

function answerMe(user: typeof demoUsers.admin | null) {
  get.mockImplementation(async (path: string) => {
    // An answer that takes a moment, as over the network: the layouts render their waiting state first.
    await new Promise((resolve) => setTimeout(resolve, 20));
    if (path === '/api/auth/me') {
      if (!user) throw new ApiRequestError(401, { error: 'Sign in to continue.' });
      return { user };
    }
    if (!user) throw new ApiRequestError(401, { error: 'Sign in to continue.' });
    if (path === '/api/team') return { team: { id: 1, name: 'Tidewater Cold Storage' }, members: [] };
    if (path === '/api/designs') return { designs: [] };
    throw new Error(`unexpected request ${path}`);
  });
}

beforeEach(() => get.mockReset());

describe('auth redirects in the layouts', () => {
  it('sends a signed-out visitor of /team to sign-in, remembering where they were going', async () => {
    answerMe(null);
    const router = renderRouter(routes(), { initialUrl: '/team' });
    expect(await screen.findByText('sign-in screen')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/sign-in');
    expect(router.getSearchParams()).toEqual({ next: '/team' });
  });

  it('sends a signed-in visitor of sign-in on to Designs', async () => {
    answerMe(demoUsers.admin);
    const router = renderRouter(routes(), { initialUrl: '/sign-in' });
    await waitFor(() => expect(router.getPathname()).toBe('/designs'));
    expect(await screen.findByText('designs screen')).toBeOnTheScreen();
  });

  it('shows sign-in to a signed-out visitor and stays there', async () => {
    answerMe(null);
    const router = renderRouter(routes(), { initialUrl: '/sign-in' });
    expect(await screen.findByText('sign-in screen')).toBeOnTheScreen();
    expect(router.getPathname()).toBe('/sign-in');
  });

  it('sends no team requests while a signed-out visitor is on the way to sign-in', async () => {
    answerMe(null);
    const router = renderRouter(routes(), { initialUrl: '/fetching' });
    expect(await screen.findByText('sign-in screen')).toBeOnTheScreen();
    expect(router.getSearchParams()).toEqual({ next: '/fetching' });
    expect(get.mock.calls.map(([path]) => path)).toEqual(['/api/auth/me']);
  });

  it("loads the screen's data once the session is known", async () => {
    answerMe(demoUsers.admin);
    renderRouter(routes(), { initialUrl: '/fetching' });
    expect(await screen.findByText('fetching screen: 0 designs, 0 members')).toBeOnTheScreen();
  });
});
