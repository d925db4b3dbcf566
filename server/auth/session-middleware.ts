import { ConnectSessionKnexStore } from 'connect-session-knex';
import session from 'express-session';
import type { Env } from '../config/env';
import type { Db } from '../db/tables';

/** Cookie sessions kept in MariaDB, so a hub restart does not sign the floor out mid-shift. */
export function sessionMiddleware(db: Db, env: Env, secret: string) {
  const store = new ConnectSessionKnexStore({
    knex: db,
    tableName: 'web_sessions',
    createTable: false,
    // Expired rows are swept by the running hub; tests pass 0 so no timer outlives them.
    cleanupInterval: env.NODE_ENV === 'test' ? 0 : 15 * 60 * 1000,
  });
  // The store checks its table once at start. If the database is unreachable then (or the hub is
  // closed before the check ends) that promise rejects with nobody listening, which would end the
  // process; requests that need a session still wait for it and fail with a 500 of their own.
  store.ready.catch(() => undefined);
  return session({
    name: 'dwell.sid',
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    proxy: env.TRUST_PROXY,
    cookie: {
      httpOnly: true,
      sameSite: 'strict',
      // 'auto' marks the cookie Secure whenever the request came over TLS (directly or via a trusted proxy).
      secure: 'auto',
      maxAge: env.SESSION_HOURS * 60 * 60 * 1000,
      path: '/',
    },
  });
}
