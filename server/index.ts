// Starts the Slotwise server: config, database, migrations, first-run demo seed, listen, clean shutdown.
import type { Server } from 'node:http';
import { createApp, stopBackgroundWork } from './app';
import { ConfigError, loadConfig } from './config';
import { openDatabase } from './db/database';
import { runMigrations } from './db/migrate';
import { seedDemo } from './seed';
import { serverLogger as logger } from './logger';

async function start(): Promise<void> {
  const config = loadConfig(process.env, (message) => logger.warn(message));
  // tsx turns source maps on, and then every stack trace is mapped back: Sequelize reads a stack
  // for each query, which cost about a tenth of the server's CPU under load. Production stacks keep
  // the transpiled positions (file and function names stay right); development keeps the maps.
  if (config.nodeEnv === 'production' && process.env.SOURCE_MAPS !== '1') process.setSourceMapsEnabled(false);
  const db = await openDatabase(config.databasePath);
  const applied = await runMigrations(db);
  if (applied.length) logger.info(`Database migrated: ${applied.join(', ')}`);

  if (config.seedDemo && (await db.models.User.count()) === 0) {
    const report = await seedDemo(db);
    logger.info(`First run: seeded the demo shop (${report.usersCreated} accounts, ${report.designsCreated} designs).`);
  }

  const app = createApp({ config, db, logger });
  const server: Server = app.listen(config.port, config.host, () => {
    logger.info(`Slotwise (${config.nodeEnv}) listening on http://${config.host}:${config.port}`);
  });
  server.on('error', (error) => {
    logger.error('The server could not start', error);
    process.exit(1);
  });

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal}: finishing open requests, then closing the database.`);
    const force = setTimeout(() => process.exit(1), 10_000);
    force.unref();
    server.close(async () => {
      await stopBackgroundWork(app).catch((error) => logger.error('Stopping the analysis threads failed', error));
      await db.close().catch((error) => logger.error('Closing the database failed', error));
      process.exit(0);
    });
    server.closeIdleConnections();
  };
  process.on('SIGTERM', () => stop('SIGTERM'));
  process.on('SIGINT', () => stop('SIGINT'));
}

start().catch((error: unknown) => {
  if (error instanceof ConfigError) logger.error(error.message);
  else logger.error('Slotwise could not start', error);
  process.exit(1);
});
