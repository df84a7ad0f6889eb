/**
 * Analysis speed on generated frames (quality.md): median analysis time at 500, 2,000 and 8,000
 * profiles (bars: < 50 ms at 2,000, < 60 ms at 8,000), the per-profile scaling ratio 500 → 8,000,
 * and the interference grid against the all-pairs check at 2,000 profiles (same findings,
 * speed-up). Wall time is the bar; CPU time of this process is shown beside it because a shared
 * machine is often busy (CPU time counts the garbage collector's helper threads too).
 */
import { analyzeDesign, createAnalysisContext } from '../src/domain/analysis/analyze';
import { interferenceFindings, interferenceFindingsAllPairs } from '../src/domain/checks/interferenceFindings';
import { largeFrame } from './largeFrame';
import { pick } from './mode';
import type { BenchRow } from './types';

const BENCH = 'analysis';
/** Median analysis time bars by profile count (quality bars: 2,000 profiles < 50 ms; 8,000 profiles < 60 ms). */
const BARS_MS: Record<number, number> = { 2000: 50, 8000: 60 };

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

function measure(fn: () => void, runs: number, warmup: number): { wall: number; cpu: number; first: number } {
  const t = performance.now();
  fn();
  const first = performance.now() - t;
  for (let i = 1; i < warmup; i++) fn();
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
  return { wall: median(wall), cpu: median(cpu), first };
}

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const perProfile: Record<number, { wall: number; cpu: number }> = {};
  for (const size of [500, 2000, 8000]) {
    const design = largeFrame({ profiles: size, overlapEvery: 25 });
    const runs = size >= 8000 ? pick(15, 5) : pick(21, 5);
    // The first of the warm-up runs (cold for this size) is reported beside the median.
    const t = measure(() => analyzeDesign(design, undefined, { timings: false }), runs, size >= 8000 ? 3 : 5);
    const n = design.profiles.length;
    perProfile[size] = { wall: t.wall / n, cpu: t.cpu / n };
    if (size === 2000) {
      const joints = design.joints.length;
      const hardware = analyzeDesign(design).bom.filter((b) => b.category === 'connector' || b.category === 'fastener').reduce((s, b) => s + b.quantity, 0);
      rows.push({ benchmark: BENCH, metric: `workload 2,000: profiles / joints / connectors+screws / panels`, value: n, unit: `${joints} j, ${hardware} hw, ${design.panels.length} panels` });
    }
    rows.push({
      benchmark: BENCH,
      metric: `median analyzeDesign, ${n} profiles (wall)`,
      value: t.wall,
      unit: 'ms',
      ...(BARS_MS[size] ? { bar: `< ${BARS_MS[size]} ms`, pass: t.wall < BARS_MS[size] } : {}),
    });
    rows.push({ benchmark: BENCH, metric: `first analyzeDesign of this size, ${n} profiles (wall, cold)`, value: t.first, unit: 'ms' });
    rows.push({ benchmark: BENCH, metric: `median analyzeDesign, ${n} profiles (process CPU)`, value: t.cpu, unit: 'ms', ...(BARS_MS[size] ? { bar: `< ${BARS_MS[size]} ms`, pass: t.cpu < BARS_MS[size] } : {}) });
    if (size === 2000 || size === 8000) {
      // Stage breakdown from the analysis' own timings, median over runs (wall time: a stage's
      // figure includes any garbage collection that fell in it). Compare 2,000 with 8,000 for
      // stages that grow faster than the profile count.
      const stages: Record<string, number[]> = {};
      for (let i = 0; i < 9; i++) {
        for (const [k, v] of Object.entries(analyzeDesign(design).timingsMs ?? {})) (stages[k] ??= []).push(v);
      }
      const label = size.toLocaleString('en-US');
      for (const [k, v] of Object.entries(stages)) rows.push({ benchmark: BENCH, metric: `  stage ${k}, ${label} profiles`, value: median(v), unit: 'ms' });
    }
  }
  const wallRatio = perProfile[8000].wall / perProfile[500].wall;
  const cpuRatio = perProfile[8000].cpu / perProfile[500].cpu;
  rows.push({ benchmark: BENCH, metric: 'time per profile, 8,000 vs 500 (wall)', value: wallRatio, unit: 'x', bar: '<= 1.5x', pass: wallRatio <= 1.5 });
  rows.push({ benchmark: BENCH, metric: 'time per profile, 8,000 vs 500 (process CPU)', value: cpuRatio, unit: 'x', bar: '<= 1.5x', pass: cpuRatio <= 1.5 });

  const design = largeFrame({ profiles: 2000, overlapEvery: 25 });
  const ctx = createAnalysisContext(design);
  const gridFindings = interferenceFindings(ctx);
  const allPairsFindings = interferenceFindingsAllPairs(ctx);
  const same = JSON.stringify(gridFindings) === JSON.stringify(allPairsFindings);
  const grid = measure(() => interferenceFindings(ctx), 31, 5);
  const allPairs = measure(() => interferenceFindingsAllPairs(ctx), 7, 1);
  rows.push({ benchmark: 'interference', metric: 'grid, 2,000 profiles + panels (wall)', value: grid.wall, unit: 'ms' });
  rows.push({ benchmark: 'interference', metric: 'all pairs, 2,000 profiles + panels (wall)', value: allPairs.wall, unit: 'ms' });
  rows.push({ benchmark: 'interference', metric: 'speed-up grid vs all pairs', value: allPairs.wall / grid.wall, unit: 'x', bar: '>= 20x', pass: allPairs.wall / grid.wall >= 20 });
  rows.push({ benchmark: 'interference', metric: `same findings (${gridFindings.length} overlaps)`, value: same ? 1 : 0, unit: 'bool', bar: '= 1', pass: same });
  return rows;
}
