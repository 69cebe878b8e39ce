/**
 * The tasks a what-if run sends to a worker thread (or runs in this thread), and the one
 * function that carries them out. All plain data, safe to pass between threads.
 *
 * - `points`: simulate and judge the design with values written at the given paths, for each point.
 * - `voltage`: the charge voltage at which the design (with values written at the given paths)
 *   just reaches a target field at the part (solveVoltage.ts).
 */
import type { Design } from '../design/schema.js';
import type { DesignPath } from './designPath.js';
import { evaluatePoint, type PointOutcome } from './evaluateDesign.js';
import { solveVoltageAt, type VoltageSolve, type VoltageSolveOptions } from './solveVoltage.js';

export interface PointsTask {
  kind: 'points';
  design: Design;
  paths: DesignPath[];
  points: { index: number; values: number[] }[];
}

export interface VoltageTask {
  kind: 'voltage';
  design: Design;
  paths: DesignPath[];
  values: number[];
  options: VoltageSolveOptions;
}

export type ExploreTask = PointsTask | VoltageTask;

export function runExploreTask(task: PointsTask): PointOutcome[];
export function runExploreTask(task: VoltageTask): VoltageSolve;
export function runExploreTask(task: ExploreTask): PointOutcome[] | VoltageSolve;
export function runExploreTask(task: ExploreTask): PointOutcome[] | VoltageSolve {
  if (task.kind === 'points') return task.points.map((p) => evaluatePoint(task.design, task.paths, p.values));
  return solveVoltageAt(task.design, task.paths, task.values, task.options);
}
