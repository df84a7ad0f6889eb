import session from 'express-session';
import type { RequestHandler } from 'express';
import connectSessionSequelize from 'connect-session-sequelize';
import type { Database } from '../../db/database';
import { keptReads } from '../../db/keptReads';

export const SESSION_COOKIE_NAME = 'slotwise.sid';
const SESSION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const BaseSequelizeStore = connectSessionSequelize(session.Store);

/**
 * The package's store, with a lean read: every signed-in request reads its session, and the
 * package builds a full Sequelize model instance for it; a raw row of the one column does the same,
 * kept in memory until the next write (server/db/keptReads.ts).
 */
class SequelizeStore extends BaseSequelizeStore {
  /** Session rows kept until the next write (sign-in, sign-out, revocation: any write). */
  rows?: ReturnType<typeof keptReads<string, string | null>>;

  override get(sid: string, callback: (error: unknown, session?: session.SessionData | null) => void): void {
    const model = (this as unknown as { sessionModel: { findOne(options: object): Promise<{ data: string } | null> } }).sessionModel;
    const load = () => model.findOne({ where: { sid }, attributes: ['data'], raw: true }).then((row) => row?.data ?? null);
    (this.rows ? this.rows(sid, load) : load())
      // Parsed for each request: express-session changes the object it gets.
      .then((data) => callback(null, data === null ? null : (JSON.parse(data) as session.SessionData)))
      .catch((error: unknown) => callback(error));
  }
}
export type SessionStore = InstanceType<typeof SequelizeStore>;

/**
 * Sessions stored in SQLite (table from migration 0002). Cookie: httpOnly, SameSite=Lax, and
 * Secure whenever the request arrived over TLS (directly or via a trusted proxy).
 */
export function createSessionMiddleware(db: Database, secret: string): { middleware: RequestHandler; store: SessionStore } {
  const store = new SequelizeStore({
    db: db.sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60 * 1000,
    // Sessions do not roll, so a touch would rewrite the same expiry on every request: skip that write.
    disableTouch: true,
  } as ConstructorParameters<typeof SequelizeStore>[0]);
  store.rows = keptReads<string, string | null>(db, 10_000);
  const middleware = session({
    name: SESSION_COOKIE_NAME,
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: SESSION_LIFETIME_MS, path: '/' },
  });
  return { middleware, store };
}

export function sessionCookieClearOptions(secure: boolean) {
  return { httpOnly: true, sameSite: 'lax' as const, secure, path: '/' };
}
