/**
 * Runs every bench/*.bench.ts module (`export async function run(): Promise<BenchRow[]>`),
 * prints one table and writes bench/results/latest.json. `npm run bench [-- name-filter]`.
 */
import { mkdirSync, readdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import os from 'node:os';
import type { BenchRow } from './types';

const here = dirname(fileURLToPath(import.meta.url));

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

async function main(): Promise<void> {
  const filter = process.argv[2];
  const files = readdirSync(here)
    .filter((f) => f.endsWith('.bench.ts'))
    .filter((f) => !filter || f.includes(filter))
    .sort();
  const rows: BenchRow[] = [];
  const failures: string[] = [];
  for (const file of files) {
    const mod = (await import(pathToFileURL(join(here, file)).href)) as { run?: () => Promise<BenchRow[]> };
    if (typeof mod.run !== 'function') {
      failures.push(`${file} has no run() export`);
      continue;
    }
    console.error(`running ${file} …`);
    try {
      rows.push(...(await mod.run()));
    } catch (error) {
      failures.push(`${file}: ${(error as Error).message}`);
    }
  }
  printTable(rows);
  for (const f of failures) console.error(`bench error: ${f}`);
  mkdirSync(join(here, 'results'), { recursive: true });
  writeFileSync(
    join(here, 'results', 'latest.json'),
    `${JSON.stringify({ date: new Date().toISOString(), node: process.version, cpus: os.cpus().length, loadAverage: os.loadavg(), rows }, null, 2)}\n`,
  );
  if (failures.length > 0) process.exitCode = 1;
}

await main();
