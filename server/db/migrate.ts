import type { QueryInterface } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import type { Database } from './database';
import { migrations } from './migrations';

export function createMigrator(db: Database): Umzug<QueryInterface> {
  return new Umzug({
    migrations,
    context: db.sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize: db.sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names it applied. */
export async function runMigrations(db: Database, options: { to?: string } = {}): Promise<string[]> {
  const applied = await createMigrator(db).up(options.to ? { to: options.to } : {});
  return applied.map((migration) => migration.name);
}
