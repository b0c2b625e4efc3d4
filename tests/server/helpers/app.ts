import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import { Sequelize } from 'sequelize';
import request from 'supertest';
import { createApp } from '@/server/app';
import { loadConfig, type Config } from '@/server/config';
import { openDatabase } from '@/server/db';
import { createMailer, type Mailer } from '@/server/mail/mailer';
import { migrate } from '@/server/migrate';
import { getModels, type Models } from '@/server/models';
import { DEMO_PASSWORD, seedDemo } from '@/server/seed';
import { createPasswords } from '@/server/services/passwords';
import { closePhotoPool } from '@/server/services/photos/photo-pool';
import type { Role } from '@/shared/roles';

/** The environment of every test app: in-memory database, cheap hashes, the real fake mail sink. */
export const TEST_ENV: Record<string, string> = {
  NODE_ENV: 'test',
  DATABASE_PATH: ':memory:',
  // bcrypt's minimum cost keeps the suite fast; production refuses under 10 (server/config.ts).
  BCRYPT_COST: '4',
  SEED: 'none',
  MAIL: 'fake',
  APP_URL: 'http://localhost:8090',
  WEB_DIR: '/nonexistent/cablewright-web',
};

export const APP_ORIGIN = 'http://localhost:8090';

/** What production requires (server/config.ts): a long session secret, real bcrypt cost, an https APP_URL. */
export const PRODUCTION_ENV: Record<string, string> = {
  NODE_ENV: 'production',
  SESSION_SECRET: 'p'.repeat(40),
  BCRYPT_COST: '10',
  SEED: 'none',
  APP_URL: 'https://cablewright.example',
  // 32 bytes as hex (server/config.ts); production refuses to start without one.
  SECRETS_KEY: '5e'.repeat(32),
};
export const PRODUCTION_ORIGIN = 'https://cablewright.example';

/** The demo people by the role the tests sign in as (docs/demo.md's Tidewater team, plus Quayside's Sam). */
export const DEMO = {
  admin: 'maya@tidewater.example',
  designer: 'ravi@tidewater.example',
  reviewer: 'theo@tidewater.example',
  installer: 'ines@tidewater.example',
  otherTeam: 'sam@quayside.example',
} as const;
export type DemoWho = keyof typeof DEMO;
export { DEMO_PASSWORD };

export type TestApp = {
  app: Express;
  sequelize: Sequelize;
  models: Models;
  mailer: Mailer;
  config: Config;
  close: () => Promise<void>;
};

/**
 * A migrated app; `seed` (default true) adds the demo teams, people and designs, `'people'` only the
 * teams and people (quicker, for tests that never look at a design). In memory unless
 * `databasePath` names a file (for what only a file database shows: WAL, several connections).
 * `clock` replaces Date.now for the sign-in limits, so a test can step past a wait.
 */
export async function makeTestApp({
  env = {},
  seed = true,
  databasePath = ':memory:',
  clock,
}: { env?: Record<string, string>; seed?: boolean | 'people'; databasePath?: string; clock?: () => number } = {}): Promise<TestApp> {
  // Each app keeps its photos in a folder of its own, removed again by close().
  const photosDir = env.PHOTOS_DIR ? null : mkdtempSync(path.join(tmpdir(), 'cw-test-photos-'));
  const config = loadConfig({ ...TEST_ENV, ...(photosDir ? { PHOTOS_DIR: photosDir } : {}), ...env });
  const database = databasePath === ':memory:' && process.env.TEST_DATABASE_URL ? await freshPostgres(process.env.TEST_DATABASE_URL) : null;
  const sequelize = await openDatabase(database ? database.url : databasePath);
  await migrate(sequelize);
  if (seed) await seedDemo(sequelize, createPasswords(config.bcryptCost), { designs: seed !== 'people' });
  const mailer = await createMailer(config);
  const app = createApp({ sequelize, mailer, config, clock });
  return {
    app,
    sequelize,
    models: getModels(sequelize),
    mailer,
    config,
    async close() {
      await mailer.close();
      await closePhotoPool();
      await sequelize.close();
      await database?.drop();
      if (photosDir) rmSync(photosDir, { recursive: true, force: true });
    },
  };
}

/**
 * With TEST_DATABASE_URL (`npm run test:postgres`), a test app that would be in memory gets an
 * empty PostgreSQL database of its own instead, dropped again when the app closes.
 */
async function freshPostgres(adminUrl: string): Promise<{ url: string; drop: () => Promise<void> }> {
  const name = `cw_test_${randomBytes(6).toString('hex')}`;
  const admin = new Sequelize(adminUrl, { dialect: 'postgres', logging: false });
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.close();
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    async drop() {
      const again = new Sequelize(adminUrl, { dialect: 'postgres', logging: false });
      await again.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await again.close();
    },
  };
}

/** A cookie-keeping client signed in as `who` (fails the test if sign-in does not answer 200). */
export async function signInAs(app: Express, who: DemoWho) {
  return signInWith(app, DEMO[who]);
}

/** The same for any account with the demo password, e.g. one made by addPerson(). */
export async function signInWith(app: Express, email: string) {
  const agent = request.agent(app);
  await agent.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
  return agent;
}

export type Agent = Awaited<ReturnType<typeof signInWith>>;

/** Add an account with the demo password to a seeded team (the demo has no Quayside admin or reviewer). */
export async function addPerson(t: TestApp, person: { team: string; name: string; email: string; role: Role }): Promise<number> {
  const team = await t.models.Team.findOne({ where: { name: person.team } });
  if (!team) throw new Error(`no team ${person.team}`);
  const passwordHash = await createPasswords(t.config.bcryptCost).hash(DEMO_PASSWORD);
  const row = await t.models.User.create({ teamId: team.id, name: person.name, email: person.email, role: person.role, passwordHash });
  return row.id;
}

/** The session cookie (`name=value`) from a response's Set-Cookie, or undefined. */
export function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith('cablewright.sid='))?.split(';')[0];
}

/** The full Set-Cookie line of the session cookie, attributes included. */
export function sessionSetCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith('cablewright.sid='));
}
