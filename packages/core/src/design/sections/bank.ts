/** Design section `bank`: the capacitor bank (C, charge voltage, ESR, ESL). */
import type { z } from 'zod';
import type { Bank } from '../../model/station.js';
import { qty, section } from '../quantity-schema.js';

export const bankSection = section('Capacitor bank: total capacitance, charge voltage at firing, series resistance and inductance.', {
  capacitance: qty('capacitance', { positive: true, description: 'Total capacitance of the bank' }),
  voltage: qty('voltage', { positive: true, description: 'Charge voltage at the moment of firing' }),
  esr: qty('resistance', { nonNegative: true, description: 'Equivalent series resistance of the bank (0: ideal)' }).default(0),
  esl: qty('inductance', { nonNegative: true, description: 'Equivalent series inductance of the bank and its bus (0: ideal)' }).default(0),
});

export type BankDesign = z.output<typeof bankSection>;

export function bankToStation(b: BankDesign): Bank {
  return { capacitance_F: b.capacitance, voltage_V: b.voltage, esr_Ohm: b.esr, esl_H: b.esl };
}
