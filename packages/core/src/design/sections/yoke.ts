/**
 * Design section `yoke`: an iron-yoke fixture (the coil on a steel yoke, the part in its gap).
 * When present, the fixture's inductance and field at the part come from the magnetic circuit
 * (magnetics/yoke.ts): the station's coil gets a nonlinear flux linkage λ(i) tabulated over
 * every current the bank can drive (magnetics/yoke-coil.ts), and `coil.inductance` /
 * `coil.fieldPerAmpere` are left out (they would contradict the circuit). The coil section
 * still gives the winding's resistance, conductor and heat capacity.
 *
 * ```yaml
 * yoke:
 *   turns: 400
 *   members:                       # steel path that carries the coil, in series
 *     - { name: core, length: 120 mm, area: 16 cm^2, steel: low-carbon-steel }
 *     - { name: frame, length: 200 mm, area: 16 cm^2, steel: cast-steel }
 *   poles:                         # steel between the leakage path and the working gap
 *     - { name: tips, length: 30 mm, area: 4 cm^2 }
 *   gaps:                          # non-magnetic gaps in series with the part
 *     - { name: clearance, length: 0.4 mm, area: 4 cm^2 }
 *   part: { length: 6 mm, area: 3.5 cm^2, recoilPermeability: 1.05 }
 *   leakage:                       # pole-to-pole paths that miss the part
 *     - { name: pole sides, permeance: 0.2 uH }      # or { length: 30 mm, area: 30 cm^2 }
 *   steels:                        # optional measured B–H tables, used by name
 *     mill-cert: { field: [0, 100, 300, 1000, 10000], fluxDensity: [0, 0.6, 1.2, 1.5, 1.9], source: "supplier certificate" }
 * ```
 */
import { z } from 'zod';
import type { Design } from '../schema.js';
import { STEEL_NAMES, bhCurveFromTable, steelCurve, validateBHTable, type BHCurve } from '../../materials/steels.js';
import type { YokeSpec, YokeSteel } from '../../magnetics/yoke.js';
import { buildYokeCoil, yokeCurrentBound, type YokeCoil } from '../../magnetics/yoke-coil.js';
import type { Station } from '../../model/station.js';
import { InputError } from '../errors.js';
import { count, num, qty, section, text, type IssueFacts } from '../quantity-schema.js';
import { nearest } from '../issues.js';

const BUILT_IN = STEEL_NAMES.join(', ');

const steelMember = section('A steel member of the flux path: mean path length, cross-section, steel.', {
  name: text('Name for reports, e.g. "core"'),
  length: qty('length', { positive: true, description: 'Mean flux-path length through the member' }),
  area: qty('area', { positive: true, description: 'Cross-section the flux crosses' }),
  steel: text(`Steel: a built-in curve (${BUILT_IN}) or the name of a table under yoke.steels`).default('low-carbon-steel'),
});

const gap = section('A non-magnetic gap in series with the part (clearance, shim, non-magnetic holder).', {
  name: text('Name for reports').default('gap'),
  length: qty('length', { positive: true, description: 'Gap length along the flux' }),
  area: qty('area', { positive: true, description: 'Effective area (widen it for fringing if you wish)' }),
});

const part = section('The part in the working gap, as a linear recoil material.', {
  length: qty('length', { positive: true, description: 'Length along the magnetizing direction' }),
  area: qty('area', { positive: true, description: 'Cross-section normal to the magnetizing direction' }),
  recoilPermeability: num({ min: 1, max: 100, description: 'Relative recoil permeability µ_rec (about 1.05 for sintered rare-earth magnets; typical)' }).default(1.05),
});

const leakagePath = section('A leakage path from pole to pole that misses the part: a permeance, or an air path of length and area.', {
  name: text('Name for reports').default('leakage'),
  permeance: qty('inductance', { nonNegative: true, description: 'Permeance P = flux/MMF (H, i.e. Wb/A)' }).optional(),
  length: qty('length', { positive: true, description: 'Air path length (with area)' }).optional(),
  area: qty('area', { positive: true, description: 'Air path area (with length)' }).optional(),
});

const steelTable = section('A measured initial magnetization curve: H and B at matching positions, from (0, 0), both increasing.', {
  field: z.array(qty('fieldStrength', { nonNegative: true })).meta({ description: 'Field strengths H, from 0, increasing' }),
  fluxDensity: z.array(qty('fluxDensity', { nonNegative: true })).meta({ description: 'Flux densities B at those H, from 0, increasing' }),
  source: text('Where the curve comes from (datasheet, measurement)').default('user table'),
});

export const yokeSection = section('Iron-yoke fixture: coil turns, steel members, gaps, the part and the leakage paths (a nonlinear magnetic circuit).', {
  turns: count({ min: 1, description: 'Turns of the coil on the yoke' }),
  members: z.array(steelMember).min(1).meta({ description: 'Steel path that carries the coil (core, back iron, return legs), in series' }),
  poles: z.array(steelMember).default([]).meta({ description: 'Steel pole pieces between the leakage paths and the working gap' }),
  gaps: z.array(gap).default([]).meta({ description: 'Non-magnetic gaps in series with the part' }),
  part,
  leakage: z.array(leakagePath).default([]).meta({ description: 'Leakage paths parallel to poles + gaps + part' }),
  steels: z.record(z.string(), steelTable).default({}).meta({ description: 'Measured B–H tables, by name (used as `steel:` of members and poles)' }),
  tableTolerance: num({ positive: true, max: 1e-3, description: 'Relative interpolation tolerance of the λ(i) table' }).default(1e-7),
}).superRefine(checkYoke);

export type YokeDesign = z.output<typeof yokeSection>;

function checkYoke(y: YokeDesign, ctx: z.RefinementCtx): void {
  const add = (path: (string | number)[], facts: IssueFacts) =>
    ctx.addIssue({ code: 'custom', path, message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  for (const [name, t] of Object.entries(y.steels)) {
    if (STEEL_NAMES.includes(name)) {
      add(['steels', name], { code: 'design.duplicate-name', problem: `"${name}" is the name of a built-in steel`, expected: `another name (built-in: ${BUILT_IN})` });
      continue;
    }
    const problem = validateBHTable(t.field, t.fluxDensity);
    if (problem) add(['steels', name, 'fluxDensity'], { code: 'design.inconsistent', problem, expected: 'H and B lists of equal length (3 or more points), from 0, both strictly increasing' });
  }
  const known = [...STEEL_NAMES, ...Object.keys(y.steels)];
  const checkSteel = (list: 'members' | 'poles') =>
    y[list].forEach((m, k) => {
      if (!known.includes(m.steel)) {
        const facts: IssueFacts = { code: 'design.not-one-of', problem: `no steel is named "${m.steel}"`, expected: `one of ${known.join(', ')}` };
        const s = nearest(m.steel, known);
        if (s !== undefined) facts.suggestion = s;
        add([list, k, 'steel'], facts);
      }
    });
  checkSteel('members');
  checkSteel('poles');
  y.leakage.forEach((l, k) => {
    const hasP = l.permeance !== undefined;
    const hasGeo = l.length !== undefined || l.area !== undefined;
    if (hasP === hasGeo) {
      add(['leakage', k], { code: 'design.inconsistent', problem: hasP ? 'both a permeance and an air path are given' : 'neither a permeance nor an air path is given', expected: 'either permeance (e.g. 0.2 uH) or length and area of an air path' });
    } else if (hasGeo && (l.length === undefined || l.area === undefined)) {
      add(['leakage', k, l.length === undefined ? 'length' : 'area'], { code: 'design.missing-field', problem: 'missing: an air path needs both length and area', expected: 'a length (e.g. 30 mm) and an area (e.g. 30 cm^2)' });
    }
  });
}

/** The fixture in SI form for the magnetic circuit (input already checked by the schema). */
export function yokeToSpec(y: YokeDesign): YokeSpec {
  const curves = new Map<string, BHCurve>();
  const curveOf = (name: string): BHCurve => {
    let c = curves.get(name) ?? steelCurve(name);
    if (!c) {
      const t = y.steels[name]!;
      c = bhCurveFromTable({ name, description: `user table ${name}`, source: t.source, field_Apm: t.field, fluxDensity_T: t.fluxDensity });
    }
    curves.set(name, c);
    return c;
  };
  const steel = (m: YokeDesign['members'][number]): YokeSteel => ({ name: m.name, length_m: m.length, area_m2: m.area, material: curveOf(m.steel) });
  return {
    turns: y.turns,
    yoke: y.members.map(steel),
    poles: y.poles.map(steel),
    gaps: y.gaps.map((g) => ({ name: g.name, length_m: g.length, area_m2: g.area })),
    part: { length_m: y.part.length, area_m2: y.part.area, recoilPermeability: y.part.recoilPermeability },
    leakage: y.leakage.map((l) => (l.permeance !== undefined ? { name: l.name, permeance_H: l.permeance } : { name: l.name, length_m: l.length!, area_m2: l.area! })),
  };
}

/** Tables already built, by the yoke section's content (sweeps rebuild the station many times). */
const tableCache = new Map<string, YokeCoil>();
const CACHE_SIZE = 8;

/** Margin on the current bound so that sweeps over nearby banks reuse one table. */
const BOUND_MARGIN = 1.25;

/**
 * The yoke's nonlinear coil for a bank of capacitance C charged to V0: tabulated up to
 * 1.25 × V0·√(C/L_sat), a current no shot of that bank can exceed (yokeCurrentBound), so the
 * engine never leaves the table. Tables are cached by content and reused when large enough.
 */
export function yokeCoilForBank(y: YokeDesign, capacitance_F: number, voltage_V: number): YokeCoil {
  const key = JSON.stringify(y);
  const spec = yokeToSpec(y);
  const needed = yokeCurrentBound(spec, capacitance_F, voltage_V);
  const cached = tableCache.get(key);
  if (cached && cached.table.maxCurrent_A >= needed) return cached;
  const coil = buildYokeCoil(spec, { maxCurrent_A: BOUND_MARGIN * needed, relTol: y.tableTolerance });
  tableCache.delete(key);
  tableCache.set(key, coil);
  while (tableCache.size > CACHE_SIZE) tableCache.delete(tableCache.keys().next().value!);
  return coil;
}

/**
 * StationStep (design/to-station.ts): with a `yoke` section, the coil's inductance and the part
 * probe's field per ampere come from the magnetic circuit, and the coil gets its nonlinear λ(i).
 * Designs without a yoke pass through unchanged.
 */
export function yokeStationStep(design: Design, station: Station): Station {
  const y = (design as Design & { yoke?: YokeDesign }).yoke;
  if (!y) return station;
  const coilDesign = design.coil as { inductance?: number; fieldPerAmpere?: number };
  const clash = (['inductance', 'fieldPerAmpere'] as const).filter((k) => coilDesign[k] !== undefined);
  if (clash.length) {
    throw new InputError(
      clash.map((k) => ({
        code: 'design.inconsistent',
        path: `coil.${k}`,
        value: coilDesign[k],
        problem: `coil.${k} is given together with a yoke section, which computes it`,
        expected: `no coil.${k} when the fixture is a yoke (the magnetic circuit gives it)`,
      })),
    );
  }
  const coil = yokeCoilForBank(y, station.bank.capacitance_F, station.bank.voltage_V);
  const probes = station.probes.map((p, k) => (k === 0 ? { ...p, coil_ApmPerA: coil.smallCurrentFieldPerAmpere_ApmPerA } : p));
  return { ...station, coil: { ...station.coil, inductance_H: coil.smallCurrentInductance_H, nonlinear: coil }, probes };
}
