// `npm start`: build the client when it is missing or older than its sources, then start the
// server (which migrates the database). `npm start` asks for the demo shop explicitly
// (SEED_DEMO=1, seeded only while the database has no accounts); a real deployment sets
// SEED_DEMO=0 and creates its first owner with `npm run user:create -- --role owner`.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, statSync, readdirSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { join, dirname, resolve } from 'node:path';
import { randomBytes } from 'node:crypto';

const root = new URL('..', import.meta.url).pathname;
const built = join(root, 'dist', 'index.html');

function newestMtime(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMtime(path));
    else newest = Math.max(newest, statSync(path).mtimeMs);
  }
  return newest;
}

const sourcesChanged = () => {
  const builtAt = statSync(built).mtimeMs;
  const inputs = [join(root, 'src'), join(root, 'public')];
  const files = ['index.html', 'vite.config.ts', 'tailwind.config.ts'].map((f) => join(root, f));
  return (
    inputs.some((d) => existsSync(d) && newestMtime(d) > builtAt) ||
    files.some((f) => existsSync(f) && statSync(f).mtimeMs > builtAt)
  );
};

if (!existsSync(built) || process.env.SLOTWISE_REBUILD === '1' || sourcesChanged()) {
  console.log('Building the Slotwise client…');
  const result = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

// Production needs a session secret. Without one in the environment, use a random secret kept
// beside the database (created once, readable by this user only), so sessions survive restarts.
function sessionSecret() {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const databasePath = resolve(root, process.env.DATABASE_PATH ?? 'data/slotwise.sqlite');
  const secretFile = join(dirname(databasePath), '.session-secret');
  if (!existsSync(secretFile)) {
    mkdirSync(dirname(secretFile), { recursive: true });
    writeFileSync(secretFile, randomBytes(48).toString('hex'), { mode: 0o600 });
    console.log('Created a session secret beside the database (set SESSION_SECRET to use your own).');
  }
  return readFileSync(secretFile, 'utf8').trim();
}

const seedDemo = process.env.SEED_DEMO ?? '1';
if (seedDemo === '1' || seedDemo === 'true' || seedDemo === 'yes') {
  console.log('npm start seeds the demo shop into an empty database (set SEED_DEMO=0 to start without it).');
}

const server = spawn('npx', ['tsx', 'server/index.ts'], {
  cwd: root,
  stdio: 'inherit',
  env: { NODE_ENV: 'production', ...process.env, SEED_DEMO: seedDemo, SESSION_SECRET: sessionSecret() },
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
