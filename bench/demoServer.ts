/**
 * A production Slotwise server with the demo shop seeded, on a throw-away database, for the
 * benchmarks that drive a browser (viewer, render). It runs under npx in its own process group.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import autocannon from 'autocannon';

export async function startDemoServer(options: { port: number; dbFile: string; name: string }): Promise<ChildProcess> {
  const base = `http://127.0.0.1:${options.port}`;
  const server = spawn('npx', ['tsx', 'server/index.ts'], {
    cwd: join(import.meta.dirname, '..'),
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(options.port),
      DATABASE_PATH: options.dbFile,
      SESSION_SECRET: `${options.name}-bench-session-secret-not-for-production-0123`,
      // Production seeds nothing unless asked; the benches sign in as the demo designer.
      SEED_DEMO: '1',
      CLIENT_DIST: process.env.CLIENT_DIST ?? 'dist',
    },
    stdio: 'ignore',
    detached: true,
  });
  try {
    await waitForHealth(base);
    return server;
  } catch (error) {
    stopServer(server);
    throw error;
  }
}

export function stopServer(server: ChildProcess): void {
  // End the server's own process group only.
  if (server.pid) {
    try {
      process.kill(-server.pid, 'SIGTERM');
    } catch {
      // already gone
    }
  }
}

/** Resolves once the server at `base` answers its health route (within 120 s). */
export async function waitForHealth(base: string): Promise<void> {
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`The bench server at ${base} did not start within 120 s.`);
}

/** autocannon as a promise. */
export function cannon(options: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolvePromise, reject) => {
    autocannon(options, (error, result) => (error ? reject(error) : resolvePromise(result)));
  });
}
