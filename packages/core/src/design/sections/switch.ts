/** Design section `switch`: the firing switch (thyristor, or thyristor with antiparallel diode). */
import type { z } from 'zod';
import type { Switch } from '../../model/station.js';
import { choice, qty, section } from '../quantity-schema.js';

export const SWITCH_KINDS = ['thyristor', 'bidirectional'] as const;

export const switchSection = section(
  'Firing switch. thyristor: conducts forward, blocks reverse after current zero. bidirectional: thyristor with antiparallel diode, the circuit rings on (demagnetizing pulse). May be omitted: an ideal thyristor.',
  {
    kind: choice(SWITCH_KINDS, 'thyristor or bidirectional').default('thyristor'),
    thresholdVoltage: qty('voltage', { nonNegative: true, description: 'On-state threshold voltage V_T0 (0: ideal)' }).default(0),
    slopeResistance: qty('resistance', { nonNegative: true, description: 'On-state slope resistance r_T (0: ideal)' }).default(0),
  },
).prefault({});

export type SwitchDesign = z.output<typeof switchSection>;

export function switchToStation(s: SwitchDesign): Switch {
  return { kind: s.kind, thresholdVoltage_V: s.thresholdVoltage, slopeResistance_Ohm: s.slopeResistance };
}
