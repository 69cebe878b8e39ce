/**
 * A growable record of the accepted integration steps of one shot: each step's start time,
 * its (full) end time, its phase, and the state at its start. With it the engine can replay any
 * step afterwards (re-integrate it from the logged state) to read the dense output there: the
 * uniform waveform grid and the level crossings of the pulse width are only known once the shot
 * has ended. Storage grows by doubling; nothing is allocated per step otherwise.
 */
export class StepLog {
  readonly n: number;
  count = 0;
  t0: Float64Array;
  t1: Float64Array;
  phase: Int32Array;
  y0: Float64Array;

  constructor(n: number, capacity = 64) {
    this.n = n;
    this.t0 = new Float64Array(capacity);
    this.t1 = new Float64Array(capacity);
    this.phase = new Int32Array(capacity);
    this.y0 = new Float64Array(capacity * n);
  }

  private grow(): void {
    const cap = this.t0.length * 2;
    const t0 = new Float64Array(cap);
    t0.set(this.t0);
    const t1 = new Float64Array(cap);
    t1.set(this.t1);
    const ph = new Int32Array(cap);
    ph.set(this.phase);
    const y0 = new Float64Array(cap * this.n);
    y0.set(this.y0);
    this.t0 = t0;
    this.t1 = t1;
    this.phase = ph;
    this.y0 = y0;
  }

  push(t0: number, t1: number, phase: number, y0: Float64Array): void {
    if (this.count === this.t0.length) this.grow();
    const k = this.count++;
    this.t0[k] = t0;
    this.t1[k] = t1;
    this.phase[k] = phase;
    this.y0.set(y0, k * this.n);
  }

  /** Value of state component c at the start of step k. */
  startValue(k: number, c: number): number {
    return this.y0[k * this.n + c];
  }

  /** The start state of step k (a view, not a copy). */
  startState(k: number): Float64Array {
    return this.y0.subarray(k * this.n, (k + 1) * this.n);
  }
}
