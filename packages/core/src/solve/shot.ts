/**
 * simulateShot: one capacitor discharge through switch, cable, coil and freewheel diode, with
 * coupled shorted loops and adiabatic heating, from firing to the end of all currents.
 *
 * Method (docs/model.md):
 * 1. The circuit (circuit/network.ts, circuit/circuit-rhs.ts) is integrated phase by phase; a
 *    phase is a conduction mode of the switch and the diode (circuit/modes.ts).
 * 2. Inside a phase an error-controlled integrator with dense output advances the state
 *    (capacitor voltage, mesh and loop currents, temperature rises, loss and I²t integrals).
 * 3. After every accepted step the mode's event functions (circuit/mode-events.ts) are checked
 *    at the step end; a sign change is located on the dense output by Brent's method to
 *    Station.solver.eventTol_s, on its triggered side, and the integration restarts from the
 *    located state in the next mode (state projected onto the new constraints). Zero crossings
 *    of the current slopes are located the same way for the peaks (solve/extrema.ts).
 * 4. The shot ends when the coil is open and no loop carries current, when the stored energy
 *    has decayed below 1e-12 of ½CV0², or at t_max.
 * 5. Waveform samples (uniform grid plus every event) and the pulse-width level crossings are
 *    read afterwards by replaying the logged steps (solve/step-log.ts) on the dense output.
 *
 * Energy balance (solve/energy-balance.ts) is checked on every shot; numerical trouble becomes a
 * Warning in the result, never a throw.
 */
import { energyBalance, ENERGY_BALANCE_WARN } from './energy-balance.js';
import { assembleFigures, widthAtLevel } from './shot-figures.js';
import { CircuitRhs } from '../circuit/circuit-rhs.js';
import { modeAfterEvent, modeEvents, violatedAtStart, DECAY_FRACTION, type ModeEvent } from '../circuit/mode-events.js';
import { modeKind, phaseName, type Mode } from '../circuit/modes.js';
import { buildNetwork, type Network } from '../circuit/network.js';
import {
  ACC_CABLE,
  ACC_DIODE,
  ACC_ESR,
  ACC_I2T_D,
  ACC_I2T_SW,
  ACC_SW,
  IL,
  IS,
  TH_COIL,
  V,
  accIndex,
  dynamicCount,
  loopCurrentIndex,
  loopThetaIndex,
  stateSize,
} from '../circuit/state.js';
import type { PhaseRecord, ShotResult, Waveform, Warning } from '../model/result.js';
import { DEFAULT_SOLVER, type Station } from '../model/station.js';
import { brentZero } from './brent.js';
import { ExtremumTracker, LinearQuantity, type DenseProbe, type Quantity } from './extrema.js';
import type { Integrator, StepView } from './integrator.js';
import type { StiffOptions } from './stiff-integrator.js';
import { chooseIntegrator, releaseIntegrator } from './choose-integrator.js';
import { stateScales } from './scales.js';
import { CurveLog } from './curve-log.js';
import { StepLog } from './step-log.js';

export interface SimulateOptions {
  /** Force an integrator (tests and cross-checks); otherwise chosen from Station.solver.method. */
  integrator?: Integrator;
}

/**
 * Work arrays of one shot, kept between shots of the same state size (a sweep runs thousands of
 * shots; allocating them anew each time costs more than some of the integration). A free list, so
 * a shot started while another is running (from a callback) gets its own.
 */
interface Workspace {
  n: number;
  a: Float64Array[];
  curve: CurveLog;
  /** The right-hand side, rebound to each shot's network (same loop count, as n = stateSize(loops)). */
  rhs: CircuitRhs;
  /** Step log (reset per shot; grows as needed). */
  log: StepLog;
  /** Event values at the previous step end and at this one (a mode has at most 4 events). */
  gPrev: Float64Array;
  gBuf: Float64Array;
}
const freeWorkspaces: Workspace[] = [];
function acquireWorkspace(net: Network): Workspace {
  const n = stateSize(net.loops.length);
  const i = freeWorkspaces.findIndex((w) => w.n === n);
  if (i >= 0) {
    const w = freeWorkspaces.splice(i, 1)[0];
    w.rhs.rebind(net);
    w.log.count = 0;
    return w;
  }
  return {
    n,
    a: Array.from({ length: 11 }, () => new Float64Array(n)),
    curve: new CurveLog(),
    rhs: new CircuitRhs(net),
    log: new StepLog(n, 64),
    gPrev: new Float64Array(8),
    gBuf: new Float64Array(8),
  };
}
function releaseWorkspace(w: Workspace): void {
  if (freeWorkspaces.length >= 8) freeWorkspaces.shift();
  freeWorkspaces.push(w);
}

/** [i_L, loop currents...]: the state indices of the coil and loop currents. */
function coilAndLoopCurrents(nLoops: number): number[] {
  const idx = [IL];
  for (let k = 0; k < nLoops; k++) idx.push(loopCurrentIndex(k));
  return idx;
}

/**
 * d²i_s/dt² by a directional difference of f along f (exact for the linear part of f); its value is
 * di_s/dt. A class rather than an object of closures made per shot (sweeps run thousands of short
 * shots, and the set-up counts); jvY, jvDy are scratch arrays of the state size.
 */
class SwitchDidt implements Quantity {
  constructor(
    private readonly rhs: CircuitRhs,
    private readonly jvY: Float64Array,
    private readonly jvDy: Float64Array,
    private readonly h_s: number,
  ) {}

  value(_yy: Float64Array, d: Float64Array): number {
    return d[IS];
  }

  slope(yy: Float64Array, d: Float64Array): number {
    if (this.rhs.mode.sw === 0) return 0;
    const n = this.rhs.size;
    for (let i = 0; i < n; i++) this.jvY[i] = yy[i] + this.h_s * d[i];
    this.rhs.eval(0, this.jvY, this.jvDy);
    return (this.jvDy[IS] - d[IS]) / this.h_s;
  }
}

/**
 * The field at probe p as a tracked quantity: linear in the currents, except at the first probe of
 * a nonlinear coil (the coil's field curve, slope by a central difference of step dI, A).
 * Module-level (not a closure per shot): sweeps run thousands of short shots.
 */
function fieldQuantity(net: Network, p: number, dI: number): Quantity {
  const nl = net.coil.nonlinear;
  const nLoops = net.loops.length;
  const pr = net.probes[p];
  if (!(nl && p === 0)) return new LinearQuantity(coilAndLoopCurrents(nLoops), [pr.coil_ApmPerA, ...pr.loops_ApmPerA]);
  return {
    value(yy) {
      let h = nl.fieldAtPart_Apm(yy[IL]);
      for (let k = 0; k < nLoops; k++) h += pr.loops_ApmPerA[k] * yy[loopCurrentIndex(k)];
      return h;
    },
    slope(yy, d) {
      const i = yy[IL];
      let h = ((nl.fieldAtPart_Apm(i + dI) - nl.fieldAtPart_Apm(i - dI)) / (2 * dI)) * d[IL];
      for (let k = 0; k < nLoops; k++) h += pr.loops_ApmPerA[k] * d[loopCurrentIndex(k)];
      return h;
    },
  };
}

const NO_COMPONENTS: number[] = [];

type EndReason = 'current-zero' | 'decayed' | 't-max' | 'step-limit' | 'step-too-small' | 'chattering';

export function simulateShot(station: Station, options: SimulateOptions = {}): ShotResult {
  const wall0 = performance.now();
  const settings = { ...DEFAULT_SOLVER, ...station.solver };
  const net = buildNetwork(station);
  const ws = acquireWorkspace(net);
  const rhs = ws.rhs;
  const N = rhs.size;
  const nLoops = rhs.nLoops;
  const scales = stateScales(rhs);
  rhs.instantCommutation_s = 1e-6 * scales.time_s;
  const integrator = options.integrator ?? chooseIntegrator(settings.method, rhs, scales);
  const absTol = ws.a[0];
  for (let i = 0; i < N; i++) absTol[i] = settings.absTol * scales.state[i];
  const intOpts: StiffOptions = {
    relTol: settings.relTol,
    absTol,
    maxSteps: settings.maxSteps,
    denseCount: dynamicCount(nLoops),
    // dense output built at every step (and error-controlled) for the coil and loop currents;
    // the other components only when an event or a peak is bracketed
    denseEager: coilAndLoopCurrents(nLoops),
    // the stiff integrator solves the electrical states implicitly, the rest explicitly
    implicit: [V, IS, ...coilAndLoopCurrents(nLoops)],
  };
  const eventTol = settings.eventTol_s;
  const tMax = settings.tMax_s;
  const E0 = net.storedEnergy_J;
  const warnings: Warning[] = [];

  const y = ws.a[1];
  const dy = ws.a[2];
  y.fill(0);
  y[V] = net.voltage_V;

  // ---- dense-output probe shared by events and trackers ------------------------------------
  let view: StepView | null = null;
  const probe: DenseProbe = {
    y: ws.a[3],
    dy: ws.a[4],
    at(t: number) {
      view!.dense(t, this.y);
      rhs.eval(t, this.y, this.dy);
    },
  };

  // ---- tracked quantities -------------------------------------------------------------------
  const dI = 1e-6 * scales.current_A;
  const jvY = ws.a[5];
  const jvDy = ws.a[6];
  const hJv = 1e-6 * scales.time_s;
  const switchDidt = new SwitchDidt(rhs, jvY, jvDy, hJv);
  // slope of a current event along the solution a short time ahead, for grazing starts
  const slopeTol = 1e-9 * (scales.current_A / scales.time_s);
  const curvature = (e: ModeEvent): number => {
    if (!e.slope) return 0;
    for (let i = 0; i < N; i++) jvY[i] = y[i] + hJv * dy[i];
    rhs.eval(t + hJv, jvY, jvDy);
    return (e.slope(jvY, jvDy) - e.slope(y, dy)) / hJv;
  };
  const coilTracker = new ExtremumTracker(new LinearQuantity([IL], [1]), probe, eventTol);
  const switchTracker = new ExtremumTracker(new LinearQuantity([IS], [1]), probe, eventTol);
  const diodeTracker = new ExtremumTracker(new LinearQuantity([IL, IS], [1, -1]), probe, eventTol);
  const didtTracker = new ExtremumTracker(switchDidt, probe, eventTol);
  const probeTrackers = net.probes.map((_, p) => new ExtremumTracker(fieldQuantity(net, p, dI), probe, eventTol));
  const loopTrackers = net.loops.map((_, k) => new ExtremumTracker(new LinearQuantity([loopCurrentIndex(k)], [1]), probe, eventTol));
  const trackers = [coilTracker, switchTracker, diodeTracker, didtTracker, ...probeTrackers, ...loopTrackers];
  let minCapV = net.voltage_V;

  // ---- phase loop ------------------------------------------------------------------------------
  // the step log is only needed to sample the waveform afterwards
  const keepLog = settings.samples > 0;
  const log = ws.log;
  const coilCurve = ws.curve;
  coilCurve.count = 0;
  const phases: PhaseRecord[] = [];
  const phaseModes: Mode[] = [];
  let mode: Mode = { sw: 1, diode: false };
  let t = 0;
  let endReason: EndReason = 'current-zero';
  let steps = 0;
  let rejected = 0;
  let evaluations = 0;
  let eventCount = 0;
  let coilEnd_s = 0;

  // per-phase observer state
  let events: ModeEvent[] = [];
  let armed: boolean[] = [];
  let gPrev = ws.gPrev;
  let phaseIndex = 0;
  let prevT = 0;
  const prevY = ws.a[7];
  let hitIndex = -1;
  let hitT = 0;
  let hitStepT0 = 0;
  let firstStep = true;
  let zeroLength = 0;
  const hitY = ws.a[8];
  const hitDy = ws.a[9];
  const lastY = ws.a[10];
  let lastT = 0;
  const gBuf = ws.gBuf;

  const sampleCoil = (tt: number): number => view!.denseComponent(IL, tt);
  const observer = (s: StepView): boolean => {
    view = s;
    if (keepLog) log.push(s.t0, s.t1, phaseIndex, prevY);
    // events at the step end
    let best = -1;
    let bestT = Infinity;
    for (let e = 0; e < events.length; e++) {
      const g1 = events[e].g(s.y1, s.dy1);
      gBuf[e] = g1;
      if (g1 <= 0 && (armed[e] || firstStep)) {
        const ev = events[e];
        const gAt = (tt: number) => {
          probe.at(tt);
          return ev.g(probe.y, probe.dy);
        };
        let ta = s.t0;
        let ga = gPrev[e];
        if (!armed[e]) {
          // not armed at the phase start (g = 0 there, e.g. a current just set to zero): look for
          // a positive value inside the step to bracket the crossing; none means the mode could
          // not hold even for a moment, so the event is at the start of the phase
          ga = 0;
          for (let q = 1; q < 8 && !(ga > 0); q++) {
            const tq = s.t0 + ((s.t1 - s.t0) * q) / 8;
            const gq = gAt(tq);
            if (gq > 0) {
              ta = tq;
              ga = gq;
            }
          }
        }
        const tr = ga > 0 ? brentZero(gAt, ta, s.t1, ga, g1, eventTol, 200, 'nonpositive') : s.t0;
        if (tr < bestT) {
          bestT = tr;
          best = e;
        }
      }
    }
    if (best >= 0) {
      probe.at(bestT);
      hitY.set(probe.y);
      hitDy.set(probe.dy);
      hitT = bestT;
      hitStepT0 = s.t0;
      hitIndex = best;
      for (let q = 0; q < trackers.length; q++) trackers[q].step(s.t0, bestT, hitY, hitDy);
      if (hitY[V] < minCapV) minCapV = hitY[V];
      coilCurve.push(s.t0, bestT, sampleCoil);
      return false;
    }
    for (let e = 0; e < events.length; e++) {
      gPrev[e] = gBuf[e];
      if (gBuf[e] > 0) armed[e] = true;
    }
    firstStep = false;
    for (let q = 0; q < trackers.length; q++) trackers[q].step(s.t0, s.t1, s.y1, s.dy1);
    if (s.y1[V] < minCapV) minCapV = s.y1[V];
    coilCurve.push(s.t0, s.t1, sampleCoil);
    prevY.set(s.y1);
    prevT = s.t1;
    lastY.set(s.y1);
    lastT = s.t1;
    return true;
  };

  for (;;) {
    // settle the mode: apply any current event already violated at the start
    let finished = false;
    let singular = false;
    for (let guard = 0; ; guard++) {
      if (modeKind(mode) === 'open' && nLoops === 0) {
        finished = true;
        break;
      }
      if (!rhs.setMode(mode)) {
        if (modeKind(mode) !== 'both') {
          warnings.push({
            code: 'circuit.singular',
            message: `The inductance matrix of the ${phaseName(mode)} phase is singular (a loop coupled with k = 1?); the shot stops at t = ${t.toPrecision(4)} s.`,
            severity: 'error',
          });
          singular = true;
          break;
        }
        // no inductance and next to no resistance between switch and diode: the commutation is
        // instantaneous; the switch current drops to zero at once (no energy is stored there)
        if (!warnings.some((w) => w.code === 'circuit.instant-commutation')) {
          warnings.push({
            code: 'circuit.instant-commutation',
            message:
              'No inductance and next to no resistance between the switch and the freewheel diode: the commutation was taken as instantaneous.',
            severity: 'info',
          });
        }
        y[IS] = 0;
        mode = { sw: 0, diode: true };
        continue;
      }
      events = modeEvents(rhs, mode);
      rhs.eval(t, y, dy);
      const bad = guard < 8 ? violatedAtStart(events, y, dy, slopeTol, curvature) : null;
      if (!bad) break;
      mode = modeAfterEvent(rhs, mode, bad.reason, t, y, dy);
    }
    if (finished || singular) break;
    rhs.setMode(mode);
    rhs.eval(t, y, dy);
    phaseIndex = phases.length;
    phases.push({ name: phaseName(mode), start_s: t, end_s: t, endReason: '' });
    phaseModes.push(mode);
    if (gPrev.length < events.length) gPrev = new Float64Array(events.length);
    armed.length = events.length;
    let decayedAt = -1;
    for (let i = 0; i < events.length; i++) {
      const g0 = events[i].g(y, dy);
      gPrev[i] = g0;
      armed[i] = g0 > 0;
      if (decayedAt < 0 && events[i].reason === 'decayed') decayedAt = i;
    }
    // nothing left to decay at the start of this phase (e.g. loops without current): the shot ends
    if (decayedAt >= 0 && !armed[decayedAt]) {
      phases.pop();
      phaseModes.pop();
      endReason = 'decayed';
      break;
    }
    for (const tr of trackers) tr.start(t, y, dy);
    prevT = t;
    prevY.set(y);
    lastY.set(y);
    lastT = t;
    hitIndex = -1;
    firstStep = true;
    if (t >= tMax) {
      phases[phaseIndex].endReason = 't-max';
      endReason = 't-max';
      break;
    }
    intOpts.maxStep = rhs.quarterPeriod(3 * scales.current_A);
    if (!Number.isFinite(intOpts.maxStep)) intOpts.maxStep = undefined;
    const res = integrator.integrate(rhs.eval, t, y, tMax, observer, intOpts);
    steps += res.steps;
    rejected += res.rejected;
    evaluations += res.evaluations;
    const conducting = modeKind(mode) !== 'open';
    if (res.outcome === 'stopped' && hitIndex >= 0) {
      eventCount++;
      // the state at the event: integrate the cut step again from its start to the event time
      // (a step no longer than one already accepted), so that it carries the integrator's own
      // accuracy rather than the dense output's, and the loss integrals come with it
      if (hitT > hitStepT0) {
        const r2 = integrator.integrate(
          rhs.eval,
          hitStepT0,
          prevY,
          hitT,
          (s) => {
            hitY.set(s.y1);
            return true;
          },
          // only the end state is wanted: no dense output, so no dense-output error control either
          { ...intOpts, initialStep: hitT - hitStepT0, denseEager: NO_COMPONENTS },
        );
        evaluations += r2.evaluations;
      }
      zeroLength = hitT > phases[phaseIndex].start_s ? 0 : zeroLength + 1;
      if (zeroLength > 20) {
        warnings.push({
          code: 'solver.chattering',
          message: `The switch and diode changed state 20 times at t = ${hitT.toPrecision(6)} s without the time advancing; the shot stops there.`,
          severity: 'error',
        });
        phases[phaseIndex].end_s = hitT;
        phases[phaseIndex].endReason = 'chattering';
        endReason = 'chattering';
        y.set(hitY);
        t = hitT;
        break;
      }
      t = hitT;
      y.set(hitY);
      const reason = events[hitIndex].reason;
      phases[phaseIndex].end_s = t;
      if (conducting) coilEnd_s = t;
      if (reason === 'decayed') {
        phases[phaseIndex].endReason = 'decayed';
        endReason = 'decayed';
        break;
      }
      const next = modeAfterEvent(rhs, mode, reason, t, y, dy);
      phases[phaseIndex].endReason =
        reason === 'switch-off' && modeKind(next) === 'open' ? 'current-zero' : reason;
      mode = next;
      continue;
    }
    // ran to t_max, or the integrator gave up
    t = lastT;
    y.set(lastY);
    phases[phaseIndex].end_s = t;
    if (conducting) coilEnd_s = t;
    endReason = res.outcome === 'step-limit' ? 'step-limit' : res.outcome === 'step-too-small' ? 'step-too-small' : 't-max';
    phases[phaseIndex].endReason = endReason;
    break;
  }
  const tEnd = t;
  if (phases.length > 0 && endReason === 'current-zero') coilEnd_s = phases[phases.length - 1].end_s;

  // ---- warnings on how the shot ended ------------------------------------------------------------
  rhs.eval(tEnd, y, dy);
  const activeEnergy = rhs.magneticEnergy(y);
  if (endReason === 't-max' && activeEnergy > DECAY_FRACTION * E0) {
    warnings.push({
      code: 'solver.t-max',
      message: `The shot reached t_max = ${tMax} s with current still flowing (stored magnetic energy ${activeEnergy.toPrecision(3)} J).`,
      severity: 'warning',
    });
  }
  if (endReason === 'step-limit') {
    warnings.push({
      code: 'solver.step-limit',
      message: `The integrator reached its step limit (${settings.maxSteps} steps in one phase) at t = ${tEnd.toPrecision(4)} s; the shot is incomplete.`,
      severity: 'error',
    });
  }
  if (endReason === 'step-too-small') {
    warnings.push({
      code: 'solver.tolerance',
      message: `The integrator could not meet the tolerance (step size underflow) at t = ${tEnd.toPrecision(4)} s; the shot is incomplete.`,
      severity: 'error',
    });
  }

  // ---- pulse widths by level crossings of the coil current -------------------------------------
  const sgn = coilTracker.valueAtMax < 0 ? -1 : 1;
  const tPk = coilTracker.time;
  const crossing = (level: number, side: 'rise' | 'fall'): number => coilCurve.crossing(level, sgn, side, tPk, eventTol);
  const peakAbs = coilTracker.maxAbs;
  const fwhm = widthAtLevel(peakAbs, 0.5, crossing, tEnd);
  const t90 = widthAtLevel(peakAbs, 0.9, crossing, tEnd);

  // ---- energy balance ---------------------------------------------------------------------------
  const loopsJ = net.loops.map((l, k) => l.heatCapacity_JpK * y[loopThetaIndex(nLoops, k)]);
  const energy = energyBalance({
    initial_J: E0,
    capacitorFinal_J: 0.5 * net.capacitance_F * y[V] * y[V],
    inductorFinal_J: activeEnergy,
    esr_J: y[accIndex(nLoops, ACC_ESR)],
    switch_J: y[accIndex(nLoops, ACC_SW)],
    cable_J: y[accIndex(nLoops, ACC_CABLE)],
    coil_J: net.coil.heatCapacity_JpK * y[TH_COIL],
    diode_J: y[accIndex(nLoops, ACC_DIODE)],
    loops_J: loopsJ,
  });
  if (energy.relativeError > ENERGY_BALANCE_WARN) {
    warnings.push({
      code: 'energy.balance',
      message: `The energy balance closes only to ${energy.relativeError.toExponential(2)} of the stored energy (limit ${ENERGY_BALANCE_WARN}).`,
      severity: 'warning',
    });
  }

  // ---- waveform, by replaying the logged steps (only when samples are asked for) ------------------
  let waveform: Waveform;
  if (keepLog) {
    let replayMode = -1;
    const replayY0 = new Float64Array(N);
    const replay = (k: number, onStep: (s: StepView) => void): void => {
      const ph = log.phase[k];
      if (ph !== replayMode) {
        rhs.setMode(phaseModes[ph]);
        replayMode = ph;
      }
      replayY0.set(log.startState(k));
      const t0 = log.t0[k];
      const t1 = log.t1[k];
      integrator.integrate(
        rhs.eval,
        t0,
        replayY0,
        t1,
        (s) => {
          onStep(s);
          return true;
        },
        { ...intOpts, initialStep: t1 - t0 },
      );
    };
    const stepEnd = (k: number): number => (k + 1 < log.count ? log.t0[k + 1] : tEnd);
    waveform = sampleWaveform(settings.samples, tEnd, y, phases, log, stepEnd, replay, net, N);
  } else {
    waveform = emptyWaveform(net);
  }

  const { figures, nonFinite } = assembleFigures({
    peakCurrent_A: coilTracker.valueAtMax,
    timeOfPeak_s: coilTracker.time,
    pulseWidthHalfMax_s: fwhm,
    timeAbove90pct_s: t90,
    endOfPulse_s: endReason === 't-max' ? tMax : coilEnd_s,
    peakField_Apm: probeTrackers.length > 0 ? probeTrackers[0].valueAtMax : 0,
    timeOfPeakField_s: probeTrackers.length > 0 ? probeTrackers[0].time : 0,
    chargeVoltage_V: net.voltage_V,
    finalCapacitorVoltage_V: y[V],
    minCapacitorVoltage_V: minCapV,
    i2tSwitch_A2s: y[accIndex(nLoops, ACC_I2T_SW)],
    i2tDiode_A2s: y[accIndex(nLoops, ACC_I2T_D)],
    peakSwitchCurrent_A: switchTracker.maxAbs,
    peakDiodeCurrent_A: diodeTracker.maxAbs,
    peakDidt_Aps: didtTracker.maxAbs,
    coilTemperatureRise_K: y[TH_COIL],
    coilInitialTemperature_C: net.coil.initialTemperature_C,
    storedEnergy_J: E0,
    energyBalanceRelativeError: energy.relativeError,
  });
  if (nonFinite.length > 0) {
    warnings.push({
      code: 'solver.non-finite',
      message: `Some figures were not finite and were set to 0: ${nonFinite.join(', ')}.`,
      severity: 'error',
    });
  }

  if (!options.integrator) releaseIntegrator(integrator);
  releaseWorkspace(ws);

  return {
    figures,
    phases,
    energy,
    loops: net.loops.map((l, k) => ({
      name: l.name,
      peakCurrent_A: loopTrackers[k].maxAbs,
      temperatureRise_K: y[loopThetaIndex(nLoops, k)],
      finalTemperature_C: l.initialTemperature_C + y[loopThetaIndex(nLoops, k)],
    })),
    probes: net.probes.map((p, i) => ({
      name: p.name,
      peakField_Apm: probeTrackers[i].maxAbs,
      timeOfPeak_s: probeTrackers[i].time,
    })),
    waveform,
    solver: {
      method: integrator.name,
      steps,
      rejectedSteps: rejected,
      functionEvaluations: evaluations,
      events: eventCount,
      relTol: settings.relTol,
      absTol: settings.absTol,
      wallTime_s: (performance.now() - wall0) / 1000,
    },
    warnings,
  };
}

/** A waveform with no samples (one empty series per loop and probe). */
function emptyWaveform(net: ReturnType<typeof buildNetwork>): Waveform {
  return {
    t_s: [],
    capacitorVoltage_V: [],
    coilCurrent_A: [],
    switchCurrent_A: [],
    diodeCurrent_A: [],
    loopCurrents_A: net.loops.map(() => []),
    field_Apm: net.probes.map(() => []),
    coilTemperature_C: [],
    loopTemperatures_C: net.loops.map(() => []),
  };
}

/**
 * Waveform on a uniform grid of `samples` points over [0, t_end] plus every phase boundary,
 * read from the dense output of the replayed steps.
 */
function sampleWaveform(
  samples: number,
  tEnd: number,
  yEnd: Float64Array,
  phases: PhaseRecord[],
  log: StepLog,
  stepEnd: (k: number) => number,
  replay: (k: number, onStep: (s: StepView) => void) => void,
  net: ReturnType<typeof buildNetwork>,
  N: number,
): Waveform {
  const nLoops = net.loops.length;
  const wf = emptyWaveform(net);
  if (!(samples > 0)) return wf;
  const times: number[] = [];
  if (samples === 1) times.push(tEnd);
  else for (let j = 0; j < samples; j++) times.push((tEnd * j) / (samples - 1));
  for (const p of phases) times.push(p.start_s);
  times.sort((a, b) => a - b);
  const uniq: number[] = [];
  for (const tt of times) if (uniq.length === 0 || tt > uniq[uniq.length - 1]) uniq.push(tt);

  const nl = net.coil.nonlinear;
  const push = (tt: number, s: Float64Array) => {
    wf.t_s.push(tt);
    wf.capacitorVoltage_V.push(s[V]);
    wf.coilCurrent_A.push(s[IL]);
    wf.switchCurrent_A.push(s[IS]);
    wf.diodeCurrent_A.push(net.diode ? s[IL] - s[IS] : 0);
    for (let k = 0; k < nLoops; k++) {
      wf.loopCurrents_A[k].push(s[loopCurrentIndex(k)]);
      wf.loopTemperatures_C[k].push(net.loops[k].initialTemperature_C + s[loopThetaIndex(nLoops, k)]);
    }
    for (let p = 0; p < net.probes.length; p++) {
      const pr = net.probes[p];
      let h = nl && p === 0 ? nl.fieldAtPart_Apm(s[IL]) : pr.coil_ApmPerA * s[IL];
      for (let k = 0; k < nLoops; k++) h += pr.loops_ApmPerA[k] * s[loopCurrentIndex(k)];
      wf.field_Apm[p].push(h);
    }
    wf.coilTemperature_C.push(net.coil.initialTemperature_C + s[TH_COIL]);
  };

  const tmp = new Float64Array(N);
  let j = 0;
  for (let k = 0; k < log.count && j < uniq.length; k++) {
    const a = log.t0[k];
    const b = stepEnd(k);
    if (uniq[j] >= b && k + 1 < log.count) continue;
    const first = j;
    let last = j;
    while (last < uniq.length && uniq[last] < b) last++;
    if (last === first) continue;
    // points in [a, b) of step k
    let next = first;
    replay(k, (s) => {
      while (next < last && uniq[next] <= s.t1) {
        const tt = Math.max(uniq[next], a);
        s.dense(tt, tmp);
        push(uniq[next], tmp);
        next++;
      }
    });
    // anything the replay did not reach (it should not happen): use the step's start state
    while (next < last) {
      push(uniq[next], log.startState(k));
      next++;
    }
    j = last;
  }
  while (j < uniq.length) {
    push(uniq[j], yEnd);
    j++;
  }
  return wf;
}
