/**
 * The station design file: top-level sections, each defined in design/sections/<name>.ts
 * with the builders of design/quantity-schema.ts (numbers in SI or strings with units).
 *
 * HOW TO ADD A SECTION (one line here, the rest in your own files):
 *   1. Write design/sections/<name>.ts exporting `<name>Section`, built with qty/num/count/
 *      choice/text/section. Make it `.optional()` or give it defaults (`.prefault({})`) if a
 *      designer may leave it out; defaults are defined once, in the section.
 *   2. Add ONE line to DESIGN_SECTIONS below, e.g. `part: partSection.optional(),`.
 *   3. If the section changes the Station (e.g. coil geometry -> L, R; conductive bodies ->
 *      coupled loops), add one StationStep to STATION_STEPS in design/to-station.ts. Sections
 *      that only feed checks (ratings, part, production) are read from the parsed `Design`
 *      by their own code: `loadDesign(path).part`.
 *   4. Regenerate the docs: `pnpm tsx packages/core/scripts/design-doc.ts` (a test fails
 *      when docs/design-file.md is out of date).
 *
 * The JSON Schema (`fluxkick schema`) and docs/design-file.md are generated from this object.
 */
import { z } from 'zod';
import { text } from './quantity-schema.js';
import { bankSection } from './sections/bank.js';
import { switchSection } from './sections/switch.js';
import { freewheelSection } from './sections/freewheel.js';
import { cableSection } from './sections/cable.js';
import { coilSection } from './sections/coil.js';
import { coupledSection } from './sections/coupled.js';
import { probesSection } from './sections/probes.js';
import { solverSection } from './sections/solver.js';
import { yokeSection } from './sections/yoke.js';
import { steadySection } from './sections/steady.js';
import { partSection } from './sections/part.js';
import { ratingsSection } from './sections/ratings.js';
import { productionSection } from './sections/production.js';
import { bleederSection } from './sections/bleeder.js';
import { fixtureGeometrySection } from './sections/fixture-geometry.js';

export const DESIGN_SECTIONS = {
  name: text('Name of the station or fixture, shown in reports; default: the file name').optional(),
  notes: text('Free text kept with the design').optional(),
  bank: bankSection,
  switch: switchSection,
  freewheel: freewheelSection,
  cable: cableSection,
  coil: coilSection,
  coupled: coupledSection,
  probes: probesSection,
  solver: solverSection,
  yoke: yokeSection.optional(),
  steady: steadySection.optional(),
  part: partSection.optional(),
  ratings: ratingsSection.optional(),
  production: productionSection.optional(),
  bleeder: bleederSection.optional(),
  fixture: fixtureGeometrySection.optional(),
  // other sections: one line each (see above)
};

export const designSchema = z.strictObject(DESIGN_SECTIONS).meta({
  title: 'fluxkick station design',
  description:
    'A capacitor-discharge magnetizing station: bank, switch, freewheel diode, cable, fixture coil, coupled loops. Numbers are SI; strings carry units, e.g. "2200 uF", "1.6 kV", "35 mohm", "40 degC".',
});

/** A parsed design: every quantity SI (temperatures °C), every default applied. */
export type Design = z.output<typeof designSchema>;
/** What a design file may contain before parsing. */
export type DesignInput = z.input<typeof designSchema>;

/**
 * JSON Schema (draft 2020-12) of the design file, input side: quantities are number|string,
 * defaults shown (in SI; temperatures in °C).
 */
export function designJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(designSchema, {
    io: 'input',
    unrepresentable: 'any',
    override: (ctx) => {
      const def = (ctx.zodSchema as unknown as { _zod: { def: { type: string; defaultValue?: unknown } } })._zod.def;
      if ((def.type === 'default' || def.type === 'prefault') && ctx.jsonSchema.default === undefined) {
        const v = def.defaultValue;
        if (v !== undefined && !(typeof v === 'object' && v !== null && !Array.isArray(v) && Object.keys(v).length === 0)) {
          ctx.jsonSchema.default = v as never;
        }
      }
    },
  }) as Record<string, unknown>;
}
