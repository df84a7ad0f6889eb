// Database chores: `tsx server/cli.ts migrate | seed | backup [file]`.
import { loadConfig } from './config';
import { backupDatabase } from './db/backup';
import { openDatabase } from './db/database';
import { runMigrations } from './db/migrate';
import { seedDemo } from './seed';

const USAGE = 'Usage: tsx server/cli.ts migrate | seed | backup [file]';

async function main(): Promise<number> {
  const [command, argument] = process.argv.slice(2);
  if (!command || !['migrate', 'seed', 'backup'].includes(command)) {
    console.error(USAGE);
    return 2;
  }
  const config = loadConfig(process.env, () => undefined);
  const db = await openDatabase(config.databasePath);
  try {
    if (command === 'migrate') {
      const applied = await runMigrations(db);
      console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The database is up to date.');
    } else if (command === 'seed') {
      await runMigrations(db);
      const report = await seedDemo(db);
      console.log(`Seeded ${report.usersCreated} users and ${report.designsCreated} designs (designs from ${report.designOrigin}).`);
    } else {
      const file = await backupDatabase(db, argument);
      console.log(file);
    }
    return 0;
  } finally {
    await db.close();
  }
}

main().then(
  (code) => process.exit(code),
  (error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  },
);
