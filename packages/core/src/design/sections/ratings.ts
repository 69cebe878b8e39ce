/**
 * Design section `ratings`: the switch's, the freewheel diode's and the capacitor bank's
 * ratings, and the winding's mechanics. Feeds the verdict only (analysis/verdict-ratings.ts,
 * verdict-winding.ts). Every item left out is not judged.
 *
 * ```yaml
 * ratings:
 *   margin: 20 %                    # headroom wanted below every rating
 *   switch:    { surgeCurrent: 18 kA, surgeBasis: 10ms, i2t: 1.6e6 A^2 s, didt: 200 A/us, blockingVoltage: 2.2 kV }
 *   diode:     { surgeCurrent: 20 kA, surgeBasis: 10ms }
 *   capacitor: { voltage: 2 kV, reverse: 20 %, peakCurrent: 8 kA, units: 4 }
 *   winding:   { temper: annealed, safetyFactor: 2, radius: 32 mm, thickness: 14 mm }
 * ```
 */
import type { z } from 'zod';
import type { CapacitorRatingInput, DeviceRatingInput, RatingsJudgeInput, WindingMechanicsInput } from '../../model/judge-inputs.js';
import { SURGE_BASES, VERDICT_DEFAULTS } from '../../model/judge-inputs.js';
import { choice, count, num, qty, section } from '../quantity-schema.js';

const surgeBasis = choice(SURGE_BASES, 'Half-sine basis of the surge rating: 10ms (50 Hz) or 8.3ms (60 Hz)').default(VERDICT_DEFAULTS.surgeBasis);

const switchRatings = section('Thyristor ratings from its datasheet.', {
  surgeCurrent: qty('current', { positive: true, description: 'Non-repetitive surge current I_TSM (one half-sine)' }).optional(),
  surgeBasis,
  i2t: qty('i2t', { positive: true, description: 'Rated I²t; default: I_TSM²·t/2 from the surge rating' }).optional(),
  didt: qty('currentRate', { positive: true, description: 'Critical rate of rise of on-state current' }).optional(),
  blockingVoltage: qty('voltage', { positive: true, description: 'Repetitive peak blocking voltage V_DRM/V_RRM' }).optional(),
});

const diodeRatings = section('Freewheel diode ratings from its datasheet.', {
  surgeCurrent: qty('current', { positive: true, description: 'Non-repetitive surge current I_FSM (one half-sine)' }).optional(),
  surgeBasis,
  i2t: qty('i2t', { positive: true, description: 'Rated I²t; default: I_FSM²·t/2 from the surge rating' }).optional(),
  blockingVoltage: qty('voltage', { positive: true, description: 'Repetitive peak reverse voltage V_RRM' }).optional(),
});

const capacitorRatings = section('Capacitor ratings.', {
  voltage: qty('voltage', { positive: true, description: 'Rated voltage of the bank' }).optional(),
  reverse: num({ min: 0, max: 1, description: 'Allowed voltage reversal as a fraction of the charge voltage, e.g. 20 %' }).optional(),
  peakCurrent: qty('current', { positive: true, description: 'Rated peak current of one unit' }).optional(),
  units: count({ min: 1, description: 'Units in parallel sharing the bank current equally' }).default(1),
});

const windingMechanics = section('The winding under magnetic pressure: conductor strength and the winding\'s size.', {
  temper: choice(['annealed', 'hard'], 'Conductor temper: annealed or hard(-drawn); selects the proof stress').default(VERDICT_DEFAULTS.temper),
  proofStress: qty('pressure', { positive: true, description: "0.2 % proof stress; default: the library's value for the conductor and temper" }).optional(),
  safetyFactor: num({ min: 1, description: 'Safety factor on the proof stress' }).default(VERDICT_DEFAULTS.safetyFactor),
  radius: qty('length', { positive: true, description: 'Mean radius of the winding' }).optional(),
  thickness: qty('length', { positive: true, description: 'Radial build of the winding' }).optional(),
  field: qty('fieldStrength', { positive: true, description: 'Field at the winding; default: the largest peak field of the shot' }).optional(),
});

export const ratingsSection = section('Ratings of the switch, the diode and the bank, and the winding\'s mechanics. Used by the verdict only.', {
  margin: num({ min: 0, max: 0.95, description: 'Headroom wanted below every rating, e.g. 20 %' }).default(VERDICT_DEFAULTS.ratingMargin),
  surgeFloor: qty('time', { positive: true, description: 'Shortest pulse the equal-I²t surge rule is applied to' }).default(VERDICT_DEFAULTS.surgeFloor_s),
  switch: switchRatings.optional(),
  diode: diodeRatings.optional(),
  capacitor: capacitorRatings.optional(),
  winding: windingMechanics.optional(),
});

export type RatingsDesign = z.output<typeof ratingsSection>;

function device(d: { surgeCurrent?: number | undefined; surgeBasis: '10ms' | '8.3ms'; i2t?: number | undefined; didt?: number | undefined; blockingVoltage?: number | undefined }): DeviceRatingInput {
  const out: DeviceRatingInput = { surgeBasis: d.surgeBasis };
  if (d.surgeCurrent !== undefined) out.surgeCurrent_A = d.surgeCurrent;
  if (d.i2t !== undefined) out.i2t_A2s = d.i2t;
  if (d.didt !== undefined) out.didt_Aps = d.didt;
  if (d.blockingVoltage !== undefined) out.blockingVoltage_V = d.blockingVoltage;
  return out;
}

/** The verdict's rating inputs from the parsed section. */
export function ratingsToJudge(r: RatingsDesign): RatingsJudgeInput {
  const out: RatingsJudgeInput = { margin: r.margin, surgeFloor_s: r.surgeFloor };
  if (r.switch) out.switch = device(r.switch);
  if (r.diode) out.diode = device(r.diode);
  if (r.capacitor) {
    const c: CapacitorRatingInput = { units: r.capacitor.units };
    if (r.capacitor.voltage !== undefined) c.voltage_V = r.capacitor.voltage;
    if (r.capacitor.reverse !== undefined) c.reverse_pct = r.capacitor.reverse * 100;
    if (r.capacitor.peakCurrent !== undefined) c.peakCurrent_A = r.capacitor.peakCurrent;
    out.capacitor = c;
  }
  if (r.winding) {
    const w: WindingMechanicsInput = { temper: r.winding.temper, safetyFactor: r.winding.safetyFactor };
    if (r.winding.proofStress !== undefined) w.proofStress_Pa = r.winding.proofStress;
    if (r.winding.radius !== undefined) w.windingRadius_m = r.winding.radius;
    if (r.winding.thickness !== undefined) w.windingThickness_m = r.winding.thickness;
    if (r.winding.field !== undefined) w.windingField_Apm = r.winding.field;
    out.winding = w;
  }
  return out;
}
