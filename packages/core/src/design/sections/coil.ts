/**
 * Design section `coil`: the fixture coil by its electrical values (L, R at 20 °C, field per
 * ampere at the part) and its conductor (for R(T) and the adiabatic heating).
 *
 * A coil given by its geometry (turns, bore, conductor size) is another form of this section:
 * add it as an alternative (e.g. z.union([coilSection, coilGeometrySection])) in schema.ts and
 * extend coilToStation, or resolve it in a StationStep (design/to-station.ts).
 */
import type { z } from 'zod';
import type { Coil } from '../../model/station.js';
import { qty, section } from '../quantity-schema.js';
import { checkThermalAmountOptional, hasThermalAmount, resolveThermal, thermalFields } from './thermal.js';
import { conductor as conductorMaterial } from '../../materials/conductors.js';

export const coilSection = section('Fixture coil: electrical values, conductor, and its field at the part.', {
  inductance: qty('inductance', { positive: true, description: 'Self inductance L of the coil (in its fixture); omit when a yoke section computes it' }).optional(),
  resistance: qty('resistance', { positive: true, description: 'Resistance at 20 °C; omit when a fixture section computes it' }).optional(),
  fieldPerAmpere: qty('fieldPerCurrent', { positive: true, description: 'Field at the part per ampere of coil current; omit when a yoke section computes it' }).optional(),
  ...thermalFields('copper'),
  conductorArea: qty('area', { positive: true, description: 'Cross-section of the conductor of one turn (IEC 60949 check)' }).optional(),
  conductorLength: qty('length', { positive: true, description: 'Total conductor length' }).optional(),
}).superRefine(checkThermalAmountOptional);

export type CoilDesign = z.output<typeof coilSection>;

export function coilToStation(c: CoilDesign): Coil {
  // without an amount of conductor (a fixture section gives it) the heat capacity is NaN until its StationStep fills it
  const th = hasThermalAmount(c)
    ? resolveThermal(c)
    : { heatCapacity_JpK: NaN, tempCoeff_perK: c.tempCoeff ?? (c.conductor ? conductorMaterial(c.conductor).tempCoeff20_perK : 0) };
  const coil: Coil = {
    inductance_H: c.inductance ?? NaN, // NaN only with a yoke or fixture section, whose StationStep fills it
    resistance20_Ohm: c.resistance ?? NaN, // NaN only with a fixture section
    tempCoeff_perK: th.tempCoeff_perK,
    heatCapacity_JpK: th.heatCapacity_JpK,
    initialTemperature_C: c.initialTemperature,
  };
  if (c.conductor !== undefined) coil.conductor = c.conductor;
  if ('mass_kg' in th && th.mass_kg !== undefined) coil.mass_kg = th.mass_kg;
  if (c.conductorArea !== undefined) coil.conductorArea_m2 = c.conductorArea;
  if (c.conductorLength !== undefined) coil.conductorLength_m = c.conductorLength;
  return coil;
}
