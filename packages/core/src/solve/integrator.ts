/**
 * The common interface of the engine's integrators (explicit extrapolation, stiff), so that the
 * phase loop in shot.ts does not care which one runs.
 *
 * An integrator advances y' = f(t, y) from t0 toward tEnd with error control and, after each
 * accepted step, calls the observer with a `StepView`: the step's ends, the state and its
 * derivative at the right end, and a dense-output interpolant valid on [t0, t1]. The observer
 * returns false to stop the integration at that step (an event was found inside it).
 *
 * Replaying a step: calling `integrate` from a logged step's start state with `initialStep` set to
 * the logged step length reproduces that step's dense output (exactly for our own integrators,
 * to the tolerance for the odex wrapper); the engine uses this to sample the waveform and to
 * locate level crossings after the shot, without keeping every step's interpolant in memory.
 */

import type { Rhs } from '../circuit/circuit-rhs.js';
export type { Rhs };

export interface StepView {
  t0: number;
  t1: number;
  /** State at t1 (read only; valid during the observer call). */
  y1: Float64Array;
  /** f(t1, y1) (read only; valid during the observer call). */
  dy1: Float64Array;
  /**
   * Dense output: the interpolated state at t ∈ [t0, t1] written into out (length n). Components
   * from `denseCount` on are interpolated linearly between the step ends.
   */
  dense(t: number, out: Float64Array): void;
  /** Dense output of one component i < denseCount. */
  denseComponent(i: number, t: number): number;
}

export type StepObserver = (step: StepView) => boolean;

export interface IntegrateOptions {
  relTol: number;
  /** Absolute tolerance per component (length n). */
  absTol: Float64Array;
  /** Step limit for this call. */
  maxSteps: number;
  /** First trial step, s (optional). */
  initialStep?: number;
  /** Largest step, s (optional). */
  maxStep?: number;
  /**
   * Only the first denseCount components need accurate dense output (and enter the dense-output
   * error control); the rest are integrals nothing else depends on. Default: all.
   */
  denseCount?: number;
  /**
   * Components (< denseCount) whose dense output is built at every step and enters the
   * dense-output error control; the others are built only when read. Default: all.
   */
  denseEager?: number[];
}

export type IntegrateOutcome = 'done' | 'stopped' | 'step-limit' | 'step-too-small';

export interface IntegrateResult {
  outcome: IntegrateOutcome;
  /** Accepted steps. */
  steps: number;
  rejected: number;
  evaluations: number;
}

export interface Integrator {
  /** Name reported in SolverStats.method. */
  readonly name: string;
  integrate(
    rhs: Rhs,
    t0: number,
    y0: Float64Array,
    tEnd: number,
    observer: StepObserver,
    options: IntegrateOptions,
  ): IntegrateResult;
}
