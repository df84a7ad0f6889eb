import { chmodSync, closeSync, existsSync, mkdirSync, openSync } from 'node:fs';
import { dirname } from 'node:path';
import sqlite3 from 'sqlite3';
import { QueryTypes, Sequelize, Transaction, type Options, type QueryOptions } from 'sequelize';
import { defineModels, type Models } from './models';
import { createWriteQueue } from './writeQueue';

export const BUSY_TIMEOUT_MS = 5000;

export interface Database {
  sequelize: Sequelize;
  models: Models;
  /** The SQLite file. */
  path: string;
  /**
   * Runs `work` in one IMMEDIATE transaction, after any write already running in this process:
   * writes queue here instead of racing for SQLite's single write lock.
   */
  write<T>(work: (transaction: Transaction) => Promise<T>, options?: WriteOptions): Promise<T>;
  /**
   * A number that moves on whenever a statement other than a read has finished (inserts, updates,
   * deletes, commits, schema changes), whether or not it went through `write`. Answers kept in
   * memory are tagged with the count taken before they were read, and used only while it stands.
   * Writes made with `{ changesAnswers: false }` do not move it.
   */
  changeCount(): number;
  close(): Promise<void>;
}

export interface WriteOptions {
  /**
   * False for writes that change nothing any answer kept in memory shows (a link's open counter):
   * they leave `changeCount` alone, so the kept answers survive them.
   */
  changesAnswers?: boolean;
}

interface SqliteConnection {
  configure(option: 'busyTimeout', milliseconds: number): void;
  run(sql: string): void;
}

const configured = new WeakSet<object>();

/**
 * Sequelize's sqlite dialect opens a new connection for every transaction and runs no connect
 * hooks, so per-connection settings are applied here the first time a connection is handed out.
 */
function setBusyTimeoutOnEveryConnection(sequelize: Sequelize): void {
  // The connection manager is internal to Sequelize and untyped: this cast names the one method used.
  const manager = sequelize.connectionManager as unknown as { getConnection(options?: unknown): Promise<SqliteConnection> };
  const getConnection = manager.getConnection.bind(manager);
  manager.getConnection = async (options?: unknown) => {
    const connection = await getConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
      // In WAL mode NORMAL still survives a crashed or killed process; only a power cut can lose the last commits.
      connection.run('PRAGMA synchronous = NORMAL');
      // No checkpoint inside a commit: see scheduleCheckpoints.
      connection.run('PRAGMA wal_autocheckpoint = 0');
      configured.add(connection);
    }
    return connection;
  };
}

type Sql = string | { query: string; values: unknown[] };
const READ_STATEMENT = /^\s*SELECT\b/i;

/**
 * Counts finished statements that are not plain reads. Every Sequelize call (models, raw queries,
 * transactions' COMMIT) goes through `sequelize.query`, so wrapping it sees them all. A statement
 * that fails is counted too: counting too often only costs a cache miss.
 */
function countChanges(sequelize: Sequelize, uncounted: WeakSet<Transaction>): () => number {
  let changes = 0;
  const query: (sql: Sql, options?: QueryOptions) => Promise<unknown> = sequelize.query.bind(sequelize);
  const isRead = (sql: Sql, options?: QueryOptions) => options?.type === QueryTypes.SELECT || READ_STATEMENT.test(typeof sql === 'string' ? sql : sql.query);
  const counts = (sql: Sql, options?: QueryOptions) => !isRead(sql, options) && !(options?.transaction && uncounted.has(options.transaction));
  const counted = (sql: Sql, options?: QueryOptions) => (counts(sql, options) ? query(sql, options).finally(() => void changes++) : query(sql, options));
  Object.assign(sequelize, { query: counted });
  return () => changes;
}

/** How long after a write the WAL is copied back into the database file, and the longest gap. */
const CHECKPOINT_DELAY_MS = 250;
const CHECKPOINT_INTERVAL_MS = 60_000;

/**
 * SQLite copies the WAL back into the database file once it passes 1,000 pages, inside the commit
 * that crosses the mark: with 1 MB designs every fourth save paid 15-30 ms for it. Connections
 * here never checkpoint on commit (wal_autocheckpoint = 0); a PASSIVE checkpoint runs shortly
 * after each write instead, on a connection of its own off the event loop, without blocking
 * readers or writers, and once a minute in case something wrote outside `write`.
 */
function scheduleCheckpoints(path: string): { afterWrite(): void; stop(): Promise<void> } {
  // A connection of its own, so a checkpoint never queues the server's reads behind it.
  let connection: sqlite3.Database | undefined;
  let running = false;
  const checkpoint = () => {
    if (running) return;
    running = true;
    connection ??= new sqlite3.Database(path, sqlite3.OPEN_READWRITE, () => undefined);
    connection.configure('busyTimeout', BUSY_TIMEOUT_MS);
    connection.run('PRAGMA wal_checkpoint(PASSIVE)', () => {
      running = false;
    });
  };
  let soon: NodeJS.Timeout | undefined;
  const regular = setInterval(checkpoint, CHECKPOINT_INTERVAL_MS);
  regular.unref();
  return {
    afterWrite() {
      if (soon) return;
      soon = setTimeout(() => {
        soon = undefined;
        checkpoint();
      }, CHECKPOINT_DELAY_MS);
      soon.unref();
    },
    stop() {
      clearTimeout(soon);
      clearInterval(regular);
      const open = connection;
      connection = undefined;
      return new Promise((resolve) => (open ? open.close(() => resolve()) : resolve()));
    },
  };
}

/** The database holds password hashes and sessions: only the server's own user may read it. */
export const DATABASE_FILE_MODE = 0o600;

/** Creates the file 0600 if missing and tightens an existing one (and its WAL and shared-memory files). */
function restrictFileModes(path: string): void {
  if (!existsSync(path)) closeSync(openSync(path, 'a', DATABASE_FILE_MODE));
  for (const file of [path, `${path}-wal`, `${path}-shm`]) {
    if (existsSync(file)) chmodSync(file, DATABASE_FILE_MODE);
  }
}

/** Opens (creating if needed, mode 0600) the SQLite file in WAL mode with foreign keys on. Does not migrate. */
export async function openDatabase(path: string): Promise<Database> {
  mkdirSync(dirname(path), { recursive: true });
  restrictFileModes(path);
  // `foreignKeys` is a sqlite dialect option Sequelize's Options type does not list.
  const options: Options & { foreignKeys: boolean } = {
    dialect: 'sqlite',
    storage: path,
    logging: false,
    transactionType: Transaction.TYPES.IMMEDIATE,
    // Sequelize already turns foreign keys on for each sqlite connection it opens.
    foreignKeys: true,
  };
  const sequelize = new Sequelize(options);
  setBusyTimeoutOnEveryConnection(sequelize);
  const uncounted = new WeakSet<Transaction>();
  const changeCount = countChanges(sequelize, uncounted);
  await sequelize.query('PRAGMA journal_mode = WAL');
  await sequelize.query(`PRAGMA busy_timeout = ${BUSY_TIMEOUT_MS}`);
  await sequelize.query('PRAGMA foreign_keys = ON');
  // SQLite gives the -wal and -shm files the database file's mode; tighten any left by an older version.
  restrictFileModes(path);
  const models = defineModels(sequelize);
  const queue = createWriteQueue();
  const checkpoints = scheduleCheckpoints(path);
  return {
    sequelize,
    models,
    path,
    write: (work, writeOptions) =>
      queue(() =>
        sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, (transaction) => {
          if (writeOptions?.changesAnswers === false) uncounted.add(transaction);
          return work(transaction);
        }),
      ).finally(checkpoints.afterWrite),
    changeCount,
    close: async () => {
      await checkpoints.stop();
      // SQLite checkpoints the whole WAL when the last connection closes.
      await sequelize.close();
    },
  };
}
