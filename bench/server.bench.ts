/**
 * The server under load (issue "proof under load"): a production server in a child process on
 * loopback with a fresh database, the demo shop and 100 designs, three of them ~2 MB.
 * autocannon, 50 connections for BENCH_DURATION_S seconds each (default 20; 3 in a quick run),
 * against the designs list (bar: p99 < 30 ms), a design read and the analysis route; then a
 * hostile analysis of 2,000 coincident profiles (bar: answered within 2 s with a 4xx or a capped
 * 200) while /api/health is polled (bar: every answer within 100 ms). Reports requests/s,
 * p50/p99 latency and errors for each route.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type autocannon from 'autocannon';
import { pick, serverNodeArgs } from './mode';
import type { BenchRow } from './types';
import { cannon, waitForHealth } from './demoServer';

const BENCH = 'server';
const root = fileURLToPath(new URL('..', import.meta.url));
const duration = Number(process.env.BENCH_DURATION_S ?? pick(20, 3));
const CONNECTIONS = 50;

function bigDocument(name: string, profiles: number) {
  // 80-character labels make ~210 bytes per profile: 9,500 profiles ≈ 2 MB.
  return {
    schemaVersion: 1,
    name,
    systemId: 'metric-40',
    profiles: Array.from({ length: profiles }, (_, i) => ({
      id: `p${i}`,
      variantId: 'm40-40x40',
      length: 500,
      start: [0, Math.floor(i / 1000) * 100, (i % 1000) * 100],
      direction: [1, 0, 0],
      label: `Bench profile ${i} `.padEnd(80, 'x'),
    })),
  };
}

const coincident = (n: number) => ({
  schemaVersion: 1,
  name: 'Stacked',
  systemId: 'metric-40',
  profiles: Array.from({ length: n }, (_, i) => ({ id: `p${i}`, variantId: 'm40-40x40', length: 500, start: [0, 0, 0], direction: [1, 0, 0] })),
});

export async function run(): Promise<BenchRow[]> {
  const dir = mkdtempSync(join(tmpdir(), 'slotwise-server-bench-'));
  const port = 42000 + Math.floor(Math.random() * 8000);
  const base = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn(process.execPath, [...serverNodeArgs(), '--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'production', SEED_DEMO: '1', PORT: String(port), HOST: '127.0.0.1', DATABASE_PATH: join(dir, 'bench.sqlite'), SESSION_SECRET: 'bench-secret-0123456789-abcdefghijklmnop', LOG_REQUESTS: 'false', CLIENT_DIST: join(dir, 'none') },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const rows: BenchRow[] = [];
  try {
    await waitForHealth(base);
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1' },
      body: JSON.stringify({ email: 'designer@harborlane.example', password: 'slotwise-demo-2026' }),
    });
    const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const headers = { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1', Cookie: cookie };
    const post = async (path: string, body: unknown) => {
      const response = await fetch(`${base}${path}`, { method: 'POST', headers, body: JSON.stringify(body) });
      if (!response.ok) throw new Error(`${path}: ${response.status} ${(await response.text()).slice(0, 200)}`);
      return response.json() as Promise<{ design: { id: number } }>;
    };

    // 100 designs: 3 of ~2 MB, the rest small (the demo shop brings 3).
    let readId = 0;
    let bigBytes = 0;
    for (let i = 0; i < 3; i++) {
      const document = bigDocument(`Big ${i}`, 9500);
      bigBytes = JSON.stringify(document).length;
      await post('/api/designs', { name: `Big ${i}`, systemId: 'metric-40', document });
    }
    for (let i = 0; i < 94; i++) {
      const created = await post('/api/designs', { name: `Small ${i}`, systemId: 'metric-40', document: bigDocument(`Small ${i}`, 12) });
      readId = created.design.id;
    }
    rows.push({ benchmark: BENCH, metric: 'setup: designs listed / size of each big document', value: 100, unit: `designs, ${(bigBytes / 1e6).toFixed(2)} MB each of 3` });

    const analysisBody = JSON.stringify({ document: bigDocument('Analysed', 40) });
    const targets: { name: string; options: autocannon.Options; bar?: { p99: number } }[] = [
      { name: 'GET /api/designs (100 designs, three of 2 MB)', options: { url: `${base}/api/designs`, headers: { Cookie: cookie } }, bar: { p99: 30 } },
      { name: 'GET /api/designs/:id', options: { url: `${base}/api/designs/${readId}`, headers: { Cookie: cookie } } },
      { name: 'POST /api/analysis (40 profiles)', options: { url: `${base}/api/analysis`, method: 'POST', headers, body: analysisBody } },
    ];
    for (const target of targets) {
      // One request first, answered before the clock starts: the analysis pool starts its threads
      // on first use, and the bench measures the server in its steady state.
      const { url, method = 'GET', headers: targetHeaders, body } = target.options;
      const warm = await fetch(String(url), { method, headers: targetHeaders as Record<string, string>, body: body as string | undefined });
      await warm.arrayBuffer();
      if (!warm.ok) throw new Error(`${target.name}: warm-up answered ${warm.status}`);
      const result = await cannon({ ...target.options, connections: CONNECTIONS, duration });
      // A run in which nothing was answered is a failure, not "no errors".
      const errors = result.errors + result.timeouts + result.non2xx + (result.requests.total === 0 ? 1 : 0);
      rows.push({ benchmark: BENCH, metric: `${target.name}: requests/s, ${CONNECTIONS} connections, ${duration} s`, value: result.requests.average, unit: 'req/s' });
      rows.push({ benchmark: BENCH, metric: `${target.name}: p50 latency`, value: result.latency.p50, unit: 'ms' });
      rows.push({
        benchmark: BENCH,
        metric: `${target.name}: p99 latency`,
        value: result.latency.p99,
        unit: 'ms',
        ...(target.bar ? { bar: `< ${target.bar.p99} ms`, pass: result.latency.p99 < target.bar.p99 } : {}),
      });
      rows.push({ benchmark: BENCH, metric: `${target.name}: errors (non-2xx, timeouts)`, value: errors, unit: 'responses', bar: '0', pass: errors === 0 });
    }

    // A hostile analysis while health is polled every 20 ms.
    const healthTimes: number[] = [];
    let polling = true;
    const poller = (async () => {
      while (polling) {
        const t0 = performance.now();
        await fetch(`${base}/api/health`).then((r) => r.arrayBuffer());
        healthTimes.push(performance.now() - t0);
        await new Promise((resolve) => setTimeout(resolve, 20));
      }
    })();
    const hostileBody = JSON.stringify({ document: coincident(2000) });
    const t0 = performance.now();
    const hostile = await fetch(`${base}/api/analysis`, { method: 'POST', headers, body: hostileBody });
    await hostile.arrayBuffer();
    const hostileMs = performance.now() - t0;
    polling = false;
    await poller;
    const okStatus = hostile.status === 200 || (hostile.status >= 400 && hostile.status < 500);
    rows.push({ benchmark: BENCH, metric: `2,000 coincident profiles: answer time (status ${hostile.status})`, value: hostileMs, unit: 'ms', bar: '< 2,000 ms, 4xx or capped 200', pass: hostileMs < 2000 && okStatus });
    const worstHealth = Math.max(...healthTimes);
    rows.push({ benchmark: BENCH, metric: `  /api/health meanwhile: slowest of ${healthTimes.length}`, value: worstHealth, unit: 'ms', bar: '< 100 ms', pass: worstHealth < 100 });
  } finally {
    child.kill('SIGTERM');
    await new Promise((resolve) => child.once('exit', resolve));
    rmSync(dir, { recursive: true, force: true });
  }
  return rows;
}
