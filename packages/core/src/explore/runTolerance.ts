/**
 * A tolerance run (Monte Carlo): the design shot many times with chosen fields drawn within
 * their tolerances (drawTolerances.ts: uniform by default, or normal with ±x as 3σ truncated
 * there), from a seed, so the run is reproduced exactly by its seed on any number of threads.
 *
 * Reported: percentiles of the peak field at the part and of the coil's final temperature and
 * rise (summarize.ts), the fraction of shots whose field reaches the required field (the part
 * saturates), the fraction whose verdict fails, and a histogram of the peak field.
 */
import type { Design } from '../design/schema.js';
import { drawTolerances, type ToleranceDistribution } from './drawTolerances.js';
import { runPoints, type RunOptions, type RunStats, type SweepRow } from './runSweep.js';
import { partField } from './solveVoltage.js';
import { histogram, summarize, type Distribution, type HistogramBin } from './summarize.js';
import type { ToleranceField } from './toleranceSpec.js';

export interface ToleranceOptions extends RunOptions {
  /** Number of shots. Default 1000. */
  samples?: number;
  /** Seed of the generator. Default 1. */
  seed?: number;
  distribution?: ToleranceDistribution;
  /** Field the part must reach, A/m, when the design has no part section. */
  requiredField_Apm?: number;
  /** Histogram bins (about). Default 20. */
  bins?: number;
}

export interface ToleranceResult extends RunStats {
  fields: ToleranceField[];
  samples: number;
  seed: number;
  distribution: ToleranceDistribution;
  /** Each shot's drawn values (one per field) and its outcome, in draw order. */
  rows: SweepRow[];
  /** Peak field at the part (the verdict's field.part value when judged, else probe 0), A/m. */
  peakField: Distribution;
  /** Coil temperature at the end of the shot, °C. */
  coilTemperature: Distribution;
  /** Coil temperature rise, K. */
  coilTemperatureRise: Distribution;
  /** Required field, A/m (the verdict's, else the option); undefined when neither is known. */
  requiredField_Apm?: number;
  /** Shots reaching the required field / shots that ran. */
  saturatedFraction?: number;
  /** Shots whose verdict fails / shots that ran. */
  failedFraction: number;
  /** Shots that could not run (invalid design at the drawn values, solver trouble). */
  errors: number;
  fieldHistogram: HistogramBin[];
}

export const DEFAULT_TOLERANCE_SAMPLES = 1000;

export async function runTolerance(design: Design, fields: ToleranceField[], options: ToleranceOptions = {}): Promise<ToleranceResult> {
  const samples = options.samples ?? DEFAULT_TOLERANCE_SAMPLES;
  const seed = options.seed ?? 1;
  const distribution = options.distribution ?? 'uniform';
  // Whole-number fields (turns, layers) take the nearest integer of each draw.
  const draws = drawTolerances(fields, samples, seed, distribution).map((row) => row.map((v, k) => (fields[k]!.integer ? Math.round(v) : v)));
  const run = await runPoints(
    design,
    fields.map((f) => f.path),
    draws.map((values, index) => ({ index, values })),
    options,
  );
  const ok = run.rows.flatMap((r) => (r.outcome.ok ? [r.outcome] : []));
  const field = ok.map((o) => partField(o));
  let required: number | undefined = options.requiredField_Apm;
  let saturated = 0;
  for (const o of ok) {
    const item = o.items.find((i) => i.id === 'field.part');
    const limit = item ? item.limit : required;
    if (item && required === undefined) required = item.limit;
    if (limit !== undefined && partField(o) >= limit) saturated += 1;
  }
  return {
    fields,
    samples,
    seed,
    distribution,
    ...run,
    peakField: summarize(field),
    coilTemperature: summarize(ok.map((o) => o.figures.coilFinalTemperature_C)),
    coilTemperatureRise: summarize(ok.map((o) => o.figures.coilTemperatureRise_K)),
    ...(required !== undefined ? { requiredField_Apm: required, saturatedFraction: ok.length ? saturated / ok.length : NaN } : {}),
    failedFraction: ok.length ? ok.filter((o) => o.overall === 'fail').length / ok.length : NaN,
    errors: run.rows.length - ok.length,
    fieldHistogram: histogram(field, options.bins ?? 20),
  };
}
