import { Transaction, type Sequelize } from 'sequelize';
import { getModels } from '@/server/models';
import type { Passwords } from '@/server/services/passwords';
import { seedDesigns } from './designs';
import { DEMO_ACCOUNTS, seedTeamsAndUsers, type DemoAccount } from './users';

export { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_TEAMS, type DemoAccount } from './users';

export type SeedOutcome = { seeded: boolean; accounts: DemoAccount[] };

/**
 * Seed the demo scenario into a database with no users, all in one transaction (a half-seeded database
 * would never be seeded again). A database with any user is left alone. The caller checks SEED and
 * never calls this in production (server/config.ts refuses SEED=demo there).
 */
export async function seedDemo(sequelize: Sequelize, passwords: Passwords, { designs = true }: { designs?: boolean } = {}): Promise<SeedOutcome> {
  const models = getModels(sequelize);
  const seeded = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    if ((await models.User.count({ transaction })) > 0) return false;
    const people = await seedTeamsAndUsers(models, passwords, transaction);
    // Only tests about people and teams leave the designs out, to stay quick.
    if (designs) await seedDesigns(sequelize, models, people, transaction);
    return true;
  });
  return { seeded, accounts: await presentAccounts(sequelize) };
}

/** The demo accounts that exist in this database (all of them unless someone removed one). */
async function presentAccounts(sequelize: Sequelize): Promise<DemoAccount[]> {
  const { User } = getModels(sequelize);
  const present = new Set((await User.findAll({ attributes: ['email'], where: { removedAt: null } })).map((u) => u.email));
  return DEMO_ACCOUNTS.filter((a) => present.has(a.email));
}
