/**
 * Which integrator runs a shot (Station.solver.method):
 *   'odex'  Gragg–Bulirsch–Stoer extrapolation (ODEX algorithm, gbs-integrator.ts): explicit,
 *           high order, the fast path for a station whose loops (if any) are not stiff;
 *   'stiff' linearly implicit Euler extrapolation (stiff-integrator.ts) for stiff loop networks;
 *   'auto'  'stiff' when the fastest decay rate of the loop network, λ_max of L_loops⁻¹·R_loops
 *           (power iteration), exceeds 30/t*, t* = √(L·C) the pulse time scale: an explicit method
 *           would then be held to steps of a few 1/λ_max for the whole shot.
 */
import type { CircuitRhs } from '../circuit/circuit-rhs.js';
import { invert } from '../circuit/small-lu.js';
import { GbsIntegrator } from './gbs-integrator.js';
import type { Integrator } from './integrator.js';
import type { Scales } from './scales.js';
import { StiffIntegrator } from './stiff-integrator.js';

/** λ_max·t* above which 'auto' picks the stiff integrator. */
export const STIFFNESS_RATIO = 30;

// Integrators keep their work arrays between shots (sized on first use); a small free list
// makes that safe even if a shot were started from inside another (e.g. from a callback).
const freeGbs: GbsIntegrator[] = [];
const freeStiff: StiffIntegrator[] = [];

/** Largest decay rate of the shorted-loop network, 1/s (0 without loops). */
export function loopDecayRate(rhs: CircuitRhs): number {
  const net = rhs.net;
  const n = net.loops.length;
  if (n === 0) return 0;
  const inv = new Float64Array(n * n);
  if (!invert(net.loopL_H, n, inv, new Float64Array(n * n), new Int32Array(n), new Float64Array(n))) return Infinity;
  const r = Float64Array.from(net.loops, (l) => l.resistance20_Ohm * Math.max(1, 1 + l.tempCoeff_perK * (l.initialTemperature_C - 20)));
  let x = new Float64Array(n).fill(1);
  let y = new Float64Array(n);
  let lambda = 0;
  for (let it = 0; it < 60; it++) {
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += inv[i * n + j] * r[j] * x[j];
      y[i] = s;
    }
    let norm = 0;
    for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(y[i]));
    if (!(norm > 0)) return 0;
    for (let i = 0; i < n; i++) y[i] /= norm;
    if (Math.abs(norm - lambda) <= 1e-6 * norm) {
      lambda = norm;
      break;
    }
    lambda = norm;
    const swap = x;
    x = y;
    y = swap;
  }
  return lambda;
}

/** An integrator for one shot; give it back with releaseIntegrator when the shot is done. */
export function chooseIntegrator(method: 'auto' | 'odex' | 'stiff', rhs: CircuitRhs, scales: Scales): Integrator {
  let stiff = method === 'stiff';
  if (method === 'auto') stiff = loopDecayRate(rhs) * scales.time_s > STIFFNESS_RATIO;
  if (stiff) return freeStiff.pop() ?? new StiffIntegrator();
  return freeGbs.pop() ?? new GbsIntegrator();
}

export function releaseIntegrator(integ: Integrator): void {
  if (integ instanceof GbsIntegrator && freeGbs.length < 4) freeGbs.push(integ);
  if (integ instanceof StiffIntegrator && freeStiff.length < 4) freeStiff.push(integ);
}
