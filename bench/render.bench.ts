/**
 * Rendering (quality.md): a 2,000-profile generated frame opened in the editor in headless
 * Chromium, drawn instanced (one mesh per shape and material) and one mesh per part
 * (`?renderMode=per-part`) in the same run. Reports draw calls of each and the median frame
 * time ratio. Needs a built client (CLIENT_DIST, default dist/); starts its own server on a
 * throw-away database in the system temp folder.
 */
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from '@playwright/test';
import playwrightConfig from '../e2e/playwright.config';
import { largeFrame } from './largeFrame';
import type { BenchRow } from './types';
import { startDemoServer, stopServer } from './demoServer';

const BENCH = 'render';
const PORT = Number(process.env.RENDER_BENCH_PORT ?? 4331);
const BASE = `http://127.0.0.1:${PORT}`;
const DESIGNER = { email: 'designer@harborlane.example', password: 'slotwise-demo-2026' };
const FRAMES = 15;

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
  const server = await startDemoServer({ port: PORT, dbFile, name: 'render' });
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
