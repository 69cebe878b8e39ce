/** Design section `freewheel`: the crowbar diode across the load (omit or null: none). */
import type { z } from 'zod';
import type { Freewheel } from '../../model/station.js';
import { choice, qty, section } from '../quantity-schema.js';

export const FREEWHEEL_POSITIONS = ['fixture', 'bank'] as const;

export const freewheelSection = section(
  'Freewheel (crowbar) diode across the load. Omit it (or write null) for a station without one.',
  {
    position: choice(FREEWHEEL_POSITIONS, 'fixture: across the coil terminals, after the cable; bank: at the bank output, before the cable').default('fixture'),
    thresholdVoltage: qty('voltage', { nonNegative: true, description: 'Forward threshold voltage V_F0 (0: ideal)' }).default(0),
    slopeResistance: qty('resistance', { nonNegative: true, description: 'Forward slope resistance r_F (0: ideal)' }).default(0),
  },
)
  .nullable()
  .optional();

export type FreewheelDesign = z.output<typeof freewheelSection>;

export function freewheelToStation(f: FreewheelDesign): Freewheel | null {
  if (!f) return null;
  return { position: f.position, thresholdVoltage_V: f.thresholdVoltage, slopeResistance_Ohm: f.slopeResistance };
}
