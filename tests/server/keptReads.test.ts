import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, type Database } from '../../server/db/database';
import { keptReads } from '../../server/db/keptReads';
import { runMigrations } from '../../server/db/migrate';

describe('keptReads', () => {
  let db: Database;
  let dir: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'slotwise-kept-'));
    db = await openDatabase(join(dir, 'kept.sqlite'));
    await runMigrations(db);
  });
  afterAll(async () => {
    await db.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const countUsers = async () => {
    const [row] = await db.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM users', { type: QueryTypes.SELECT });
    return Number(row?.n);
  };
  const addUser = (email: string) =>
    db.write((transaction) => db.models.User.create({ email, displayName: 'Kept', role: 'designer', passwordHash: 'x', preferences: { units: 'mm' } }, { transaction }));

  it('keeps a read until a write finishes, then reads again', async () => {
    const read = keptReads<string, number>(db, 10);
    let loads = 0;
    const load = () => {
      loads++;
      return countUsers();
    };
    const first = await read('users', load);
    expect(await read('users', load)).toBe(first);
    expect(loads).toBe(1);
    await addUser('kept-1@example.com');
    expect(await read('users', load)).toBe(first + 1);
    expect(loads).toBe(2);
  });

  it('does not keep a value read while a write finished', async () => {
    const read = keptReads<string, number>(db, 10);
    let loads = 0;
    const slowLoad = async () => {
      loads++;
      const value = await countUsers();
      await addUser(`kept-during-${loads}@example.com`); // a write lands before the read returns
      return value;
    };
    const stale = await read('users', slowLoad);
    const fresh = await read('users', countUsers);
    expect(fresh).toBe(stale + 1);
  });
});
