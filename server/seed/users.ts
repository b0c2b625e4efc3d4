import type { Transaction } from 'sequelize';
import type { Role } from '@/shared/roles';
import type { Models, TeamRow, UserRow } from '@/server/models';
import type { Passwords } from '@/server/services/passwords';

/** Every demo account's password (printed at start and in the README); the demo never runs in production. */
export const DEMO_PASSWORD = 'harbor-road-demo';

/** The invented demo teams of the product brief; `.example` addresses are reserved for examples (RFC 2606). */
export const DEMO_TEAMS: ReadonlyArray<{ name: string; members: ReadonlyArray<{ name: string; email: string; role: Role }> }> = [
  {
    name: 'Tidewater Cold Storage',
    members: [
      { name: 'Maya Okafor', email: 'maya@tidewater.example', role: 'admin' },
      { name: 'Ravi Menon', email: 'ravi@tidewater.example', role: 'designer' },
      { name: 'Theo Brandt', email: 'theo@tidewater.example', role: 'reviewer' },
      { name: 'Ines Duarte', email: 'ines@tidewater.example', role: 'installer' },
    ],
  },
  {
    name: 'Quayside Analytics',
    members: [{ name: 'Sam Whitlock', email: 'sam@quayside.example', role: 'designer' }],
  },
];

export type DemoAccount = { team: string; name: string; email: string; role: Role; password: string };

export const DEMO_ACCOUNTS: DemoAccount[] = DEMO_TEAMS.flatMap((team) =>
  team.members.map((m) => ({ team: team.name, ...m, password: DEMO_PASSWORD })),
);

/** What the user seed made, by name and e-mail, for the seeds that follow (designs need teams and authors). */
export type SeededPeople = { teams: Map<string, TeamRow>; users: Map<string, UserRow> };

export async function seedTeamsAndUsers(models: Models, passwords: Passwords, transaction: Transaction): Promise<SeededPeople> {
  const teams = new Map<string, TeamRow>();
  const users = new Map<string, UserRow>();
  for (const demo of DEMO_TEAMS) {
    const team = await models.Team.create({ name: demo.name }, { transaction });
    teams.set(demo.name, team);
    for (const member of demo.members) {
      const passwordHash = await passwords.hash(DEMO_PASSWORD);
      users.set(member.email, await models.User.create({ ...member, teamId: team.id, passwordHash }, { transaction }));
    }
  }
  return { teams, users };
}
