import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { z } from 'zod';

/** The server's whole environment (api.md), parsed once at start so a typo fails loudly instead of later. */
const envSchema = z.object({
  NODE_ENV: z.string().optional(),
  PORT: z.coerce.number({ error: 'use a port number from 0 to 65535' }).int().min(0).max(65535).default(8080),
  DATABASE_PATH: z.string().trim().min(1).default('data/cablewright.sqlite'),
  SESSION_SECRET: z.string().optional(),
  SEED: z.enum(['demo', 'none']).optional(),
  MAIL: z
    .string()
    .trim()
    .default('fake')
    .refine((v) => v === 'fake' || /^smtps?:\/\/.+/.test(v), 'use "fake" or an smtp://… / smtps://… URL'),
  MAIL_FROM: z.string().trim().min(3).default('Cablewright <no-reply@cablewright.example>'),
  APP_URL: z.url({ protocol: /^https?$/, error: 'use an http:// or https:// URL' }).optional(),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).optional(),
  WEB_DIR: z.string().trim().min(1).optional(),
  WEB_DEV_SERVER: z.url({ protocol: /^https?$/, error: 'use an http:// URL such as http://localhost:8081' }).optional(),
  PHOTOS_DIR: z.string().trim().min(1).optional(),
});

export type MailConfig = { kind: 'fake' } | { kind: 'smtp'; url: string };

export type Config = {
  isProduction: boolean;
  port: number;
  databasePath: string;
  sessionSecret: string;
  /** True when no SESSION_SECRET was given and a random one was made for this process. */
  sessionSecretGenerated: boolean;
  seed: 'demo' | 'none';
  mail: MailConfig;
  mailFrom: string;
  /** Base of links in e-mails, and the app's own origin for the cross-site check. */
  appUrl: string;
  /** Origins whose state-changing requests are accepted besides the request's own. */
  trustedOrigins: string[];
  bcryptCost: number;
  /** Folder of the exported web app (served with an SPA fallback when it holds index.html). */
  webDir: string;
  /** `npm run dev`: pages come from Expo's dev server through this app, so the browser sees one origin. */
  webDevServer: string | null;
  /**
   * Folder of the build record's photos (absolute): PHOTOS_DIR, else `photos/` beside the database
   * file. Null with DATABASE_PATH=:memory: and no PHOTOS_DIR: a temporary folder is made on first use.
   */
  photosDir: string | null;
};

/** Expo's dev server (npm run dev) calls the API from this origin. */
export const EXPO_DEV_ORIGIN = 'http://localhost:8081';
const MIN_SECRET_LENGTH = 32;
// bcrypt cost 11 is about a tenth of a second per hash in bcryptjs here: slow for guessing, quick for people.
const DEFAULT_BCRYPT_COST = 11;
const MIN_PRODUCTION_BCRYPT_COST = 10;

export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid environment:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

/** Parse an environment (process.env by default) into a Config, or throw a ConfigError listing every problem. */
export function loadConfig(env: Record<string, string | undefined> = process.env): Config {
  const parsed = envSchema.safeParse(withoutEmpty(env));
  if (!parsed.success) {
    throw new ConfigError(parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`));
  }
  const e = parsed.data;
  const isProduction = e.NODE_ENV === 'production';
  const problems: string[] = [];

  if (isProduction && (!e.SESSION_SECRET || e.SESSION_SECRET.length < MIN_SECRET_LENGTH)) {
    problems.push(`SESSION_SECRET: required in production, at least ${MIN_SECRET_LENGTH} characters`);
  }
  if (isProduction && e.SEED === 'demo') {
    problems.push('SEED: the demo seed never runs in production; use SEED=none or leave it unset');
  }
  const bcryptCost = e.BCRYPT_COST ?? DEFAULT_BCRYPT_COST;
  if (isProduction && bcryptCost < MIN_PRODUCTION_BCRYPT_COST) {
    problems.push(`BCRYPT_COST: at least ${MIN_PRODUCTION_BCRYPT_COST} in production`);
  }
  if (isProduction && e.WEB_DEV_SERVER) {
    problems.push('WEB_DEV_SERVER: only for development; production serves the exported web app');
  }
  const webDir = path.resolve(e.WEB_DIR ?? 'dist/web');
  const photosDir = photoFolder(e.PHOTOS_DIR, e.DATABASE_PATH);
  if (photosDir && isInside(photosDir, webDir)) {
    problems.push('PHOTOS_DIR: must not be inside the web app folder (WEB_DIR), where it would be served to anyone');
  }
  if (problems.length > 0) throw new ConfigError(problems);

  const appUrl = (e.APP_URL ?? `http://localhost:${e.PORT}`).replace(/\/+$/, '');
  const trustedOrigins = [new URL(appUrl).origin, ...(isProduction ? [] : [EXPO_DEV_ORIGIN])];
  return {
    isProduction,
    port: e.PORT,
    databasePath: e.DATABASE_PATH,
    sessionSecret: e.SESSION_SECRET ?? randomBytes(32).toString('hex'),
    sessionSecretGenerated: !e.SESSION_SECRET,
    seed: isProduction ? 'none' : (e.SEED ?? 'demo'),
    mail: e.MAIL === 'fake' ? { kind: 'fake' } : { kind: 'smtp', url: e.MAIL },
    mailFrom: e.MAIL_FROM,
    appUrl,
    trustedOrigins,
    bcryptCost,
    webDir,
    webDevServer: e.WEB_DEV_SERVER ?? null,
    photosDir,
  };
}

function photoFolder(photosDir: string | undefined, databasePath: string): string | null {
  if (photosDir) return path.resolve(photosDir);
  return databasePath === ':memory:' ? null : path.resolve(path.dirname(databasePath), 'photos');
}

function isInside(folder: string, parent: string): boolean {
  const relative = path.relative(parent, folder);
  return relative === '' || (!relative.startsWith('..') && !path.isAbsolute(relative));
}

/** For entry points: a bad environment prints what is wrong and exits instead of throwing a stack trace. */
export function loadConfigOrExit(env: Record<string, string | undefined> = process.env): Config {
  try {
    return loadConfig(env);
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(`Cablewright cannot start. ${error.message}`);
      process.exit(1);
    }
    throw error;
  }
}

/** `FOO=` in a shell means "not set" to most people; treat it so. */
function withoutEmpty(env: Record<string, string | undefined>): Record<string, string> {
  return Object.fromEntries(
    Object.entries(env).filter((entry): entry is [string, string] => entry[1] !== undefined && entry[1] !== ''),
  );
}
