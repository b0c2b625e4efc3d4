import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import request from 'supertest';
import { createApp } from '@/server/app';
import { loadConfig, type Config } from '@/server/config';
import { openDatabase } from '@/server/db';
import { createMailer, type Mailer } from '@/server/mail/mailer';
import { migrate } from '@/server/migrate';
import { getModels, type Models } from '@/server/models';
import { DEMO_PASSWORD, seedDemo } from '@/server/seed';
import { createPasswords } from '@/server/services/passwords';

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

/** The demo people by the role the tests sign in as (product.md's Tidewater team, plus Quayside's Sam). */
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

/** A migrated in-memory app; `seed` (default true) adds the demo teams and people. */
export async function makeTestApp({ env = {}, seed = true }: { env?: Record<string, string>; seed?: boolean } = {}): Promise<TestApp> {
  const config = loadConfig({ ...TEST_ENV, ...env });
  const sequelize = await openDatabase(':memory:');
  await migrate(sequelize);
  if (seed) await seedDemo(sequelize, createPasswords(config.bcryptCost));
  const mailer = await createMailer(config);
  const app = createApp({ sequelize, mailer, config });
  return {
    app,
    sequelize,
    models: getModels(sequelize),
    mailer,
    config,
    async close() {
      await mailer.close();
      await sequelize.close();
    },
  };
}

/** A cookie-keeping client signed in as `who` (fails the test if sign-in does not answer 200). */
export async function signInAs(app: Express, who: DemoWho) {
  const agent = request.agent(app);
  await agent.post('/api/auth/sign-in').send({ email: DEMO[who], password: DEMO_PASSWORD }).expect(200);
  return agent;
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
