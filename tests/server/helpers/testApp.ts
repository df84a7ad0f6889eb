import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Express } from 'express';
import request from 'supertest';
import { createApp, stopBackgroundWork } from '../../../server/app';
import { loadConfig, type AppConfig } from '../../../server/config';
import { openDatabase, type Database } from '../../../server/db/database';
import { runMigrations } from '../../../server/db/migrate';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../../../server/seed';
import type { Role } from '../../../server/db/models/user';
import type { Logger } from '../../../server/logger';
import type { AnalysisPool } from '../../../server/modules/analysis/pool';
import type { SignInRateLimit } from '../../../server/modules/auth/signInRateLimit';

/** The header every state-changing API call from the Slotwise client carries. */
export const CLIENT = { 'X-Slotwise-Client': '1' } as const;
/** bcrypt cost in tests: low so suites stay fast (production uses 10). */
export const TEST_PASSWORD_COST = 4;

export type Agent = ReturnType<typeof request.agent>;

export interface TestApp {
  app: Express;
  db: Database;
  config: AppConfig;
  dir: string;
  /** Errors the server logged (a 5xx logs one). */
  loggedErrors: unknown[];
  /** A cookie-keeping client signed in as the demo account with that role. */
  signIn(role: Role): Promise<Agent>;
  signInAs(email: string, password: string): Promise<Agent>;
  anonymous(): Agent;
  userId(role: Role): Promise<number>;
  close(): Promise<void>;
}

export interface TestAppOptions {
  rateLimit?: SignInRateLimit;
  nodeEnv?: 'test' | 'production';
  clientDist?: string;
  seed?: boolean;
  /** Extra environment variables for loadConfig (ANALYSIS_TIME_LIMIT_MS, …). */
  env?: Record<string, string>;
  /** Replaces the recording logger. */
  logger?: Logger;
  analysisPool?: AnalysisPool;
  linkRateLimit?: { max: number; windowMs: number };
}

export const demoEmail = (role: Role) => DEMO_ACCOUNTS.find((account) => account.role === role)!.email;

/** A fresh app on its own temporary SQLite file, migrated and seeded with the demo shop. */
export async function buildTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'slotwise-server-test-'));
  const config = loadConfig(
    {
      NODE_ENV: options.nodeEnv ?? 'test',
      DATABASE_PATH: join(dir, 'slotwise.sqlite'),
      SESSION_SECRET: 'test-session-secret-that-is-long-enough-0123456789',
      CLIENT_DIST: options.clientDist ?? join(dir, 'no-client'),
      LOG_REQUESTS: 'false',
      ...options.env,
    },
    () => undefined,
  );
  const db = await openDatabase(config.databasePath);
  await runMigrations(db);
  if (options.seed !== false) await seedDemo(db, { passwordCost: TEST_PASSWORD_COST });

  const loggedErrors: unknown[] = [];
  const logger: Logger = options.logger ?? { info() {}, warn() {}, error: (_message, details) => void loggedErrors.push(details) };
  const app = createApp({
    config,
    db,
    logger,
    analysisPool: options.analysisPool,
    passwordCost: TEST_PASSWORD_COST,
    rateLimit: options.rateLimit ?? { signInMax: 1000, windowMs: 60_000 },
    linkRateLimit: options.linkRateLimit ?? { max: 100_000, windowMs: 60_000 },
  });

  async function signInAs(email: string, password: string): Promise<Agent> {
    const agent = request.agent(app);
    const response = await agent.post('/api/auth/sign-in').set(CLIENT).send({ email, password });
    if (response.status !== 200) throw new Error(`Sign-in as ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
    return agent;
  }

  return {
    app,
    db,
    config,
    dir,
    loggedErrors,
    signIn: (role) => signInAs(demoEmail(role), DEMO_PASSWORD),
    signInAs,
    anonymous: () => request.agent(app),
    async userId(role) {
      const user = await db.models.User.findOne({ where: { email: demoEmail(role) } });
      return user!.id;
    },
    async close() {
      await stopBackgroundWork(app);
      await db.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Row counts of the tables that hold the shop's data (sessions excluded: reading touches them). */
export async function rowCounts(db: Database): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const table of ['users', 'designs', 'design_revisions']) {
    const [rows] = await db.sequelize.query(`SELECT COUNT(*) AS n FROM ${table}`);
    counts[table] = (rows as { n: number }[])[0].n;
  }
  return counts;
}

/** Row counts of every table and a SHA-256 of every row of the data tables: "nothing changed" in one value. */
export async function dataFingerprint(db: Database): Promise<{ counts: Record<string, number>; checksum: string }> {
  const { createHash } = await import('node:crypto');
  return { counts: await rowCounts(db), checksum: createHash('sha256').update(await dataSnapshot(db)).digest('hex') };
}

/** Every row of the shop's data tables, for "nothing changed" checks. */
export async function dataSnapshot(db: Database): Promise<string> {
  const parts: unknown[] = [];
  for (const table of ['users', 'designs', 'design_revisions']) {
    const [rows] = await db.sequelize.query(`SELECT * FROM ${table} ORDER BY id`);
    parts.push(rows);
  }
  return JSON.stringify(parts);
}

/** The session id inside a slotwise.sid cookie value ("s:<id>.<signature>"). */
export function sessionIdFromSetCookie(setCookie: string[] | string | undefined): string | undefined {
  const cookies = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const cookie = cookies.find((value) => value.startsWith('slotwise.sid='));
  if (!cookie) return undefined;
  const value = decodeURIComponent(cookie.split(';')[0].slice('slotwise.sid='.length));
  return value.replace(/^s:/, '').split('.')[0];
}
