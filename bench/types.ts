/** One row of a benchmark table; `npm run bench` prints these and writes bench/results/latest.json. */
export interface BenchRow {
  benchmark: string;
  metric: string;
  value: number;
  unit: string;
  /** The bar from quality.md this row is held against, in words (e.g. "< 50 ms"). */
  bar?: string;
  pass?: boolean;
}
