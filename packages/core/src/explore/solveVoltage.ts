/**
 * The charge voltage at which a design just reaches a target field at the part: the smallest V
 * with H(V) ≥ H_target, returned with H(V) within [H_target, H_target·(1 + relTol)].
 *
 * Method: H(V) rises monotonically with the charge voltage (every current in the linear circuit
 * scales with V apart from the fixed device drops; R(T) and iron saturation bend it but keep it
 * rising). 1. Bracket from the design's voltage with a first step from the proportional
 * estimate V·H_target/H(V), then geometric steps (expandBracket.ts). 2. Brent's method on
 * H(V) − H_target (findRoot.ts) with xTol = relTol·V/4 and fTol = relTol·H_target/2.
 * 3. The answer is the lowest evaluated voltage whose field is at or above the target; if its
 * excess is still above relTol, bisect between it and the highest voltage below the target until
 * it is not. Every evaluation is a full shot (evaluateDesign.ts), so the answer's own shot is
 * returned with it.
 *
 * The field at the part: the verdict's `field.part` item (the worst of the part's probes) when
 * the design has a part section, else the shot's peak field at probe 0.
 */
import type { Design } from '../design/schema.js';
import { parseDesignPath, withDesignValues, type DesignPath } from './designPath.js';
import { evaluateDesign, type PointResult } from './evaluateDesign.js';
import { expandBracket } from './expandBracket.js';
import { findRoot } from './findRoot.js';
import { isInputError, formatInputError } from '../design/errors.js';

export interface VoltageSolveOptions {
  /** Field to reach at the part, A/m (the margin already included). */
  targetField_Apm: number;
  /** Relative tolerance on the field: the answer's field lies in [target, target·(1 + relTol)]. Default 1e-5. */
  relTol?: number;
  /** Highest voltage to try, V (e.g. the bank's rating). Default 1000 × the design's voltage. */
  maxVoltage_V?: number;
  /** Lowest voltage to try, V. Default the design's voltage / 1000. */
  minVoltage_V?: number;
}

export type VoltageSolve =
  | { ok: true; voltage_V: number; field_Apm: number; excess: number; result: PointResult; evaluations: number }
  | {
      ok: false;
      reason: 'unreachable' | 'below-min' | 'error';
      /** What was found at the last voltage tried (at the bound for unreachable / below-min). */
      voltage_V: number;
      field_Apm: number;
      result?: PointResult;
      error?: string;
      evaluations: number;
    };

/**
 * Default relative tolerance on the field: fine enough that the energies of neighbouring
 * capacitances in a sizing run (0.1 % apart) are not lost in the solve's own spread (2·relTol).
 */
export const DEFAULT_FIELD_REL_TOL = 1e-5;
const VOLTAGE_PATH = parseDesignPath('bank.voltage')!;

/** The field at the part that sizing aims at: the verdict's field.part value, else probe 0's peak. */
export function partField(r: PointResult): number {
  const item = r.items.find((i) => i.id === 'field.part');
  return item ? item.value : Math.abs(r.figures.peakField_Apm);
}

/** Solve on `design` as it is. */
export function solveVoltage(design: Design, options: VoltageSolveOptions): VoltageSolve {
  return solveVoltageAt(design, [], [], options);
}

/** Solve on the design with `values` written at `paths` first (e.g. another capacitance). */
export function solveVoltageAt(design: Design, paths: readonly DesignPath[], values: readonly number[], options: VoltageSolveOptions): VoltageSolve {
  const base = withDesignValues(
    design,
    paths.map((path, k) => ({ path, value: values[k] })),
  );
  const target = options.targetField_Apm;
  const relTol = options.relTol ?? DEFAULT_FIELD_REL_TOL;
  const v0 = base.bank.voltage;
  const min = options.minVoltage_V ?? v0 / 1000;
  const max = options.maxVoltage_V ?? v0 * 1000;
  const cache = new Map<number, { field: number; result?: PointResult; error?: string }>();
  const at = (v: number) => {
    let hit = cache.get(v);
    if (!hit) {
      try {
        const result = evaluateDesign(withDesignValues(base, [{ path: VOLTAGE_PATH, value: v }]));
        hit = { field: partField(result), result };
      } catch (e) {
        hit = { field: NaN, error: isInputError(e) ? formatInputError(e) : e instanceof Error ? e.message : String(e) };
      }
      cache.set(v, hit);
    }
    return hit;
  };
  const f = (v: number) => at(v).field - target;
  const failure = (reason: 'unreachable' | 'below-min' | 'error', v: number) => {
    const hit = at(v);
    return {
      ok: false as const,
      reason,
      voltage_V: v,
      field_Apm: hit.field,
      ...(hit.result ? { result: hit.result } : {}),
      ...(hit.error !== undefined ? { error: hit.error } : {}),
      evaluations: cache.size,
    };
  };

  const start = Math.min(max, Math.max(min, v0));
  const bracket = expandBracket(f, start, {
    factor: 1.6,
    min,
    max,
    firstStep: (v, fv) => (v * target) / (fv + target),
  });
  if (!bracket.ok) {
    if (bracket.reason === 'nan') return failure('error', bracket.x);
    return failure(bracket.fx < 0 ? 'unreachable' : 'below-min', bracket.x);
  }
  findRoot(f, bracket.a, bracket.b, { fa: bracket.fa, fb: bracket.fb, xTol: (relTol * bracket.a) / 4, fTol: (relTol * target) / 2 });

  // The lowest voltage at or above the target, and the highest below it.
  const pick = () => {
    let above = Infinity;
    let below = -Infinity;
    for (const [v, hit] of cache) {
      if (!(hit.field === hit.field)) continue;
      if (hit.field >= target) above = Math.min(above, v);
      else below = Math.max(below, v);
    }
    return { above, below };
  };
  let { above, below } = pick();
  for (let i = 0; i < 60 && Number.isFinite(above) && at(above).field > target * (1 + relTol); i++) {
    const lo = Number.isFinite(below) ? below : min;
    const mid = 0.5 * (lo + above);
    if (mid === lo || mid === above) break;
    at(mid);
    ({ above, below } = pick());
  }
  if (!Number.isFinite(above)) return failure('error', bracket.b);
  const hit = at(above);
  if (!hit.result) return failure('error', above);
  return { ok: true, voltage_V: above, field_Apm: hit.field, excess: hit.field / target - 1, result: hit.result, evaluations: cache.size };
}
