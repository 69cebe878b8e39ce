/**
 * Summary statistics of a tolerance run's figures: percentiles by linear interpolation between
 * order statistics (Hyndman & Fan 1996, definition 7, the default of R and of d3-array's
 * `quantileSorted`), mean, extremes; and a histogram on "nice" bin edges (d3-array `bin`).
 * NaN values (failed shots) are left out and counted.
 */
import { bin, quantileSorted } from 'd3-array';

export interface Distribution {
  count: number;
  /** Values left out because they were NaN. */
  missing: number;
  min: number;
  max: number;
  mean: number;
  /** Keyed by percent: p1, p5, p50, p95, p99. */
  percentiles: { p1: number; p5: number; p50: number; p95: number; p99: number };
}

export interface HistogramBin {
  x0: number;
  x1: number;
  count: number;
}

export function summarize(values: readonly number[]): Distribution {
  const finite = values.filter((v) => !Number.isNaN(v)).sort((a, b) => a - b);
  const q = (p: number) => (finite.length ? (quantileSorted(finite, p) as number) : NaN);
  return {
    count: finite.length,
    missing: values.length - finite.length,
    min: finite.length ? finite[0]! : NaN,
    max: finite.length ? finite[finite.length - 1]! : NaN,
    mean: finite.length ? finite.reduce((s, v) => s + v, 0) / finite.length : NaN,
    percentiles: { p1: q(0.01), p5: q(0.05), p50: q(0.5), p95: q(0.95), p99: q(0.99) },
  };
}

/** Histogram with about `bins` nice bins (d3-array's threshold choice). */
export function histogram(values: readonly number[], bins = 20): HistogramBin[] {
  const finite = values.filter((v) => !Number.isNaN(v));
  if (finite.length === 0) return [];
  return bin()
    .thresholds(bins)(finite)
    .map((b) => ({ x0: b.x0 as number, x1: b.x1 as number, count: b.length }));
}
