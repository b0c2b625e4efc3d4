import type { Sequelize } from 'sequelize';
import type { Config } from '@/server/config';
import type { Mailer } from '@/server/mail/mailer';
import type { Models } from '@/server/models';
import type { Passwords } from './passwords';

/** What every service is built from; tests pass an in-memory database and the real fake mail sink. */
export type ServiceDeps = {
  sequelize: Sequelize;
  models: Models;
  mailer: Mailer;
  config: Config;
  passwords: Passwords;
  /** Milliseconds since the epoch; tests pass their own to step through time-based limits. */
  clock: () => number;
};
