/**
 * Exact search for small bin-packing sets: can these sizes (mm, kerf included) go into k bars of
 * the given capacity? Depth-first over items (longest first) with symmetry breaking (bars with
 * equal load are tried once) and a capacity bound; gives up after a node limit.
 */
import { LENGTH_TOLERANCE } from './cuttingPatterns';

/** Assignment of each item (sizes in mm, longest first) to one of `barCount` bars, or null; `complete` is false when the node limit cut the search short. */
export function packIntoBars(sizes: number[], capacity: number, barCount: number, nodeLimit: number): { bins: number[] | null; complete: boolean } {
  const count = sizes.length;
  const loads = new Float64Array(barCount);
  const assignment = new Array<number>(count).fill(-1);
  const remainingAfter = new Float64Array(count + 1);
  for (let k = count - 1; k >= 0; k--) remainingAfter[k] = remainingAfter[k + 1] + sizes[k];
  let nodes = 0;
  let aborted = false;
  const totalCapacity = capacity * barCount;

  const search = (item: number, usedTotal: number): boolean => {
    if (item === count) return true;
    if (++nodes > nodeLimit) {
      aborted = true;
      return false;
    }
    // Space that no remaining item can use is lost; prune when the rest cannot fit.
    const smallest = sizes[count - 1];
    let lost = 0;
    for (let bar = 0; bar < barCount; bar++) {
      const free = capacity - loads[bar];
      if (free + LENGTH_TOLERANCE < smallest) lost += free;
    }
    if (usedTotal + remainingAfter[item] + lost > totalCapacity + LENGTH_TOLERANCE) return false;
    const size = sizes[item];
    const triedLoads: number[] = [];
    for (let bar = 0; bar < barCount; bar++) {
      const load = loads[bar];
      if (load + size > capacity + LENGTH_TOLERANCE) continue;
      if (triedLoads.some((tried) => Math.abs(tried - load) <= LENGTH_TOLERANCE)) continue;
      triedLoads.push(load);
      loads[bar] += size;
      assignment[item] = bar;
      if (search(item + 1, usedTotal + size)) return true;
      loads[bar] -= size;
      if (aborted) return false;
    }
    return false;
  };
  const found = search(0, 0);
  return { bins: found ? assignment : null, complete: !aborted };
}
