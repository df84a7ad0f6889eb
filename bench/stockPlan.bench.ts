/** Stock plan benchmark: 300-cut plans against the "< 100 ms" bar, bars against FFD and the lower bound, and the Wikipedia check instance. */
import type { BenchRow } from './types';
import { planStock, type StockCut, type StockPlanInput } from '../src/domain/outputs/stockPlan';

/** Deterministic pseudo-random numbers (Park–Miller), so every run plans the same cuts. */
function seededRandom(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 16807) % 2147483647;
    return state / 2147483647;
  };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
}

function shopCuts(count: number, seed: number): StockCut[] {
  // A frame's cut list repeats a few dozen lengths; mix those with some one-off lengths.
  const random = seededRandom(seed);
  const repeated = Array.from({ length: 30 }, () => Math.round(200 + random() * 2600));
  return Array.from({ length: count }, (_, index) => ({
    id: `cut-${index}`,
    length: random() < 0.8 ? repeated[Math.floor(random() * repeated.length)] : Math.round(150 + random() * 3000),
  }));
}

function timePlans(input: StockPlanInput, runs: number): { medianMs: number; plan: ReturnType<typeof planStock> } {
  planStock(input); // warm-up
  const times: number[] = [];
  let plan = planStock(input);
  for (let run = 0; run < runs; run++) {
    const started = performance.now();
    plan = planStock(input);
    times.push(performance.now() - started);
  }
  return { medianMs: median(times), plan };
}

export async function run(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const benchmark = 'stock plan';
  const input: StockPlanInput = { cuts: shopCuts(300, 7), stockLength: 6000, kerf: 3, endTrim: 10, minReusableOffcut: 300 };
  const { medianMs, plan } = timePlans(input, 20);
  rows.push({ benchmark, metric: '300 cuts, median time (20 runs)', value: Number(medianMs.toFixed(2)), unit: 'ms', bar: '< 100 ms', pass: medianMs < 100 });
  rows.push({ benchmark, metric: '300 cuts, bars used', value: plan.barCount, unit: 'bars', bar: `≤ FFD (${plan.firstFitDecreasingBarCount})`, pass: plan.barCount <= plan.firstFitDecreasingBarCount });
  rows.push({ benchmark, metric: '300 cuts, first-fit-decreasing bars', value: plan.firstFitDecreasingBarCount, unit: 'bars' });
  rows.push({ benchmark, metric: '300 cuts, lower bound', value: plan.lowerBound, unit: 'bars', bar: 'within 1 bar', pass: plan.barCount - plan.lowerBound <= 1 });

  const catalogueLengths = [300, 450, 600, 755, 900, 1200, 1500, 1800, 2100, 2400, 395.3, 1016];
  const fewLengths: StockPlanInput = {
    ...input,
    cuts: (() => {
      const random = seededRandom(23);
      return Array.from({ length: 300 }, (_, index) => ({ id: `s${index}`, length: catalogueLengths[Math.floor(random() * catalogueLengths.length)] }));
    })(),
  };
  const few = timePlans(fewLengths, 20);
  rows.push({ benchmark, metric: '300 cuts of 12 lengths, median time (20 runs)', value: Number(few.medianMs.toFixed(2)), unit: 'ms', bar: '< 100 ms', pass: few.medianMs < 100 });
  rows.push({
    benchmark,
    metric: `300 cuts of 12 lengths, bars used (${few.plan.method})`,
    value: few.plan.barCount,
    unit: 'bars',
    bar: `≤ FFD (${few.plan.firstFitDecreasingBarCount}); within 1 of lower bound ${few.plan.lowerBound}`,
    pass: few.plan.barCount <= few.plan.firstFitDecreasingBarCount && few.plan.barCount - few.plan.lowerBound <= 1,
  });

  const continuous: StockPlanInput = {
    ...input,
    cuts: (() => {
      const random = seededRandom(11);
      return Array.from({ length: 300 }, (_, index) => ({ id: `c${index}`, length: Math.round(150 + random() * 3200) }));
    })(),
  };
  const wide = timePlans(continuous, 20);
  rows.push({ benchmark, metric: '300 one-off lengths, median time (20 runs)', value: Number(wide.medianMs.toFixed(2)), unit: 'ms', bar: '< 100 ms', pass: wide.medianMs < 100 });
  rows.push({ benchmark, metric: '300 one-off lengths, bars used', value: wide.plan.barCount, unit: 'bars', bar: `≤ FFD (${wide.plan.firstFitDecreasingBarCount}); lower bound ${wide.plan.lowerBound}`, pass: wide.plan.barCount <= wide.plan.firstFitDecreasingBarCount });

  // Wikipedia, "Cutting stock problem": 5,600 mm stock, optimum 73 bars.
  const spec: [number, number][] = [
    [1380, 22], [1520, 25], [1560, 12], [1710, 14], [1820, 18], [1880, 18], [1930, 20],
    [2000, 10], [2050, 12], [2100, 14], [2140, 16], [2150, 18], [2200, 20],
  ];
  const wikipedia: StockPlanInput = {
    cuts: spec.flatMap(([length, count]) => Array.from({ length: count }, (_, k) => ({ id: `${length}-${k}`, length }))),
    stockLength: 5600,
    kerf: 0,
    endTrim: 0,
    minReusableOffcut: 0,
  };
  const check = timePlans(wikipedia, 5);
  rows.push({ benchmark, metric: 'Wikipedia 5,600 mm instance, bars', value: check.plan.barCount, unit: 'bars', bar: 'optimum 73 (≤ 74)', pass: check.plan.barCount <= 74 });
  rows.push({ benchmark, metric: 'Wikipedia 5,600 mm instance, median time (5 runs)', value: Number(check.medianMs.toFixed(2)), unit: 'ms', bar: '< 2000 ms', pass: check.medianMs < 2000 });
  return rows;
}
