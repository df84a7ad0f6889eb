// Database chores: `tsx server/cli.ts migrate | seed | backup [file] | user-create --role owner`.
import { loadConfig } from './config';
import { createUserFromCommandLine } from './createUserCli';
import { backupDatabase } from './db/backup';
import { openDatabase } from './db/database';
import { runMigrations } from './db/migrate';
import { seedDemo } from './seed';

const USAGE = 'Usage: tsx server/cli.ts migrate | seed | backup [file] | user-create --role <role> [--email <address>] [--name <name>]';

async function main(): Promise<number> {
  const [command, argument] = process.argv.slice(2);
  if (!command || !['migrate', 'seed', 'backup', 'user-create'].includes(command)) {
    console.error(USAGE);
    return 2;
  }
  const config = loadConfig(process.env, () => undefined);
  const db = await openDatabase(config.databasePath);
  try {
    if (command === 'migrate') {
      const applied = await runMigrations(db);
      console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'The database is up to date.');
    } else if (command === 'user-create') {
      await runMigrations(db);
      return await createUserFromCommandLine(db, process.argv.slice(3));
    } else if (command === 'seed') {
      await runMigrations(db);
      const report = await seedDemo(db);
      console.log(`Seeded ${report.usersCreated} users and ${report.designsCreated} demo designs.`);
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
