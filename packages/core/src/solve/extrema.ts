/**
 * Extremum tracking on the dense output: the largest |q(t)| of a quantity over a shot, with its
 * time, located where dq/dt changes sign inside a step (Brent's method on the slope evaluated
 * from the interpolated state through the right-hand side), and checked at every step end and
 * event point (where q may be largest at a boundary). A peak is therefore located to the event
 * tolerance in time, not read off the largest sample.
 */
import { brentZero } from './brent.js';

/** A quantity of the state and its time derivative. */
export interface Quantity {
  value(y: Float64Array, dy: Float64Array): number;
  slope(y: Float64Array, dy: Float64Array): number;
}

/**
 * A quantity linear in the state, q = Σ w_k·y[i_k] (a current, a diode current i_L − i_s, the field of a
 * linear coil and its loops), slope Σ w_k·dy[i_k]. One class for all of them, so that the trackers'
 * calls stay monomorphic (the JavaScript engine inlines them instead of boxing every returned number).
 */
export class LinearQuantity implements Quantity {
  private readonly idx: Int32Array;
  private readonly w: Float64Array;

  constructor(indices: ArrayLike<number>, weights: ArrayLike<number>) {
    // the constructors copy an array-like directly (TypedArray.from takes a slower generic path)
    this.idx = new Int32Array(indices);
    this.w = new Float64Array(weights);
  }

  value(y: Float64Array): number {
    let s = 0;
    for (let k = 0; k < this.idx.length; k++) s += this.w[k] * y[this.idx[k]];
    return s;
  }

  slope(_y: Float64Array, dy: Float64Array): number {
    let s = 0;
    for (let k = 0; k < this.idx.length; k++) s += this.w[k] * dy[this.idx[k]];
    return s;
  }
}

/** Evaluates the interpolated state and its derivative at t (into y, dy). */
export interface DenseProbe {
  y: Float64Array;
  dy: Float64Array;
  at(t: number): void;
}

export class ExtremumTracker {
  /** Largest |q| seen. */
  maxAbs = 0;
  /** q (signed) where |q| was largest. */
  valueAtMax = 0;
  /** Time of the largest |q|, s. */
  time = 0;
  private slopePrev = 0;
  /** q's slope on the dense output, for Brent's method; made at the first bracketed extremum only
   * (many shots' trackers never need it, and a sweep builds trackers for every shot). */
  private slopeAt: ((t: number) => number) | null = null;

  constructor(
    readonly q: Quantity,
    private readonly probe: DenseProbe,
    private readonly tol: number,
  ) {}

  private consider(v: number, t: number): void {
    const a = Math.abs(v);
    if (a > this.maxAbs) {
      this.maxAbs = a;
      this.valueAtMax = v;
      this.time = t;
    }
  }

  /** At the start of a phase (state and derivative of the new mode). */
  start(t: number, y: Float64Array, dy: Float64Array): void {
    this.slopePrev = this.q.slope(y, dy);
    this.consider(this.q.value(y, dy), t);
  }

  /** After the interval [ta, tb] (dense output valid there), with the state at tb. */
  step(ta: number, tb: number, yb: Float64Array, dyb: Float64Array): void {
    const sb = this.q.slope(yb, dyb);
    const sa = this.slopePrev;
    if ((sa > 0 && sb < 0) || (sa < 0 && sb > 0)) {
      this.slopeAt ??= (t: number) => {
        this.probe.at(t);
        return this.q.slope(this.probe.y, this.probe.dy);
      };
      const tr = brentZero(this.slopeAt, ta, tb, sa, sb, this.tol);
      this.probe.at(tr);
      this.consider(this.q.value(this.probe.y, this.probe.dy), tr);
    }
    this.consider(this.q.value(yb, dyb), tb);
    this.slopePrev = sb;
  }
}
