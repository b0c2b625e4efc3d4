import connectSessionSequelize from 'connect-session-sequelize';
import type { RequestHandler } from 'express';
import session from 'express-session';
import type { Sequelize } from 'sequelize';
import type { Config } from '@/server/config';
import { SESSION_MODEL_NAME } from '@/server/models/session';
import { SESSION_COOKIE } from './session';

const SessionStore = connectSessionSequelize(session.Store);
const SESSION_DAYS = 14;

/**
 * Sessions live in the `sessions` table (migration 0003). The cookie is httpOnly (scripts cannot read it),
 * SameSite=Lax (not sent on cross-site POSTs) and Secure in production (HTTPS only). The store copies
 * the session's userId into its own column so removing a member can end that member's sessions.
 */
export function sessionMiddleware(sequelize: Sequelize, config: Config): RequestHandler {
  const store = new SessionStore({
    db: sequelize,
    table: SESSION_MODEL_NAME,
    expiration: SESSION_DAYS * 24 * 60 * 60 * 1000,
    extendDefaultFields: (defaults, data: { userId?: number }) => ({
      ...defaults,
      userId: data.userId ?? null,
    }),
  });
  return session({
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    // The app's `trust proxy` (TRUST_PROXY) decides whether X-Forwarded-Proto says the request was HTTPS.
    proxy: undefined,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.isProduction,
      maxAge: SESSION_DAYS * 24 * 60 * 60 * 1000,
      path: '/',
    },
  });
}
