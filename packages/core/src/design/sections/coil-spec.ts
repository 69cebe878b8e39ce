/**
 * `fluxkick coil <spec>`: a file with just the fixture geometry (the fields of the design's
 * `fixture` section at the top level, a name, and the part's grade), or a whole design file with
 * a `fixture` section, turned into the coil's figures (design/sections/fixture-geometry.ts,
 * magnetics/fixture.ts) and, with conductive bodies, the step response of the field at the part's
 * centre (magnetics/eddy-step.ts).
 *
 * Kept apart from fixture-geometry.ts, which the design schema imports: this module reads files
 * through design/parse.ts, which imports the schema.
 */
import { z } from 'zod';
import type { Design } from '../schema.js';
import { buildFixture, type FixtureBuild } from '../../magnetics/fixture.js';
import { stepField, stepModes } from '../../magnetics/eddy-step.js';
import { MAGNET_GRADE_IDS } from '../../materials/magnet-grades.js';
import { InputError } from '../errors.js';
import { parseWithSchema } from '../issues.js';
import { parseDesign, readDesignText, readStructuredText } from '../parse.js';
import { choice, qty, text } from '../quantity-schema.js';
import { fixtureBuildOf, fixtureGeometrySection, fixtureToSpec } from './fixture-geometry.js';

const GRADE_IDS = MAGNET_GRADE_IDS as unknown as readonly [string, ...string[]];

/** A coil spec file: the fields of the `fixture` section at the top level, a name, and the part's grade. */
export const coilSpecSchema = z.strictObject({
  name: text('Name for the report').optional(),
  ...fixtureGeometrySection.shape,
  grade: choice(GRADE_IDS, `The part's magnet grade (for its resistivity): ${MAGNET_GRADE_IDS.join(', ')}`).optional(),
  initialTemperature: qty('temperature', { min: -273.15, description: 'Temperature of the part and bodies' }).default(20),
});

export interface CoilSpecResult {
  name: string;
  build: FixtureBuild;
  notes: string[];
  /** Time for the field at the part's centre (probe 0) to reach 50 % and 90 % of its final value after a step of coil current, s (null without conductive bodies). */
  stepResponse: { t50_s: number; t90_s: number } | null;
}

/** Time for the probe-0 field to reach `fraction` of its final value after a unit step of coil current (bisection on the modal solution). */
function stepTime(modes: ReturnType<typeof stepModes>, fraction: number): number {
  const target = fraction * modes.coil_ApmPerA;
  if (stepField(modes, 0) >= target) return 0;
  let hi = Math.max(...modes.timeConstants_s);
  while (stepField(modes, hi) < target && hi < 1e6) hi *= 2;
  let lo = 0;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (stepField(modes, mid) < target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

function finishSpec(name: string, build: FixtureBuild, notes: string[]): CoilSpecResult {
  let stepResponse: CoilSpecResult['stepResponse'] = null;
  if (build.coupled.length > 0) {
    const modes = stepModes({ L: build.loopMutual_H, R: build.coupled.map((l) => l.resistance20_Ohm), coilMutual_H: build.coupled.map((l) => l.mutualToCoil_H) }, build.probes[0]!.coil_ApmPerA, build.probes[0]!.loops_ApmPerA);
    stepResponse = { t50_s: stepTime(modes, 0.5), t90_s: stepTime(modes, 0.9) };
  }
  return { name, build, notes, stepResponse };
}

/**
 * Parse a coil spec (YAML or JSON): the fixture geometry alone (windings, part, bodies, points,
 * grade), or a whole design file with a `fixture` section. Throws InputError for bad input.
 */
export function parseCoilSpec(textIn: string, fileName = 'coil.yaml'): CoilSpecResult {
  if (textIn.trim() === '') {
    throw new InputError({ code: 'file.empty', path: '', value: undefined, problem: 'the file is empty', expected: 'a coil spec with at least `windings:` (see `fluxkick coil --help`)' }, fileName);
  }
  const { data, locate } = readStructuredText(textIn, fileName);
  const base = fileName.replace(/^.*[\\/]/, '').replace(/\.[^.]*$/, '');
  if (data && typeof data === 'object' && !Array.isArray(data) && ('bank' in data || 'fixture' in data)) {
    const design = parseDesign(textIn, fileName);
    const made = fixtureBuildOf(design);
    if (!made) throw new InputError({ code: 'design.missing-field', path: 'fixture', value: undefined, problem: 'the design has no fixture section', expected: 'a `fixture` section with the windings (or a coil spec file)' }, fileName);
    return finishSpec(design.name ?? base, made.build, made.notes);
  }
  const spec = parseWithSchema(coilSpecSchema, data, { file: fileName, locate });
  const { name, grade, initialTemperature, ...fx } = spec;
  const pseudo = { coil: { initialTemperature }, ...(grade ? { part: { grade } } : {}) } as unknown as Design;
  const { spec: geo, notes } = fixtureToSpec(pseudo, fx);
  let build: FixtureBuild;
  try {
    build = buildFixture(geo);
  } catch (e) {
    if (e instanceof InputError) throw new InputError(e.issues, fileName);
    throw e;
  }
  return finishSpec(name ?? base, build, [...notes, ...build.info.notes]);
}

/** Read and parse a coil spec file. */
export function loadCoilSpec(path: string): CoilSpecResult {
  return parseCoilSpec(readDesignText(path), path);
}

/** Machine-readable report of a coil spec (SI units; keys stable). */
export function coilSpecJson(r: CoilSpecResult): Record<string, unknown> {
  const i = r.build.info;
  return {
    name: r.name,
    coil: {
      turns: i.turns,
      conductorLength_m: i.conductorLength_m,
      resistance20_Ohm: i.resistance20_Ohm,
      inductance_H: i.inductance_H,
      mass_kg: i.mass_kg,
      heatCapacity_JpK: i.heatCapacity_JpK,
      tempCoeff_perK: r.build.coil.tempCoeff_perK,
      conductor: r.build.coil.conductor ?? null,
      conductorArea_m2: r.build.coil.conductorArea_m2 ?? null,
    },
    windings: i.windings.map((w, k) => ({ ...w, inductance_H: i.windingInductances_H[k] })),
    estimates: i.estimates,
    probes: r.build.probes.map((p, k) => ({ name: p.name, r_m: i.probePoints[k]!.r_m, z_m: i.probePoints[k]!.z_m, coil_ApmPerA: p.coil_ApmPerA })),
    partField: i.partField ?? null,
    bodies: i.bodies,
    loops: r.build.coupled.map((l) => ({ name: l.name, inductance_H: l.inductance_H, mutualToCoil_H: l.mutualToCoil_H, resistance20_Ohm: l.resistance20_Ohm, heatCapacity_JpK: l.heatCapacity_JpK })),
    stepResponse: r.stepResponse,
    notes: r.notes,
  };
}
