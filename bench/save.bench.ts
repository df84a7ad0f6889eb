/**
 * Save speed (quality.md "save a 2,000-part design: median under 60 ms"): the real app on a
 * temporary SQLite file, listening on loopback; the designer signs in, creates a design holding
 * the 2,000-profile frame, then saves it 20 times in a row through POST /api/designs/:id/revisions,
 * with gzip accepted like a browser. Also times the domain parse on its own.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp, stopBackgroundWork } from '../server/app';
import { loadConfig } from '../server/config';
import { openDatabase } from '../server/db/database';
import { runMigrations } from '../server/db/migrate';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemo } from '../server/seed';
import { parseDesignDocument } from '../src/domain/design/parse';
import { largeFrame } from './largeFrame';
import { pick } from './mode';
import type { BenchRow } from './types';

const BENCH = 'save';
const SAVES = pick(20, 5);

function percentile(values: number[], p: number): number {
  const s = [...values].sort((a, b) => a - b);
  if (p === 50) {
    const m = s.length >> 1;
    return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
  }
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)];
}

export async function run(): Promise<BenchRow[]> {
  const dir = mkdtempSync(join(tmpdir(), 'slotwise-save-bench-'));
  const config = loadConfig(
    {
      NODE_ENV: 'test',
      DATABASE_PATH: join(dir, 'slotwise.sqlite'),
      SESSION_SECRET: 'bench-session-secret-that-is-long-enough-0123456789',
      CLIENT_DIST: join(dir, 'no-client'),
      LOG_REQUESTS: 'false',
    },
    () => undefined,
  );
  // As the production server runs (server/index.ts): without tsx's source maps, which Sequelize's
  // stack reads per query would otherwise map back on every statement.
  const sourceMaps = process.sourceMapsEnabled;
  process.setSourceMapsEnabled(false);
  const db = await openDatabase(config.databasePath);
  await runMigrations(db);
  await seedDemo(db, { passwordCost: 4 });
  const app = createApp({ config, db, passwordCost: 4, logger: { info() {}, warn() {}, error() {} }, rateLimit: { signInMax: 1000, windowMs: 60_000 } });
  const server = app.listen(0, '127.0.0.1');
  await new Promise<void>((resolve) => server.once('listening', () => resolve()));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const rows: BenchRow[] = [];
  try {
    const designer = DEMO_ACCOUNTS.find((a) => a.role === 'designer')!;
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1' },
      body: JSON.stringify({ email: designer.email, password: DEMO_PASSWORD }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in failed: ${signIn.status}`);
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const headers = { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1', 'Accept-Encoding': 'gzip, deflate', Cookie: cookie };

    const document = largeFrame({ profiles: 2000, overlapEvery: 25 });
    const created = await fetch(`${base}/api/designs`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ name: 'Save bench frame', systemId: document.systemId, document }),
    });
    if (created.status !== 201) throw new Error(`create failed: ${created.status} ${(await created.text()).slice(0, 300)}`);
    const { design } = (await created.json()) as { design: { id: number } };

    let baseRevision = 1;
    const times: number[] = [];
    const cpuTimes: number[] = [];
    let requestBytes = 0;
    for (let i = 0; i < SAVES + 2; i++) {
      // A small edit each time, as the editor would send.
      document.profiles[0].length = 560 + (i % 5);
      const body = JSON.stringify({ baseRevision, document, message: `bench save ${i}` });
      requestBytes = body.length;
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      const response = await fetch(`${base}/api/designs/${design.id}/revisions`, { method: 'POST', headers, body });
      // Read the whole answer (gunzip included) but leave parsing its 1 MB document out: that is the client's work, in its own process.
      const answer = await response.text();
      const ms = performance.now() - t0;
      const cpu = process.cpuUsage(c0);
      const number = /^\{"revision":\{"number":(\d+),/.exec(answer)?.[1];
      if (response.status !== 201 || !number) throw new Error(`save failed: ${response.status} ${answer.slice(0, 300)}`);
      baseRevision = Number(number);
      if (i >= 2) {
        // the first two warm the JIT
        times.push(ms);
        cpuTimes.push((cpu.user + cpu.system) / 1000);
      }
    }

    const parseTimes: number[] = [];
    const parsedInput = JSON.parse(JSON.stringify(document)) as unknown;
    for (let i = 0; i < 12; i++) {
      const t0 = performance.now();
      const result = parseDesignDocument(parsedInput);
      parseTimes.push(performance.now() - t0);
      if (!result.ok) throw new Error('the bench frame does not parse');
    }

    const medianMs = percentile(times, 50);
    rows.push({ benchmark: BENCH, metric: `workload: ${document.profiles.length} profiles, ${document.joints.length} joints, ${document.panels.length} panels`, value: requestBytes / 1e6, unit: 'MB request' });
    rows.push({ benchmark: BENCH, metric: `median of ${SAVES} sequential saves, loopback (wall)`, value: medianMs, unit: 'ms', bar: '< 60 ms', pass: medianMs < 60 });
    rows.push({ benchmark: BENCH, metric: `p95 of ${SAVES} sequential saves`, value: percentile(times, 95), unit: 'ms' });
    // Server and client share this process, so its CPU time per save is both sides' work (the machine is shared).
    rows.push({ benchmark: BENCH, metric: 'median process CPU per save (server + in-process client)', value: percentile(cpuTimes, 50), unit: 'ms' });
    rows.push({ benchmark: BENCH, metric: '  of which parseDesignDocument (median)', value: percentile(parseTimes.slice(2), 50), unit: 'ms' });
  } finally {
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await stopBackgroundWork(app);
    await db.close();
    rmSync(dir, { recursive: true, force: true });
    process.setSourceMapsEnabled(sourceMaps);
  }
  return rows;
}
