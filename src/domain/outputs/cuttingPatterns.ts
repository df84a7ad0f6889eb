/**
 * Column generation for one-dimensional cutting stock (Gilmore–Gomory): a revised simplex over
 * cutting patterns, a bounded-knapsack pricing step, and rounding by diving. Sizes and capacity in
 * mm (kerf already added); patterns are counts per length type. Work is counted in rough inner-loop
 * steps rather than clock time so results do not depend on machine load.
 */

/** Tolerance in mm for length comparisons, so inch fractions converted to mm still fit exactly. */
export const LENGTH_TOLERANCE = 1e-6;
/** Work allowed for column generation and rounding, in rough inner-loop steps (tens of ms). */
const COLUMN_GENERATION_WORK_BUDGET = 30_000_000;
/** Search nodes allowed for one pricing knapsack. */
const PRICING_NODE_LIMIT = 20_000;

/** Shared effort counter so column generation stays within a bounded amount of work on any input. */
export interface Effort {
  spent: number;
  budget: number;
}

/** Best pattern for the duals: maximise Σ value·count with Σ size·count ≤ capacity, count ≤ bound (depth-first, bounded). */
export function boundedKnapsack(
  values: ArrayLike<number>,
  sizes: ArrayLike<number>,
  bounds: ArrayLike<number>,
  capacity: number,
  nodeLimit = 50_000,
  effort?: Effort,
): { value: number; counts: number[] } {
  const order: number[] = [];
  for (let index = 0; index < values.length; index++) {
    if (values[index] > 1e-12 && bounds[index] > 0 && sizes[index] <= capacity + LENGTH_TOLERANCE) order.push(index);
  }
  order.sort((a, b) => values[b] / sizes[b] - values[a] / sizes[a]);
  const count = order.length;
  const itemValue = new Float64Array(count);
  const itemSize = new Float64Array(count);
  const itemBound = new Int32Array(count);
  order.forEach((index, k) => {
    itemValue[k] = values[index];
    itemSize[k] = sizes[index];
    itemBound[k] = bounds[index];
  });
  const taken = new Int32Array(count);
  const bestTaken = new Int32Array(count);
  let best = 0;
  let nodes = 0;

  const search = (k: number, room: number, value: number): void => {
    if (value > best + 1e-12) {
      best = value;
      bestTaken.set(taken);
    }
    if (k === count || ++nodes > nodeLimit) return;
    // Optimistic bound: fill the remaining room fractionally in value-density order.
    let bound = value;
    let rest = room;
    for (let j = k; j < count && rest > 0; j++) {
      const take = Math.min(itemBound[j], rest / itemSize[j]);
      bound += take * itemValue[j];
      rest -= take * itemSize[j];
    }
    if (bound <= best + 1e-12) return;
    const most = Math.min(itemBound[k], Math.floor((room + LENGTH_TOLERANCE) / itemSize[k]));
    for (let take = most; take >= 0 && nodes <= nodeLimit; take--) {
      taken[k] = take;
      search(k + 1, room - take * itemSize[k], value + take * itemValue[k]);
    }
    taken[k] = 0;
  };
  search(0, capacity, 0);
  if (effort) effort.spent += nodes * 10;
  const counts = new Array<number>(values.length).fill(0);
  order.forEach((index, k) => (counts[index] = bestTaken[k]));
  return { value: best, counts };
}

interface LinearSolution {
  objective: number;
  /** pattern → bars (fractional) */
  usage: { pattern: number[]; amount: number }[];
}

/** A pattern kept sparse: the rows it cuts and how many of each. */
interface SparseColumn {
  dense: number[];
  rows: Int32Array;
  counts: Float64Array;
}

function sparseColumn(dense: number[]): SparseColumn {
  const rows: number[] = [];
  const counts: number[] = [];
  dense.forEach((count, row) => {
    if (count > 0) {
      rows.push(row);
      counts.push(count);
    }
  });
  return { dense, rows: Int32Array.from(rows), counts: Float64Array.from(counts) };
}

/**
 * Cutting-stock LP: minimise bars Σx over patterns with Σ pattern·x = demand, x ≥ 0, by revised
 * simplex with an explicit (flat) basis inverse, adding patterns from the knapsack pricing step.
 * Equality rows are fine because any sub-pattern of a pattern is also a pattern.
 */
function solveCuttingLp(types: { sizes: number[]; demand: number[] }, capacity: number, pool: number[][], effort: Effort): LinearSolution {
  const m = types.demand.length;
  const bounds = types.sizes.map((size, row) => Math.min(types.demand[row], Math.floor((capacity + LENGTH_TOLERANCE) / size)));
  // Start from one single-length pattern per row: a diagonal basis, feasible at once.
  const columns: SparseColumn[] = [];
  const basis = new Int32Array(m);
  const inverse = new Float64Array(m * m);
  const values = new Float64Array(m);
  for (let row = 0; row < m; row++) {
    const dense = new Array<number>(m).fill(0);
    dense[row] = bounds[row];
    columns.push(sparseColumn(dense));
    basis[row] = row;
    inverse[row * m + row] = 1 / bounds[row];
    values[row] = types.demand[row] / bounds[row];
  }
  for (const pattern of pool) columns.push(sparseColumn(pattern));
  let inBasis = new Uint8Array(columns.length + 64);
  for (let row = 0; row < m; row++) inBasis[row] = 1;
  const duals = new Float64Array(m);
  const direction = new Float64Array(m);
  const maxIterations = 50 * m + 200;
  // Duals y = 1ᵀB⁻¹ (every pattern costs one bar); updated after each pivot as y += d·(new pivot row).
  for (let row = 0; row < m; row++) duals[row] = 1 / bounds[row];

  for (let iteration = 0; iteration < maxIterations && effort.spent < effort.budget; iteration++) {
    effort.spent += m * m + columns.length * 4;
    // Entering column: most negative reduced cost 1 − y·a among known patterns, else a priced one.
    let entering = -1;
    let bestReduced = -1e-9;
    for (let column = 0; column < columns.length; column++) {
      if (inBasis[column]) continue;
      const { rows, counts } = columns[column];
      let dot = 0;
      for (let t = 0; t < rows.length; t++) dot += duals[rows[t]] * counts[t];
      if (1 - dot < bestReduced) {
        bestReduced = 1 - dot;
        entering = column;
      }
    }
    let reducedCost = bestReduced;
    if (entering < 0) {
      const priced = boundedKnapsack(duals, types.sizes, bounds, capacity, PRICING_NODE_LIMIT, effort);
      if (priced.value <= 1 + 1e-9) break;
      reducedCost = 1 - priced.value;
      columns.push(sparseColumn(priced.counts));
      pool.push(priced.counts);
      entering = columns.length - 1;
      if (inBasis.length < columns.length) {
        const grown = new Uint8Array(columns.length * 2);
        grown.set(inBasis);
        inBasis = grown;
      }
    }
    // Direction u = B⁻¹a, then the ratio test.
    const { rows, counts } = columns[entering];
    let leaving = -1;
    let ratio = Infinity;
    for (let k = 0; k < m; k++) {
      const offset = k * m;
      let sum = 0;
      for (let t = 0; t < rows.length; t++) sum += inverse[offset + rows[t]] * counts[t];
      direction[k] = sum;
      if (sum > 1e-11) {
        const candidate = values[k] / sum;
        if (candidate < ratio - 1e-12) {
          ratio = candidate;
          leaving = k;
        }
      }
    }
    if (leaving < 0) break; // cannot happen for this LP; stop rather than loop
    const pivot = direction[leaving];
    const pivotOffset = leaving * m;
    for (let j = 0; j < m; j++) inverse[pivotOffset + j] /= pivot;
    values[leaving] /= pivot;
    for (let k = 0; k < m; k++) {
      const factor = direction[k];
      if (k === leaving || factor === 0) continue;
      const offset = k * m;
      for (let j = 0; j < m; j++) inverse[offset + j] -= factor * inverse[pivotOffset + j];
      values[k] -= factor * values[leaving];
    }
    for (let j = 0; j < m; j++) duals[j] += reducedCost * inverse[pivotOffset + j];
    inBasis[basis[leaving]] = 0;
    basis[leaving] = entering;
    inBasis[entering] = 1;
  }
  const usage: LinearSolution['usage'] = [];
  let objective = 0;
  for (let k = 0; k < m; k++) {
    const amount = Math.max(0, values[k]);
    objective += amount;
    if (amount > 1e-9) usage.push({ pattern: columns[basis[k]].dense, amount });
  }
  return { objective, usage };
}

/**
 * Cutting patterns (counts per length type; sizes and capacity in mm, kerf included) from the LP by
 * diving: commit whole pattern counts, or the largest fraction, then re-solve the rest. Stops when at
 * most `stopAtResidualCuts` cuts are left or the work budget is spent; `residual` is what is left.
 */
export function columnGenerationPlan(
  types: { sizes: number[]; demand: number[] },
  capacity: number,
  maxRounds: number,
  stopAtResidualCuts = 0,
  effort: Effort = { spent: 0, budget: COLUMN_GENERATION_WORK_BUDGET },
): { patterns: number[][]; residual: number[]; lpObjective: number } {
  const residual = types.demand.slice();
  const patterns: number[][] = [];
  let pool: number[][] = [];
  let lpObjective = 0;
  for (let round = 0; round < maxRounds && effort.spent < effort.budget; round++) {
    const active = residual.map((count, type) => (count > 0 ? type : -1)).filter((type) => type >= 0);
    if (active.length === 0) break;
    // A few cuts left: exact search packs them better than more rounding.
    if (round > 0 && residual.reduce((sum, count) => sum + count, 0) <= stopAtResidualCuts) break;
    const projectedPool = pool
      .map((pattern) => active.map((type) => Math.min(pattern[type] ?? 0, residual[type])))
      .filter((pattern) => pattern.some((count) => count > 0));
    const localPool: number[][] = projectedPool;
    const solution = solveCuttingLp(
      { sizes: active.map((type) => types.sizes[type]), demand: active.map((type) => residual[type]) },
      capacity,
      localPool,
      effort,
    );
    if (round === 0) lpObjective = solution.objective;
    // Keep generated patterns in full-width form for the next round.
    pool = localPool.map((pattern) => {
      const full = new Array<number>(types.demand.length).fill(0);
      active.forEach((type, row) => (full[type] = pattern[row]));
      return full;
    });
    const commit = (localPattern: number[], copies: number) => {
      for (let copy = 0; copy < copies; copy++) {
        const full = new Array<number>(types.demand.length).fill(0);
        let any = false;
        active.forEach((type, row) => {
          const take = Math.min(localPattern[row], residual[type]);
          full[type] = take;
          residual[type] -= take;
          if (take > 0) any = true;
        });
        if (any) patterns.push(full);
      }
    };
    let committed = false;
    for (const { pattern, amount } of solution.usage) {
      const whole = Math.floor(amount + 1e-9);
      if (whole >= 1) {
        commit(pattern, whole);
        committed = true;
      }
    }
    if (!committed) {
      const largest = solution.usage.reduce((best, entry) => (entry.amount > best.amount ? entry : best), solution.usage[0]);
      if (!largest) break;
      commit(largest.pattern, 1);
    }
  }
  return { patterns, residual, lpObjective };
}
