/**
 * Design section `probes`: extra points where the field is reported, besides the part
 * (probe 0, built from coil.fieldPerAmpere and each loop's fieldPerAmpere).
 */
import { z } from 'zod';
import { qty, section, text } from '../quantity-schema.js';

export const probeSection = section('A point where the field is reported.', {
  name: text('Name for reports, e.g. "coil centre"'),
  fieldPerAmpere: qty('fieldPerCurrent', { description: 'Field at this point per ampere of coil current' }),
  loops: z
    .record(z.string(), qty('fieldPerCurrent'))
    .optional()
    .meta({ description: 'Field at this point per ampere of each coupled loop, by loop name (missing loops: 0)' }),
});

export const probesSection = z.array(probeSection).default([]).meta({ description: 'Extra field points (the part is always the first probe). Default: none.' });

export type ProbeDesign = z.output<typeof probeSection>;
