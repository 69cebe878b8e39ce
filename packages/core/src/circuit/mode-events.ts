/**
 * Events of each conduction mode and the mode that follows each event (docs/model.md §3).
 *
 * Every event is a function g(y, dy) that is positive while the mode holds and crosses zero when
 * a device changes state. The engine arms an event once g > 0 has been seen, and locates the
 * crossing on the dense output on its triggered side (g ≤ 0), so the next mode starts just past
 * the switching point and its own consistency conditions hold.
 *
 *   switch-off  (switch conducting)   g = sw·i_s                     current zero in the switch
 *   diode-off   (diode conducting)    g = i_d = i_L − i_s            current zero in the diode
 *   diode-on    (diode blocking)      g = u + V_F0                   diode forward voltage reaches V_F0
 *                                     (u needs di/dt: evaluated from the state through f)
 *   switch-on   (bidirectional, off)  g = V_T0 − |V_sw| (+ tiny)     switch voltage reaches its threshold
 *   decayed     (any)                 g = W − 1e-12·½CV0²            W = magnetic energy, plus ½Cv² while
 *                                                                    the switch conducts
 *
 * Device drops are constant while conducting and vanish in the next mode, so the right-hand side
 * is smooth inside a phase and nothing chatters at a current zero.
 */
import type { CircuitRhs } from './circuit-rhs.js';
import type { Mode } from './modes.js';
import { IL, IS, V } from './state.js';

export type EventReason = 'switch-off' | 'diode-off' | 'diode-on' | 'switch-on' | 'decayed';

export interface ModeEvent {
  reason: EventReason;
  /** True for a current that reaches zero (its slope is the current's derivative). */
  current: boolean;
  g(y: Float64Array, dy: Float64Array): number;
  /** For current events: dg/dt from the state derivative. */
  slope?(y: Float64Array, dy: Float64Array): number;
}

/** Hysteresis of the bidirectional switch's turn-on, as a fraction of the charge voltage. */
export const SWITCH_HYSTERESIS = 1e-9;

/** Relative threshold of the `decayed` end condition (fraction of the stored energy). */
export const DECAY_FRACTION = 1e-12;

/**
 * One event of a mode. A class with the event's constants in fields rather than a pair of closures
 * per event: modeEvents runs at every phase of every shot, and closures cost an allocation each
 * (and a name property under tsx's keep-names), which showed in sweeps of short shots.
 */
class CircuitEvent implements ModeEvent {
  constructor(
    readonly reason: EventReason,
    readonly current: boolean,
    private readonly rhs: CircuitRhs,
    /** switch-off: the switch direction (±1); decayed: 1 if the capacitor's energy counts, else 0. */
    private readonly sw: number,
    /** diode-on: V_F0; switch-on: V_T0 + hysteresis; decayed: the energy threshold. */
    private readonly level: number,
    /** decayed: ½C. */
    private readonly halfC: number,
  ) {}

  g(y: Float64Array, dy: Float64Array): number {
    switch (this.reason) {
      case 'switch-off':
        return this.sw * y[IS];
      case 'diode-off':
        return y[IL] - y[IS];
      case 'diode-on':
        return this.rhs.nodeVoltage(y, dy) + this.level;
      case 'switch-on':
        return this.level - Math.abs(this.rhs.switchVoltage(y, dy));
      default:
        return this.rhs.magneticEnergy(y) + (this.sw !== 0 ? this.halfC * y[V] * y[V] : 0) - this.level;
    }
  }

  /** Meaningful for the current events only (callers check `current` first). */
  slope(_y: Float64Array, dy: Float64Array): number {
    return this.reason === 'switch-off' ? this.sw * dy[IS] : dy[IL] - dy[IS];
  }
}

export function modeEvents(rhs: CircuitRhs, mode: Mode): ModeEvent[] {
  const net = rhs.net;
  const out: ModeEvent[] = [];
  const sw = mode.sw;
  if (sw !== 0) out.push(new CircuitEvent('switch-off', true, rhs, sw, 0, 0));
  if (net.diode) {
    if (mode.diode) out.push(new CircuitEvent('diode-off', true, rhs, 0, 0, 0));
    else if (sw !== 0 || rhs.nLoops > 0) out.push(new CircuitEvent('diode-on', false, rhs, 0, net.diode.vF0_V, 0));
  }
  if (sw === 0 && net.switchKind === 'bidirectional') {
    const hysteresis = SWITCH_HYSTERESIS * net.voltage_V;
    out.push(new CircuitEvent('switch-on', false, rhs, 0, net.vT0_V + hysteresis, 0));
  }
  const threshold = DECAY_FRACTION * net.storedEnergy_J;
  out.push(new CircuitEvent('decayed', false, rhs, sw !== 0 ? 1 : 0, threshold, 0.5 * net.capacitance_F));
  return out;
}

/**
 * The mode after an event, with the state projected onto the new mode's constraints
 * (a current that reached zero is set to exactly zero). `dy` is scratch space.
 * Uses rhs (changes its mode) to evaluate the switch voltage where the choice depends on it.
 */
export function modeAfterEvent(rhs: CircuitRhs, mode: Mode, reason: EventReason, t: number, y: Float64Array, dy: Float64Array): Mode {
  const net = rhs.net;
  switch (reason) {
    case 'switch-off': {
      y[IS] = 0;
      if (!mode.diode) y[IL] = 0;
      const next: Mode = { sw: 0, diode: mode.diode };
      if (net.switchKind === 'bidirectional' && rhs.setMode(next)) {
        rhs.eval(t, y, dy);
        const vs = rhs.switchVoltage(y, dy);
        // the same small hysteresis as the switch-on event, so a marginal drive does not flip it
        if (-mode.sw * vs > net.vT0_V + SWITCH_HYSTERESIS * net.voltage_V) return { sw: mode.sw === 1 ? -1 : 1, diode: mode.diode };
      }
      return next;
    }
    case 'diode-on':
      return { sw: mode.sw, diode: true };
    case 'diode-off': {
      if (mode.sw !== 0) y[IS] = y[IL];
      else y[IL] = 0;
      return { sw: mode.sw, diode: false };
    }
    case 'switch-on': {
      rhs.setMode(mode);
      rhs.eval(t, y, dy);
      const vs = rhs.switchVoltage(y, dy);
      return { sw: vs > 0 ? 1 : -1, diode: mode.diode };
    }
    default:
      return mode;
  }
}

/**
 * A current event already violated at the start of a mode: the current is zero and the mode
 * would drive it negative (e.g. a switch fired with V0 below V_T0). Returns the event, or null.
 *
 * A slope within ±slopeTol is a grazing start (a diode taking over through an inductance starts
 * with zero slope); then the sign of the second derivative decides, from `curvature(e)`.
 */
export function violatedAtStart(
  events: ModeEvent[],
  y: Float64Array,
  dy: Float64Array,
  slopeTol: number,
  curvature: (e: ModeEvent) => number,
): ModeEvent | null {
  for (const e of events) {
    if (!e.current || !e.slope) continue;
    const g = e.g(y, dy);
    if (g < 0) return e;
    if (g > 0) continue;
    const s = e.slope(y, dy);
    if (s > slopeTol) continue;
    if (s < -slopeTol) return e;
    if (!(curvature(e) > 0)) return e;
  }
  return null;
}
