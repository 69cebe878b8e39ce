/** Design section `solver`: integration settings; every default comes from DEFAULT_SOLVER (model/station.ts). */
import type { z } from 'zod';
import { DEFAULT_SOLVER, type SolverSettings } from '../../model/station.js';
import { choice, count, num, qty, section } from '../quantity-schema.js';

export const SOLVER_METHODS = ['auto', 'odex', 'stiff'] as const satisfies readonly SolverSettings['method'][];

export const solverSection = section('Integration settings. May be omitted: every field has a default.', {
  relTol: num({ positive: true, max: 0.1, description: 'Relative tolerance of the integrator' }).default(DEFAULT_SOLVER.relTol),
  absTol: num({ positive: true, description: "Absolute tolerance, relative to each state's scale" }).default(DEFAULT_SOLVER.absTol),
  maxSteps: count({ min: 1, description: 'Step limit per phase' }).default(DEFAULT_SOLVER.maxSteps),
  tMax: qty('time', { positive: true, description: 'Hard stop of the simulated shot' }).default(DEFAULT_SOLVER.tMax_s),
  eventTol: qty('time', { positive: true, description: 'Event location tolerance' }).default(DEFAULT_SOLVER.eventTol_s),
  samples: count({ description: 'Waveform samples stored (0: figures only)' }).default(DEFAULT_SOLVER.samples),
  method: choice(SOLVER_METHODS, 'Integrator: auto picks by stiffness').default(DEFAULT_SOLVER.method),
}).prefault({});

export type SolverDesign = z.output<typeof solverSection>;

export function solverToStation(s: SolverDesign): SolverSettings {
  return {
    relTol: s.relTol,
    absTol: s.absTol,
    maxSteps: s.maxSteps,
    tMax_s: s.tMax,
    eventTol_s: s.eventTol,
    method: s.method,
    samples: s.samples,
  };
}
