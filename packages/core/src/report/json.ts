/**
 * Machine-readable output of one shot (`fluxkick shot <design> --json`).
 *
 * Top level: `schemaVersion`, `figures`, `verdict`, `warnings`, `phases`, `solver`, `energy`,
 * `probes`, `loops`, `penetration` (null without coupled loops), and `waveform` only when asked. All values SI; keys in a fixed order;
 * NaN and ±Infinity (JSON cannot hold them) become null. Every key is described once in
 * JSON_FIELDS below (figures from FIGURES in figures.ts); docs/json-output.md is generated
 * from these tables (see json-doc.ts) and a test checks that output, tables and document agree.
 */
import { PENETRATION_WARN, type PenetrationFigures } from '../analysis/penetration.js';
import type { ShotResult } from '../model/result.js';
import type { Verdict } from '../model/verdict.js';
import { FIGURES, FIGURE_KEYS } from './figures.js';

/** Bumped when a key is removed or changes meaning (adding keys does not bump it). */
export const SHOT_JSON_SCHEMA_VERSION = 1;

export interface ShotJsonOptions {
  /** Include the sampled waveform arrays. */
  waveform: boolean;
  /** Penetration figures of a shot with coupled loops (simulateDesign's `penetration`); absent: `penetration` is null. */
  penetration?: PenetrationFigures | null;
}

/** A JSON number: finite, or null for NaN/±Infinity. */
export type JsonNumber = number | null;

function num(x: number): JsonNumber {
  return Number.isFinite(x) ? x : null;
}
function nums(a: readonly number[]): JsonNumber[] {
  return a.map(num);
}

export interface ShotJson {
  schemaVersion: number;
  figures: Record<string, JsonNumber>;
  verdict: {
    overall: string;
    items: {
      id: string;
      item: string;
      value: JsonNumber;
      limit: JsonNumber;
      unit: string;
      margin: JsonNumber;
      status: string;
      note: string;
    }[];
  } | null;
  warnings: { code: string; severity: string; message: string }[];
  phases: { name: string; start_s: JsonNumber; end_s: JsonNumber; endReason: string }[];
  solver: {
    method: string;
    steps: number;
    rejectedSteps: number;
    functionEvaluations: number;
    events: number;
    relTol: JsonNumber;
    absTol: JsonNumber;
    wallTime_s: JsonNumber;
  };
  energy: {
    initial_J: JsonNumber;
    capacitorFinal_J: JsonNumber;
    inductorFinal_J: JsonNumber;
    dissipated_J: {
      esr: JsonNumber;
      switch: JsonNumber;
      cable: JsonNumber;
      coil: JsonNumber;
      diode: JsonNumber;
      loops: JsonNumber[];
    };
    relativeError: JsonNumber;
  };
  probes: { name: string; peakField_Apm: JsonNumber; timeOfPeak_s: JsonNumber }[];
  loops: { name: string; peakCurrent_A: JsonNumber; temperatureRise_K: JsonNumber; finalTemperature_C: JsonNumber }[];
  penetration: {
    riseTime_s: JsonNumber;
    equivalentFrequency_Hz: JsonNumber;
    bodies: {
      name: string;
      isPart: boolean;
      solid: boolean;
      skinDepth_m: JsonNumber;
      size_m: JsonNumber;
      sizeOverSkinDepth: JsonNumber;
      diffusionTime_s: JsonNumber;
      diffusionTimeBasis: string;
      riseOverDiffusion: JsonNumber;
    }[];
    centreToSurfaceAtPeak: JsonNumber;
    centreToSurfacePeaks: JsonNumber;
    staticCentreToSurface: JsonNumber;
    penetration: JsonNumber;
    centreLag_s: JsonNumber;
  } | null;
  waveform?: {
    t_s: JsonNumber[];
    capacitorVoltage_V: JsonNumber[];
    coilCurrent_A: JsonNumber[];
    switchCurrent_A: JsonNumber[];
    diodeCurrent_A: JsonNumber[];
    loopCurrents_A: JsonNumber[][];
    field_Apm: JsonNumber[][];
    coilTemperature_C: JsonNumber[];
    loopTemperatures_C: JsonNumber[][];
  };
}

/** The JSON document of one shot (a plain object; serialize with JSON.stringify). */
export function shotToJson(result: ShotResult, verdict: Verdict | null, options: ShotJsonOptions): ShotJson {
  const figures: Record<string, JsonNumber> = {};
  for (const k of FIGURE_KEYS) figures[k] = num(result.figures[k]);
  // figures the engine may carry beyond the documented set (kept, after the documented ones)
  for (const k of Object.keys(result.figures).sort()) {
    if (!(k in figures)) figures[k] = num((result.figures as unknown as Record<string, number>)[k]);
  }
  const e = result.energy;
  const s = result.solver;
  const out: ShotJson = {
    schemaVersion: SHOT_JSON_SCHEMA_VERSION,
    figures,
    verdict: verdict
      ? {
          overall: verdict.overall,
          items: verdict.items.map((v) => ({
            id: v.id,
            item: v.item,
            value: num(v.value),
            limit: num(v.limit),
            unit: v.unit,
            margin: num(v.margin),
            status: v.status,
            note: v.note,
          })),
        }
      : null,
    warnings: result.warnings.map((w) => ({ code: w.code, severity: w.severity, message: w.message })),
    phases: result.phases.map((p) => ({ name: p.name, start_s: num(p.start_s), end_s: num(p.end_s), endReason: p.endReason })),
    solver: {
      method: s.method,
      steps: s.steps,
      rejectedSteps: s.rejectedSteps,
      functionEvaluations: s.functionEvaluations,
      events: s.events,
      relTol: num(s.relTol),
      absTol: num(s.absTol),
      wallTime_s: num(s.wallTime_s),
    },
    energy: {
      initial_J: num(e.initial_J),
      capacitorFinal_J: num(e.capacitorFinal_J),
      inductorFinal_J: num(e.inductorFinal_J),
      dissipated_J: {
        esr: num(e.dissipated_J.esr),
        switch: num(e.dissipated_J.switch),
        cable: num(e.dissipated_J.cable),
        coil: num(e.dissipated_J.coil),
        diode: num(e.dissipated_J.diode),
        loops: nums(e.dissipated_J.loops),
      },
      relativeError: num(e.relativeError),
    },
    probes: result.probes.map((p) => ({ name: p.name, peakField_Apm: num(p.peakField_Apm), timeOfPeak_s: num(p.timeOfPeak_s) })),
    loops: result.loops.map((l) => ({
      name: l.name,
      peakCurrent_A: num(l.peakCurrent_A),
      temperatureRise_K: num(l.temperatureRise_K),
      finalTemperature_C: num(l.finalTemperature_C),
    })),
    penetration: options.penetration ? penetrationJson(options.penetration) : null,
  };
  if (options.waveform) {
    const w = result.waveform;
    out.waveform = {
      t_s: nums(w.t_s),
      capacitorVoltage_V: nums(w.capacitorVoltage_V),
      coilCurrent_A: nums(w.coilCurrent_A),
      switchCurrent_A: nums(w.switchCurrent_A),
      diodeCurrent_A: nums(w.diodeCurrent_A),
      loopCurrents_A: w.loopCurrents_A.map(nums),
      field_Apm: w.field_Apm.map(nums),
      coilTemperature_C: nums(w.coilTemperature_C),
      loopTemperatures_C: w.loopTemperatures_C.map(nums),
    };
  }
  return out;
}

const numOrNull = (x: number | null): JsonNumber => (x === null ? null : num(x));

function penetrationJson(p: PenetrationFigures): NonNullable<ShotJson['penetration']> {
  return {
    riseTime_s: num(p.riseTime_s),
    equivalentFrequency_Hz: num(p.equivalentFrequency_Hz),
    bodies: p.bodies.map((b) => ({
      name: b.name,
      isPart: b.isPart,
      solid: b.solid,
      skinDepth_m: num(b.skinDepth_m),
      size_m: num(b.size_m),
      sizeOverSkinDepth: num(b.sizeOverSkinDepth),
      diffusionTime_s: num(b.diffusionTime_s),
      diffusionTimeBasis: b.diffusionTimeBasis,
      riseOverDiffusion: num(b.riseOverDiffusion),
    })),
    centreToSurfaceAtPeak: numOrNull(p.centreToSurfaceAtPeak),
    centreToSurfacePeaks: numOrNull(p.centreToSurfacePeaks),
    staticCentreToSurface: numOrNull(p.staticCentreToSurface),
    penetration: numOrNull(p.penetration),
    centreLag_s: numOrNull(p.centreLag_s),
  };
}

/** Serialized with two-space indentation and a final newline. */
export function shotToJsonString(result: ShotResult, verdict: Verdict | null, options: ShotJsonOptions): string {
  return JSON.stringify(shotToJson(result, verdict, options), null, 2) + '\n';
}

/** One documented key: its path (`[]` marks array elements), JSON type, SI unit and meaning. */
export interface JsonField {
  path: string;
  type: string;
  unit: string;
  description: string;
}

/** Every key of the shot JSON, in document order. */
export const JSON_FIELDS: readonly JsonField[] = [
  { path: 'schemaVersion', type: 'integer', unit: '', description: `Version of this layout (now ${SHOT_JSON_SCHEMA_VERSION}); bumped only when a key is removed or changes meaning.` },
  { path: 'figures', type: 'object', unit: '', description: 'Figures of the shot, one number per key (table below).' },
  ...FIGURE_KEYS.map((k) => ({
    path: `figures.${k}`,
    type: 'number',
    unit: FIGURES[k].unit,
    description: FIGURES[k].description,
  })),
  { path: 'verdict', type: 'object | null', unit: '', description: 'The engineering verdict, or null when none was computed.' },
  { path: 'verdict.overall', type: 'string', unit: '', description: 'Worst status over the items: `pass`, `warn` or `fail` (informative items do not count).' },
  { path: 'verdict.items', type: 'array', unit: '', description: 'The checked items, in the order the verdict lists them.' },
  { path: 'verdict.items[].id', type: 'string', unit: '', description: 'Stable identifier of the check, e.g. `field.part`, `coil.temperature`.' },
  { path: 'verdict.items[].item', type: 'string', unit: '', description: 'Human label of the check.' },
  { path: 'verdict.items[].value', type: 'number | null', unit: 'see `unit`', description: 'Value found.' },
  { path: 'verdict.items[].limit', type: 'number | null', unit: 'see `unit`', description: 'Limit checked against; null for informative items.' },
  { path: 'verdict.items[].unit', type: 'string', unit: '', description: 'SI unit symbol of `value` and `limit`.' },
  { path: 'verdict.items[].margin', type: 'number | null', unit: '1', description: 'Headroom as a fraction: positive inside the limit, negative beyond it; null for informative items.' },
  { path: 'verdict.items[].status', type: 'string', unit: '', description: '`pass`, `warn`, `fail` or `info`.' },
  { path: 'verdict.items[].note', type: 'string', unit: '', description: 'Basis of the limit and what to do if the check fails.' },
  { path: 'warnings', type: 'array', unit: '', description: 'Numerical and engineering warnings raised during the shot.' },
  { path: 'warnings[].code', type: 'string', unit: '', description: 'Stable code, e.g. `solver.tolerance`, `energy.balance`.' },
  { path: 'warnings[].severity', type: 'string', unit: '', description: '`info`, `warning` or `error`.' },
  { path: 'warnings[].message', type: 'string', unit: '', description: 'Human message.' },
  { path: 'phases', type: 'array', unit: '', description: 'The circuit phases in time order.' },
  { path: 'phases[].name', type: 'string', unit: '', description: '`discharge`, `commutation`, `freewheel`, `reverse` or `loops-decay`.' },
  { path: 'phases[].start_s', type: 'number', unit: 's', description: 'Start of the phase.' },
  { path: 'phases[].end_s', type: 'number', unit: 's', description: 'End of the phase.' },
  { path: 'phases[].endReason', type: 'string', unit: '', description: 'Event that ended it, e.g. `diode-on`, `current-zero`, `decayed`, `t-max`.' },
  { path: 'solver', type: 'object', unit: '', description: 'Integrator statistics.' },
  { path: 'solver.method', type: 'string', unit: '', description: 'Integrator that ran.' },
  { path: 'solver.steps', type: 'integer', unit: '', description: 'Accepted steps over all phases.' },
  { path: 'solver.rejectedSteps', type: 'integer', unit: '', description: 'Rejected steps.' },
  { path: 'solver.functionEvaluations', type: 'integer', unit: '', description: 'Right-hand-side evaluations.' },
  { path: 'solver.events', type: 'integer', unit: '', description: 'Located events.' },
  { path: 'solver.relTol', type: 'number', unit: '1', description: 'Relative tolerance used.' },
  { path: 'solver.absTol', type: 'number', unit: '1', description: 'Absolute tolerance used (relative to each state’s scale).' },
  { path: 'solver.wallTime_s', type: 'number', unit: 's', description: 'Wall-clock time of the integration (informative; varies run to run).' },
  { path: 'energy', type: 'object', unit: '', description: 'Energy balance of the shot.' },
  { path: 'energy.initial_J', type: 'number', unit: 'J', description: 'Stored in the bank at firing, ½·C·V0².' },
  { path: 'energy.capacitorFinal_J', type: 'number', unit: 'J', description: 'Left in the bank at the end.' },
  { path: 'energy.inductorFinal_J', type: 'number', unit: 'J', description: 'Magnetic energy left at the end (all inductors and mutuals).' },
  { path: 'energy.dissipated_J', type: 'object', unit: '', description: 'Losses by element.' },
  { path: 'energy.dissipated_J.esr', type: 'number', unit: 'J', description: 'In the bank’s series resistance.' },
  { path: 'energy.dissipated_J.switch', type: 'number', unit: 'J', description: 'In the switch (threshold and slope resistance).' },
  { path: 'energy.dissipated_J.cable', type: 'number', unit: 'J', description: 'In the cable or bus bars.' },
  { path: 'energy.dissipated_J.coil', type: 'number', unit: 'J', description: 'In the coil winding.' },
  { path: 'energy.dissipated_J.diode', type: 'number', unit: 'J', description: 'In the freewheel diode.' },
  { path: 'energy.dissipated_J.loops', type: 'array of number', unit: 'J', description: 'In each coupled loop, in the order of `loops`.' },
  { path: 'energy.relativeError', type: 'number', unit: '1', description: '|stored − (left + losses)| / stored.' },
  { path: 'probes', type: 'array', unit: '', description: 'Field probes; element 0 is the part’s reference point.' },
  { path: 'probes[].name', type: 'string', unit: '', description: 'Probe name, e.g. `part surface`.' },
  { path: 'probes[].peakField_Apm', type: 'number', unit: 'A/m', description: 'Peak field at the probe.' },
  { path: 'probes[].timeOfPeak_s', type: 'number', unit: 's', description: 'Time of that peak.' },
  { path: 'loops', type: 'array', unit: '', description: 'Coupled shorted loops (eddy-current shells, sleeves), empty when none.' },
  { path: 'loops[].name', type: 'string', unit: '', description: 'Loop name.' },
  { path: 'loops[].peakCurrent_A', type: 'number', unit: 'A', description: 'Peak absolute loop current.' },
  { path: 'loops[].temperatureRise_K', type: 'number', unit: 'K', description: 'Adiabatic temperature rise of the loop.' },
  { path: 'loops[].finalTemperature_C', type: 'number', unit: '°C', description: 'Loop temperature at the end.' },
  { path: 'penetration', type: 'object | null', unit: '', description: 'How far the field got into the part through the eddy currents of the coupled loops (analysis/penetration.ts); null when the station has no coupled loops. Its warning, `part.not-penetrated`, is in `warnings`.' },
  { path: 'penetration.riseTime_s', type: 'number', unit: 's', description: 'Time from firing to the peak coil current, t_rise.' },
  { path: 'penetration.equivalentFrequency_Hz', type: 'number', unit: 'Hz', description: 'Equivalent frequency of the pulse, 1/(4·t_rise) (a rise to peak taken as a quarter period).' },
  { path: 'penetration.bodies', type: 'array', unit: '', description: 'The conductive bodies of a fixture given by geometry; empty when the loops were given as numbers.' },
  { path: 'penetration.bodies[].name', type: 'string', unit: '', description: 'Body name (`part` for the part itself).' },
  { path: 'penetration.bodies[].isPart', type: 'boolean', unit: '', description: 'True for the part being magnetized.' },
  { path: 'penetration.bodies[].solid', type: 'boolean', unit: '', description: 'True for a solid cylinder (size = radius), false for a tube (size = wall thickness).' },
  { path: 'penetration.bodies[].skinDepth_m', type: 'number', unit: 'm', description: 'Skin depth δ = √(2ρ/(ω·µ0)) at the equivalent frequency.' },
  { path: 'penetration.bodies[].size_m', type: 'number', unit: 'm', description: 'Radius of a solid body, wall thickness of a tube.' },
  { path: 'penetration.bodies[].sizeOverSkinDepth', type: 'number', unit: '1', description: 'size_m / skinDepth_m: well above 1 means the field stays near the surface during the rise.' },
  { path: 'penetration.bodies[].diffusionTime_s', type: 'number', unit: 's', description: 'Magnetic diffusion time of the body (µ0·σ·a² for a solid cylinder; see `diffusionTimeBasis`).' },
  { path: 'penetration.bodies[].diffusionTimeBasis', type: 'string', unit: '', description: 'The formula behind `diffusionTime_s`.' },
  { path: 'penetration.bodies[].riseOverDiffusion', type: 'number', unit: '1', description: 'riseTime_s / diffusionTime_s: well above 1 means the field gets in.' },
  { path: 'penetration.centreToSurfaceAtPeak', type: 'number | null', unit: '1', description: 'Field at the part’s centre / field at its surface at the moment the surface field peaks (probes `part` and `part surface`); null without both probes.' },
  { path: 'penetration.centreToSurfacePeaks', type: 'number | null', unit: '1', description: 'Peak field at the centre / peak field at the surface; null without both probes.' },
  { path: 'penetration.staticCentreToSurface', type: 'number | null', unit: '1', description: 'The same ratio without eddy currents (from the coil’s field per ampere at the two points).' },
  { path: 'penetration.penetration', type: 'number | null', unit: '1', description: `centreToSurfacePeaks / staticCentreToSurface: 1 when fully penetrated; below ${PENETRATION_WARN} raises \`part.not-penetrated\`.` },
  { path: 'penetration.centreLag_s', type: 'number | null', unit: 's', description: 'Time of the centre’s peak minus time of the surface’s peak.' },
  { path: 'waveform', type: 'object', unit: '', description: 'Sampled waveforms; present only when asked for (`--waveform`). Every array has the length of `t_s`.' },
  { path: 'waveform.t_s', type: 'array of number', unit: 's', description: 'Sample times from firing.' },
  { path: 'waveform.capacitorVoltage_V', type: 'array of number', unit: 'V', description: 'Bank voltage.' },
  { path: 'waveform.coilCurrent_A', type: 'array of number', unit: 'A', description: 'Coil current.' },
  { path: 'waveform.switchCurrent_A', type: 'array of number', unit: 'A', description: 'Switch current.' },
  { path: 'waveform.diodeCurrent_A', type: 'array of number', unit: 'A', description: 'Freewheel diode current.' },
  { path: 'waveform.loopCurrents_A', type: 'array of array of number', unit: 'A', description: '`loopCurrents_A[k][j]`: loop k at sample j.' },
  { path: 'waveform.field_Apm', type: 'array of array of number', unit: 'A/m', description: '`field_Apm[p][j]`: probe p at sample j.' },
  { path: 'waveform.coilTemperature_C', type: 'array of number', unit: '°C', description: 'Coil conductor temperature.' },
  { path: 'waveform.loopTemperatures_C', type: 'array of array of number', unit: '°C', description: '`loopTemperatures_C[k][j]`: loop k at sample j.' },
];

/** Every key path that occurs in a JSON value, with `[]` for array elements (objects inside arrays are walked). */
export function jsonPaths(value: unknown, prefix = ''): Set<string> {
  const out = new Set<string>();
  const walk = (v: unknown, p: string) => {
    if (Array.isArray(v)) {
      for (const el of v) if (el !== null && typeof el === 'object' && !Array.isArray(el)) walk(el, `${p}[]`);
      return;
    }
    if (v !== null && typeof v === 'object') {
      for (const [k, child] of Object.entries(v)) {
        const cp = p ? `${p}.${k}` : k;
        out.add(cp);
        walk(child, cp);
      }
    }
  };
  walk(value, prefix);
  return out;
}
