import { chmodSync, closeSync, existsSync, mkdirSync, openSync } from 'node:fs';
import { dirname } from 'node:path';
import { Sequelize, Transaction, type Options } from 'sequelize';
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
  write<T>(work: (transaction: Transaction) => Promise<T>): Promise<T>;
  close(): Promise<void>;
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
      configured.add(connection);
    }
    return connection;
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
  await sequelize.query('PRAGMA journal_mode = WAL');
  await sequelize.query(`PRAGMA busy_timeout = ${BUSY_TIMEOUT_MS}`);
  await sequelize.query('PRAGMA foreign_keys = ON');
  // SQLite gives the -wal and -shm files the database file's mode; tighten any left by an older version.
  restrictFileModes(path);
  const models = defineModels(sequelize);
  const queue = createWriteQueue();
  return {
    sequelize,
    models,
    path,
    write: (work) => queue(() => sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, work)),
    close: () => sequelize.close(),
  };
}
