/**
 * Gragg–Bulirsch–Stoer extrapolation with step-size and order control and dense output:
 * the ODEX algorithm of E. Hairer and G. Wanner (E. Hairer, S. P. Nørsett, G. Wanner,
 * *Solving Ordinary Differential Equations I*, 2nd ed., Springer 1993, §II.9; dense output
 * after Hairer & Ostermann 1990, same section), written allocation-free for the engine's
 * many short integrations.
 *
 * Method: the explicit midpoint rule with n_j = 2, 6, 10, 14, … substeps (sequence 4j − 2,
 * which the dense output needs), Richardson extrapolation in h² (Aitken–Neville table), error
 * estimate from the last two table columns, step size and order from the work per unit step.
 * Dense output: Hermite interpolation of the step ends, corrected by extrapolated derivatives at
 * the midpoint (degree 2·k_c + 4 − 4 = 2·k_c), with the interpolation error estimate that rejects
 * steps whose dense output would be poor.
 *
 * This is a transcription of the structure of odex 2.0.4 (npm; C. Smith's JavaScript port of
 * ODEX.F; BSD 2-clause, notice below) onto preallocated Float64Arrays with zero-based state
 * indices: the package allocates on every derivative call, and the engine must run thousands of
 * shots per second. tests/reference cross-checks it against the package.
 *
 * odex-js: Copyright (c) 2016 Colin Smith. Redistribution and use in source and binary forms,
 * with or without modification, are permitted provided that the following conditions are met:
 * 1. Redistributions of source code must retain the above copyright notice, this list of
 * conditions and the following disclaimer. 2. Redistributions in binary form must reproduce the
 * above copyright notice, this list of conditions and the following disclaimer in the
 * documentation and/or other materials provided with the distribution. THIS SOFTWARE IS PROVIDED
 * BY THE COPYRIGHT HOLDERS AND CONTRIBUTORS "AS IS" AND ANY EXPRESS OR IMPLIED WARRANTIES,
 * INCLUDING, BUT NOT LIMITED TO, THE IMPLIED WARRANTIES OF MERCHANTABILITY AND FITNESS FOR A
 * PARTICULAR PURPOSE ARE DISCLAIMED. IN NO EVENT SHALL THE COPYRIGHT HOLDER OR CONTRIBUTORS BE
 * LIABLE FOR ANY DIRECT, INDIRECT, INCIDENTAL, SPECIAL, EXEMPLARY, OR CONSEQUENTIAL DAMAGES
 * (INCLUDING, BUT NOT LIMITED TO, PROCUREMENT OF SUBSTITUTE GOODS OR SERVICES; LOSS OF USE, DATA,
 * OR PROFITS; OR BUSINESS INTERRUPTION) HOWEVER CAUSED AND ON ANY THEORY OF LIABILITY, WHETHER IN
 * CONTRACT, STRICT LIABILITY, OR TORT (INCLUDING NEGLIGENCE OR OTHERWISE) ARISING IN ANY WAY OUT
 * OF THE USE OF THIS SOFTWARE, EVEN IF ADVISED OF THE POSSIBILITY OF SUCH DAMAGE.
 */
import type { IntegrateOptions, IntegrateResult, Integrator, Rhs, StepObserver, StepView } from './integrator.js';

const KM = 9; // maximal number of extrapolation columns
const U_ROUND = 2.3e-16;
const FAC1 = 0.02;
const FAC2 = 4.0;
const FAC3 = 0.8;
const FAC4 = 0.9;
const SAFE1 = 0.65;
const SAFE2 = 0.94;
const STEP_REDUCTION = 0.5;
const IPOLDEG = 4; // interpolation: µ = 2·kc − IPOLDEG + 1

/** Step numbers n_j = 4j − 2 (1-based j), the sequence that allows dense output. */
const NJ = new Float64Array(KM + 2);
for (let i = 1; i <= KM + 1; i++) NJ[i] = 4 * i - 2;
/** Work a_j = 1 + Σ n_i. */
const AW = new Float64Array(KM + 2);
AW[1] = 1 + NJ[1];
for (let i = 2; i <= KM + 1; i++) AW[i] = AW[i - 1] + NJ[i];
/** Pointers into the stored midpoint derivatives. */
const IPOINT = new Int32Array(KM + 2);
IPOINT[1] = 0;
for (let i = 1; i <= KM; i++) {
  let njAdd = 4 * i - 2;
  if (NJ[i] > njAdd) ++njAdd;
  IPOINT[i + 1] = IPOINT[i] + njAdd;
}
/** Error factors of the dense output. */
const ERRFAC = new Float64Array(2 * KM + 1);
for (let mu = 1; mu <= 2 * KM; mu++) {
  const errx = Math.sqrt(mu / (mu + 4)) * 0.5;
  let prod = (1 / (mu + 4)) ** 2;
  for (let j = 1; j <= mu; j++) prod *= errx / j;
  ERRFAC[mu] = prod;
}
const LF_SAFE = 2 * KM * KM + KM;
/** FAC1^(1/(2j − 1)), the smallest step reduction of line j. */
const FACMIN = Float64Array.from({ length: KM + 2 }, (_, j) => (j > 0 ? FAC1 ** (1 / (2 * j - 1)) : 1));
/** EXTRAP[j·(KM+2) + l] = (n_j/n_{l−1})² − 1, the Aitken–Neville factors. */
const EXTRAP = new Float64Array((KM + 2) * (KM + 2));
for (let j = 2; j <= KM + 1; j++) for (let l = 2; l <= j; l++) EXTRAP[j * (KM + 2) + l] = (NJ[j] / NJ[l - 1]) ** 2 - 1;
/** FACNJ[kk·(2KM+2) + kmi] = (n_kk/2)^(kmi−1), scaling of the midpoint derivatives. */
const FACNJ = new Float64Array((KM + 2) * (2 * KM + 2));
for (let kk = 1; kk <= KM + 1; kk++) for (let kmi = 1; kmi <= 2 * KM + 1; kmi++) FACNJ[kk * (2 * KM + 2) + kmi] = (NJ[kk] / 2) ** (kmi - 1);
// states of the step controller
const S_START = 0;
const S_BASIC = 1;
const S_CONVERGENCE = 2;
const S_HOPE = 3;
const S_ACCEPT = 4;
const S_REJECT = 5;

function rows(r: number, c: number): Float64Array[] {
  const a: Float64Array[] = [];
  for (let i = 0; i <= r; i++) a.push(new Float64Array(c));
  return a;
}

/**
 * The integrator's state lives in instance fields and its parts are methods, not closures made
 * per `integrate` call: the engine calls `integrate` several times per shot, and closures over
 * mutable numbers would allocate on every call and every write (garbage collection was a sizeable
 * share of a shot's time). The dense-output view is made once per instance.
 */
export class GbsIntegrator implements Integrator {
  readonly name = 'odex';
  private n = -1;
  private y!: Float64Array;
  private dz!: Float64Array;
  private yh1!: Float64Array;
  private yh2!: Float64Array;
  private dy!: Float64Array;
  private scal!: Float64Array;
  private t!: Float64Array[];
  private ySafe!: Float64Array[];
  private fSafe!: Float64Array[];
  private dens!: Float64Array;
  private dy1!: Float64Array;
  private yLeft!: Float64Array;
  private dzLeft!: Float64Array;
  private built!: Int32Array;
  private allCache: number[] = [];
  private readonly hh = new Float64Array(KM + 2);
  private readonly w = new Float64Array(KM + 2);
  private readonly coef = new Float64Array(31);
  /** Scratch columns of ySafe and fSafe for the component being built (buildOne). */
  private readonly ysCol = new Float64Array(KM + 2);
  private readonly fsCol = new Float64Array(LF_SAFE + 1);

  // ---- state of the running integration (valid during integrate and its observer calls) ----
  private f: Rhs = () => {};
  private observer: StepObserver = () => true;
  private aTol: Float64Array = new Float64Array(0);
  private rTol = 0;
  private eager: number[] = [];
  /** components with full dense output */
  private nd = 0;
  private x = 0;
  private h = 0;
  private k = 0;
  private kc = 0;
  private err = 0;
  private errOld = 1e10;
  private hoptde = 0;
  private hMax = 0;
  private posneg = 1;
  private iPt = 0;
  private nEval = 0;
  private nStep = 0;
  private nAccept = 0;
  private nReject = 0;
  private reject = false;
  private atov = false;
  // dense output context of the last accepted step
  private dXOld = 0;
  private dH = 1;
  private kmit = 0;
  private stepKc = 0;
  /** step counter for the lazily built dense components */
  private stamp = 0;
  private readonly view: StepView;

  constructor() {
    const denseComponent = (i: number, xx: number): number => this.denseComponent(i, xx);
    const dense = (xx: number, out: Float64Array): void => {
      for (let i = 0; i < this.n; i++) out[i] = this.denseComponent(i, xx);
    };
    this.view = { t0: 0, t1: 0, y1: new Float64Array(0), dy1: new Float64Array(0), dense, denseComponent };
  }

  private allDense(nd: number): number[] {
    if (this.allCache.length !== nd) this.allCache = Array.from({ length: nd }, (_, i) => i);
    return this.allCache;
  }

  private alloc(n: number): void {
    if (n === this.n) return;
    this.n = n;
    this.y = new Float64Array(n);
    this.dz = new Float64Array(n);
    this.yh1 = new Float64Array(n);
    this.yh2 = new Float64Array(n);
    this.dy = new Float64Array(n);
    this.scal = new Float64Array(n);
    this.t = rows(KM + 1, n);
    this.ySafe = rows(KM + 1, n);
    this.fSafe = rows(LF_SAFE, n);
    this.dens = new Float64Array((2 * KM + 5) * n);
    this.dy1 = new Float64Array(n);
    this.yLeft = new Float64Array(n);
    this.dzLeft = new Float64Array(n);
    this.built = new Int32Array(n);
    this.view.y1 = this.y;
    this.view.dy1 = this.dy1;
  }

  // dense output of the last accepted step: blocks of nd values in dens; the integrals
  // (components ≥ nd) are interpolated linearly between yLeft and y
  private denseComponent(i: number, xx: number): number {
    const theta = (xx - this.dXOld) / this.dH;
    if (i >= this.nd) return this.yLeft[i] + theta * (this.y[i] - this.yLeft[i]);
    if (this.built[i] !== this.stamp) this.buildOne(i);
    const dens = this.dens;
    const nd = this.nd;
    const kmit = this.kmit;
    const theta1 = 1 - theta;
    const phthet = dens[i] + theta * (dens[nd + i] + theta1 * (dens[2 * nd + i] * theta + dens[3 * nd + i] * theta1));
    if (kmit < 0) return phthet;
    const thetah = theta - 0.5;
    let ret = dens[nd * (kmit + 4) + i];
    for (let im = kmit; im >= 1; --im) ret = dens[nd * (im + 3) + i] + (ret * thetah) / im;
    const tt = theta * theta1;
    return phthet + tt * tt * ret;
  }

  integrate(
    f: Rhs,
    x0: number,
    y0: Float64Array,
    xEnd: number,
    observer: StepObserver,
    options: IntegrateOptions,
  ): IntegrateResult {
    const n = y0.length;
    this.alloc(n);
    const nd = Math.min(n, Math.max(1, options.denseCount ?? n));
    this.nd = nd;
    this.f = f;
    this.observer = observer;
    const { y, dz, scal } = this;
    this.aTol = options.absTol;
    const rTol = options.relTol;
    this.rTol = rTol;
    y.set(y0);
    this.x = x0;
    this.nEval = 0;
    this.nStep = 0;
    this.nAccept = 0;
    this.nReject = 0;
    const maxSteps = options.maxSteps;
    this.hMax = Math.abs(options.maxStep ?? xEnd - x0);
    const hMax = this.hMax;
    const posneg = xEnd - x0 >= 0 ? 1 : -1;
    this.posneg = posneg;
    for (let i = 0; i < n; i++) scal[i] = this.aTol[i] + rTol + Math.abs(y[i]);
    this.k = Math.max(2, Math.min(KM - 1, Math.floor(-Math.log10(rTol + 1e-40) * 0.6 + 1.5)));
    if (options.initialStep !== undefined && options.initialStep > 0) {
      this.h = posneg * Math.min(options.initialStep, hMax, Math.abs(xEnd - x0));
    } else {
      this.h = posneg * Math.min(1e-4, hMax, Math.abs(xEnd - x0) / 2);
    }
    this.iPt = 0;
    this.err = 0;
    this.errOld = 1e10;
    this.hoptde = posneg * hMax;
    this.w[1] = 0;
    this.reject = false;
    this.atov = false;
    this.kc = 0;
    this.dXOld = 0;
    this.dH = 1;
    this.kmit = 0;
    this.stepKc = 0;
    this.stamp = 0;
    this.built.fill(-1);
    this.eager = options.denseEager ?? this.allDense(nd);
    this.view.t0 = x0;
    this.view.t1 = x0;
    let last = false;

    let state = S_START;
    for (;;) {
      switch (state) {
        case S_START: {
          this.atov = false;
          const x = this.x;
          if (0.1 * Math.abs(xEnd - x) <= Math.abs(x) * U_ROUND) return this.result('done');
          this.h = posneg * Math.min(Math.abs(this.h), Math.abs(xEnd - x), hMax, Math.abs(this.hoptde));
          if (!(Math.abs(this.h) > 16 * U_ROUND * Math.max(Math.abs(x), Math.abs(xEnd - x0)))) return this.result('step-too-small');
          if ((x + 1.01 * this.h - xEnd) * posneg > 0) {
            this.h = xEnd - x;
            last = true;
          }
          if (this.nStep === 0) {
            f(x, y, dz);
            ++this.nEval;
          }
          if (this.nStep === 0 || last) {
            this.iPt = 0;
            ++this.nStep;
            let next = S_HOPE;
            for (let j = 1; j <= this.k; ++j) {
              this.kc = j;
              this.midex(j);
              if (this.atov) {
                next = S_START;
                break;
              }
              if (j > 1 && this.err <= 1) {
                next = S_ACCEPT;
                break;
              }
            }
            state = next;
            continue;
          }
          state = S_BASIC;
          continue;
        }
        case S_BASIC: {
          this.iPt = 0;
          ++this.nStep;
          if (this.nStep >= maxSteps) return this.result('step-limit');
          const k = this.k;
          this.kc = k - 1;
          let again = false;
          for (let j = 1; j <= this.kc; ++j) {
            this.midex(j);
            if (this.atov) {
              again = true;
              break;
            }
          }
          if (again) {
            state = S_START;
            continue;
          }
          const err = this.err;
          if (k === 2 || this.reject) state = S_CONVERGENCE;
          else if (err <= 1) state = S_ACCEPT;
          else if (err > ((NJ[k + 1] * NJ[k]) / 4) ** 2) state = S_REJECT;
          else state = S_CONVERGENCE;
          continue;
        }
        case S_CONVERGENCE: {
          this.midex(this.k);
          if (this.atov) {
            state = S_START;
            continue;
          }
          this.kc = this.k;
          state = this.err <= 1 ? S_ACCEPT : S_HOPE;
          continue;
        }
        case S_HOPE: {
          const k = this.k;
          if (this.err > (NJ[k + 1] / 2) ** 2) {
            state = S_REJECT;
            continue;
          }
          this.kc = k + 1;
          this.midex(this.kc);
          if (this.atov) state = S_START;
          else if (this.err > 1) state = S_REJECT;
          else state = S_ACCEPT;
          continue;
        }
        case S_ACCEPT: {
          if (!this.acceptStep()) return this.result('stopped');
          state = S_START;
          continue;
        }
        case S_REJECT: {
          let k = Math.min(this.k, this.kc, KM - 1);
          if (k > 2 && this.w[k - 1] < this.w[k] * FAC3) k -= 1;
          this.k = k;
          ++this.nReject;
          this.h = posneg * this.hh[k];
          this.reject = true;
          state = S_BASIC;
          continue;
        }
      }
    }
  }

  private result(outcome: IntegrateResult['outcome']): IntegrateResult {
    return { outcome, steps: this.nAccept, rejected: this.nReject, evaluations: this.nEval };
  }

  /** Line j of the extrapolation table: n_j explicit midpoint substeps, then extrapolation. */
  private midex(j: number): void {
    const { n, nd, y, dz, yh1, yh2, dy, scal, t, ySafe, fSafe, f, x } = this;
    const h = this.h;
    const hj = h / NJ[j];
    for (let i = 0; i < n; i++) {
      yh1[i] = y[i];
      yh2[i] = y[i] + hj * dz[i];
    }
    const m = NJ[j] - 1;
    const njMid = (NJ[j] / 2) | 0;
    for (let mm = 1; mm <= m; ++mm) {
      if (mm === njMid) {
        const sj = ySafe[j];
        for (let i = 0; i < nd; i++) sj[i] = yh2[i];
      }
      f(x + hj * mm, yh2, dy);
      if (Math.abs(mm - njMid) <= 2 * j - 1) {
        const fs = fSafe[++this.iPt];
        for (let i = 0; i < nd; i++) fs[i] = dy[i];
      }
      for (let i = 0; i < n; i++) {
        const ys = yh1[i];
        yh1[i] = yh2[i];
        yh2[i] = ys + 2 * hj * dy[i];
      }
      if (mm <= 1 && j <= 2) {
        // stability check
        let del1 = 0;
        let del2 = 0;
        for (let i = 0; i < n; i++) {
          const a = dz[i] / scal[i];
          const b = (dy[i] - dz[i]) / scal[i];
          del1 += a * a;
          del2 += b * b;
        }
        const quot = del2 / Math.max(U_ROUND, del1);
        if (quot > 4) {
          ++this.nEval;
          this.atov = true;
          this.h = h * STEP_REDUCTION;
          this.reject = true;
          return;
        }
      }
    }
    // final smoothing step
    f(x + h, yh2, dy);
    if (njMid <= 2 * j - 1) {
      const fs = fSafe[++this.iPt];
      for (let i = 0; i < nd; i++) fs[i] = dy[i];
    }
    const tj = t[j];
    for (let i = 0; i < n; i++) tj[i] = (yh1[i] + yh2[i] + hj * dy[i]) / 2;
    this.nEval += NJ[j];
    if (j === 1) return;
    // polynomial extrapolation
    for (let l = j; l > 1; --l) {
      const fac = EXTRAP[j * (KM + 2) + l];
      const tl = t[l];
      const tl1 = t[l - 1];
      for (let i = 0; i < n; i++) tl1[i] = tl[i] + (tl[i] - tl1[i]) / fac;
    }
    const aTol = this.aTol;
    const rTol = this.rTol;
    let err = 0;
    const t1 = t[1];
    const t2 = t[2];
    for (let i = 0; i < n; i++) {
      const t1i = Math.max(Math.abs(y[i]), Math.abs(t1[i]));
      scal[i] = aTol[i] + rTol * t1i;
      const e = (t1[i] - t2[i]) / scal[i];
      err += e * e;
    }
    err = Math.sqrt(err / n);
    this.err = err;
    if (!(err * U_ROUND < 1) || (j > 2 && err >= this.errOld)) {
      this.atov = true;
      this.h = h * STEP_REDUCTION;
      this.reject = true;
      return;
    }
    this.errOld = Math.max(4 * err, 1);
    // optimal step sizes
    const exp0 = 1 / (2 * j - 1);
    const facMin = FACMIN[j];
    let fac = Math.min(FAC2 / facMin, Math.max(facMin, (err / SAFE1) ** exp0 / SAFE2));
    fac = 1 / fac;
    this.hh[j] = Math.min(Math.abs(h) * fac, this.hMax);
    this.w[j] = AW[j] / this.hh[j];
  }

  /** One component of the interpolation polynomial (Hermite part plus midpoint corrections). */
  private interpOne(i: number, imit: number): void {
    const a = this.coef;
    const yy = this.dens;
    const nd = this.nd;
    const y0i = yy[i];
    const y1i = yy[2 * nd + i];
    const yp0 = yy[nd + i];
    const yp1 = yy[3 * nd + i];
    const yDiff = y1i - y0i;
    const aspl = -yp1 + yDiff;
    const bspl = yp0 - yDiff;
    yy[nd + i] = yDiff;
    yy[2 * nd + i] = aspl;
    yy[3 * nd + i] = bspl;
    if (imit < 0) return;
    const ph0 = (y0i + y1i) * 0.5 + 0.125 * (aspl + bspl);
    const ph1 = yDiff + (aspl - bspl) * 0.25;
    const ph2 = -(yp0 - yp1);
    const ph3 = 6 * (bspl - aspl);
    if (imit >= 1) {
      a[1] = 16 * (yy[5 * nd + i] - ph1);
      if (imit >= 3) {
        a[3] = 16 * (yy[7 * nd + i] - ph3 + 3 * a[1]);
        for (let im = 5; im <= imit; im += 2) {
          const fac1 = (im * (im - 1)) / 2;
          const fac2 = fac1 * (im - 2) * (im - 3) * 2;
          a[im] = 16 * (yy[(im + 4) * nd + i] + fac1 * a[im - 2] - fac2 * a[im - 4]);
        }
      }
    }
    a[0] = (yy[4 * nd + i] - ph0) * 16;
    if (imit >= 2) {
      a[2] = (yy[nd * 6 + i] - ph2 + a[0]) * 16;
      for (let im = 4; im <= imit; im += 2) {
        const fac1 = (im * (im - 1)) / 2;
        const fac2 = im * (im - 1) * (im - 2) * (im - 3);
        a[im] = (yy[nd * (im + 4) + i] + a[im - 2] * fac1 - a[im - 4] * fac2) * 16;
      }
    }
    for (let im = 0; im <= imit; ++im) yy[nd * (im + 4) + i] = a[im];
  }

  /**
   * Dense output of component i for the step just accepted, built on demand (the data it needs,
   * ySafe, fSafe, t[1], stay untouched until the next step starts): every component's
   * polynomial is independent of the others, so only what the observer reads is built.
   */
  private buildOne(i: number): void {
    const { dens, t, yh2, dzLeft, yLeft, nd } = this;
    const hD = this.dH;
    const kcD = this.stepKc;
    const km = this.kmit;
    // component i's midpoint values and stored derivatives, copied into contiguous scratch rows
    // (the updates below touch only component i, so working on a copy changes nothing else)
    const ys = this.ysCol;
    const fs = this.fsCol;
    for (let l = 1; l <= kcD; l++) ys[l] = this.ySafe[l][i];
    const fTop = IPOINT[kcD + 1];
    for (let l = 0; l <= fTop; l++) fs[l] = this.fSafe[l][i];
    dens[i] = yLeft[i];
    dens[nd + i] = hD * dzLeft[i];
    dens[2 * nd + i] = t[1][i];
    // solution at the midpoint
    for (let j = 2; j <= kcD; ++j) {
      for (let l = j; l >= 2; --l) {
        const sl = ys[l];
        ys[l - 1] = sl + (sl - ys[l - 1]) / EXTRAP[j * (KM + 2) + l];
      }
    }
    dens[4 * nd + i] = ys[1];
    dens[3 * nd + i] = yh2[i] * hD;
    for (let kmi = 1; kmi <= km; ++kmi) {
      // kmi-th derivative at the midpoint
      const kbeg = ((kmi + 1) / 2) | 0;
      for (let kk = kbeg; kk <= kcD; ++kk) {
        ys[kk] = fs[IPOINT[kk + 1] - 2 * kk + kmi] * FACNJ[kk * (2 * KM + 2) + kmi];
      }
      for (let j = kbeg + 1; j <= kcD; ++j) {
        for (let l = j; l >= kbeg + 1; --l) {
          const sl = ys[l];
          ys[l - 1] = sl + (sl - ys[l - 1]) / EXTRAP[j * (KM + 2) + l];
        }
      }
      dens[(kmi + 4) * nd + i] = ys[kbeg] * hD;
      if (kmi === km) continue;
      // differences
      for (let kk = ((kmi + 2) / 2) | 0; kk <= kcD; ++kk) {
        const lbeg = IPOINT[kk + 1];
        let lend = IPOINT[kk] + kmi + 1;
        if (kmi === 1) lend += 2;
        for (let l = lbeg; l >= lend; l -= 2) fs[l] -= fs[l - 2];
        if (kmi === 1) fs[lend - 2] -= dzLeft[i];
      }
      for (let kk = ((kmi + 2) / 2) | 0; kk <= kcD; ++kk) {
        const lbeg = IPOINT[kk + 1] - 1;
        const lend = IPOINT[kk] + kmi + 2;
        for (let l = lbeg; l >= lend; l -= 2) fs[l] -= fs[l - 2];
      }
    }
    this.interpOne(i, km);
    this.built[i] = this.stamp;
  }

  /** Accept the step (or reject it on its dense-output error); false if the observer asked to stop. */
  private acceptStep(): boolean {
    const { n, nd, y, dz, yh1, yh2, scal, t, dens, hh, w, dy1, yLeft, dzLeft, eager } = this;
    const h = this.h;
    const xOld = this.x;
    const x = xOld + h;
    this.x = x;
    const kc = this.kc;
    const kmit = 2 * kc - IPOLDEG + 1;
    this.kmit = kmit;
    this.stepKc = kc;
    this.dXOld = xOld;
    this.dH = h;
    this.stamp++;
    for (let i = 0; i < n; i++) yLeft[i] = y[i];
    for (let i = 0; i < nd; i++) dzLeft[i] = dz[i];
    // first derivative at the right end
    for (let i = 0; i < n; i++) yh1[i] = t[1][i];
    this.f(x, yh1, yh2);
    ++this.nEval;
    for (let e = 0; e < eager.length; e++) this.buildOne(eager[e]);
    // estimation of the interpolation error (on the components built now)
    if (kmit >= 1 && eager.length > 0) {
      let errint = 0;
      const off = (kmit + 4) * nd;
      for (let e = 0; e < eager.length; e++) {
        const i = eager[e];
        const v = dens[off + i] / scal[i];
        errint += v * v;
      }
      errint = Math.sqrt(errint / eager.length) * ERRFAC[kmit];
      this.hoptde = h / Math.max(errint ** (1 / (kmit + 4)), 0.01);
      if (errint > 10) {
        this.h = this.hoptde;
        this.x = xOld;
        ++this.nReject;
        this.reject = true;
        this.stamp++;
        return true;
      }
    }
    const t1 = t[1];
    for (let i = 0; i < n; i++) {
      dz[i] = yh2[i];
      y[i] = t1[i];
      dy1[i] = yh2[i];
    }
    ++this.nAccept;
    const view = this.view;
    view.t0 = xOld;
    view.t1 = x;
    if (!this.observer(view)) return false;
    // optimal order
    const k = this.k;
    const reject = this.reject;
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
      this.k = Math.min(kopt, kc);
      this.h = this.posneg * Math.min(Math.abs(h), Math.abs(hh[this.k]));
      this.reject = false;
      return true;
    }
    let hNew: number;
    if (kopt <= kc) {
      hNew = hh[kopt];
    } else if (kc < k && w[kc] < w[kc - 1] * FAC4) {
      hNew = (hh[kc] * AW[kopt + 1]) / AW[kc];
    } else {
      hNew = (hh[kc] * AW[kopt]) / AW[kc];
    }
    this.k = kopt;
    this.h = this.posneg * Math.abs(hNew);
    return true;
  }
}
