/**
 * Assembly sequence speed on a generated 2,000-profile frame (issue bar: generation under 100 ms
 * median), with the enriched sequence (motions, tools, cautions) and the feasibility check beside
 * it. Wall time is the bar; CPU time of this process is shown because the machine is shared.
 */
import { createAnalysisContext } from '../src/domain/analysis/analyze';
import { generateSequence, generateSteps, sequenceFindings } from '../src/domain/assembly';
import { largeFrame } from './largeFrame';
import type { BenchRow } from './types';

const BENCH = 'sequence';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function measure(fn: () => void, runs: number, warmup: number): { wall: number; cpu: number } {
  for (let i = 0; i < warmup; i++) fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu) };
}

export async function run(): Promise<BenchRow[]> {
  const design = largeFrame({ profiles: 2000 });
  const n = design.profiles.length;
  const steps = measure(() => generateSteps(design), 21, 5);
  const full = measure(() => generateSequence(design), 21, 5);
  const withSteps = { ...design, steps: generateSteps(design) };
  const ctx = createAnalysisContext(withSteps);
  const check = measure(() => sequenceFindings(ctx), 11, 3);
  return [
    { benchmark: BENCH, metric: `generate steps, ${n} profiles, median wall`, value: steps.wall, unit: 'ms', bar: '< 100 ms', pass: steps.wall < 100 },
    { benchmark: BENCH, metric: `generate steps, ${n} profiles, median CPU`, value: steps.cpu, unit: 'ms' },
    { benchmark: BENCH, metric: `generate sequence with motions, tools, cautions, ${n} profiles, median wall`, value: full.wall, unit: 'ms' },
    { benchmark: BENCH, metric: `generate sequence with motions, tools, cautions, ${n} profiles, median CPU`, value: full.cpu, unit: 'ms' },
    { benchmark: BENCH, metric: `feasibility check, ${n} profiles, ${withSteps.steps.length} steps, median wall`, value: check.wall, unit: 'ms' },
  ];
}
