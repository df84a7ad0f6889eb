import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp, stopBackgroundWork } from '../../server/app';
import { loadConfig } from '../../server/config';
import { openDatabase } from '../../server/db/database';
import { runMigrations } from '../../server/db/migrate';
import { silentLogger } from '../../server/logger';
import { sampleDocument } from './helpers/fixtures';
import { CLIENT } from './helpers/testApp';

const root = new URL('../../', import.meta.url).pathname;
const dir = mkdtempSync(join(tmpdir(), 'slotwise-crash-'));
const databasePath = join(dir, 'slotwise.sqlite');
const port = 41000 + Math.floor(Math.random() * 9000);
const base = `http://127.0.0.1:${port}`;
const children: ChildProcess[] = [];

function startServer(): ChildProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'test', PORT: String(port), HOST: '127.0.0.1', DATABASE_PATH: databasePath, SESSION_SECRET: 'crash-test-secret-0123456789-abcdefghij', LOG_REQUESTS: 'false' },
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  children.push(child);
  return child;
}

async function waitForHealth(): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 150));
  }
  throw new Error('The server did not start within 60 s');
}

const exited = (child: ChildProcess) =>
  new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) resolve({ code: child.exitCode, signal: child.signalCode });
    else child.once('exit', (code, signal) => resolve({ code, signal }));
  });

async function call(method: string, path: string, cookie: string, body?: unknown) {
  const response = await fetch(`${base}${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1', Cookie: cookie },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return { status: response.status, body: (await response.json().catch(() => null)) as any, headers: response.headers };
}

afterAll(() => {
  for (const child of children) if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
  rmSync(dir, { recursive: true, force: true });
});

describe('a server killed with SIGKILL during a burst of saves', () => {
  it('comes back with a database that passes integrity_check and holds every acknowledged save', async () => {
    const first = startServer();
    await waitForHealth();
    const signIn = await call('POST', '/api/auth/sign-in', '', { email: 'designer@harborlane.example', password: 'slotwise-demo-2026' });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const created = await call('POST', '/api/designs', cookie, { name: 'Crash target', systemId: 'metric-40' });
    expect(created.status).toBe(201);
    const id = created.body.design.id as number;

    const acknowledged: { number: number; name: string }[] = [];
    let stop = false;
    const writer = async (writerIndex: number) => {
      let baseRevision = 1;
      for (let i = 0; !stop; i += 1) {
        const name = `Writer ${writerIndex} save ${i}`;
        try {
          const save = await call('POST', `/api/designs/${id}/revisions`, cookie, { baseRevision, document: sampleDocument(name) });
          if (save.status === 201) {
            acknowledged.push({ number: save.body.revision.number, name });
            baseRevision = save.body.revision.number;
          } else if (save.status === 409) {
            baseRevision = save.body.error.latestRevision;
          }
        } catch {
          return; // the server is gone
        }
      }
    };
    const writers = Promise.all([0, 1, 2, 3].map(writer));
    while (acknowledged.length < 15) await new Promise((resolve) => setTimeout(resolve, 10));
    first.kill('SIGKILL');
    stop = true;
    await writers;
    expect((await exited(first)).signal).toBe('SIGKILL');

    // Start again the way server/index.ts does: open, migrate, serve.
    const db = await openDatabase(databasePath);
    try {
      const [check] = await db.sequelize.query<{ integrity_check: string }>('PRAGMA integrity_check', { type: QueryTypes.SELECT });
      expect(check.integrity_check).toBe('ok');
      await runMigrations(db);
      const app = createApp({ config: loadConfig({ NODE_ENV: 'test', DATABASE_PATH: databasePath, SESSION_SECRET: 'x'.repeat(40) }, () => undefined), db, logger: silentLogger });
      const agent = request.agent(app);
      expect((await agent.post('/api/auth/sign-in').set(CLIENT).send({ email: 'designer@harborlane.example', password: 'slotwise-demo-2026' })).status).toBe(200);
      const listed = await agent.get(`/api/designs/${id}/revisions`);
      const stored = new Set((listed.body.revisions as { number: number }[]).map((r) => r.number));
      for (const ack of acknowledged) {
        expect(stored.has(ack.number), `revision ${ack.number}`).toBe(true);
        const revision = await agent.get(`/api/designs/${id}/revisions/${ack.number}`);
        expect(revision.body.revision.document.name).toBe(ack.name);
      }
      await stopBackgroundWork(app);
    } finally {
      await db.close();
    }
  }, 120_000);
});
