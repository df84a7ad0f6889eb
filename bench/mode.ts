/**
 * How the current bench run was asked for: `npm run bench -- --quick` (or BENCH_QUICK=1) shortens
 * every benchmark for a smoke test; its figures are not the ones to quote.
 */
export const QUICK = process.env.BENCH_QUICK === '1' || process.argv.includes('--quick');

/** `full` in a normal run, `quick` in a quick one. */
export function pick<T>(full: T, quick: T): T {
  return QUICK ? quick : full;
}

/** Extra node flags for a bench's server child, e.g. BENCH_SERVER_NODE_ARGS="--cpu-prof --cpu-prof-dir=prof" to profile it. */
export const serverNodeArgs = (): string[] => (process.env.BENCH_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean);
