// `npm start`: build the client when it is missing or older than its sources, then start the
// server (which migrates the database and seeds the demo shop on first run).
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, statSync, readdirSync } from 'node:fs';
import { join } from 'node:path';

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

const server = spawn('npx', ['tsx', 'server/index.ts'], {
  cwd: root,
  stdio: 'inherit',
  env: { NODE_ENV: 'production', ...process.env },
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
