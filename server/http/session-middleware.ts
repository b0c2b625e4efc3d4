import connectSessionSequelize from 'connect-session-sequelize';
import type { RequestHandler } from 'express';
import session from 'express-session';
import type { Sequelize } from 'sequelize';
import type { Config } from '@/server/config';
import { SESSION_MODEL_NAME } from '@/server/models/session';
import { SESSION_COOKIE } from './session';

const SessionStore = connectSessionSequelize(session.Store);
const SESSION_DAYS = 14;
/** A session's stored expiry is pushed forward at most this often (see touchAtMostEvery). */
const TOUCH_EVERY_MS = 10 * 60 * 1000;
const TOUCHED_KEPT = 10_000;

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
  touchAtMostEvery(store, TOUCH_EVERY_MS);
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

/**
 * express-session "touches" the store on every request to push the session's expiry forward, and
 * connect-session-sequelize does that with an UPDATE: a database write (and, with WAL, a sync to
 * disk) for every read of the API. A 14-day session loses nothing if its stored expiry moves at
 * most every ten minutes, so this process remembers when it last touched each session (a Map of
 * the most recent ones) and skips the write in between. Sessions are still saved whenever they change.
 */
function touchAtMostEvery(store: session.Store, everyMs: number): void {
  const touch = store.touch?.bind(store);
  if (!touch) return;
  const touched = new Map<string, number>();
  store.touch = (sid, data, callback) => {
    const now = Date.now();
    const last = touched.get(sid);
    if (last !== undefined && now - last < everyMs) return callback?.();
    touched.delete(sid);
    touched.set(sid, now);
    for (const oldest of touched.keys()) {
      if (touched.size <= TOUCHED_KEPT) break;
      touched.delete(oldest);
    }
    touch(sid, data, callback);
  };
}
