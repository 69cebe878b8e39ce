/**
 * The nonlinear coil of a yoke fixture as the discharge engine consumes it (model/station.ts,
 * `NonlinearCoil`): λ(i), dλ/di, the field at the part and the co-energy, fast enough to be
 * called in the integrator's right-hand side.
 *
 * Method: the magnetic network (yoke.ts) is solved once per knot on 0 ≤ i ≤ i_max; at each knot
 * the exact slopes dλ/di and dH_part/di come from implicit differentiation of the network.
 * λ(i) and H_part(i) are cubic Hermite interpolants through the knot values with those slopes,
 * passed through the Fritsch–Carlson limiter so that they stay monotone (Fritsch & Carlson,
 * SIAM J. Numer. Anal. 17(2), 1980). Consistency by construction:
 *   incrementalInductance_H(i) = d/di of the λ interpolant (its exact derivative),
 *   coEnergy_J(i)              = ∫0^i λ di' of the same interpolant (its exact integral),
 * so magnetic energy i·λ − W' and the circuit's power i·dλ/dt balance to rounding.
 * Odd symmetry: λ(−i) = −λ(i), H(−i) = −H(i), W'(−i) = W'(i). Above i_max the interpolants go
 * on as straight lines with the slopes at i_max (exact once every steel member is above its
 * table, where it behaves as µ0 incrementally).
 *
 * Knot placement is adaptive: starting from a uniform grid, an interval [a, b] is split while
 * the Hermite value at its midpoint differs from a direct network solve there by more than
 * relTol (relative, for λ and for H_part). For a smooth function the Hermite error peaks near
 * the midpoint (error ∝ t²(1 − t)²·f⁗), so the largest midpoint error, reported in
 * `table.maxRelError`, estimates the interpolation error of the final table; the co-energy
 * error at the knots is reported as well. Error of the network model itself (uniform flux per
 * member, no hysteresis, no eddy currents) is not included.
 */

import type { NonlinearCoil } from '../model/station.js';
import type { Warning } from '../model/result.js';
import { cubicInverse, cubicIntegral, cubicSlope, cubicValue, monotoneCubic } from './magnetic-circuit-spline.js';
import { yokeInductanceLimits, yokeOperatingPoint, type YokeOperatingPoint, type YokeSpec } from './yoke.js';

export interface YokeCoilOptions {
  /** Upper end of the table, A (> 0): at least the largest current the shot can reach (see yokeCurrentBound). */
  maxCurrent_A: number;
  /** Relative interpolation tolerance at interval midpoints (default 1e-7). */
  relTol?: number;
  /** Cap on the number of knots (default 4000). */
  maxKnots?: number;
  /** Knots of the starting uniform grid, endpoints included (default 17). */
  initialKnots?: number;
}

/** What the table achieved. */
export interface YokeCoilTable {
  knots: number;
  /** Table top, A. */
  maxCurrent_A: number;
  /** Largest relative difference between the interpolants and direct solves at the interval midpoints (λ and H_part). */
  maxRelError: number;
  /** Largest relative difference between the co-energy integral and the network's co-energy at the knots. */
  coEnergyMaxRelError: number;
  /** Network solves made while building. */
  solves: number;
  /** false when some network solve did not converge or the knot cap stopped refinement short of relTol. */
  ok: boolean;
  /** Wall-clock build time, s (informative). */
  buildTime_s: number;
}

/** A yoke fixture's nonlinear coil, with a few extras beyond the engine's contract. */
export interface YokeCoil extends NonlinearCoil {
  /** dλ/di at i = 0, H (the value for Coil.inductance_H). */
  smallCurrentInductance_H: number;
  /** Incremental inductance with every steel saturated, H (the lower bound of dλ/di). */
  saturatedInductance_H: number;
  /** dH_part/di at i = 0, (A/m)/A (the value for the part probe's coil_ApmPerA). */
  smallCurrentFieldPerAmpere_ApmPerA: number;
  /** The current for a flux linkage: the inverse of fluxLinkage_Wb, A. */
  current_A(fluxLinkage_Wb: number): number;
  table: YokeCoilTable;
}

interface Sample {
  i: number;
  lam: number;
  dLam: number;
  h: number;
  dH: number;
  coEnergy: number;
  op: YokeOperatingPoint;
}

/**
 * Upper bound on the coil current a bank of capacitance C charged to V0 can drive through the
 * yoke coil: V0·√(C/L_sat) (energy conservation with dλ/di ≥ L_sat; see yokeInductanceLimits).
 */
export function yokeCurrentBound(spec: YokeSpec, capacitance_F: number, voltage_V: number): number {
  const { saturated_H } = yokeInductanceLimits(spec);
  return Math.abs(voltage_V) * Math.sqrt(capacitance_F / saturated_H);
}

/** Tabulates the yoke and returns the engine's NonlinearCoil. Throws RangeError on a bad option. */
export function buildYokeCoil(spec: YokeSpec, options: YokeCoilOptions): YokeCoil {
  const t0 = performance.now();
  const iMax = options.maxCurrent_A;
  if (!(iMax > 0) || !Number.isFinite(iMax)) throw new RangeError(`buildYokeCoil: maxCurrent_A must be finite and > 0 (got ${iMax})`);
  const relTol = options.relTol ?? 1e-7;
  const maxKnots = options.maxKnots ?? 4000;
  const n0 = Math.max(2, options.initialKnots ?? 17);
  let solves = 0;
  let allConverged = true;
  const solve = (i: number, warm?: Sample): Sample => {
    const op = yokeOperatingPoint(spec, i, warm?.op);
    solves++;
    if (!op.converged) allConverged = false;
    return { i, lam: op.fluxLinkage_Wb, dLam: op.incrementalInductance_H, h: op.partField_Apm, dH: op.partFieldPerAmpere_ApmPerA, coEnergy: op.coEnergy_J, op };
  };
  const knots: Sample[] = [];
  let prev: Sample | undefined;
  for (let k = 0; k < n0; k++) {
    prev = solve((iMax * k) / (n0 - 1), prev);
    knots.push(prev);
  }
  const lamScale = Math.abs(knots[knots.length - 1].lam);
  const hScale = Math.abs(knots[knots.length - 1].h);
  const hermiteMid = (a: number, b: number, da: number, db: number, w: number) => 0.5 * (a + b) + (w * (da - db)) / 8;
  const relErr = (pred: number, exact: number, scale: number) => Math.abs(pred - exact) / Math.max(Math.abs(exact), 1e-12 * scale, Number.MIN_VALUE);

  // Adaptive refinement: split intervals whose midpoint prediction misses.
  const accepted: { a: Sample; b: Sample; mid: Sample }[] = [];
  const stack: [Sample, Sample][] = [];
  for (let k = knots.length - 2; k >= 0; k--) stack.push([knots[k], knots[k + 1]]);
  let knotCount = knots.length;
  let capped = false;
  while (stack.length) {
    const [a, b] = stack.pop()!;
    const w = b.i - a.i;
    const mid = solve(a.i + 0.5 * w, a);
    const eLam = relErr(hermiteMid(a.lam, b.lam, a.dLam, b.dLam, w), mid.lam, lamScale);
    const eH = relErr(hermiteMid(a.h, b.h, a.dH, b.dH, w), mid.h, hScale);
    if ((eLam > relTol || eH > relTol) && w > 1e-9 * iMax) {
      if (knotCount < maxKnots) {
        knotCount++;
        stack.push([mid, b], [a, mid]);
        continue;
      }
      capped = true;
    }
    accepted.push({ a, b, mid });
  }
  accepted.sort((p, q) => p.a.i - q.a.i);
  const all: Sample[] = [accepted[0].a, ...accepted.map((x) => x.b)];
  const xs = all.map((s) => s.i);
  const lamCurve = monotoneCubic(xs, all.map((s) => s.lam), { slopes: all.map((s) => s.dLam) });
  const hCurve = monotoneCubic(xs, all.map((s) => s.h), { slopes: all.map((s) => s.dH) });

  // Final error estimates on the interpolants as built (limiter included).
  let maxRelError = 0;
  for (const { mid } of accepted) {
    maxRelError = Math.max(maxRelError, relErr(cubicValue(lamCurve, mid.i), mid.lam, lamScale), relErr(cubicValue(hCurve, mid.i), mid.h, hScale));
  }
  const wScale = Math.abs(all[all.length - 1].coEnergy);
  let coEnergyMaxRelError = 0;
  for (const s of all) coEnergyMaxRelError = Math.max(coEnergyMaxRelError, relErr(cubicIntegral(lamCurve, s.i), s.coEnergy, wScale));

  const limits = yokeInductanceLimits(spec);
  const odd = (f: (v: number) => number) => (i: number) => (i < 0 ? -f(-i) : f(i));
  const even = (f: (v: number) => number) => (i: number) => f(Math.abs(i));
  return {
    fluxLinkage_Wb: odd((i) => cubicValue(lamCurve, i)),
    incrementalInductance_H: even((i) => cubicSlope(lamCurve, i)),
    fieldAtPart_Apm: odd((i) => cubicValue(hCurve, i)),
    coEnergy_J: even((i) => cubicIntegral(lamCurve, i)),
    current_A: odd((lam) => cubicInverse(lamCurve, lam)),
    smallCurrentInductance_H: limits.smallCurrent_H,
    saturatedInductance_H: limits.saturated_H,
    smallCurrentFieldPerAmpere_ApmPerA: limits.partFieldPerAmpereSmall_ApmPerA,
    table: {
      knots: all.length,
      maxCurrent_A: iMax,
      maxRelError,
      coEnergyMaxRelError,
      solves,
      ok: allConverged && !capped && maxRelError <= 10 * relTol,
      buildTime_s: (performance.now() - t0) / 1000,
    },
  };
}

/**
 * Warnings about a yoke coil's table for a finished shot (stable codes of our own):
 * `yoke.table-tolerance` when the table missed its tolerance (a network solve did not converge,
 * or the knot cap stopped refinement), `yoke.table-range` when the shot's peak current went
 * beyond the table (λ(i) was extrapolated with the end slope there). Empty for other coils.
 */
export function yokeCoilWarnings(coil: NonlinearCoil | undefined, peakCurrent_A: number): Warning[] {
  const table = (coil as Partial<YokeCoil> | undefined)?.table;
  if (!table) return [];
  const out: Warning[] = [];
  if (!table.ok) {
    out.push({
      code: 'yoke.table-tolerance',
      message: `The yoke's flux-linkage table reached a relative error of ${table.maxRelError.toExponential(1)} only (a magnetic-circuit solve did not converge or the knot limit was hit); results carry that error.`,
      severity: 'warning',
    });
  }
  if (Math.abs(peakCurrent_A) > table.maxCurrent_A) {
    out.push({
      code: 'yoke.table-range',
      message: `The peak current ${Math.abs(peakCurrent_A).toPrecision(4)} A went beyond the yoke table (${table.maxCurrent_A.toPrecision(4)} A); above it λ(i) continues with its end slope.`,
      severity: 'warning',
    });
  }
  return out;
}
