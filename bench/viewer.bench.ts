/**
 * The viewer (issue bars): in headless Chromium on CPU rendering, the read-only viewer page
 * (/designs/:id/view) of a generated 2,000-profile frame must draw under 300 k triangles in its
 * default view (level of detail), and a step-player frame must take under 2 ms of script time
 * (instance matrices of the sequence's largest step rewritten mid-travel: the worst case). The demo enclosure's viewer must show its first
 * frame under 3 s from navigation. Needs a built client (CLIENT_DIST, default dist/); starts its
 * own server on a throw-away database in the system temp folder.
 */
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import playwrightConfig from '../e2e/playwright.config';
import { largeFrame } from './largeFrame';
import type { BenchRow } from './types';
import { startDemoServer, stopServer } from './demoServer';

const BENCH = 'viewer';
const PORT = Number(process.env.VIEWER_BENCH_PORT ?? 4332);
const BASE = `http://127.0.0.1:${PORT}`;
const DESIGNER = { email: 'designer@harborlane.example', password: 'slotwise-demo-2026' };
const HEADERS = { 'X-Slotwise-Client': '1' };

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

export async function run(): Promise<BenchRow[]> {
  const dbFile = join(tmpdir(), `slotwise-viewer-bench-${process.pid}-${Date.now()}.sqlite`);
  const server = await startDemoServer({ port: PORT, dbFile, name: 'viewer' });
  const launchArgs = (playwrightConfig.use?.launchOptions?.args ?? []) as string[];
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: launchArgs });
  try {
    const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, baseURL: BASE });
    const page = await context.newPage();
    const signIn = await page.request.post('/api/auth/sign-in', { headers: HEADERS, data: DESIGNER });
    if (!signIn.ok()) throw new Error(`Sign-in failed: ${signIn.status()}`);

    // First frame of the demo enclosure's viewer, from navigation start (median of 3 loads).
    const list = (await (await page.request.get('/api/designs', { headers: HEADERS })).json()) as { designs: { id: number; name: string }[] };
    const enclosure = list.designs.find((d) => /enclosure/i.test(d.name));
    if (!enclosure) throw new Error('The demo shop has no enclosure design.');
    const firstFrames: number[] = [];
    for (let i = 0; i < 3; i++) {
      await page.goto('about:blank');
      await page.goto(`/designs/${enclosure.id}/view`, { waitUntil: 'commit' });
      const handle = await page.waitForFunction(
        () =>
          (window.__slotwiseScene?.stats().profilesDrawn ?? 0) > 0
            ? new Promise<number>((resolve) => requestAnimationFrame(() => resolve(performance.now())))
            : 0,
        null,
        { polling: 50, timeout: 60_000 },
      );
      firstFrames.push((await handle.jsonValue()) as number);
    }

    // The 2,000-profile frame in the viewer's default view.
    const document = largeFrame({ profiles: 2000 });
    const created = await page.request.post('/api/designs', { headers: HEADERS, data: { name: 'Viewer benchmark', systemId: document.systemId, document } });
    if (created.status() !== 201) throw new Error(`Creating the design failed: ${created.status()} ${await created.text()}`);
    const { design } = (await created.json()) as { design: { id: number } };
    await page.goto(`/designs/${design.id}/view`);
    await page.waitForFunction((n) => window.__slotwiseScene?.stats().profilesDrawn === n, document.profiles.length, { timeout: 120_000 });
    await page.waitForTimeout(1500);
    const figures = await page.evaluate(() => {
      const hook = window.__slotwiseScene!;
      const info = hook.renderInfo();
      return { triangles: info.triangles, calls: info.calls, playerMs: hook.playerFrameMs(40) };
    });
    const playerMs = figures.playerMs ?? Number.NaN;
    const firstFrame = median(firstFrames);
    return [
      { benchmark: BENCH, metric: 'first frame, demo enclosure viewer (median of 3)', value: firstFrame, unit: 'ms', bar: '< 3000', pass: firstFrame < 3000 },
      { benchmark: BENCH, metric: `triangles, ${document.profiles.length}-profile frame, default view`, value: figures.triangles, unit: 'triangles', bar: '< 300000', pass: figures.triangles < 300_000 },
      { benchmark: BENCH, metric: 'draw calls, default view', value: figures.calls, unit: 'calls' },
      { benchmark: BENCH, metric: 'player frame script time, largest step travelling', value: playerMs, unit: 'ms', bar: '< 2', pass: playerMs < 2 },
    ];
  } finally {
    await browser.close();
    stopServer(server);
    for (const suffix of ['', '-wal', '-shm']) rmSync(dbFile + suffix, { force: true });
  }
}
