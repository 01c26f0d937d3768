import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';
import type { Config } from './config';

const PgStore = connectPgSimple(session);

/** Sessions in PostgreSQL (table `session`, created by the migrations), cookie httpOnly + Lax. */
export function sessionMiddleware(config: Config, pool: pg.Pool) {
  const secure = config.APP_URL.startsWith('https://');
  return session({
    name: 'bundlesmith.sid',
    store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: secure,
    cookie: { httpOnly: true, sameSite: 'lax', secure, maxAge: 8 * 60 * 60 * 1000 },
  });
}
