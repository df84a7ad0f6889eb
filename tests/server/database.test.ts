import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, dirname, join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase, defaultBackupPath } from '../../server/db/backup';
import { openDatabase, type Database } from '../../server/db/database';
import { runMigrations } from '../../server/db/migrate';
import { migrations } from '../../server/db/migrations';
import { seedDemo } from '../../server/seed';
import { sampleDocument } from './helpers/fixtures';
import { buildTestApp, CLIENT, rowCounts, TEST_PASSWORD_COST, type TestApp } from './helpers/testApp';

async function pragma(db: Database, name: string): Promise<unknown> {
  const rows = await db.sequelize.query<Record<string, unknown>>(`PRAGMA ${name}`, { type: QueryTypes.SELECT });
  return Object.values(rows[0])[0];
}

describe('WAL checkpoints', () => {
  it('copies the WAL back after writes (never inside a commit), so it does not grow with every save', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'slotwise-wal-'));
    const db = await openDatabase(join(dir, 'wal.sqlite'));
    try {
      await runMigrations(db);
      await seedDemo(db, { passwordCost: TEST_PASSWORD_COST });
      const design = (await db.models.Design.findOne())!;
      const megabyte = JSON.stringify({ padding: 'x'.repeat(1024 * 1024) });
      for (let i = 0; i < 8; i++) {
        await db.write((transaction) => db.models.DesignRevision.create({ designId: design.id, number: 100 + i, document: megabyte, createdBy: design.createdBy }, { transaction }));
        // Longer than the checkpoint's delay after a write.
        await new Promise((resolve) => setTimeout(resolve, 400));
      }
      // Eight 1 MB commits with no checkpoint leave a WAL of 8 MB or more; checkpointed, it is reused.
      expect(statSync(join(dir, 'wal.sqlite-wal')).size).toBeLessThan(4 * 1024 * 1024);
      expect(await db.models.DesignRevision.count({ where: { designId: design.id } })).toBeGreaterThanOrEqual(8);
    } finally {
      await db.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('the running database', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await buildTestApp();
  });
  afterAll(() => t.close());

  it('answers the health check with status ok, database ok and the version', async () => {
    const response = await request(t.app).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'ok', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
  });

  it('runs SQLite in WAL mode with foreign keys enforced', async () => {
    expect(String(await pragma(t.db, 'journal_mode')).toLowerCase()).toBe('wal');
    expect(await pragma(t.db, 'foreign_keys')).toBe(1);
    await expect(
      t.db.models.DesignRevision.create({ designId: 999_999, number: 1, document: '{}', createdBy: 1 }),
    ).rejects.toThrow(/FOREIGN KEY/);
  });

  it('writes a backup while requests keep saving, and the copy passes integrity_check with every row', async () => {
    const designer = await t.signIn('designer');
    const created = await designer.post('/api/designs').set(CLIENT).send({ name: 'Backed up', systemId: 'metric-40' });
    const id = created.body.design.id;
    const saving = (async () => {
      for (let base = 1; base <= 10; base += 1) {
        await designer.post(`/api/designs/${id}/revisions`).set(CLIENT).send({ baseRevision: base, document: sampleDocument(`Save ${base}`) });
      }
    })();
    const file = await backupDatabase(t.db);
    await saving;

    expect(dirname(file)).toBe(join(t.dir, 'backups'));
    expect(basename(file)).toMatch(/^slotwise-\d{4}-\d\d-\d\dT[\d-]+Z\.sqlite$/);
    const copy = await openDatabase(file);
    try {
      expect(await pragma(copy, 'integrity_check')).toBe('ok');
      const counts = await rowCounts(copy);
      expect(counts.users).toBe(5);
      expect(counts.designs).toBeGreaterThanOrEqual(4);
      // A consistent snapshot: the design's latest_revision always has its revision row.
      const [orphans] = await copy.sequelize.query(
        'SELECT d.id FROM designs d LEFT JOIN design_revisions r ON r.design_id = d.id AND r.number = d.latest_revision WHERE r.id IS NULL',
      );
      expect(orphans).toEqual([]);
    } finally {
      await copy.close();
    }
  });

  it('names backups by time under backups/ beside the database file', () => {
    expect(defaultBackupPath('/srv/slotwise/data/slotwise.sqlite', new Date('2026-12-02T01:30:00.000Z'))).toBe(
      '/srv/slotwise/data/backups/slotwise-2026-12-02T01-30-00-000Z.sqlite',
    );
  });
});

describe('migrations and seeding', () => {
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'slotwise-migrations-'));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('lists the migrations in number order', () => {
    const names = migrations.map((m) => m.name);
    expect(names).toEqual([...names].sort());
  });

  it('brings up to date a database migrated when the builds migrations were listed before the sharing ones', async () => {
    const file = join(dir, 'older-order.sqlite');
    const db = await openDatabase(file);
    // The listing order before: 0001–0004, 0020, 0021, then 0010–0013; this database stopped after 0021.
    const older = migrations.filter((m) => m.name < '0010' || m.name >= '0020');
    await new Umzug({ migrations: older, context: db.sequelize.getQueryInterface(), storage: new SequelizeStorage({ sequelize: db.sequelize, tableName: 'schema_migrations' }), logger: undefined }).up();
    expect(await runMigrations(db)).toEqual(['0010-create-links-and-classes', '0011-create-reviews', '0012-create-password-resets', '0013-create-uploads']);
    expect(await runMigrations(db)).toEqual([]);
    expect(await db.models.Build.count()).toBe(0);
    expect(await db.models.Upload.count()).toBe(0);
    await db.close();
  });

  it('runs forward on an existing database without losing rows, and a second run changes nothing', async () => {
    const file = join(dir, 'existing.sqlite');
    const first = migrations[0].name;
    let db = await openDatabase(file);
    expect(await runMigrations(db, { to: first })).toEqual([first]);
    await db.sequelize.query(
      `INSERT INTO users (email, display_name, role, password_hash, active, preferences, created_at, updated_at)
       VALUES ('early@harborlane.example', 'Early Adopter', 'owner', 'x', 1, '{"units":"in"}', '2026-01-01 00:00:00.000 +00:00', '2026-01-01 00:00:00.000 +00:00')`,
    );
    await db.close();

    db = await openDatabase(file);
    const applied = await runMigrations(db);
    expect(applied).toEqual(migrations.slice(1).map((m) => m.name));
    const user = await db.models.User.findOne({ where: { email: 'early@harborlane.example' } });
    expect(user?.displayName).toBe('Early Adopter');
    expect(user?.preferences).toEqual({ units: 'in' });
    expect(await runMigrations(db)).toEqual([]);
    expect(await db.models.User.count()).toBe(1);
    await db.close();
  });

  it('seeds the demo shop once: a second seed adds nothing', async () => {
    const db = await openDatabase(join(dir, 'seeded.sqlite'));
    await runMigrations(db);
    const first = await seedDemo(db, { passwordCost: TEST_PASSWORD_COST });
    expect(first.usersCreated).toBe(5);
    expect(first.designsCreated).toBe(3);
    const counts = await rowCounts(db);
    const second = await seedDemo(db, { passwordCost: TEST_PASSWORD_COST });
    expect(second).toMatchObject({ usersCreated: 0, designsCreated: 0 });
    expect(await rowCounts(db)).toEqual(counts);
    await db.close();
  });

  it('creates the folder of a database path that does not exist yet', async () => {
    const file = join(dir, 'nested', 'deeper', 'new.sqlite');
    const db = await openDatabase(file);
    await runMigrations(db);
    expect(existsSync(file)).toBe(true);
    await db.close();
  });
});
