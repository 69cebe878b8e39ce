/** Design section `cable`: cable or bus bars between bank and fixture (go and return). */
import type { z } from 'zod';
import type { Cable } from '../../model/station.js';
import { qty, section } from '../quantity-schema.js';

export const cableSection = section('Cable or bus bars between the bank and the fixture, both conductors. May be omitted: no cable.', {
  resistance: qty('resistance', { nonNegative: true, description: 'Loop resistance of the cable, go and return' }).default(0),
  inductance: qty('inductance', { nonNegative: true, description: 'Loop inductance of the cable, go and return' }).default(0),
}).prefault({});

export type CableDesign = z.output<typeof cableSection>;

export function cableToStation(c: CableDesign): Cable {
  return { resistance_Ohm: c.resistance, inductance_H: c.inductance };
}
