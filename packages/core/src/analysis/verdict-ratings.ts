/**
 * Verdict items about device and capacitor ratings (analysis/ratings.ts):
 *   switch.surge, diode.surge      peak current vs the surge rating scaled to the pulse's
 *                                  equivalent half-sine (equal-I²t rule, floored; approximation)
 *   switch.i2t, diode.i2t          I²t vs the rated I²t (given, or I_TSM²·t_base/2)
 *   switch.didt                    peak di/dt vs the critical rate of rise
 *   switch.blocking, diode.blocking  charge voltage vs the blocking voltage
 *   capacitor.voltage              charge voltage vs rated voltage
 *   capacitor.reverse              voltage reversal % vs the allowed %
 *   capacitor.peak-current         peak bank current per unit vs the unit's rating
 * margin = 1 − value/limit for all; warn below the user's rating margin, fail beyond the rating.
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { VerdictItem } from '../model/verdict.js';
import { allowedSurgeCurrent_A, equivalentHalfSineDuration_s, ratedI2t_A2s, surgeBasisDuration_s } from './ratings.js';
import { VERDICT_DEFAULTS, type DeviceRatingInput, type RatingsJudgeInput } from '../model/judge-inputs.js';
import { judgedItem, marginAtMost } from './verdict-item.js';

function atMost(id: string, item: string, value: number, limit: number, unit: string, note: string, required: number): VerdictItem {
  return judgedItem({ id, item, value, limit, unit, margin: marginAtMost(value, limit), note }, required);
}

const ms = (t: number) => `${Number((t * 1e3).toPrecision(3))} ms`;
const kA = (i: number) => `${Number((i / 1e3).toPrecision(4))} kA`;
const basisText = (b: string) => b.replace('ms', ' ms');

function judgeDevice(
  key: 'switch' | 'diode',
  label: string,
  d: DeviceRatingInput,
  peak_A: number,
  i2t_A2s: number,
  didt_Aps: number | undefined,
  chargeVoltage_V: number,
  required: number,
  floor_s: number,
): VerdictItem[] {
  const items: VerdictItem[] = [];
  const basis = d.surgeBasis ?? VERDICT_DEFAULTS.surgeBasis;
  const tBase = surgeBasisDuration_s(basis);
  const mTxt = `${Number((required * 100).toPrecision(3))} % headroom wanted`;
  if (d.surgeCurrent_A !== undefined) {
    const tEq = equivalentHalfSineDuration_s(peak_A, i2t_A2s);
    const allowed = allowedSurgeCurrent_A(d.surgeCurrent_A, tBase, tEq, floor_s);
    items.push(
      atMost(
        `${key}.surge`,
        `${label} peak current vs surge rating`,
        Math.abs(peak_A),
        allowed,
        'A',
        `surge rating ${kA(d.surgeCurrent_A)} (${basisText(basis)} half-sine, user setting) scaled to the pulse's equivalent half-sine of ${ms(tEq)} by √(t_base/t), t ≥ ${ms(floor_s)}: equal-I²t rule, an approximation (common practice); the maker's surge curve wins; ${mTxt}.`,
        required,
      ),
    );
  }
  if (d.i2t_A2s !== undefined || d.surgeCurrent_A !== undefined) {
    const rated = ratedI2t_A2s(d.surgeCurrent_A ?? Number.NaN, tBase, d.i2t_A2s);
    const src = d.i2t_A2s !== undefined ? 'rated I²t (user setting)' : `rating from the surge rating by I²t = I_TSM²·t/2 (${basisText(basis)} half-sine)`;
    items.push(atMost(`${key}.i2t`, `${label} I²t`, i2t_A2s, rated, 'A²s', `${src}; ${mTxt}.`, required));
  }
  if (didt_Aps !== undefined && d.didt_Aps !== undefined) {
    items.push(atMost(`${key}.didt`, `${label} di/dt`, Math.abs(didt_Aps), d.didt_Aps, 'A/s', `critical rate of rise of on-state current (user setting); ${mTxt}. If high: more inductance before the switch.`, required));
  }
  if (d.blockingVoltage_V !== undefined) {
    items.push(atMost(`${key}.blocking`, `${label} blocking voltage`, chargeVoltage_V, d.blockingVoltage_V, 'V', `charge voltage against the repetitive peak blocking voltage (user setting); ${mTxt}.`, required));
  }
  return items;
}

export function judgeRatings(station: Station, result: ShotResult, r: RatingsJudgeInput): VerdictItem[] {
  const items: VerdictItem[] = [];
  const required = r.margin ?? VERDICT_DEFAULTS.ratingMargin;
  const floor = r.surgeFloor_s ?? VERDICT_DEFAULTS.surgeFloor_s;
  const f = result.figures;
  const V0 = station.bank.voltage_V;
  const switchPeak = Number.isFinite(f.peakSwitchCurrent_A) ? f.peakSwitchCurrent_A : f.peakCurrent_A;
  if (r.switch) items.push(...judgeDevice('switch', 'Switch', r.switch, switchPeak, f.i2tSwitch_A2s, f.peakDidt_Aps, V0, required, floor));
  if (r.diode) {
    if (station.freewheel === null) {
      // Ratings given for a diode the station does not have: nothing flows, nothing to judge.
    } else {
      items.push(...judgeDevice('diode', 'Freewheel diode', r.diode, f.peakDiodeCurrent_A, f.i2tDiode_A2s, undefined, V0, required, floor));
    }
  }
  const c = r.capacitor;
  if (c) {
    const mTxt = `${Number((required * 100).toPrecision(3))} % headroom wanted`;
    if (c.voltage_V !== undefined) {
      items.push(atMost('capacitor.voltage', 'Capacitor charge voltage', V0, c.voltage_V, 'V', `rated voltage (user setting); ${mTxt}.`, required));
    }
    if (c.reverse_pct !== undefined) {
      items.push(
        atMost(
          'capacitor.reverse',
          'Capacitor voltage reversal',
          f.reverseVoltage_pct,
          c.reverse_pct,
          '%',
          `allowed reversal (user setting); ${mTxt}. If high: a freewheel diode, or one nearer the bank.`,
          required,
        ),
      );
    }
    if (c.peakCurrent_A !== undefined) {
      const n = c.units ?? 1;
      items.push(
        atMost(
          'capacitor.peak-current',
          n > 1 ? `Capacitor peak current per unit (${n} in parallel)` : 'Capacitor peak current',
          Math.abs(switchPeak) / n,
          c.peakCurrent_A,
          'A',
          `rated peak current of one unit (user setting)${n > 1 ? ', bank current shared equally' : ''}; ${mTxt}.`,
          required,
        ),
      );
    }
  }
  return items;
}
