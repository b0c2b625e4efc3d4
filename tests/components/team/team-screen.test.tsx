import { screen } from '@testing-library/react-native';
import { TeamScreen } from '@/components/team/TeamScreen';
import { api } from '@/lib/api/client';
import { teamKeys } from '@/lib/api/team';
import type { Member, TeamResponse } from '@/shared/api/team';
import { createTestQueryClient, demoUsers, renderWithClient } from '../helpers/render';

jest.mock('@/lib/api/client', () => require('../helpers/mock-client').clientModule());
const get = api.get as jest.Mock;

const member = (id: number, name: string, email: string, role: Member['role']): Member => ({ id, name, email, role, createdAt: '2026-11-20T09:00:00.000Z' });
const before: TeamResponse = {
  team: { id: 1, name: 'Tidewater Cold Storage' },
  members: [member(1, 'Maya Okafor', 'maya@tidewater.example', 'admin'), member(2, 'Ravi Menon', 'ravi@tidewater.example', 'designer')],
  invitations: [],
};

describe('team screen', () => {
  it('asks the server again when it opens, so someone who just accepted an invitation is listed', async () => {
    const after: TeamResponse = { ...before, members: [...before.members, member(9, 'Noor Haddad', 'noor@tidewater.example', 'installer')] };
    get.mockImplementation(async (path: string) => {
      if (path === '/api/team') return after;
      throw new Error(`unexpected request ${path}`);
    });
    // The shell fetched the team a moment ago: a copy well inside the query's stale time.
    const client = createTestQueryClient();
    client.setQueryData(teamKeys.current(), before);
    renderWithClient(<TeamScreen />, { user: demoUsers.admin, client });
    expect(await screen.findByText('Noor Haddad')).toBeOnTheScreen();
    expect(screen.getByTestId('team-members')).toHaveTextContent(/Members \(3\)/);
    expect(get).toHaveBeenCalledWith('/api/team');
  });
});
