/**
 * Read-only links (issue bars): the link's design read, GET /api/shared/:token of the demo
 * enclosure, at 50 connections for BENCH_DURATION_S seconds (default 20; e.g. 3 for a quick look)
 * with autocannon must answer with 0 errors and p99 under 30 ms; the link viewer page
 * (/view/:token, no sign-in) must show the enclosure's first frame under 3 s from navigation in
 * headless Chromium (median of 3 loads; LINK_BENCH_LOADS changes the count).
 *
 * The link routes are rate limited per address (600 requests a minute by default). One bench
 * client is one address, so the bench server is started with LINK_RATE_LIMIT_PER_MINUTE set high
 * enough to let the whole run through; the output says which limit was in force. Production
 * servers keep their own limit. Needs a built client (CLIENT_DIST, default dist/); starts its own
 * production server on a throw-away database in the system temp folder.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from '@playwright/test';
import playwrightConfig from '../e2e/playwright.config';
import type { BenchRow } from './types';
import { cannon, waitForHealth } from './demoServer';
import { serverNodeArgs } from './mode';

const BENCH = 'link';
const root = fileURLToPath(new URL('..', import.meta.url));
const duration = Number(process.env.BENCH_DURATION_S ?? 20);
const loads = Number(process.env.LINK_BENCH_LOADS ?? 3);
const CONNECTIONS = 50;
/** Requests per minute per address for the bench server: far above what 50 connections reach. */
const BENCH_LINK_LIMIT = 10_000_000;
const DESIGNER = { email: 'designer@harborlane.example', password: 'slotwise-demo-2026' };

/**
 * CPU time a process has used, s, from /proc (Linux; NaN elsewhere). User + system ticks at
 * USER_HZ = 100, the value Linux reports to user space on every common architecture (from memory).
 */
function processCpuSeconds(pid: number | undefined): number {
  try {
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    // Fields 14 and 15 of stat (utime, stime) are at 11 and 12 after the command name.
    return (Number(fields[11]) + Number(fields[12])) / 100;
  } catch {
    return Number.NaN;
  }
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

/** Makes a read-only link to the demo enclosure as the demo designer; returns its token. */
async function makeLink(base: string): Promise<string> {
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1' },
    body: JSON.stringify(DESIGNER),
  });
  if (!signIn.ok) throw new Error(`Sign-in failed: ${signIn.status}`);
  const headers = { 'Content-Type': 'application/json', 'X-Slotwise-Client': '1', Cookie: signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ') };
  const list = (await (await fetch(`${base}/api/links/designs`, { headers })).json()) as { designs: { id: number; name: string }[] };
  const enclosure = list.designs.find((d) => /enclosure/i.test(d.name));
  if (!enclosure) throw new Error('The demo shop has no enclosure design.');
  const created = await fetch(`${base}/api/links`, { method: 'POST', headers, body: JSON.stringify({ designId: enclosure.id, label: 'Bench' }) });
  if (created.status !== 201) throw new Error(`Making the link failed: ${created.status} ${await created.text()}`);
  return ((await created.json()) as { token: string }).token;
}

export async function run(): Promise<BenchRow[]> {
  const dir = mkdtempSync(join(tmpdir(), 'slotwise-link-bench-'));
  const port = 42000 + Math.floor(Math.random() * 8000);
  const base = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn(process.execPath, [...serverNodeArgs(), '--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      SEED_DEMO: '1',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATABASE_PATH: join(dir, 'bench.sqlite'),
      SESSION_SECRET: 'link-bench-secret-0123456789-abcdefghijklmnop',
      LOG_REQUESTS: 'false',
      CLIENT_DIST: resolve(root, process.env.CLIENT_DIST ?? 'dist'),
      LINK_RATE_LIMIT_PER_MINUTE: String(BENCH_LINK_LIMIT),
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const rows: BenchRow[] = [];
  try {
    await waitForHealth(base);
    const token = await makeLink(base);
    const url = `${base}/api/shared/${token}`;
    const sample = await fetch(url);
    const bytes = (await sample.arrayBuffer()).byteLength;
    rows.push({ benchmark: BENCH, metric: `rate limit in force for the bench (LINK_RATE_LIMIT_PER_MINUTE; default 600)`, value: BENCH_LINK_LIMIT, unit: 'req/min/address' });
    rows.push({ benchmark: BENCH, metric: 'GET /api/shared/:token answer size, demo enclosure', value: bytes / 1024, unit: 'KiB' });

    // As a browser asks: gzip accepted (the server compresses API answers at level 1).
    const cpuBefore = processCpuSeconds(child.pid);
    const result = await cannon({ url, connections: CONNECTIONS, duration, headers: { 'Accept-Encoding': 'gzip' } });
    const cpuPerRequestMs = ((processCpuSeconds(child.pid) - cpuBefore) * 1000) / Math.max(1, result.requests.total);
    const errors = result.errors + result.timeouts + result.non2xx;
    const name = 'GET /api/shared/:token (demo enclosure)';
    rows.push({ benchmark: BENCH, metric: `${name}: requests/s, ${CONNECTIONS} connections, ${duration} s`, value: result.requests.average, unit: 'req/s' });
    rows.push({ benchmark: BENCH, metric: `${name}: p50 latency`, value: result.latency.p50, unit: 'ms' });
    rows.push({ benchmark: BENCH, metric: `${name}: p99 latency`, value: result.latency.p99, unit: 'ms', bar: '< 30 ms', pass: result.latency.p99 < 30 });
    // Load-independent figure: the server's own CPU per answer (the machine may be shared and busy).
    rows.push({ benchmark: BENCH, metric: `${name}: server CPU per answer (load average ${loadavg()[0].toFixed(1)})`, value: cpuPerRequestMs, unit: 'ms' });
    rows.push({ benchmark: BENCH, metric: `${name}: errors (non-2xx, timeouts) of ${result.requests.total}`, value: errors, unit: 'responses', bar: '0', pass: errors === 0 });

    // The link viewer's first frame, anonymous, from navigation start.
    const launchArgs = (playwrightConfig.use?.launchOptions?.args ?? []) as string[];
    const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: launchArgs });
    try {
      const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, baseURL: base });
      const page = await context.newPage();
      const firstFrames: number[] = [];
      for (let i = 0; i < loads; i++) {
        await page.goto('about:blank');
        await page.goto(`/view/${token}`, { waitUntil: 'commit' });
        const handle = await page.waitForFunction(
          () =>
            (window.__slotwiseScene?.stats().profilesDrawn ?? 0) > 0
              ? new Promise<number>((resolveFrame) => requestAnimationFrame(() => resolveFrame(performance.now())))
              : 0,
          null,
          { polling: 50, timeout: 60_000 },
        );
        firstFrames.push((await handle.jsonValue()) as number);
      }
      const firstFrame = median(firstFrames);
      rows.push({ benchmark: BENCH, metric: `first frame, demo enclosure link viewer (median of ${loads})`, value: firstFrame, unit: 'ms', bar: '< 3000', pass: firstFrame < 3000 });
    } finally {
      await browser.close();
    }
  } finally {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
    rmSync(dir, { recursive: true, force: true });
  }
  return rows;
}
