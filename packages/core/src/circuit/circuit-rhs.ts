/**
 * The discharge circuit's right-hand side dy/dt = f(t, y) for one conduction mode, written
 * without allocation (every buffer is made once in the constructor).
 *
 * Equations (docs/model.md §2). With R_1(T) = R_20·(1 + α_20·(T − 20 °C)) (IEC 60028 linear
 * resistance–temperature law), R_s = ESR (+ R_w), R_L = R_1(T) (+ R_w), u the voltage across
 * the diode position (top minus return), V_sw = sw·V_T0 + r_T·i_s the switch drop:
 *
 *   C·dv/dt = −i_s
 *   source mesh:  L_ss·di_s/dt = v − R_s·i_s − V_sw − u
 *   load mesh:    L_LL·di_L/dt + Σ M_1k·di_k/dt = u − R_L·i_L
 *   loop k:       M_1k·di_L/dt + Σ_j (L_lp)_kj·di_j/dt = −R_k(T_k)·i_k
 *   diode on:     u = −(V_F0 + r_F·i_d),  i_d = i_L − i_s
 *   C_th·dθ/dt = i²·R(T)  for the coil and each loop (adiabatic heating)
 *
 * Each mode eliminates what its devices fix: 'series' adds the two mesh equations (u drops out,
 * i_s = i_L), 'both' keeps both with u from the diode, 'freewheel' keeps the load mesh with
 * i_s = 0, 'open' keeps only the loops (i_L = 0). The reduced inductance matrix of the mode is
 * constant for a linear coil, so its inverse is formed once per phase; a nonlinear coil
 * (iron yoke) replaces L_1 by the incremental inductance dλ/di(i_L) and the matrix is solved at
 * every call (dλ/dt = L_inc(i)·di/dt: the state stays the current).
 *
 * Zero source inductance in 'both' (ESL = 0 with the diode at the bank end): the source mesh is
 * algebraic, v − (R_s + r_T)·i_s − V_T0 + V_F0 + r_F·(i_L − i_s) = 0; its time derivative
 * (R_s + r_T + r_F)·di_s/dt − r_F·di_L/dt = −i_s/C replaces the source row (index reduction,
 * consistent at the diode-on event where i_d = 0). If (R_s + r_T + r_F)·C is below
 * `instantCommutation_s` the commutation is instantaneous: setMode reports the mode as singular.
 */
/** A right-hand side dy/dt = f(t, y), written into dy (no allocation); the integrators of solve/ take this. */
export type Rhs = (t: number, y: Float64Array, dy: Float64Array) => void;
import { modeKind, type Mode, type ModeKind } from './modes.js';
import type { Network } from './network.js';
import { luFactor, luSolve, invert } from './small-lu.js';
import { ACC_CABLE, ACC_DIODE, ACC_ESR, ACC_I2T_D, ACC_I2T_SW, ACC_SW, IL, IS, LOOP0, TH_COIL, V, dynamicCount, stateSize } from './state.js';

export class CircuitRhs {
  /** The network (changed only by `rebind`). */
  net: Network;
  readonly nLoops: number;
  readonly size: number;
  /** Index of the first integral (E_esr) in the state. */
  readonly accBase: number;
  mode: Mode = { sw: 1, diode: false };
  kind: ModeKind = 'series';
  /** Size of the reduced system of the current mode. */
  private m = 0;
  /** Index in the reduced system of the coil's diagonal entry (−1 if none). */
  private coilRow = -1;
  /** Offset of the loops in the reduced system. */
  private loopOff = 0;
  private algebraicSource = false;
  /**
   * Without inductance between switch and diode the commutation is an RC decay with
   * τ = (R_s + r_T + r_F)·C; below this τ, s, setMode('both') reports the mode as singular and the
   * engine commutates instantaneously. Set by the engine (1e-6 of the pulse time scale).
   */
  instantCommutation_s = 0;
  private readonly mat: Float64Array;
  private readonly minv: Float64Array;
  private readonly work: Float64Array;
  private readonly piv: Int32Array;
  private readonly b: Float64Array;
  private readonly col: Float64Array;
  private nonlinear: boolean;
  private readonly mLoop: Float64Array;
  private readonly rLoop20: Float64Array;
  private readonly aLoop: Float64Array;
  private readonly t0Loop: Float64Array;
  /** 1/C_th,k of each loop, and 1/C_th of the coil and 1/C (multiplications in the hot path). */
  private readonly invCthLoop: Float64Array;
  private invCthCoil: number;
  private invC: number;
  /** f(t, y) → dy for the current mode. */
  readonly eval: Rhs;

  constructor(net: Network) {
    this.net = net;
    const n = net.loops.length;
    this.nLoops = n;
    this.size = stateSize(n);
    this.accBase = dynamicCount(n);
    const mMax = n + 2;
    this.mat = new Float64Array(mMax * mMax);
    this.minv = new Float64Array(mMax * mMax);
    this.work = new Float64Array(mMax * mMax);
    this.piv = new Int32Array(mMax);
    this.b = new Float64Array(mMax);
    this.col = new Float64Array(mMax);
    this.mLoop = new Float64Array(n);
    this.rLoop20 = new Float64Array(n);
    this.aLoop = new Float64Array(n);
    this.t0Loop = new Float64Array(n);
    this.invCthLoop = new Float64Array(n);
    this.nonlinear = false;
    this.invCthCoil = 0;
    this.invC = 0;
    this.rebind(net);
    this.eval = (t, y, dy) => this.evaluate(y, dy);
  }

  /**
   * Take another network with the same number of loops, as if newly constructed (same buffers, no
   * allocation: the engine keeps one CircuitRhs per state size between shots, since a sweep runs
   * thousands of short shots and typed-array allocation is a good part of their set-up).
   */
  rebind(net: Network): void {
    const n = this.nLoops;
    if (net.loops.length !== n) throw new Error(`CircuitRhs.rebind: ${net.loops.length} loops, expected ${n}`);
    this.net = net;
    this.mode = { sw: 1, diode: false };
    this.kind = 'series';
    this.m = 0;
    this.coilRow = -1;
    this.loopOff = 0;
    this.algebraicSource = false;
    this.instantCommutation_s = 0;
    this.mat.fill(0);
    this.minv.fill(0);
    this.work.fill(0);
    this.piv.fill(0);
    this.b.fill(0);
    this.col.fill(0);
    this.nonlinear = net.coil.nonlinear !== null;
    for (let k = 0; k < n; k++) {
      const l = net.loops[k];
      this.mLoop[k] = l.mutualToCoil_H;
      this.rLoop20[k] = l.resistance20_Ohm;
      this.aLoop[k] = l.tempCoeff_perK;
      this.t0Loop[k] = l.initialTemperature_C;
      this.invCthLoop[k] = 1 / l.heatCapacity_JpK;
    }
    this.invCthCoil = 1 / net.coil.heatCapacity_JpK;
    this.invC = 1 / net.capacitance_F;
  }

  /** Load-mesh self inductance L_LL at coil current i (incremental for a nonlinear coil), H. */
  loadInductance(iL: number): number {
    const nl = this.net.coil.nonlinear;
    return this.net.loadCableL_H + (nl ? nl.incrementalInductance_H(iL) : this.net.coil.inductance_H);
  }

  /**
   * Switch to a conduction mode: assemble the reduced inductance matrix and (linear coil)
   * invert it. Returns false if the mode's matrix is singular.
   */
  setMode(mode: Mode): boolean {
    this.mode = { sw: mode.sw, diode: mode.diode };
    const kind = modeKind(mode);
    this.kind = kind;
    const net = this.net;
    const n = this.nLoops;
    let off: number;
    let coilRow: number;
    switch (kind) {
      case 'series':
        off = 1;
        coilRow = 0;
        break;
      case 'both':
        off = 2;
        coilRow = 1;
        break;
      case 'freewheel':
        off = 1;
        coilRow = 0;
        break;
      default:
        off = 0;
        coilRow = -1;
    }
    const m = off + n;
    this.m = m;
    this.loopOff = off;
    this.coilRow = coilRow;
    const a = this.mat;
    a.fill(0, 0, m * m);
    this.algebraicSource = false;
    if (coilRow >= 0) {
      a[coilRow * m + coilRow] = this.loadInductance(0);
      for (let k = 0; k < n; k++) {
        a[coilRow * m + off + k] = this.mLoop[k];
        a[(off + k) * m + coilRow] = this.mLoop[k];
      }
    }
    if (kind === 'series') a[0] += net.sourceL_H;
    if (kind === 'both') {
      if (net.sourceL_H > 0) {
        a[0] = net.sourceL_H;
      } else {
        this.algebraicSource = true;
        const rF = net.diode ? net.diode.rF_Ohm : 0;
        const rSum = net.sourceR_Ohm + net.rT_Ohm + rF;
        // commutation time constant (R_s + r_T + r_F)·C below the threshold: instantaneous
        if (!(rSum * net.capacitance_F >= this.instantCommutation_s)) return false;
        a[0] = rSum;
        a[1] = -rF;
      }
    }
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) a[(off + j) * m + off + k] = net.loopL_H[j * n + k];
    }
    if (m === 0) return true;
    return invert(a, m, this.minv, this.work, this.piv, this.col);
  }

  /**
   * A quarter of the shortest oscillation period the capacitor can have in the current mode,
   * (π/2)·√(L_eff·C), s, with L_eff the inductance the source mesh sees when every loop is
   * shorted (1/(M⁻¹)₀₀); Infinity when no capacitor current flows or the source row is algebraic.
   * The engine keeps integration steps below it, so a current cannot cross zero twice inside one
   * step unseen. For a nonlinear coil the saturated incremental inductance at `iSat` is used.
   */
  quarterPeriod(iSat: number): number {
    if (this.mode.sw === 0 || this.algebraicSource) return Infinity;
    const net = this.net;
    let lEff: number;
    if (this.nonlinear && this.kind === 'series') {
      lEff = net.sourceL_H + net.loadCableL_H + net.coil.nonlinear!.incrementalInductance_H(iSat);
    } else if (this.kind === 'both') {
      lEff = net.sourceL_H;
    } else {
      lEff = 1 / this.minv[0];
    }
    const q = 0.5 * Math.PI * Math.sqrt(lEff * net.capacitance_F);
    return q > 0 && Number.isFinite(q) ? q : Infinity;
  }

  /** Coil resistance at temperature rise θ, Ω. */
  coilResistance(theta: number): number {
    const c = this.net.coil;
    return c.resistance20_Ohm * (1 + c.tempCoeff_perK * (c.initialTemperature_C + theta - 20));
  }

  private evaluate(y: Float64Array, dy: Float64Array): void {
    const net = this.net;
    const n = this.nLoops;
    const kind = this.kind;
    const sw = this.mode.sw;
    const v = y[V];
    const is = y[IS];
    const iL = y[IL];
    const rc = this.coilResistance(y[TH_COIL]);
    const m = this.m;
    const off = this.loopOff;
    const b = this.b;
    const vsw = sw * net.vT0_V + net.rT_Ohm * is;
    const d = net.diode;
    const iD = iL - is;
    const vD = this.mode.diode && d ? d.vF0_V + d.rF_Ohm * iD : 0;
    const rL = rc + net.loadCableR_Ohm;
    switch (kind) {
      case 'series':
        b[0] = v - (net.sourceR_Ohm + rL) * is - vsw;
        break;
      case 'both':
        b[0] = this.algebraicSource ? -is / net.capacitance_F : v - net.sourceR_Ohm * is - vsw + vD;
        b[1] = -vD - rL * iL;
        break;
      case 'freewheel':
        b[0] = -vD - rL * iL;
        break;
      default:
        break;
    }
    for (let k = 0; k < n; k++) {
      const ik = y[LOOP0 + k];
      const th = y[LOOP0 + n + k];
      const rk = this.rLoop20[k] * (1 + this.aLoop[k] * (this.t0Loop[k] + th - 20));
      b[off + k] = -rk * ik;
      dy[LOOP0 + n + k] = ik * ik * rk * this.invCthLoop[k];
    }
    // x = M⁻¹·b, into col
    const x = this.col;
    if (this.nonlinear && this.coilRow >= 0) {
      const a = this.work;
      a.set(this.mat.subarray(0, m * m));
      const cr = this.coilRow;
      a[cr * m + cr] = this.loadInductance(iL) + (kind === 'series' ? net.sourceL_H : 0);
      for (let i = 0; i < m; i++) x[i] = b[i];
      if (luFactor(a, m, this.piv)) luSolve(a, m, this.piv, x);
      else x.fill(NaN, 0, m);
    } else {
      const mi = this.minv;
      for (let i = 0; i < m; i++) {
        let s = 0;
        for (let j = 0; j < m; j++) s += mi[i * m + j] * b[j];
        x[i] = s;
      }
    }
    dy[V] = -is * this.invC;
    switch (kind) {
      case 'series':
        dy[IS] = x[0];
        dy[IL] = x[0];
        break;
      case 'both':
        dy[IS] = x[0];
        dy[IL] = x[1];
        break;
      case 'freewheel':
        dy[IS] = 0;
        dy[IL] = x[0];
        break;
      default:
        dy[IS] = 0;
        dy[IL] = 0;
    }
    for (let k = 0; k < n; k++) dy[LOOP0 + k] = x[off + k];
    dy[TH_COIL] = iL * iL * rc * this.invCthCoil;
    const acc = this.accBase;
    dy[acc + ACC_ESR] = net.esr_Ohm * is * is;
    dy[acc + ACC_SW] = vsw * is;
    const ic = net.cableInSource ? is : iL;
    dy[acc + ACC_CABLE] = net.cableR_Ohm * ic * ic;
    const diodeOn = this.mode.diode;
    dy[acc + ACC_DIODE] = diodeOn ? vD * iD : 0;
    dy[acc + ACC_I2T_SW] = is * is;
    dy[acc + ACC_I2T_D] = diodeOn ? iD * iD : 0;
  }

  /**
   * Voltage u across the diode position (top minus return), V, given the state and its
   * derivative in the current mode. Diode off and switch on: from the source mesh; both off:
   * the coil's induced voltage Σ M_1k·di_k/dt (the coil is open).
   */
  nodeVoltage(y: Float64Array, dy: Float64Array): number {
    const net = this.net;
    const d = net.diode;
    if (this.mode.diode && d) return -(d.vF0_V + d.rF_Ohm * (y[IL] - y[IS]));
    if (this.mode.sw !== 0) {
      return y[V] - (net.sourceR_Ohm + net.rT_Ohm) * y[IS] - this.mode.sw * net.vT0_V - net.sourceL_H * dy[IS];
    }
    let u = 0;
    for (let k = 0; k < this.nLoops; k++) u += this.mLoop[k] * dy[LOOP0 + k];
    return u;
  }

  /** Voltage across the switch in its forward direction, V. */
  switchVoltage(y: Float64Array, dy: Float64Array): number {
    const net = this.net;
    if (this.mode.sw !== 0) return this.mode.sw * net.vT0_V + net.rT_Ohm * y[IS];
    return y[V] - this.nodeVoltage(y, dy);
  }

  /** Magnetic energy stored in all inductances (mutuals included), J. */
  magneticEnergy(y: Float64Array): number {
    const net = this.net;
    const n = this.nLoops;
    const is = y[IS];
    const iL = y[IL];
    const nl = net.coil.nonlinear;
    let w = 0.5 * net.sourceL_H * is * is + 0.5 * net.loadCableL_H * iL * iL;
    w += nl ? iL * nl.fluxLinkage_Wb(iL) - nl.coEnergy_J(iL) : 0.5 * net.coil.inductance_H * iL * iL;
    for (let k = 0; k < n; k++) {
      const ik = y[LOOP0 + k];
      w += this.mLoop[k] * iL * ik;
      let s = 0;
      for (let j = 0; j < n; j++) s += net.loopL_H[k * n + j] * y[LOOP0 + j];
      w += 0.5 * ik * s;
    }
    return w;
  }
}
