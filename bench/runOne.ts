/**
 * Runs one benchmark module in a process of its own and writes its rows as JSON to the file named:
 * `node --import tsx bench/runOne.ts bench/x.bench.ts rows.json`. bench/run.ts starts one per
 * module, so no benchmark inherits another's heap, threads or open handles.
 */
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { BenchRow } from './types';

const [file, out] = process.argv.slice(2);
const mod = (await import(pathToFileURL(resolve(file)).href)) as { run?: () => Promise<BenchRow[]> };
if (typeof mod.run !== 'function') throw new Error(`${file} has no run() export`);
writeFileSync(out, JSON.stringify(await mod.run()));
// Benchmarks leave pools, timers or sockets behind at times: the rows are written, so end here.
process.exit(0);
