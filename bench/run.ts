/**
 * Runs every bench/*.bench.ts module (`export async function run(): Promise<BenchRow[]>`) and
 * prints one table with each figure beside its bar and pass/FAIL. Each module runs in a process of
 * its own (bench/runOne.ts).
 *
 *   npm run bench                    every benchmark, full length; writes bench/results/latest.json
 *   npm run bench -- server save     only the benchmarks whose file name contains a word given
 *   npm run bench -- --quick         short runs for a smoke test (also BENCH_QUICK=1)
 *
 * Only a full, unfiltered run writes latest.json (the figures to quote); a quick or partial run
 * writes bench/results/partial.json, which git ignores. Both record the date, Node, the CPU and
 * the load average before and after, because a busy machine makes every figure worse.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import os from 'node:os';
import { QUICK } from './mode';
import type { BenchRow } from './types';

const here = dirname(fileURLToPath(import.meta.url));
/** Pause between benchmark modules, ms (BENCH_SETTLE_MS). */
const SETTLE_MS = Number(process.env.BENCH_SETTLE_MS ?? 5000);

function formatValue(v: number): string {
  if (!Number.isFinite(v)) return String(v);
  const abs = Math.abs(v);
  return abs >= 100 ? v.toFixed(0) : abs >= 10 ? v.toFixed(1) : abs >= 1 ? v.toFixed(2) : v.toFixed(3);
}

function printTable(rows: BenchRow[]): void {
  const cells = rows.map((r) => [r.benchmark, r.metric, formatValue(r.value), r.unit, r.bar ?? '', r.pass === undefined ? '' : r.pass ? 'pass' : 'FAIL']);
  const header = ['benchmark', 'metric', 'value', 'unit', 'bar', 'result'];
  const widths = header.map((h, i) => Math.max(h.length, ...cells.map((c) => c[i].length)));
  const line = (c: string[]) => c.map((v, i) => (i === 2 ? v.padStart(widths[i]) : v.padEnd(widths[i]))).join('  ');
  console.log(line(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const c of cells) console.log(line(c));
}

function loadAverage(): number[] {
  return os.loadavg().map((v) => Math.round(v * 100) / 100);
}

async function main(): Promise<void> {
  const filters = process.argv.slice(2).filter((a) => !a.startsWith('--'));
  const startedAt = new Date().toISOString();
  const loadBefore = loadAverage();
  const cores = os.cpus().length;
  if (loadBefore[0] > cores) {
    console.error(`note: load average ${loadBefore[0]} on ${cores} cores: the machine is busy, so these figures are worse than a quiet machine's.`);
  }
  if (QUICK) console.error('quick run: shortened benchmarks, for a smoke test only.');
  const files = readdirSync(here)
    .filter((f) => f.endsWith('.bench.ts'))
    .filter((f) => filters.length === 0 || filters.some((word) => f.includes(word)))
    .sort();
  if (files.length === 0) throw new Error(`no benchmark matches ${filters.join(', ')}`);
  const rows: BenchRow[] = [];
  const failures: string[] = [];
  const scratch = mkdtempSync(join(os.tmpdir(), 'slotwise-bench-'));
  for (const [index, file] of files.entries()) {
    // A pause between modules: the last one's browser and server may still be shutting down.
    if (index > 0) await new Promise((resolve) => setTimeout(resolve, SETTLE_MS));
    console.error(`running ${file} …`);
    // Each benchmark in a fresh process (bench/runOne.ts): one module's heap, worker threads or
    // browser must not slow the next one down.
    const out = join(scratch, `${file}.json`);
    const child = spawnSync(process.execPath, ['--import', 'tsx', join(here, 'runOne.ts'), join(here, file), out], {
      stdio: ['ignore', 'inherit', 'inherit'],
      env: { ...process.env, ...(QUICK ? { BENCH_QUICK: '1' } : {}) },
    });
    if (child.status === 0 && existsSync(out)) rows.push(...(JSON.parse(readFileSync(out, 'utf8')) as BenchRow[]));
    else failures.push(`${file}: ended with ${child.status === null ? `signal ${child.signal}` : `exit code ${child.status}`}`);
  }
  rmSync(scratch, { recursive: true, force: true });
  printTable(rows);
  const held = rows.filter((r) => r.pass !== undefined);
  const missed = held.filter((r) => !r.pass);
  console.log(`\n${held.length - missed.length} of ${held.length} bars met${missed.length ? `; missed: ${missed.map((r) => `${r.benchmark} ${r.metric.trim()}`).join('; ')}` : ''}.`);
  for (const f of failures) console.error(`bench error: ${f}`);
  const loadAfter = loadAverage();
  const official = !QUICK && filters.length === 0;
  const out = join(here, 'results', official ? 'latest.json' : 'partial.json');
  mkdirSync(join(here, 'results'), { recursive: true });
  writeFileSync(
    out,
    `${JSON.stringify(
      {
        date: startedAt,
        finished: new Date().toISOString(),
        node: process.version,
        cpus: cores,
        cpuModel: os.cpus()[0]?.model ?? 'unknown',
        // 1, 5 and 15-minute load averages when the run started and ended.
        loadAverage: loadBefore,
        loadAverageAtEnd: loadAfter,
        quick: QUICK,
        benchmarks: files,
        rows,
      },
      null,
      2,
    )}\n`,
  );
  console.error(`results: ${out.slice(here.length - 'bench'.length)} (load average ${loadBefore.join(' / ')} at the start, ${loadAfter.join(' / ')} at the end)`);
  if (failures.length > 0) process.exitCode = 1;
}

await main();
