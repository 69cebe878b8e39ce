/**
 * The odex package (odex 2.0.4: E. Hairer and G. Wanner's ODEX, Gragg–Bulirsch–Stoer
 * extrapolation with dense output, ported to JavaScript by C. Smith) behind our `Integrator`
 * interface. Reference: E. Hairer, S. P. Nørsett, G. Wanner, *Solving Ordinary Differential
 * Equations I*, 2nd ed., Springer 1993, §II.9 (extrapolation) and §II.9 dense output.
 *
 * This wrapper is the reference path (`solver.method: 'odex'`): it is exact to the package's
 * algorithm, but the package allocates on every derivative call, so the engine's fast path uses
 * our allocation-free extrapolation integrator (gbs-integrator.ts) of the same method.
 */
import { createRequire } from 'node:module';

// Loaded through require so that TypeScript does not type-check the package's own .ts source
// (odex ships odex.ts beside odex.js and it does not pass `strict`).
interface OdexSolver {
  denseOutput: boolean;
  relativeTolerance: number | number[];
  absoluteTolerance: number | number[];
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x: number,
    y0: number[],
    xEnd: number,
    solOut: (nr: number, xOld: number, x: number, y: number[], dense?: (c: number, x: number) => number) => boolean | void,
  ): { outcome: number; nAccept: number; nReject: number; nEval: number };
}
const { Solver } = createRequire(import.meta.url)('odex') as { Solver: new (n: number) => OdexSolver };
import type { IntegrateOptions, IntegrateResult, Integrator, Rhs, StepObserver, StepView } from './integrator.js';

export class OdexIntegrator implements Integrator {
  readonly name = 'odex';

  integrate(
    rhs: Rhs,
    t0: number,
    y0: Float64Array,
    tEnd: number,
    observer: StepObserver,
    options: IntegrateOptions,
  ): IntegrateResult {
    const n = y0.length;
    const solver = new Solver(n);
    solver.denseOutput = true;
    solver.relativeTolerance = options.relTol;
    solver.absoluteTolerance = Array.from(options.absTol);
    solver.maxSteps = options.maxSteps;
    if (options.initialStep !== undefined) solver.initialStepSize = options.initialStep;
    if (options.maxStep !== undefined) solver.maxStepSize = options.maxStep;
    const yBuf = new Float64Array(n);
    const dyBuf = new Float64Array(n);
    const out: number[] = new Array<number>(n).fill(0);
    const f = (t: number, y: number[]): number[] => {
      for (let i = 0; i < n; i++) yBuf[i] = y[i];
      rhs(t, yBuf, dyBuf);
      for (let i = 0; i < n; i++) out[i] = dyBuf[i];
      return out;
    };
    const y1 = new Float64Array(n);
    const dy1 = new Float64Array(n);
    let stopped = false;
    let denseFn: ((c: number, x: number) => number) | undefined;
    const view: StepView = {
      t0,
      t1: t0,
      y1,
      dy1,
      dense(t: number, o: Float64Array) {
        if (!denseFn) throw new Error('no dense output');
        for (let i = 0; i < n; i++) o[i] = denseFn(i, t);
      },
      denseComponent(i: number, t: number) {
        if (!denseFn) throw new Error('no dense output');
        return denseFn(i, t);
      },
    };
    const result = solver.solve(f, t0, Array.from(y0), tEnd, (nr, xOld, x, y, dense) => {
      if (nr === 1 || !dense) return true;
      denseFn = dense;
      view.t0 = xOld;
      view.t1 = x;
      for (let i = 0; i < n; i++) y1[i] = y[i];
      rhs(x, y1, dy1);
      if (!observer(view)) {
        stopped = true;
        return false;
      }
      return true;
    });
    // odex 2.0.4 Outcome enum: 0 Converged, 1 MaxStepsExceeded, 2 EarlyReturn
    const outcome = stopped ? 'stopped' : result.outcome === 1 ? 'step-limit' : 'done';
    return { outcome, steps: result.nAccept, rejected: result.nReject, evaluations: result.nEval };
  }
}
