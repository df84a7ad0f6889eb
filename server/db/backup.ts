import { closeSync, mkdirSync, openSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { DATABASE_FILE_MODE, type Database } from './database';

/** data/backups/ beside the database file, e.g. data/backups/slotwise-2026-12-02T01-30-00-000Z.sqlite. */
export function defaultBackupPath(databasePath: string, now = new Date()): string {
  const stamp = now.toISOString().replace(/[:.]/g, '-');
  return join(dirname(databasePath), 'backups', `slotwise-${stamp}.sqlite`);
}

/**
 * Writes a consistent copy with VACUUM INTO: SQLite reads one snapshot, so the copy is whole even
 * while the server keeps writing. Refuses to overwrite an existing file. The copy holds password
 * hashes and sessions, so it is created empty with mode 0600 first (VACUUM INTO fills an empty file).
 */
export async function backupDatabase(db: Database, target = defaultBackupPath(db.path)): Promise<string> {
  const file = resolve(target);
  mkdirSync(dirname(file), { recursive: true, mode: 0o700 });
  try {
    closeSync(openSync(file, 'wx', DATABASE_FILE_MODE));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'EEXIST') throw new Error(`The backup file ${file} already exists; choose another name.`, { cause: error });
    throw error;
  }
  await db.sequelize.query('VACUUM INTO :file', { replacements: { file } });
  return file;
}
