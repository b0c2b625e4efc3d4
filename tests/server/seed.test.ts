import type { Sequelize } from 'sequelize';
import { openDatabase } from '@/server/db';
import { migrate } from '@/server/migrate';
import { getModels } from '@/server/models';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '@/server/seed';
import { createPasswords } from '@/server/services/passwords';

let sequelize: Sequelize;
const passwords = createPasswords(4);
beforeEach(async () => {
  sequelize = await openDatabase(':memory:');
  await migrate(sequelize);
});
afterEach(() => sequelize.close());

describe('the demo seed', () => {
  it('creates the two demo teams and their five people (docs/demo.md) in an empty database', async () => {
    const outcome = await seedDemo(sequelize, passwords);
    expect(outcome.seeded).toBe(true);
    const { Team, User } = getModels(sequelize);
    expect((await Team.findAll({ order: [['id', 'ASC']] })).map((t) => t.name)).toEqual(['Tidewater Cold Storage', 'Quayside Analytics']);
    const people = await User.findAll({ include: [{ model: Team, as: 'team' }], order: [['id', 'ASC']] });
    expect(people.map((u) => [u.name, u.email, u.role])).toEqual([
      ['Maya Okafor', 'maya@tidewater.example', 'admin'],
      ['Ravi Menon', 'ravi@tidewater.example', 'designer'],
      ['Theo Brandt', 'theo@tidewater.example', 'reviewer'],
      ['Ines Duarte', 'ines@tidewater.example', 'installer'],
      ['Sam Whitlock', 'sam@quayside.example', 'designer'],
    ]);
    for (const person of people) expect(await passwords.verify(DEMO_PASSWORD, person.passwordHash)).toBe(true);
    expect(outcome.accounts).toEqual(DEMO_ACCOUNTS);
  });

  it('uses only addresses of the reserved .example domain (RFC 2606 §3)', () => {
    for (const account of DEMO_ACCOUNTS) expect(account.email).toMatch(/\.example$/);
  });

  it('leaves a database that has users alone, and still reports the demo accounts present', async () => {
    await seedDemo(sequelize, passwords);
    const again = await seedDemo(sequelize, passwords);
    expect(again.seeded).toBe(false);
    expect(await getModels(sequelize).User.count()).toBe(5);
    expect(again.accounts).toHaveLength(5);
  });

  it('does not seed next to someone else’s users', async () => {
    const { Team, User } = getModels(sequelize);
    const team = await Team.create({ name: 'Someone' });
    await User.create({ teamId: team.id, email: 'me@elsewhere.example', name: 'Me', role: 'admin', passwordHash: 'x' });
    const outcome = await seedDemo(sequelize, passwords);
    expect(outcome).toEqual({ seeded: false, accounts: [] });
  });
});
