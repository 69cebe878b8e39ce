/**
 * Design section `part`: the magnet part the station must saturate. Feeds the verdict only
 * (analysis/verdict-part.ts); the Station is unchanged.
 *
 * ```yaml
 * part:
 *   grade: ndfeb-sh                 # library grade (materials/magnet-grades.ts)
 *   requiredField: 3.0 MA/m         # default: the grade's saturation field
 *   fieldMargin: 10 %               # warn when the peak field has less headroom than this
 *   datasheet:                      # the grade's datasheet wins over the library
 *     saturationField: 3.2 MA/m
 *     maxWorkingTemperature: 150 degC
 * ```
 */
import type { z } from 'zod';
import type { PartJudgeInput } from '../../model/judge-inputs.js';
import { VERDICT_DEFAULTS } from '../../model/judge-inputs.js';
import { MAGNET_GRADE_IDS, type MagnetOverrides } from '../../materials/magnet-grades.js';
import { choice, num, qty, section, text } from '../quantity-schema.js';

const GRADES = MAGNET_GRADE_IDS as unknown as readonly [string, ...string[]];

const datasheetSection = section("Values from the grade's datasheet; each replaces the library's typical value.", {
  saturationField: qty('fieldStrength', { positive: true, description: 'Applied field for full saturation from the thermally demagnetized state' }).optional(),
  intrinsicCoercivity: qty('fieldStrength', { positive: true, description: 'Intrinsic coercivity H_cJ at 20 °C' }).optional(),
  remanence: qty('fluxDensity', { positive: true, description: 'Remanence B_r at 20 °C' }).optional(),
  resistivity: qty('resistivity', { positive: true, description: 'Electrical resistivity' }).optional(),
  recoilPermeability: num({ min: 1, description: 'Relative recoil permeability' }).optional(),
  curieTemperature: qty('temperature', { description: 'Curie temperature' }).optional(),
  maxWorkingTemperature: qty('temperature', { description: 'Highest working temperature of the part' }).optional(),
});

export const partSection = section('The magnet part: grade, the field it needs and the headroom wanted. Used by the verdict only.', {
  grade: choice(GRADES, `Magnet grade from the library: ${MAGNET_GRADE_IDS.join(', ')}`),
  requiredField: qty('fieldStrength', { positive: true, description: "Field the part must see; default: the grade's saturation field" }).optional(),
  fieldMargin: num({ min: 0, description: 'Headroom wanted above the required field (warn below it)' }).default(VERDICT_DEFAULTS.fieldMargin),
  temperatureMargin: qty('temperatureDifference', { nonNegative: true, description: "Headroom wanted below the part's maximum working temperature" }).default(VERDICT_DEFAULTS.temperatureMargin_K),
  loopPrefix: text('Coupled loops whose name starts with this belong to the part (their heating is the part\'s)').default(VERDICT_DEFAULTS.partLoopPrefix),
  switchingSpread: num({ positive: true, max: 3, description: 'Log-spread σ of the saturation estimate; default by the grade\'s coercivity mechanism' }).optional(),
  datasheet: datasheetSection.optional(),
});

export type PartDesign = z.output<typeof partSection>;

/** The verdict's part inputs from the parsed section. */
export function partToJudge(p: PartDesign): PartJudgeInput {
  const out: PartJudgeInput = { grade: p.grade, fieldMargin: p.fieldMargin, temperatureMargin_K: p.temperatureMargin, loopPrefix: p.loopPrefix };
  if (p.requiredField !== undefined) out.requiredField_Apm = p.requiredField;
  if (p.switchingSpread !== undefined) out.switchingSpread = p.switchingSpread;
  const d = p.datasheet;
  if (d) {
    const o: MagnetOverrides = {};
    if (d.saturationField !== undefined) o.saturationField_Apm = d.saturationField;
    if (d.intrinsicCoercivity !== undefined) o.intrinsicCoercivity_Apm = d.intrinsicCoercivity;
    if (d.remanence !== undefined) o.remanence_T = d.remanence;
    if (d.resistivity !== undefined) o.resistivity_Ohm_m = d.resistivity;
    if (d.recoilPermeability !== undefined) o.recoilPermeability = d.recoilPermeability;
    if (d.curieTemperature !== undefined) o.curieTemperature_C = d.curieTemperature;
    if (d.maxWorkingTemperature !== undefined) o.maxWorkingTemperature_C = d.maxWorkingTemperature;
    out.overrides = o;
  }
  return out;
}
