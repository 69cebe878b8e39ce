/**
 * One what-if point: a design (parsed, SI) → validated again by the design schema (so a swept
 * value out of a field's range is caught with its path) → Station → one simulated shot with
 * figures only (no waveform samples), plus the warnings `fluxkick shot` adds (a yoke coil's
 * table, and `part.not-penetrated` with conductive bodies; analysis/design-shot.ts) → the
 * verdict. The unit of work of sweeps, tolerance runs and sizing, in this thread or on a worker
 * thread.
 *
 * Returned rows are plain data (structured-clone safe): the shot's figures, each verdict item's
 * id, value, limit, unit, margin and status, and the warnings' codes.
 */
import { designSchema, type Design } from '../design/schema.js';
import { parseWithSchema } from '../design/issues.js';
import { designToStation } from '../design/to-station.js';
import { isInputError, formatInputError } from '../design/errors.js';
import { simulateShot } from '../solve/shot.js';
import { judgeShot } from '../analysis/verdict.js';
import { judgeInputsFromDesign } from '../analysis/verdict-design.js';
import { withPenetration, withStationWarnings } from '../analysis/design-shot.js';
import type { ShotFigures } from '../model/result.js';
import type { VerdictStatus } from '../model/verdict.js';
import { withDesignValues, type DesignPath } from './designPath.js';

export interface PointVerdictItem {
  id: string;
  value: number;
  limit: number;
  unit: string;
  margin: number;
  status: VerdictStatus;
}

export interface PointResult {
  figures: ShotFigures;
  overall: 'pass' | 'warn' | 'fail';
  items: PointVerdictItem[];
  warnings: { code: string; severity: 'info' | 'warning' | 'error' }[];
}

export type PointOutcome = ({ ok: true } & PointResult) | { ok: false; error: string };

/** Simulate and judge one design. Throws InputError when the design is invalid. */
export function evaluateDesign(design: Design): PointResult {
  const valid = parseWithSchema(designSchema, design);
  const station = designToStation(valid);
  station.solver = { ...station.solver, samples: 0 };
  const { result: shot } = withPenetration(valid, station, withStationWarnings(station, simulateShot(station)));
  const verdict = judgeShot(station, judgeInputsFromDesign(valid), shot);
  return {
    figures: shot.figures,
    overall: verdict.overall,
    items: verdict.items.map((i) => ({ id: i.id, value: i.value, limit: i.limit, unit: i.unit, margin: i.margin, status: i.status })),
    warnings: shot.warnings.map((w) => ({ code: w.code, severity: w.severity })),
  };
}

/** evaluateDesign with values written at paths; bad input becomes `{ ok: false, error }`. */
export function evaluatePoint(design: Design, paths: readonly DesignPath[], values: readonly number[]): PointOutcome {
  try {
    const d = withDesignValues(
      design,
      paths.map((path, k) => ({ path, value: values[k] })),
    );
    return { ok: true, ...evaluateDesign(d) };
  } catch (e) {
    if (isInputError(e)) return { ok: false, error: formatInputError(e) };
    return { ok: false, error: e instanceof Error ? `${e.name}: ${e.message}` : String(e) };
  }
}
