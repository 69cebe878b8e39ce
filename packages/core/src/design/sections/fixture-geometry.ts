/**
 * Design section `fixture`: the fixture by its geometry. Windings on one axis give the coil's
 * inductance, resistance, heat capacity and field per ampere; conductive bodies (the part, a
 * sleeve, a hub, a shaft, the housing) become coupled loops; the part's centre, surface and
 * weakest point become the field probes (magnetics/fixture.ts).
 *
 * ```yaml
 * fixture:
 *   windings:
 *     - innerRadius: 14 mm
 *       layers: 20                 # or outerRadius: 34 mm
 *       length: 41 mm
 *       turnsPerLayer: 40          # default: as many as fit the length
 *       conductor: { shape: round, diameter: 0.95 mm, insulationBuild: 0.05 mm }   # or awg: 18
 *       # conductor: { shape: rectangular, width: 3 mm, height: 1.2 mm, insulationBuild: 0.1 mm }
 *       packingFactor: 0.95        # or fillFactor: 0.6 (copper area / window area)
 *   part:                          # the part's geometry; it conducts when its grade does
 *     outerRadius: 10 mm
 *     length: 20 mm
 *   bodies:
 *     - { name: sleeve, innerRadius: 10.5 mm, outerRadius: 12 mm, length: 24 mm, material: stainless }
 *   points:
 *     - { name: coil end, r: 0 mm, z: 20 mm }
 * ```
 *
 * With a `fixture` section the coil section may leave out inductance, resistance, field per
 * ampere and the amount of conductor (mass, volume or heat capacity): they are computed. When
 * they are given as well, the given values win (a measured value beats a computed one) and
 * `fluxkick check` shows both. The part conducts with the resistivity of its grade (`part.grade`,
 * overridden by `part.datasheet.resistivity` or `fixture.part.resistivity`); a grade that is
 * practically insulating (ferrite, bonded NdFeB: above 1e-3 Ω·m) makes no loops.
 */
import { z } from 'zod';
import type { Design } from '../schema.js';
import type { CoupledLoop, FieldProbe, Station } from '../../model/station.js';
import { BODY_METALS, BODY_METAL_NAMES, MAGNET_FAMILY_THERMAL, magnetBodyMaterial, type BodyMaterial, type BodyMetal } from '../../magnetics/body-materials.js';
import { buildFixture, type FixtureBuild, type FixtureGeometrySpec, type PartGeometry } from '../../magnetics/fixture.js';
import type { BodySpec } from '../../magnetics/shells.js';
import type { ConductorSpec, WindingSpec } from '../../magnetics/winding.js';
import { parseAwg } from '../../magnetics/wire-gauge.js';
import { applyMagnetOverrides, magnetGrade } from '../../materials/magnet-grades.js';
import { CONDUCTOR_NAMES } from '../../materials/conductors.js';
import { InputError, type InputIssue } from '../errors.js';
import { choice, count, num, qty, section, text, type IssueFacts } from '../quantity-schema.js';
import type { DescribedSection } from '../describe.js';
import { formatQuantity, formatNumber } from '../../units/format.js';

/** Resistivity above which a part is treated as insulating (no eddy loops), Ω·m. */
export const INSULATING_RESISTIVITY_Ohm_m = 1e-3;

const roundConductor = section('Round wire: bare diameter (or AWG size, ASTM B258) and insulation build.', {
  shape: z.literal('round'),
  diameter: qty('length', { positive: true, description: 'Bare diameter (give this or awg)' }).optional(),
  awg: z.union([z.number().int(), z.string()]).optional().meta({ description: 'AWG size, ASTM B258: 18, "4/0", "AWG 10" (give this or diameter)' }),
  insulationBuild: qty('length', { nonNegative: true, description: 'Increase of the diameter due to insulation (both sides together)' }).default(0),
});

const rectangularConductor = section('Rectangular (strip) conductor: bare width along the axis × height across the winding.', {
  shape: z.literal('rectangular'),
  width: qty('length', { positive: true, description: 'Bare width along the coil axis' }),
  height: qty('length', { positive: true, description: 'Bare height across the winding (radial)' }),
  cornerRadius: qty('length', { nonNegative: true, description: 'Corner radius of the bare conductor' }).default(0),
  insulationBuild: qty('length', { nonNegative: true, description: 'Increase of each outer dimension due to insulation (both sides together)' }).default(0),
});

const windingSection = section('A winding of rectangular cross-section on the common axis.', {
  name: text('Name for reports; default "winding 1", "winding 2", …').optional(),
  innerRadius: qty('length', { positive: true, description: 'Inner radius of the winding' }),
  outerRadius: qty('length', { positive: true, description: 'Outer radius of the winding (give this or layers, or both)' }).optional(),
  layers: count({ min: 1, description: 'Number of layers (give this or outerRadius, or both)' }).optional(),
  length: qty('length', { positive: true, description: 'Winding length along the axis' }),
  turnsPerLayer: count({ min: 1, description: 'Turns per layer; default: as many as fit the length' }).optional(),
  centre: qty('length', { description: "Axial position of the winding's centre" }).default(0),
  conductor: z.discriminatedUnion('shape', [roundConductor, rectangularConductor]).meta({ description: 'The conductor: { shape: round, … } or { shape: rectangular, … }' }),
  packingFactor: num({ positive: true, max: 1, description: 'Fraction of the ideal square stacking achieved (pitches grow by 1/√f); default 1' }).optional(),
  fillFactor: num({ positive: true, max: 1, description: 'Copper area / window area; sets the pitches instead of packingFactor' }).optional(),
  metal: choice(CONDUCTOR_NAMES, 'Conductor metal').default('copper'),
  sense: choice(['aiding', 'opposing'], 'Current sense relative to the first winding (windings are in series)').default('aiding'),
}).superRefine((w, ctx) => {
  const add = (path: string, facts: IssueFacts) => ctx.addIssue({ code: 'custom', path: [path], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  if (w.outerRadius === undefined && w.layers === undefined) add('layers', { code: 'design.missing-field', problem: 'missing: neither layers nor outerRadius is given', expected: 'layers (e.g. 12) or outerRadius (e.g. 34 mm)' });
  if (w.outerRadius !== undefined && w.outerRadius <= w.innerRadius) add('outerRadius', { code: 'design.out-of-range', problem: 'not greater than innerRadius', expected: `an outer radius above ${formatQuantity(w.innerRadius, 'm')}` });
  if (w.packingFactor !== undefined && w.fillFactor !== undefined) add('fillFactor', { code: 'design.inconsistent', problem: 'both packingFactor and fillFactor are given', expected: 'one of packingFactor or fillFactor' });
  const c = w.conductor;
  if (c.shape === 'round') {
    if (c.diameter === undefined && c.awg === undefined) add('conductor', { code: 'design.missing-field', problem: 'missing: a round conductor needs a size', expected: 'diameter (e.g. 1.2 mm) or awg (e.g. 16)' });
    if (c.awg !== undefined && parseAwg(c.awg) === null) ctx.addIssue({ code: 'custom', path: ['conductor', 'awg'], message: 'not an AWG size', params: { fluxkick: { code: 'design.out-of-range', problem: `${JSON.stringify(c.awg)} is not an AWG size`, expected: 'an AWG size from 4/0 (0000) to 56, e.g. 18 or "2/0"' } } });
  }
});

const materialFields = {
  resistivity: qty('resistivity', { positive: true, description: "Resistivity at 20 °C; overrides the material's" }).optional(),
  density: qty('density', { positive: true, description: "Density; overrides the material's" }).optional(),
  specificHeat: qty('specificHeat', { positive: true, description: "Specific heat; overrides the material's" }).optional(),
  tempCoeff: qty('tempCoeff', { description: "Temperature coefficient of resistivity at 20 °C; overrides the material's" }).optional(),
};

const meshFields = {
  radialShells: count({ min: 1, max: 64, description: 'Radial shells of the eddy model (default 10 for a solid body, 10 × wall/outer radius for a tube, at least 2; equal shells)' }).optional(),
  axialSlices: count({ min: 1, max: 64, description: 'Axial slices (default: length/outer radius, from 1 to 8)' }).optional(),
  grading: num({ min: 1, max: 3, description: 'Thickness ratio of neighbouring shells, inner/outer (default 1: equal)' }).optional(),
};

const partGeometrySection = section("The part's geometry (a coaxial cylinder or ring). It conducts with its grade's resistivity.", {
  innerRadius: qty('length', { nonNegative: true, description: 'Bore of a ring part; 0 for a solid part' }).default(0),
  outerRadius: qty('length', { positive: true, description: 'Outer radius' }),
  length: qty('length', { positive: true, description: 'Length along the axis' }),
  centre: qty('length', { description: "Axial position of the part's centre" }).default(0),
  conductive: z.boolean().optional().meta({ description: 'Whether the part carries eddy currents; default: when its resistivity is below 1e-3 Ω·m' }),
  ...materialFields,
  ...meshFields,
});

const bodySection = section('A conductive body on the axis (sleeve, hub, shaft, housing): a cylinder or tube.', {
  name: text('Name for reports, e.g. "sleeve"; unique ("part" is the part)'),
  innerRadius: qty('length', { nonNegative: true, description: 'Bore; 0 for a solid cylinder' }).default(0),
  outerRadius: qty('length', { positive: true, description: 'Outer radius' }),
  length: qty('length', { positive: true, description: 'Length along the axis' }),
  centre: qty('length', { description: 'Axial position of its centre' }).default(0),
  material: choice(BODY_METAL_NAMES as unknown as readonly [BodyMetal, ...BodyMetal[]], `Material: ${BODY_METAL_NAMES.join(', ')} (or give resistivity, density and specificHeat)`).optional(),
  ...materialFields,
  ...meshFields,
}).superRefine((b, ctx) => {
  if (b.material === undefined && (b.resistivity === undefined || b.density === undefined || b.specificHeat === undefined)) {
    const missing = (['resistivity', 'density', 'specificHeat'] as const).find((k) => b[k] === undefined)!;
    const facts: IssueFacts = { code: 'design.missing-field', problem: 'missing: a body needs a material', expected: `material (${BODY_METAL_NAMES.join(', ')}) or resistivity, density and specificHeat` };
    ctx.addIssue({ code: 'custom', path: [missing], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  }
  if (b.outerRadius <= b.innerRadius) {
    const facts: IssueFacts = { code: 'design.out-of-range', problem: 'not greater than innerRadius', expected: `an outer radius above ${formatQuantity(b.innerRadius, 'm')}` };
    ctx.addIssue({ code: 'custom', path: ['outerRadius'], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  }
});

const pointSection = section('A point where the field is reported.', {
  name: text('Name for reports'),
  r: qty('length', { nonNegative: true, description: 'Distance from the axis' }).default(0),
  z: qty('length', { description: 'Axial position' }),
});

export const fixtureGeometrySection = section('The fixture by its geometry: windings, the part, conductive bodies, extra field points.', {
  windings: z.array(windingSection).min(1).meta({ description: 'Windings on the common axis, in series' }),
  part: partGeometrySection.optional(),
  bodies: z.array(bodySection).default([]).meta({ description: 'Conductive bodies besides the part' }),
  points: z.array(pointSection).default([]).meta({ description: "Extra field points, reported after the part's probes" }),
  bodyTemperature: qty('temperature', { min: -273.15, description: "Temperature of the part and the bodies at firing; default: the coil's initial temperature" }).optional(),
});

export type FixtureGeometryDesign = z.output<typeof fixtureGeometrySection>;
type WindingDesign = z.output<typeof windingSection>;
type BodyDesign = z.output<typeof bodySection>;

function withOverrides(base: BodyMaterial, o: { resistivity?: number | undefined; density?: number | undefined; specificHeat?: number | undefined; tempCoeff?: number | undefined }): BodyMaterial {
  const m = { ...base };
  let changed = false;
  if (o.resistivity !== undefined) (m.resistivity20_Ohm_m = o.resistivity), (changed = true);
  if (o.density !== undefined) (m.density_kgpm3 = o.density), (changed = true);
  if (o.specificHeat !== undefined) (m.specificHeat_JpkgK = o.specificHeat), (changed = true);
  if (o.tempCoeff !== undefined) (m.tempCoeff20_perK = o.tempCoeff), (changed = true);
  if (changed) m.source = `${base.source}; some values from the design file`;
  return m;
}

function windingToSpec(w: WindingDesign, i: number): WindingSpec {
  const c = w.conductor;
  let conductor: ConductorSpec;
  if (c.shape === 'round') {
    conductor = { shape: 'round', insulationBuild_m: c.insulationBuild };
    if (c.diameter !== undefined) conductor.diameter_m = c.diameter;
    if (c.awg !== undefined) conductor.awg = parseAwg(c.awg)!;
  } else {
    conductor = { shape: 'rectangular', width_m: c.width, height_m: c.height, cornerRadius_m: c.cornerRadius, insulationBuild_m: c.insulationBuild };
  }
  const s: WindingSpec = { name: w.name ?? `winding ${i + 1}`, innerRadius_m: w.innerRadius, length_m: w.length, centre_m: w.centre, conductor, metal: w.metal, sense: w.sense };
  if (w.outerRadius !== undefined) s.outerRadius_m = w.outerRadius;
  if (w.layers !== undefined) s.layers = w.layers;
  if (w.turnsPerLayer !== undefined) s.turnsPerLayer = w.turnsPerLayer;
  if (w.packingFactor !== undefined) s.packingFactor = w.packingFactor;
  if (w.fillFactor !== undefined) s.fillFactor = w.fillFactor;
  return s;
}

function meshOf<T extends { radialShells?: number | undefined; axialSlices?: number | undefined; grading?: number | undefined }>(d: T): Pick<BodySpec, 'radialShells' | 'axialSlices' | 'grading'> {
  const o: Pick<BodySpec, 'radialShells' | 'axialSlices' | 'grading'> = {};
  if (d.radialShells !== undefined) o.radialShells = d.radialShells;
  if (d.axialSlices !== undefined) o.axialSlices = d.axialSlices;
  if (d.grading !== undefined) o.grading = d.grading;
  return o;
}

function bodyToSpec(b: BodyDesign): BodySpec {
  const base: BodyMaterial = b.material
    ? BODY_METALS[b.material]
    : { name: `${b.name} material`, resistivity20_Ohm_m: b.resistivity!, tempCoeff20_perK: 0, density_kgpm3: b.density!, specificHeat_JpkgK: b.specificHeat!, ferromagnetic: false, source: 'design file' };
  return { name: b.name, innerRadius_m: b.innerRadius, outerRadius_m: b.outerRadius, length_m: b.length, centre_m: b.centre, material: withOverrides(base, b), ...meshOf(b) };
}

/** The part's material: grade (with datasheet overrides) and the fixture's own overrides; null when it does not conduct. */
export function partMaterial(design: Design, fx: FixtureGeometryDesign): { material: BodyMaterial | null; note?: string } {
  const p = fx.part!;
  const verdictPart = (design as Design & { part?: { grade: string; datasheet?: { resistivity?: number } } }).part;
  const grade = verdictPart ? magnetGrade(verdictPart.grade) : undefined;
  let material: BodyMaterial | null = null;
  if (grade) {
    const g = applyMagnetOverrides(grade, verdictPart?.datasheet?.resistivity !== undefined ? { resistivity_Ohm_m: verdictPart.datasheet.resistivity } : undefined);
    material = withOverrides(magnetBodyMaterial(g.family, g.resistivity_Ohm_m.value, g.name), p);
  } else if (p.resistivity !== undefined) {
    const t = MAGNET_FAMILY_THERMAL['ndfeb-sintered'];
    material = withOverrides({ name: 'part material', resistivity20_Ohm_m: p.resistivity, tempCoeff20_perK: 0, density_kgpm3: t.density_kgpm3, specificHeat_JpkgK: t.specificHeat_JpkgK, ferromagnetic: false, source: 'design file; density and specific heat of sintered NdFeB (typical, from memory) unless given' }, p);
  }
  if (p.conductive === false) return { material: null, note: 'The part is set non-conductive (fixture.part.conductive: false): no eddy currents in it.' };
  if (!material) {
    if (p.conductive === true) {
      throw new InputError({ code: 'design.missing-field', path: 'fixture.part.resistivity', value: undefined, expected: 'a resistivity (e.g. 1.4 uohm m) or a part section with a grade', problem: 'missing: the part is conductive but nothing gives its resistivity' });
    }
    return { material: null, note: 'No grade or resistivity is given for the part: it is treated as insulating (no eddy currents).' };
  }
  if (p.conductive === undefined && material.resistivity20_Ohm_m > INSULATING_RESISTIVITY_Ohm_m) {
    return { material: null, note: `The part's resistivity (${formatNumber(material.resistivity20_Ohm_m, 3)} Ω·m) is practically insulating: no eddy currents in it.` };
  }
  return { material };
}

/** The fixture in SI form for buildFixture. */
export function fixtureToSpec(design: Design, fx: FixtureGeometryDesign): { spec: FixtureGeometrySpec; notes: string[] } {
  const notes: string[] = [];
  const spec: FixtureGeometrySpec = {
    windings: fx.windings.map(windingToSpec),
    bodies: fx.bodies.map(bodyToSpec),
    points: fx.points.map((p) => ({ name: p.name, r_m: p.r, z_m: p.z })),
    initialTemperature_C: fx.bodyTemperature ?? design.coil.initialTemperature,
  };
  if (fx.part) {
    const p = fx.part;
    const part: PartGeometry = { innerRadius_m: p.innerRadius, outerRadius_m: p.outerRadius, length_m: p.length, centre_m: p.centre, ...meshOf(p) };
    const { material, note } = partMaterial(design, fx);
    if (material) part.material = material;
    if (note) notes.push(note);
    spec.part = part;
  }
  return { spec, notes };
}

/** Builds already made, by the section's content (sweeps rebuild the station many times). */
const cache = new Map<string, { build: FixtureBuild; notes: string[] }>();
const CACHE_SIZE = 8;

/** buildFixture for a design's fixture section (cached by content); InputError paths start with `fixture.`. */
export function fixtureBuildOf(design: Design): { build: FixtureBuild; notes: string[] } | undefined {
  const fx = (design as Design & { fixture?: FixtureGeometryDesign }).fixture;
  if (!fx) return undefined;
  const verdictPart = (design as Design & { part?: unknown }).part;
  const key = JSON.stringify([fx, verdictPart, design.coil.initialTemperature]);
  const hit = cache.get(key);
  if (hit) return hit;
  const { spec, notes } = fixtureToSpec(design, fx);
  let build: FixtureBuild;
  try {
    build = buildFixture(spec);
  } catch (e) {
    if (e instanceof InputError) throw e.prefixed('fixture');
    throw e;
  }
  const out = { build, notes: [...notes, ...build.info.notes] };
  cache.set(key, out);
  while (cache.size > CACHE_SIZE) cache.delete(cache.keys().next().value!);
  return out;
}

/**
 * StationStep (design/to-station.ts): with a `fixture` section, the coil's electrical and
 * thermal values not given in the coil section come from the windings; the bodies' loops are
 * added after any loops of the `coupled` section; the probes become the part's (part centre,
 * surface, weakest point, named points), followed by the `probes` section's.
 */
export function fixtureStationStep(design: Design, station: Station): Station {
  const made = fixtureBuildOf(design);
  if (!made) return station;
  if ((design as Design & { yoke?: unknown }).yoke) {
    throw new InputError({ code: 'design.inconsistent', path: 'fixture', value: undefined, problem: 'both a fixture and a yoke section are given', expected: 'one description of the fixture: `fixture` (air-core geometry) or `yoke` (magnetic circuit)' });
  }
  const { build } = made;
  const c = design.coil as Design['coil'] & { inductance?: number; resistance?: number; fieldPerAmpere?: number; mass?: number; volume?: number; heatCapacity?: number; tempCoeff?: number; conductorArea?: number; conductorLength?: number };
  const amountGiven = c.mass !== undefined || c.volume !== undefined || c.heatCapacity !== undefined;
  const coil = { ...station.coil };
  if (c.inductance === undefined) coil.inductance_H = build.coil.inductance_H;
  if (c.resistance === undefined) coil.resistance20_Ohm = build.coil.resistance20_Ohm;
  if (c.tempCoeff === undefined) coil.tempCoeff_perK = build.coil.tempCoeff_perK;
  if (!amountGiven) {
    coil.heatCapacity_JpK = build.coil.heatCapacity_JpK;
    if (build.coil.mass_kg !== undefined) coil.mass_kg = build.coil.mass_kg;
  }
  if (build.coil.conductor !== undefined) coil.conductor = build.coil.conductor;
  if (c.conductorArea === undefined && build.coil.conductorArea_m2 !== undefined) coil.conductorArea_m2 = build.coil.conductorArea_m2;
  if (c.conductorLength === undefined && build.coil.conductorLength_m !== undefined) coil.conductorLength_m = build.coil.conductorLength_m;

  const nu = station.coupled.length;
  const ng = build.coupled.length;
  const coupled: CoupledLoop[] = [...station.coupled, ...build.coupled];
  const n = nu + ng;
  const M: number[][] = Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (i < nu && j < nu ? station.loopMutual_H[i]![j]! : i >= nu && j >= nu ? build.loopMutual_H[i - nu]![j - nu]! : 0)),
  );
  const userPart = station.probes[0]!;
  const probes: FieldProbe[] = build.probes.map((p, k) => ({
    name: p.name,
    coil_ApmPerA: k === 0 && c.fieldPerAmpere !== undefined ? c.fieldPerAmpere : p.coil_ApmPerA,
    // user loops: their given field at the part counts at probe 0 only
    loops_ApmPerA: [...(k === 0 ? userPart.loops_ApmPerA : new Array<number>(nu).fill(0)), ...p.loops_ApmPerA],
  }));
  const taken = new Set(probes.map((p) => p.name));
  const issues: InputIssue[] = [];
  station.probes.slice(1).forEach((p, k) => {
    if (taken.has(p.name)) issues.push({ code: 'design.duplicate-name', path: `probes[${k}].name`, value: p.name, expected: `a name other than the fixture's probes (${[...taken].join(', ')})`, problem: `"${p.name}" is already a fixture probe` });
    probes.push({ ...p, loops_ApmPerA: [...p.loops_ApmPerA, ...new Array<number>(ng).fill(0)] });
  });
  if (issues.length) throw new InputError(issues);
  return { ...station, coil, coupled, loopMutual_H: M, probes };
}

/** "Derived from the geometry" rows for `fluxkick check`, or nothing without a fixture section. */
export function describeFixture(design: Design, digits = 4): DescribedSection[] {
  const made = fixtureBuildOf(design);
  if (!made) return [];
  const { build, notes } = made;
  const i = build.info;
  const q = (v: number, unit: string) => formatQuantity(v, unit, { digits });
  const rows = [
    { path: 'fixture.turns', label: 'turns', text: formatNumber(i.turns, digits) },
    { path: 'fixture.conductorLength', label: 'conductor length', text: q(i.conductorLength_m, 'm') },
    { path: 'fixture.resistance20', label: 'resistance at 20 °C', text: q(i.resistance20_Ohm, 'Ω') },
    { path: 'fixture.inductance', label: 'inductance', text: q(i.inductance_H, 'H') },
    { path: 'fixture.mass', label: 'conductor mass', text: q(i.mass_kg, 'kg') },
    { path: 'fixture.heatCapacity', label: 'conductor heat capacity', text: q(i.heatCapacity_JpK, 'J/K') },
    ...build.probes.map((p, k) => ({ path: `fixture.probes[${k}]`, label: `field per ampere, ${p.name}`, text: q(p.coil_ApmPerA, '(A/m)/A') })),
  ];
  if (i.partField) {
    rows.push({ path: 'fixture.part.min', label: 'field per ampere over the part, min', text: q(i.partField.min_ApmPerA, '(A/m)/A') });
    rows.push({ path: 'fixture.part.mean', label: 'field per ampere over the part, mean', text: q(i.partField.mean_ApmPerA, '(A/m)/A') });
  }
  const out: DescribedSection[] = [{ title: 'fixture (derived from the geometry)', rows }];
  i.windings.forEach((w, k) => {
    out.push({
      title: `fixture.windings[${k}] (${w.name}, derived)`,
      rows: [
        { path: `fixture.windings[${k}].layers`, label: 'layers × turns per layer', text: `${w.layers} × ${w.turnsPerLayer}` },
        { path: `fixture.windings[${k}].outerRadius`, label: 'outer radius', text: q(w.outerRadius_m, 'm') },
        { path: `fixture.windings[${k}].area`, label: 'conductor section', text: q(w.conductorArea_m2, 'm²') },
        { path: `fixture.windings[${k}].fill`, label: 'copper fill of the window', text: `${formatNumber(100 * w.fillFactor, 3)} %` },
        { path: `fixture.windings[${k}].inductance`, label: 'inductance alone', text: q(i.windingInductances_H[k]!, 'H') },
        ...i.estimates
          .filter((e) => e.winding === w.name)
          .map((e) => ({
            path: `fixture.windings[${k}].estimate`,
            label: `${e.formula}${e.applies ? '' : ' (outside its range)'}`,
            text: `${q(e.value, e.quantity === 'inductance_H' ? 'H' : '(A/m)/A')} (ours ${q(e.ours, e.quantity === 'inductance_H' ? 'H' : '(A/m)/A')}, ${formatNumber(100 * (e.value / e.ours - 1), 2)} %)`,
          })),
      ],
    });
  });
  for (const b of i.bodies) {
    out.push({
      title: `fixture body ${b.name} (derived)`,
      rows: [
        { path: `fixture.bodies.${b.name}.material`, label: 'material', text: `${b.material}, ${formatNumber(b.resistivity20_Ohm_m * 1e6, 3)} µΩ·m` },
        { path: `fixture.bodies.${b.name}.loops`, label: 'loops (shells × slices)', text: `${b.loopCount} (${b.radialShells} × ${b.axialSlices})` },
        { path: `fixture.bodies.${b.name}.heatCapacity`, label: 'heat capacity', text: q(b.heatCapacity_JpK, 'J/K') },
        { path: `fixture.bodies.${b.name}.diffusionTime`, label: `diffusion time, ${b.diffusionTimeBasis}`, text: q(b.diffusionTime_s, 's') },
      ],
    });
  }
  if (notes.length) out.push({ title: 'fixture notes', rows: notes.map((n, k) => ({ path: `fixture.notes[${k}]`, label: `note ${k + 1}`, text: n })) });
  return out;
}
