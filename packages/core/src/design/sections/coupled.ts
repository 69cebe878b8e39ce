/**
 * Design section `coupled`: shorted loops magnetically coupled to the coil (a conductive
 * sleeve, a shell of the part, a shorted winding), each with L_k, R_k (at 20 °C), mutual
 * inductance to the coil M_1k, optional mutuals to the other loops, and its own field at the part.
 */
import { z } from 'zod';
import type { CoupledLoop } from '../../model/station.js';
import { qty, section, text } from '../quantity-schema.js';
import { checkThermal, resolveThermal, thermalFields } from './thermal.js';

export const coupledLoopSection = section('A shorted loop coupled to the coil.', {
  name: text('Name for reports, e.g. "sleeve"; unique'),
  inductance: qty('inductance', { positive: true, description: 'Self inductance L_k of the loop' }),
  resistance: qty('resistance', { nonNegative: true, description: 'Resistance of the loop at 20 °C' }),
  mutual: qty('inductance', { description: 'Mutual inductance to the coil M_1k (sign: same current convention as the coil)' }),
  mutualTo: z
    .record(z.string(), qty('inductance'))
    .optional()
    .meta({ description: 'Mutual inductances to other loops, by name, e.g. { shell-2: 0.8 uH }; give each pair once (or equal both ways)' }),
  fieldPerAmpere: qty('fieldPerCurrent', { description: 'Field at the part per ampere of loop current, same current convention as the coil (induced currents flow the other way, so their field subtracts)' }).default(0),
  ...thermalFields(undefined),
}).superRefine(checkThermal);

export const coupledSection = z
  .array(coupledLoopSection)
  .default([])
  .meta({ description: 'Shorted loops coupled to the coil (eddy-current paths). Default: none.' });

export type CoupledLoopDesign = z.output<typeof coupledLoopSection>;

export function coupledLoopToStation(l: CoupledLoopDesign): CoupledLoop {
  const th = resolveThermal(l);
  return {
    name: l.name,
    inductance_H: l.inductance,
    mutualToCoil_H: l.mutual,
    resistance20_Ohm: l.resistance,
    tempCoeff_perK: th.tempCoeff_perK,
    heatCapacity_JpK: th.heatCapacity_JpK,
    initialTemperature_C: l.initialTemperature,
  };
}
