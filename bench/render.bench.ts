/**
 * Rendering (quality.md): a 2,000-profile generated frame opened in the editor in headless
 * Chromium, drawn instanced (one mesh per shape and material) and one mesh per part
 * (`?renderMode=per-part`) in the same run. Reports draw calls of each and the median frame
 * time ratio. Needs a built client (CLIENT_DIST, default dist/); starts its own server on a
 * throw-away database in the system temp folder.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from '@playwright/test';
import playwrightConfig from '../e2e/playwright.config';
import { largeFrame } from './largeFrame';
import type { BenchRow } from './types';

const BENCH = 'render';
const PORT = Number(process.env.RENDER_BENCH_PORT ?? 4331);
const BASE = `http://127.0.0.1:${PORT}`;
const DESIGNER = { email: 'designer@harborlane.example', password: 'slotwise-demo-2026' };
const FRAMES = 15;

async function startServer(dbFile: string): Promise<ChildProcess> {
  const server = spawn('npx', ['tsx', 'server/index.ts'], {
    cwd: join(import.meta.dirname, '..'),
    env: {
      ...process.env,
      NODE_ENV: 'production',
      PORT: String(PORT),
      DATABASE_PATH: dbFile,
      SESSION_SECRET: 'render-bench-session-secret-not-for-production-0123',
      CLIENT_DIST: process.env.CLIENT_DIST ?? 'dist',
    },
    stdio: 'ignore',
    detached: true,
  });
  const deadline = Date.now() + 120_000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return server;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  stopServer(server);
  throw new Error('The render benchmark server did not start within 120 s.');
}

function stopServer(server: ChildProcess): void {
  // The server runs under npx in its own process group; end that group only.
  if (server.pid) {
    try {
      process.kill(-server.pid, 'SIGTERM');
    } catch {
      // already gone
    }
  }
}

async function measure(page: Page, path: string, profiles: number): Promise<{ calls: number; frameMs: number; triangles: number }> {
  await page.goto(`${BASE}${path}`);
  await page.waitForFunction((n) => window.__slotwiseScene?.stats().profilesDrawn === n, profiles, { timeout: 120_000 });
  return page.evaluate((frames) => {
    const hook = window.__slotwiseScene!;
    const info = hook.renderInfo();
    return { calls: info.calls, triangles: info.triangles, frameMs: hook.frameTimeMs(frames) };
  }, FRAMES);
}

export async function run(): Promise<BenchRow[]> {
  const dbFile = join(tmpdir(), `slotwise-render-bench-${process.pid}-${Date.now()}.sqlite`);
  const server = await startServer(dbFile);
  const launchArgs = (playwrightConfig.use?.launchOptions?.args ?? []) as string[];
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: launchArgs });
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, baseURL: BASE });
    const page = await context.newPage();
    const headers = { 'X-Slotwise-Client': '1' };
    const signIn = await page.request.post('/api/auth/sign-in', { headers, data: DESIGNER });
    if (!signIn.ok()) throw new Error(`Sign-in failed: ${signIn.status()}`);
    const document = largeFrame({ profiles: 2000 });
    const created = await page.request.post('/api/designs', { headers, data: { name: 'Render benchmark', systemId: document.systemId, document } });
    if (created.status() !== 201) throw new Error(`Creating the design failed: ${created.status()} ${await created.text()}`);
    const { design } = (await created.json()) as { design: { id: number } };

    const profiles = document.profiles.length;
    const instanced = await measure(page, `/designs/${design.id}`, profiles);
    const perPart = await measure(page, `/designs/${design.id}?renderMode=per-part`, profiles);
    const ratio = perPart.frameMs / Math.max(1e-6, instanced.frameMs);
    return [
      { benchmark: BENCH, metric: `draw calls, instanced (${profiles} profiles)`, value: instanced.calls, unit: 'calls', bar: '≤ 60', pass: instanced.calls <= 60 },
      { benchmark: BENCH, metric: 'draw calls, one mesh per part', value: perPart.calls, unit: 'calls' },
      { benchmark: BENCH, metric: 'triangles per frame', value: instanced.triangles, unit: 'triangles' },
      { benchmark: BENCH, metric: 'median frame time, instanced', value: instanced.frameMs, unit: 'ms' },
      { benchmark: BENCH, metric: 'median frame time, one mesh per part', value: perPart.frameMs, unit: 'ms' },
      { benchmark: BENCH, metric: 'frame time ratio, per part / instanced', value: ratio, unit: 'x', bar: 'reported' },
    ];
  } finally {
    await browser.close();
    stopServer(server);
    for (const suffix of ['', '-wal', '-shm']) rmSync(dbFile + suffix, { force: true });
  }
}
