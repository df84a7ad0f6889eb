/**
 * Stock plan: pack profile cuts into stock bars (one-dimensional cutting stock). Lengths in mm.
 *
 * Model
 * - usable length = stockLength − endTrim (endTrim is the total squared off the bar, both ends together);
 * - every cut consumes its length plus one kerf, except that a bar's last cut needs no saw cut when it
 *   runs to the end of the usable length: a bar holds cuts c₁…cₙ when Σcᵢ + (n − 1)·kerf ≤ usable.
 *   Equivalently each cut has size c + kerf in a bar of capacity usable + kerf, which is how the
 *   packing below sees it;
 * - offcut = usable − Σcᵢ − n·kerf (never below 0); reusable when offcut ≥ minReusableOffcut;
 * - lowerBound = ceil(Σ(c + kerf) / (usable + kerf)), which is ceil(total length / usable) without kerf;
 * - wasteLength = everything bought that is neither a cut nor a reusable offcut (end trim, kerf, short offcuts).
 *
 * Method: first-fit-decreasing (FFD) and best-fit-decreasing baselines; when they miss the lower
 * bound, exact branch and bound for small sets, and column generation (revised simplex over cutting
 * patterns with a bounded-knapsack pricing step) followed by rounding for larger ones. The better
 * plan wins, so the result is never worse than FFD. Column generation and the leftover search run
 * under fixed work limits (counted steps, not clock time), so the same input always gives the same plan.
 */

import { LENGTH_TOLERANCE, boundedKnapsack, columnGenerationPlan } from './cuttingPatterns';
import { packIntoBars } from './binPackingSearch';

export { boundedKnapsack } from './cuttingPatterns';

export interface StockCut {
  id: string;
  /** mm */
  length: number;
  label?: string;
}

export interface StockPlanInput {
  cuts: StockCut[];
  /** mm, length of one stock bar as bought */
  stockLength: number;
  /** mm, saw blade width lost per cut */
  kerf: number;
  /** mm, total trimmed from a bar before cutting (both ends together) */
  endTrim: number;
  /** mm, an offcut at least this long is kept for reuse */
  minReusableOffcut: number;
  /**
   * `cuts` as `sortCutsForPacking` orders them, when the caller plans the same cuts more than once
   * (one plan per bar length): each plan then takes the cuts that fit from this list instead of
   * sorting again. Every length must be a finite number.
   */
  sortedCuts?: readonly StockCut[];
}

export interface StockBar {
  index: number;
  cuts: StockCut[];
  /** mm of the usable length consumed by cuts and kerfs */
  usedLength: number;
  /** mm left over at the end of the usable length */
  offcut: number;
  reusable: boolean;
}

export interface StockPlan {
  bars: StockBar[];
  barCount: number;
  lowerBound: number;
  firstFitDecreasingBarCount: number;
  /** mm, sum of placed cut lengths */
  totalCutLength: number;
  /** mm, bought length that is neither a placed cut nor a reusable offcut */
  wasteLength: number;
  method: string;
  unplaceable: StockCut[];
}

/** Exact search is used up to this many cuts. */
const EXACT_SEARCH_MAX_CUTS = 30;
/** Search nodes allowed for each bar count tried by the exact search. */
const EXACT_SEARCH_NODE_LIMIT = 100_000;
/** Column generation runs up to this many distinct lengths (its cost grows with the square of it). */
const COLUMN_GENERATION_MAX_TYPES = 40;
/** Search nodes allowed to fill one bar in the minimum-slack heuristic. */
const MINIMUM_SLACK_NODE_LIMIT = 2_000;

interface PackingProblem {
  usable: number;
  capacity: number;
  kerf: number;
  placeable: StockCut[];
  unplaceable: StockCut[];
  /** `placeable`, longest first (ties by id), made on first use: FFD, BFD, the exact search and the grouping share it. */
  sorted?: StockCut[];
}

/** The placeable cuts longest first; sorted once per problem. Callers must not change the list. */
function sortedCuts(problem: PackingProblem): StockCut[] {
  if (!problem.sorted) problem.sorted = [...problem.placeable].sort(byLengthDescending);
  return problem.sorted;
}

function preparePacking(input: StockPlanInput): PackingProblem {
  const usable = input.stockLength - input.endTrim;
  const kerf = Math.max(0, input.kerf);
  const fits = (cut: StockCut) => Number.isFinite(cut.length) && cut.length > 0 && usable > 0 && cut.length <= usable + LENGTH_TOLERANCE;
  const cuts = input.cuts;
  let fitting = 0;
  for (let c = 0; c < cuts.length; c++) if (fits(cuts[c])) fitting++;
  // Usually every cut fits: the given lists are then used as they are (read only), not copied.
  if (fitting === cuts.length) {
    const problem: PackingProblem = { usable, capacity: usable + kerf, kerf, placeable: cuts, unplaceable: [] };
    if (input.sortedCuts) problem.sorted = input.sortedCuts as StockCut[];
    return problem;
  }
  const placeable: StockCut[] = [];
  const unplaceable: StockCut[] = [];
  for (const cut of cuts) (fits(cut) ? placeable : unplaceable).push(cut);
  const problem: PackingProblem = { usable, capacity: usable + kerf, kerf, placeable, unplaceable };
  // The stable sort of the cuts that fit is the sorted list with the others left out.
  if (input.sortedCuts) problem.sorted = input.sortedCuts.filter(fits);
  return problem;
}

/**
 * Cuts longest first, ties by id: the order every packing here starts from (a new list), as the
 * stable `[...cuts].sort(byLengthDescending)` gives it. When the cuts already come longest first
 * (as the stock plans pass them), only each run of one length is sorted, by id.
 */
export function sortCutsForPacking(cuts: readonly StockCut[]): StockCut[] {
  const out = cuts.slice();
  for (let from = 0; from < out.length; ) {
    const length = out[from].length;
    let to = from + 1;
    while (to < out.length && out[to].length === length) to++;
    // Not longest first (or not numbers): the plain sort.
    if (!Number.isFinite(length) || (to < out.length && !(out[to].length < length))) return [...cuts].sort(byLengthDescending);
    if (to - from > 1) {
      const run = out.slice(from, to).sort(byLengthDescending);
      for (let k = 0; k < run.length; k++) out[from + k] = run[k];
    }
    from = to;
  }
  return out;
}

function byLengthDescending(a: StockCut, b: StockCut): number {
  return b.length - a.length || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);
}

/** Removes `list[position]`, shifting the rest down (as `splice(position, 1)`, without the removed-items array it returns). */
function removeAt(list: number[], position: number): void {
  for (let k = position + 1; k < list.length; k++) list[k - 1] = list[k];
  // pop() rather than `length -= 1`, which takes a slow path in the engine.
  list.pop();
}

/** Inserts `value` at `position`, shifting the rest up (as `splice(position, 0, value)`, without the array it returns). */
function insertAt(list: number[], position: number, value: number): void {
  list.push(value);
  for (let k = list.length - 1; k > position; k--) list[k] = list[k - 1];
  list[position] = value;
}

/**
 * Bars from groups of cuts. Each group must already list its cuts as the stable sort by
 * `byLengthDescending` would (longest first, ties by id, equal cuts in the group's order): every
 * packing here fills its bars in packing order, and `patternsToGroups` lays its pattern bars out
 * that way, so no bar is sorted here (that took a map from cut to rank, 8,000 entries a plan).
 */
function toStockBars(groups: StockCut[][], problem: PackingProblem, minReusableOffcut: number): StockBar[] {
  return groups.map((sorted, index) => {
    const consumed = sorted.reduce((sum, cut) => sum + cut.length + problem.kerf, 0);
    const usedLength = Math.min(problem.usable, consumed);
    const offcut = Math.max(0, problem.usable - consumed);
    return {
      index,
      cuts: sorted,
      usedLength,
      offcut,
      reusable: offcut > LENGTH_TOLERANCE && offcut >= minReusableOffcut - LENGTH_TOLERANCE,
    };
  });
}

/**
 * A packing of the sorted cuts (`sortedCuts`): the bar of each cut, by its place in that order.
 * The bars' cut lists are made only for the packing that wins (`groupsOf`): at 8,000 profiles
 * first fit and best fit each filled about 650 lists that column generation then beat.
 */
interface Packing {
  count: number;
  barOf: Int32Array;
}

/** Each bar's cuts, in the sorted order (the order the packings placed them in). */
function groupsOf(packing: Packing, sorted: readonly StockCut[]): StockCut[][] {
  const { count, barOf } = packing;
  const sizes = new Int32Array(count);
  for (let i = 0; i < barOf.length; i++) sizes[barOf[i]]++;
  const groups = new Array<StockCut[]>(count);
  for (let bar = 0; bar < count; bar++) groups[bar] = new Array<StockCut>(sizes[bar]);
  const filled = new Int32Array(count);
  for (let i = 0; i < barOf.length; i++) {
    const bar = barOf[i];
    groups[bar][filled[bar]++] = sorted[i];
  }
  return groups;
}

function fitDecreasing(problem: PackingProblem, rule: 'first' | 'best'): Packing {
  if (rule === 'best') return bestFitDecreasing(problem);
  const sorted = sortedCuts(problem);
  const barOf = new Int32Array(sorted.length);
  // One bar at most per cut; `count` of them are in use.
  const loads = new Float64Array(sorted.length);
  let count = 0;
  const limit = problem.capacity + LENGTH_TOLERANCE;
  // Sizes only shrink, so a bar that cannot take the smallest cut never takes another: drop it from
  // `open` (bar indices, ascending). Same bars, same order, same choices as scanning every bar.
  const smallest = sorted.length > 0 ? sorted[sorted.length - 1].length + problem.kerf : 0;
  const open: number[] = [];
  let previousSize = Number.NaN;
  let previousPosition = 0;
  for (let i = 0; i < sorted.length; i++) {
    const size = sorted[i].length + problem.kerf;
    // First fit: every open bar before the last choice already refused a cut of this same size.
    let position = size === previousSize ? previousPosition : 0;
    let chosenPosition = -1;
    for (; position < open.length; position++) {
      if (loads[open[position]] + size > limit) continue;
      chosenPosition = position;
      break;
    }
    if (chosenPosition < 0) {
      open.push(count++);
      chosenPosition = open.length - 1;
    }
    const chosen = open[chosenPosition];
    barOf[i] = chosen;
    loads[chosen] += size;
    if (loads[chosen] + smallest > limit) removeAt(open, chosenPosition);
    previousSize = size;
    previousPosition = chosenPosition;
  }
  return { count, barOf };
}

/**
 * Best fit decreasing: each cut goes to the open bar with the highest load that still takes it
 * (the lowest bar index among equal loads), else to a new bar. The open bars are kept ordered by
 * load (highest first, then bar index), so the bar is found by binary search instead of a scan of
 * every open bar (n cuts × hundreds of bars at 8,000 profiles). `load + size <= limit` only turns
 * false as the load grows, so the search finds the same bar the scan did.
 */
function bestFitDecreasing(problem: PackingProblem): Packing {
  const sorted = sortedCuts(problem);
  const barOf = new Int32Array(sorted.length);
  const loads = new Float64Array(sorted.length);
  let count = 0;
  const limit = problem.capacity + LENGTH_TOLERANCE;
  const smallest = sorted.length > 0 ? sorted[sorted.length - 1].length + problem.kerf : 0;
  // Open bar indices, highest load first, then lowest index.
  const open: number[] = [];
  for (let i = 0; i < sorted.length; i++) {
    const size = sorted[i].length + problem.kerf;
    // First position whose bar takes the cut: bars before it are too full.
    let lo = 0;
    let hi = open.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (loads[open[mid]] + size > limit) lo = mid + 1;
      else hi = mid;
    }
    let chosen: number;
    if (lo < open.length) {
      chosen = open[lo];
      removeAt(open, lo);
    } else chosen = count++;
    barOf[i] = chosen;
    loads[chosen] += size;
    if (!(loads[chosen] + smallest > limit)) {
      // Back into the open bars at its place: after every bar with a higher load, or an equal load and a lower index.
      const load = loads[chosen];
      lo = 0;
      hi = open.length;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        const other = open[mid];
        if (loads[other] > load || (loads[other] === load && other < chosen)) lo = mid + 1;
        else hi = mid;
      }
      insertAt(open, lo, chosen);
    }
  }
  return { count, barOf };
}

/** First-fit-decreasing packing of the placeable cuts into bars (mm in, bars out); the baseline every plan must match or beat. */
export function firstFitDecreasing(input: StockPlanInput): StockBar[] {
  const problem = preparePacking(input);
  return toStockBars(groupsOf(fitDecreasing(problem, 'first'), sortedCuts(problem)), problem, input.minReusableOffcut);
}

/** Lower bound on the bar count: ceil(Σ(cut + kerf) / (usable + kerf)) over the placeable cuts (lengths in mm). */
export function stockLowerBound(input: StockPlanInput): number {
  const problem = preparePacking(input);
  return lowerBoundOf(problem);
}

function lowerBoundOf(problem: PackingProblem): number {
  if (problem.placeable.length === 0) return 0;
  const total = problem.placeable.reduce((sum, cut) => sum + cut.length + problem.kerf, 0);
  return Math.max(1, Math.ceil(total / problem.capacity - 1e-9));
}

// ---------------------------------------------------------------------------------------------
// Exact search for small sets


function exactSearch(problem: PackingProblem, lowerBound: number, upperBound: number): StockCut[][] | null {
  const sorted = sortedCuts(problem);
  const sizes = sorted.map((cut) => cut.length + problem.kerf);
  for (let barCount = lowerBound; barCount < upperBound; barCount++) {
    const { bins, complete } = packIntoBars(sizes, problem.capacity, barCount, EXACT_SEARCH_NODE_LIMIT);
    if (bins) {
      const groups: StockCut[][] = Array.from({ length: barCount }, () => []);
      bins.forEach((bar, item) => groups[bar].push(sorted[item]));
      return groups.filter((group) => group.length > 0);
    }
    if (!complete) return null; // out of effort: the heuristics' answer stands
  }
  return null;
}

/** Packs a set by first fit decreasing, then by exact search when it is small and FFD misses the bound. */
function packSmallSet(problem: PackingProblem, enough = 0): StockCut[][] {
  const firstFit = fitDecreasing(problem, 'first');
  const bound = Math.max(lowerBoundOf(problem), enough);
  if (firstFit.count <= bound || problem.placeable.length > EXACT_SEARCH_MAX_CUTS) return groupsOf(firstFit, sortedCuts(problem));
  return exactSearch(problem, bound, firstFit.count) ?? groupsOf(firstFit, sortedCuts(problem));
}

// ---------------------------------------------------------------------------------------------
// Column generation over cutting patterns

interface CuttingTypes {
  /** distinct lengths, longest first */
  lengths: number[];
  sizes: number[];
  demand: number[];
  /** The placeable cuts longest first (`sortedCuts`); type t is `sorted[starts[t]]` up to `sorted[starts[t + 1]]`. */
  sorted: readonly StockCut[];
  starts: number[];
}

function groupByLength(problem: PackingProblem): CuttingTypes {
  const sorted = sortedCuts(problem);
  const lengths: number[] = [];
  const starts: number[] = [];
  for (let i = 0; i < sorted.length; i++) {
    const last = lengths.length - 1;
    if (last >= 0 && Math.abs(lengths[last] - sorted[i].length) <= LENGTH_TOLERANCE) continue;
    lengths.push(sorted[i].length);
    starts.push(i);
  }
  starts.push(sorted.length);
  const sizes: number[] = [];
  const demand: number[] = [];
  // The longest cut of a type is its first (the list is longest first).
  for (let t = 0; t < lengths.length; t++) {
    sizes.push(sorted[starts[t]].length + problem.kerf);
    demand.push(starts[t + 1] - starts[t]);
  }
  return { lengths, sizes, demand, sorted, starts };
}

/** Turns patterns into bars of real cuts; cuts the patterns leave over are packed by first fit decreasing. */
function patternsToGroups(patterns: number[][], types: CuttingTypes, problem: PackingProblem, enoughBars = 0): StockCut[][] {
  const { sorted, starts } = types;
  // Each length's cuts not yet taken: sorted[starts[t]] up to sorted[ends[t]]; a bar takes from the end.
  const ends = starts.slice(1);
  // Each bar takes the last `count` cuts of a length (in packing order), and lists them in the
  // order a stable sort by packing order gives the cuts as taken from the end: in packing order,
  // except that a run of cuts the order ties (same length and id) stays last-taken first.
  const groups = patterns.map((pattern) => {
    // A pattern can ask for more cuts of a length than are left (the minimum-slack patterns of a
    // plan that then loses): it gets those left.
    const group: StockCut[] = [];
    for (let type = 0; type < pattern.length; type++) {
      const count = pattern[type];
      if (!(count > 0)) continue;
      const end = ends[type];
      const from = Math.max(starts[type], end - count);
      let k = from;
      while (k < end) {
        let runEnd = k + 1;
        while (runEnd < end && sorted[runEnd].length === sorted[k].length && sorted[runEnd].id === sorted[k].id) runEnd++;
        for (let t = runEnd - 1; t >= k; t--) group.push(sorted[t]);
        k = runEnd;
      }
      ends[type] = from;
    }
    return group;
  });
  const leftover: StockCut[] = [];
  for (let type = 0; type < ends.length; type++) for (let k = starts[type]; k < ends[type]; k++) leftover.push(sorted[k]);
  if (leftover.length > 0) groups.push(...packSmallSet({ ...problem, placeable: leftover, sorted: undefined }, enoughBars - groups.length));
  return groups;
}

/**
 * Minimum bin slack (Gupta and Ho): fill one bar at a time with the longest remaining cut plus the
 * subset of the rest that leaves the least slack (a bounded knapsack on lengths, node-limited).
 */
function minimumSlackPlan(types: CuttingTypes, capacity: number): number[][] {
  const remaining = types.demand.slice();
  const patterns: number[][] = [];
  let left = remaining.reduce((sum, count) => sum + count, 0);
  while (left > 0) {
    const first = remaining.findIndex((count) => count > 0);
    remaining[first] -= 1;
    const room = capacity - types.sizes[first];
    const fill = boundedKnapsack(types.sizes, types.sizes, remaining, room, MINIMUM_SLACK_NODE_LIMIT);
    const pattern = fill.counts;
    pattern[first] += 1;
    pattern.forEach((count, type) => {
      if (type !== first) remaining[type] -= count;
      left -= count;
    });
    patterns.push(pattern);
  }
  return patterns;
}

// ---------------------------------------------------------------------------------------------

/**
 * Plans which cuts (mm) go on which stock bars (mm) with kerf and end trim (mm). Never uses more bars
 * than first-fit-decreasing; cuts longer than the usable length are returned in `unplaceable`.
 */
export function planStock(input: StockPlanInput): StockPlan {
  if (!(input.stockLength > 0)) throw new Error('The stock length must be greater than 0 mm.');
  if (!(input.kerf >= 0) || !(input.endTrim >= 0)) throw new Error('Kerf and end trim cannot be negative.');
  const problem = preparePacking(input);
  const lowerBound = lowerBoundOf(problem);
  const firstFit = fitDecreasing(problem, 'first');
  // The best so far: its bar count, and its bars as a packing (first or best fit) or as cut lists.
  let bestCount = firstFit.count;
  let bestPacking: Packing | null = firstFit;
  let bestGroups: StockCut[][] | null = null;
  let method = 'first-fit-decreasing';
  const consider = (groups: StockCut[][] | null, by: string) => {
    if (groups && groups.length < bestCount) {
      bestCount = groups.length;
      bestGroups = groups;
      bestPacking = null;
      method = by;
    }
  };

  if (bestCount > lowerBound) {
    const bestFit = fitDecreasing(problem, 'best');
    if (bestFit.count < bestCount) {
      bestCount = bestFit.count;
      bestPacking = bestFit;
      method = 'best-fit-decreasing';
    }
  }
  if (bestCount > lowerBound && problem.placeable.length <= EXACT_SEARCH_MAX_CUTS) {
    consider(exactSearch(problem, lowerBound, bestCount), 'branch-and-bound');
  }
  let target = lowerBound;
  if (bestCount > target) {
    const types = groupByLength(problem);
    if (types.lengths.length <= COLUMN_GENERATION_MAX_TYPES) {
      const planned = columnGenerationPlan(types, problem.capacity, bestCount, EXACT_SEARCH_MAX_CUTS);
      // No plan beats the rounded-up LP optimum (an estimate if pricing was cut short), so the searches stop there.
      target = Math.max(target, Math.ceil(planned.lpObjective - 1e-6));
      consider(patternsToGroups(planned.patterns, types, problem, target), 'column-generation');
    }
    if (bestCount > target) {
      consider(patternsToGroups(minimumSlackPlan(types, problem.capacity), types, problem), 'minimum-bin-slack');
    }
  }

  const groups = bestGroups ?? groupsOf(bestPacking!, sortedCuts(problem));
  const bars = toStockBars(groups, problem, input.minReusableOffcut);
  const totalCutLength = problem.placeable.reduce((sum, cut) => sum + cut.length, 0);
  const reusableLength = bars.reduce((sum, bar) => sum + (bar.reusable ? bar.offcut : 0), 0);
  return {
    bars,
    barCount: bars.length,
    lowerBound,
    firstFitDecreasingBarCount: firstFit.count,
    totalCutLength,
    wasteLength: Math.max(0, bars.length * input.stockLength - totalCutLength - reusableLength),
    method,
    unplaceable: problem.unplaceable,
  };
}
