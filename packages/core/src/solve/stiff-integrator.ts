/**
 * Linearly implicit Euler extrapolation for stiff systems, with step-size and order control
 * and dense output (the method of Deuflhard's EULSIM and Hairer & Wanner's SEULEX: E. Hairer,
 * G. Wanner, *Solving Ordinary Differential Equations II*, 2nd ed., Springer 1996, §IV.9).
 *
 * Method. For a step H and the step numbers n_j = 2j (j = 1, 2, …), line j takes n_j substeps
 * of h = H/n_j of the linearly implicit Euler method
 *
 *     (I − h·J)·Δ_i = h·f(y_i),   y_{i+1} = y_i + Δ_i,
 *
 * with J ≈ ∂f/∂y (finite differences, refreshed every few steps and after rejections). Only the `implicit` components
 * (the circuit's voltage and currents) take part in J; the others (temperature rises, loss
 * integrals: slow and with no stiff feedback) take an explicit Euler step in the same substeps.
 * The method is L-stable for the implicit part, and its error has an expansion in powers of h,
 * so the line results T_j1 are extrapolated by the Aitken–Neville scheme in h:
 *
 *     T_{j,k+1} = T_{j,k} + (T_{j,k} − T_{j−1,k})/(n_j/n_{j−k} − 1),
 *
 * T_jj having order j. The error estimate is ‖T_jj − T_{j,j−1}‖ (scaled by absTol + relTol·|y|),
 * the step size H·(0.65/err)^(1/j)/0.94 as in ODEX/SEULEX, and the order is chosen by the work per
 * unit step (one function evaluation per substep plus one LU per line and the Jacobian).
 *
 * Dense output. The state after n_j/2 substeps of every line is the same kind of approximation
 * at the step midpoint, so it is extrapolated the same way. The slope at the step end is Δ/h of
 * each line's last substep, extrapolated alike; the slope at the start is the previous step's end
 * slope (f itself on the first step). Evaluating f at extrapolated states instead would multiply
 * their error by the stiffness ∥J∥, whereas the substep quotients (I − hJ)⁻¹·f stay bounded; the
 * first substep's quotient is no estimate of y′ for a stiff component (it tends to 0 as hλ grows),
 * hence the previous end slope. The dense output is the quartic matching value and slope at θ = 0
 * and 1 and the value at ½ (error O(H⁵)).
 * Components from `denseCount` on are interpolated linearly, as in gbs-integrator.ts.
 *
 * Why: eddy-current shells of a conductive part have time constants of microseconds against a
 * pulse of milliseconds; an explicit method must then take microsecond steps for the whole shot.
 */
import { luDiagRecip, luFactor, luSolveRecip, invert } from '../circuit/small-lu.js';
import type { IntegrateOptions, IntegrateResult, Integrator, Rhs, StepObserver, StepView } from './integrator.js';

const KM = 8;
const U_ROUND = 2.3e-16;
const FAC1 = 0.02;
const FAC2 = 4.0;
const FAC3 = 0.8;
const FAC4 = 0.9;
const SAFE1 = 0.65;
const SAFE2 = 0.94;
/** Accepted steps between Jacobian updates. */
const JAC_AGE = 10;

/** Step numbers n_j = 2j (1-based). */
const NJ = Float64Array.from({ length: KM + 2 }, (_, j) => 2 * j);
/** Reciprocal Aitken–Neville factors 1/(n_j/n_{l−1} − 1) (extrapolation in h). */
const EXTRAP_INV = new Float64Array((KM + 2) * (KM + 2));
for (let j = 2; j <= KM + 1; j++) for (let l = 2; l <= j; l++) EXTRAP_INV[j * (KM + 2) + l] = 1 / (NJ[j] / NJ[l - 1] - 1);

/**
 * Quartic Hermite basis on [0, 1]: HERMITE[r·5 + c] is the coefficient of θ^r of the basis
 * polynomial for condition c: value at 0, slope at 0, value at ½, value at 1, slope at 1.
 */
const HERMITE = (() => {
  const a = new Float64Array(25);
  // row = condition, column = power r
  for (let r = 0; r < 5; r++) {
    a[0 * 5 + r] = r === 0 ? 1 : 0;
    a[1 * 5 + r] = r === 1 ? 1 : 0;
    a[2 * 5 + r] = 0.5 ** r;
    a[3 * 5 + r] = 1;
    a[4 * 5 + r] = r;
  }
  const inv = new Float64Array(25);
  invert(a, 5, inv, new Float64Array(25), new Int32Array(5), new Float64Array(5));
  return inv; // inv[r·5 + c]: coefficient of θ^r for condition c
})();

export interface StiffOptions extends IntegrateOptions {
  /** Components solved implicitly (they make up J); default: all of the first denseCount. */
  implicit?: number[];
}

/**
 * The running integration's numbers live in instance fields and its parts are methods (no
 * closures made per `integrate` call, no boxed numbers written per substep); the dense-output
 * view is made once per instance.
 */
export class StiffIntegrator implements Integrator {
  readonly name = 'stiff';
  private n = -1;
  private m = -1;
  private y!: Float64Array;
  private f0!: Float64Array;
  private yk!: Float64Array;
  private fk!: Float64Array;
  private ypert!: Float64Array;
  private fpert!: Float64Array;
  private scal!: Float64Array;
  private t!: Float64Array[];
  private mid!: Float64Array[];
  private d1!: Float64Array[];
  private jac!: Float64Array;
  private lu!: Float64Array;
  private piv!: Int32Array;
  /** 1/U_kk of the current line's factorization. */
  private rdiag!: Float64Array;
  private rhsv!: Float64Array;
  private poly!: Float64Array;
  /** Slope at the start of the current step (f at the first, then the previous end slope). */
  private s0!: Float64Array;
  private yLeft!: Float64Array;
  private f1!: Float64Array;
  private ym!: Float64Array;
  private readonly hh = new Float64Array(KM + 2);
  private readonly w = new Float64Array(KM + 2);
  private readonly aw = new Float64Array(KM + 2);
  private implicitCache: number[] = [];

  // ---- state of the running integration (valid during integrate and its observer calls) ----
  private f: Rhs = () => {};
  private imp: number[] = [];
  /** The explicit components (all not in imp). */
  private expl: number[] = [];
  private aTol: Float64Array = new Float64Array(0);
  private rTol = 0;
  private nd = 0;
  private x = 0;
  private h = 0;
  private err = 0;
  private hMax = 0;
  private nEval = 0;
  // dense output of the last accepted step
  private dXOld = 0;
  private dH = 1;
  private readonly view: StepView;

  constructor() {
    const denseComponent = (i: number, xx: number): number => this.denseComponent(i, xx);
    const dense = (xx: number, out: Float64Array): void => {
      for (let i = 0; i < this.n; i++) out[i] = this.denseComponent(i, xx);
    };
    this.view = { t0: 0, t1: 0, y1: new Float64Array(0), dy1: new Float64Array(0), dense, denseComponent };
  }

  private alloc(n: number, m: number): void {
    if (n === this.n && m === this.m) return;
    this.n = n;
    this.m = m;
    const mk = () => new Float64Array(n);
    this.y = mk();
    this.f0 = mk();
    this.yk = mk();
    this.fk = mk();
    this.ypert = mk();
    this.fpert = mk();
    this.scal = mk();
    this.yLeft = mk();
    this.f1 = mk();
    this.ym = mk();
    this.t = Array.from({ length: KM + 2 }, mk);
    this.mid = Array.from({ length: KM + 2 }, mk);
    this.d1 = Array.from({ length: KM + 2 }, mk);
    this.jac = new Float64Array(m * m);
    this.lu = new Float64Array(m * m);
    this.piv = new Int32Array(m);
    this.rdiag = new Float64Array(m);
    this.rhsv = new Float64Array(m);
    this.poly = new Float64Array(5 * n);
    this.s0 = mk();
    this.view.y1 = this.y;
    this.view.dy1 = this.f1;
  }

  private denseComponent(i: number, xx: number): number {
    const th = (xx - this.dXOld) / this.dH;
    if (i >= this.nd) return this.yLeft[i] + th * (this.y[i] - this.yLeft[i]);
    const poly = this.poly;
    const o = 5 * i;
    return poly[o] + th * (poly[o + 1] + th * (poly[o + 2] + th * (poly[o + 3] + th * poly[o + 4])));
  }

  /** J ≈ ∂f/∂y over the implicit components, by forward differences at (x, y) with f0 = f(x, y). */
  private jacobian(): void {
    const { n, m, imp, y, ypert, fpert, f0, jac, aTol } = this;
    const rTol = this.rTol;
    for (let i = 0; i < n; i++) ypert[i] = y[i];
    for (let c = 0; c < m; c++) {
      const col = imp[c];
      const yc = y[col];
      const d = Math.sqrt(U_ROUND) * Math.max(Math.abs(yc), aTol[col] / Math.max(rTol, 1e-14), 1e-30);
      ypert[col] = yc + d;
      this.f(this.x, ypert, fpert);
      this.nEval++;
      ypert[col] = yc;
      for (let r = 0; r < m; r++) jac[r * m + c] = (fpert[imp[r]] - f0[imp[r]]) / d;
    }
  }

  /** Line j of the extrapolation table; false if the substeps failed (singular or non-finite). */
  private line(j: number): boolean {
    const { n, m, imp, expl, y, yk, fk, f0, jac, lu, piv, rdiag, rhsv, d1, mid, t } = this;
    const x = this.x;
    const hj = this.h / NJ[j];
    for (let r = 0; r < m; r++) {
      for (let c = 0; c < m; c++) lu[r * m + c] = (r === c ? 1 : 0) - hj * jac[r * m + c];
    }
    if (!luFactor(lu, m, piv)) return false;
    luDiagRecip(lu, m, rdiag);
    for (let i = 0; i < n; i++) yk[i] = y[i];
    const nj = NJ[j];
    const half = nj / 2;
    const dq = d1[j];
    for (let s = 0; s < nj; s++) {
      const fs = s === 0 ? f0 : fk;
      if (s > 0) {
        this.f(x + hj * s, yk, fk);
        this.nEval++;
      }
      for (let r = 0; r < m; r++) rhsv[r] = hj * fs[imp[r]];
      luSolveRecip(lu, m, piv, rdiag, rhsv);
      // the substep's increment: explicit Euler, the implicit components from the solve
      for (let e = 0; e < expl.length; e++) yk[expl[e]] += hj * fs[expl[e]];
      for (let r = 0; r < m; r++) yk[imp[r]] += rhsv[r];
      if (s + 1 === half) mid[j].set(yk);
      if (s + 1 === nj) {
        // the last substep's Δ/h is the line's estimate of the end slope
        for (let i = 0; i < n; i++) dq[i] = fs[i];
        for (let r = 0; r < m; r++) dq[imp[r]] = rhsv[r] / hj;
      }
    }
    const tj = t[j];
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(yk[i])) return false;
      tj[i] = yk[i];
    }
    return true;
  }

  /** Extrapolate line j into the table and estimate the error (j ≥ 2). */
  private extrapolate(j: number): void {
    const { n, t, scal, y, aTol, hh, w, aw } = this;
    const rTol = this.rTol;
    for (let l = j; l > 1; --l) {
      const rfac = EXTRAP_INV[j * (KM + 2) + l];
      const tl = t[l];
      const tl1 = t[l - 1];
      for (let i = 0; i < n; i++) tl1[i] = tl[i] + (tl[i] - tl1[i]) * rfac;
    }
    let err = 0;
    const t1 = t[1];
    const t2 = t[2];
    for (let i = 0; i < n; i++) {
      scal[i] = aTol[i] + rTol * Math.max(Math.abs(y[i]), Math.abs(t1[i]));
      const e = (t1[i] - t2[i]) / scal[i];
      err += e * e;
    }
    err = Math.sqrt(err / n);
    this.err = err;
    const exp0 = 1 / j;
    const facMin = FAC1 ** exp0;
    let fac = Math.min(FAC2 / facMin, Math.max(facMin, (err / SAFE1) ** exp0 / SAFE2));
    fac = 1 / fac;
    hh[j] = Math.min(Math.abs(this.h) * fac, this.hMax);
    w[j] = aw[j] / hh[j];
  }

  integrate(
    f: Rhs,
    x0: number,
    y0: Float64Array,
    xEnd: number,
    observer: StepObserver,
    options: StiffOptions,
  ): IntegrateResult {
    const n = y0.length;
    const nd = Math.min(n, Math.max(1, options.denseCount ?? n));
    let imp = options.implicit;
    if (!imp) {
      if (this.implicitCache.length !== nd) this.implicitCache = Array.from({ length: nd }, (_, i) => i);
      imp = this.implicitCache;
    }
    const m = imp.length;
    this.alloc(n, m);
    this.f = f;
    if (this.imp !== imp || this.expl.length + imp.length !== n) {
      const isImp = new Uint8Array(n);
      for (const i of imp) isImp[i] = 1;
      this.expl = [];
      for (let i = 0; i < n; i++) if (!isImp[i]) this.expl.push(i);
    }
    this.imp = imp;
    this.nd = nd;
    // components whose dense output enters the dense-output error control (default: all dense)
    const eager = options.denseEager ?? (this.implicitCache.length === nd ? this.implicitCache : Array.from({ length: nd }, (_, i) => i));
    const { y, f0, scal, t, mid, d1, poly, yLeft, f1, ym, hh, w, aw, s0, view } = this;
    const aTol = options.absTol;
    const rTol = options.relTol;
    this.aTol = aTol;
    this.rTol = rTol;
    y.set(y0);
    this.x = x0;
    this.nEval = 0;
    let nAccept = 0;
    let nReject = 0;
    let nStep = 0;
    const hMax = Math.abs(options.maxStep ?? xEnd - x0);
    this.hMax = hMax;
    const posneg = xEnd - x0 >= 0 ? 1 : -1;
    // work per line in function evaluations: Jacobian (m), then per line n_j substeps + one LU
    const luCost = Math.max(0.5, (m * m * m) / (30 * n));
    aw[1] = m + NJ[1] + luCost;
    for (let j = 2; j <= KM + 1; j++) aw[j] = aw[j - 1] + NJ[j] + luCost;
    let k = Math.max(2, Math.min(KM - 1, Math.floor(-Math.log10(rTol + 1e-40) * 0.6 + 1.5)));
    if (options.initialStep !== undefined && options.initialStep > 0) {
      this.h = posneg * Math.min(options.initialStep, hMax, Math.abs(xEnd - x0));
    } else {
      this.h = posneg * Math.min(1e-4, hMax, Math.abs(xEnd - x0) / 2);
    }
    this.err = 0;
    let errOld = 1e10;
    let reject = false;
    let kc = 0;
    let fresh = true; // f0 and J valid for the current y?
    let hoptde = Infinity; // step limit from the dense-output error
    let jacAge = 0;
    this.dXOld = x0;
    this.dH = 1;
    view.t0 = x0;
    view.t1 = x0;

    const result = (outcome: IntegrateResult['outcome']): IntegrateResult => ({
      outcome,
      steps: nAccept,
      rejected: nReject,
      evaluations: this.nEval,
    });

    for (;;) {
      const x = this.x;
      if (0.1 * Math.abs(xEnd - x) <= Math.abs(x) * U_ROUND) return result('done');
      let h = posneg * Math.min(Math.abs(this.h), Math.abs(xEnd - x), hMax, hoptde);
      if (!(Math.abs(h) > 16 * U_ROUND * Math.max(Math.abs(x), Math.abs(xEnd - x0)))) return result('step-too-small');
      if ((x + 1.01 * h - xEnd) * posneg > 0) h = xEnd - x;
      this.h = h;
      if (fresh) {
        f(x, y, f0);
        this.nEval++;
        this.jacobian();
        for (let i = 0; i < n; i++) s0[i] = f0[i];
        fresh = false;
      }
      nStep++;
      if (nStep >= options.maxSteps) return result('step-limit');
      // lines 1..k−1, then k, then k+1 as in ODEX's convergence monitor
      let accepted = false;
      let failed = false;
      errOld = 1e10;
      for (let j = 1; j <= Math.min(k + 1, KM); j++) {
        if (!this.line(j)) {
          failed = true;
          break;
        }
        kc = j;
        if (j === 1) continue;
        this.extrapolate(j);
        const err = this.err;
        if (!(err * U_ROUND < 1) || (j > 2 && err >= errOld)) {
          failed = true;
          break;
        }
        errOld = Math.max(4 * err, 1);
        if (j >= k - 1 && err <= 1) {
          accepted = true;
          break;
        }
        if (j === k && err > (NJ[k + 1] / 2) ** 2) break; // no hope in line k + 1
      }
      if (failed) {
        this.h = h * 0.5;
        nReject++;
        reject = true;
        continue;
      }
      if (!accepted) {
        // reject with the best proposal
        k = Math.max(2, Math.min(k, kc, KM - 1));
        if (k > 2 && w[k - 1] < w[k] * FAC3) k -= 1;
        this.h = posneg * hh[k];
        nReject++;
        reject = true;
        continue;
      }
      // ---- dense output data: midpoint state and end slope, extrapolated over lines 1..kc ----
      for (let q = 0; q < 2; q++) {
        const tab = q === 0 ? mid : d1;
        for (let j = 2; j <= kc; j++) {
          for (let l = j; l > 1; --l) {
            const rfac = EXTRAP_INV[j * (KM + 2) + l];
            const ml = tab[l];
            const ml1 = tab[l - 1];
            for (let i = 0; i < nd; i++) ml1[i] = ml[i] + (ml[i] - ml1[i]) * rfac;
          }
        }
      }
      // dense-output error control (as ODEX's): the cubic Hermite's miss at the midpoint estimates
      // the interpolation error from above; above 10 tolerances the step is redone shorter. Only the
      // `denseEager` components count (the engine: coil and loop currents)
      let errint = 0;
      for (let q = 0; q < eager.length; q++) {
        const i = eager[q];
        const cubicMid = 0.5 * (y[i] + t[1][i]) + (h * (s0[i] - d1[1][i])) / 8;
        const e = (mid[1][i] - cubicMid) / scal[i];
        errint += e * e;
      }
      errint = Math.sqrt(errint / Math.max(1, eager.length));
      hoptde = errint > 0 ? Math.abs(h) * Math.min(4, 0.9 * (10 / errint) ** 0.25) : Infinity;
      if (errint > 10) {
        this.h = posneg * hoptde;
        nReject++;
        reject = true;
        continue;
      }
      // ---- accept: dense output, observer, next order and step ----
      const xOld = x;
      const xNew = x + h;
      this.x = xNew;
      for (let i = 0; i < n; i++) yLeft[i] = y[i];
      for (let i = 0; i < n; i++) ym[i] = mid[1][i];
      for (let i = 0; i < n; i++) y[i] = t[1][i];
      f(xNew, y, f1);
      this.nEval++;
      for (let i = 0; i < nd; i++) {
        const c0 = yLeft[i];
        const c1 = h * s0[i];
        const c2 = ym[i];
        const c3 = y[i];
        const c4 = h * d1[1][i];
        for (let r = 0; r < 5; r++) {
          const b = r * 5;
          poly[5 * i + r] = HERMITE[b] * c0 + HERMITE[b + 1] * c1 + HERMITE[b + 2] * c2 + HERMITE[b + 3] * c3 + HERMITE[b + 4] * c4;
        }
      }
      // the slope at the start of the next step: this step's extrapolated end slope
      for (let i = 0; i < nd; i++) s0[i] = d1[1][i];
      this.dXOld = xOld;
      this.dH = h;
      nAccept++;
      view.t0 = xOld;
      view.t1 = xNew;
      if (!observer(view)) return result('stopped');
      for (let i = 0; i < n; i++) f0[i] = f1[i];
      // J is kept between steps (any fixed J gives the same h-expansion, only stability needs
      // J close to ∂f/∂y): refreshed after rejections and every JAC_AGE accepted steps
      if (++jacAge >= JAC_AGE || reject) {
        this.jacobian();
        jacAge = 0;
      }
      // order and step size for the next step (ODEX/SEULEX rules)
      let kopt: number;
      if (kc === 2) {
        kopt = Math.min(3, KM - 1);
        if (reject) kopt = 2;
      } else if (kc <= k) {
        kopt = kc;
        if (w[kc - 1] < w[kc] * FAC3) kopt = kc - 1;
        if (w[kc] < w[kc - 1] * FAC4) kopt = Math.min(kc + 1, KM - 1);
      } else {
        kopt = kc - 1;
        if (kc > 3 && w[kc - 2] < w[kc - 1] * FAC3) kopt = kc - 2;
        if (w[kc] < w[kopt] * FAC4) kopt = Math.min(kc, KM - 1);
      }
      if (reject) {
        k = Math.min(kopt, kc);
        this.h = posneg * Math.min(Math.abs(h), Math.abs(hh[k]));
        reject = false;
      } else {
        let hNew: number;
        if (kopt <= kc) hNew = hh[kopt];
        else hNew = (hh[kc] * aw[kopt]) / aw[kc];
        k = kopt;
        this.h = posneg * Math.abs(hNew);
      }
    }
  }
}
