/**
 * A fixture from its geometry: windings on one axis and conductive bodies around them, reduced to
 * the numbers the discharge engine consumes (model/station.ts): the coil's L, R20, heat capacity
 * and conductor; the coupled loops (shells of the bodies) with their mutual inductances; and the
 * field probes (field per ampere of the coil and of each loop at chosen points).
 *
 *   coil     windings in series (aiding or opposing): L = ΣΣ s_i·s_j·M_ij over all turns
 *            (coil-inductance.ts), R20, mass, heat capacity summed (winding.ts)
 *   loops    each body split into shells × slices (shells.ts)
 *   probes   [0] "part": the part's centre on its mid-plane (on the axis, or at the bore of a
 *            ring); then "part surface" (outer radius, mid-plane) and "part weakest point"
 *            (where the coil's own axial field is smallest over the part, when that is elsewhere),
 *            then any named points. Without a part, probe 0 is the centre of the windings.
 *
 * Also returned (`info`): the coil's figures, the published estimates beside ours (Wheeler,
 * Nagaoka, Brooks, Montgomery, where they apply), the static field over the part's volume
 * (minimum, mean, where the minimum lies), and, per body, its loops, heat capacity and
 * diffusion time (µ0·σ·a² for a solid cylinder of radius a; µ0·σ·t·r/2 for a tube wall of
 * thickness t at mean radius r, the L/R time of the wall as one shorted turn).
 */
import { InputError, type InputIssue } from '../design/errors.js';
import type { Coil, CoupledLoop, FieldProbe } from '../model/station.js';
import type { BodyMaterial } from './body-materials.js';
import { layersField, volumeFieldStats, type PartVolume, type VolumeFieldStats } from './coil-field.js';
import { layersInductance_H } from './coil-inductance.js';
import { MU0_HpM } from './constants.js';
import {
  brooksInductance_H,
  isBrooksShape,
  nagaokaInductance_H,
  thickSolenoidCentreField_ApmPerA,
  wheelerMultilayer_H,
  wheelerMultilayerApplies,
  wheelerSingleLayer_H,
  wheelerSingleLayerApplies,
} from './formulas.js';
import type { Rect } from './gmd.js';
import { LayerLattice } from './layer-lattice.js';
import { loopField } from './loop-field.js';
import { buildShellNetwork, loopFieldsAt, meshBody, type BodySpec, type ShellNetwork } from './shells.js';
import { resolveWinding, type Winding, type WindingLayer, type WindingSpec } from './winding.js';

/** The part's geometry; with a material it is also a conductive body named "part". */
export interface PartGeometry {
  innerRadius_m: number;
  outerRadius_m: number;
  length_m: number;
  centre_m?: number;
  /** Conductive part: its material (e.g. from the magnet grade's resistivity). Omit for an insulating part. */
  material?: BodyMaterial;
  radialShells?: number;
  axialSlices?: number;
  grading?: number;
}

export interface FixtureGeometrySpec {
  /** One or more windings on the common axis, connected in series. */
  windings: WindingSpec[];
  part?: PartGeometry;
  /** Other conductive bodies (sleeve, hub, shaft, housing, ...). */
  bodies?: BodySpec[];
  /** Extra field points, reported as probes after the part's. */
  points?: { name: string; r_m: number; z_m: number }[];
  /** Temperature of the bodies at firing, °C. Default 20. */
  initialTemperature_C?: number;
}

/** A published estimate beside ours. */
export interface Estimate {
  winding: string;
  quantity: 'inductance_H' | 'centreField_ApmPerA';
  formula: string;
  source: string;
  value: number;
  ours: number;
  /** Whether the formula's stated range of accuracy covers this geometry. */
  applies: boolean;
  /** The formula's stated accuracy, e.g. "about 1 %". */
  accuracy: string;
}

export interface BodyInfo {
  name: string;
  material: string;
  resistivity20_Ohm_m: number;
  innerRadius_m: number;
  outerRadius_m: number;
  length_m: number;
  centre_m: number;
  radialShells: number;
  axialSlices: number;
  /** Index of the first of this body's loops in `coupled`, and how many. */
  firstLoop: number;
  loopCount: number;
  heatCapacity_JpK: number;
  diffusionTime_s: number;
  diffusionTimeBasis: string;
  ferromagnetic: boolean;
  isPart: boolean;
}

export interface FixtureInfo {
  windings: Omit<Winding, 'layerList'>[];
  turns: number;
  conductorLength_m: number;
  resistance20_Ohm: number;
  mass_kg: number;
  heatCapacity_JpK: number;
  inductance_H: number;
  /** Self inductance of each winding alone, H. */
  windingInductances_H: number[];
  estimates: Estimate[];
  /** Where each probe is, in probe order. */
  probePoints: { name: string; r_m: number; z_m: number }[];
  /** Static (coil only) axial field per ampere over the part's volume. */
  partField?: VolumeFieldStats;
  part?: PartVolume;
  bodies: BodyInfo[];
  /** Things the user should know about the model of this fixture. */
  notes: string[];
  /** Filament-kernel evaluations spent on the coil–body coupling (performance figure). */
  couplingEvaluations: number;
}

export interface FixtureBuild {
  coil: Pick<Coil, 'inductance_H' | 'resistance20_Ohm' | 'tempCoeff_perK' | 'heatCapacity_JpK'> &
    Partial<Pick<Coil, 'conductor' | 'mass_kg' | 'conductorArea_m2' | 'conductorLength_m'>>;
  coupled: CoupledLoop[];
  loopMutual_H: number[][];
  probes: FieldProbe[];
  info: FixtureInfo;
  /** The eddy network (cells, full inductance matrix), for step responses and reports. */
  network: ShellNetwork;
}

/** A length in millimetres for notes, with a true minus sign. */
function mm(x_m: number): string {
  const v = (x_m * 1e3).toFixed(2);
  return `${v.replace('-', '−')} mm`;
}

function rectOverlap(a: Rect, b: Rect): boolean {
  const tol = 1e-12;
  return Math.min(a.x2, b.x2) - Math.max(a.x1, b.x1) > tol && Math.min(a.y2, b.y2) - Math.max(a.y1, b.y1) > tol;
}

function windingRect(w: Winding): Rect {
  return { x1: w.innerRadius_m, x2: w.outerRadius_m, y1: w.centre_m - w.length_m / 2, y2: w.centre_m + w.length_m / 2 };
}

function bodyRect(b: BodySpec): Rect {
  const zc = b.centre_m ?? 0;
  return { x1: b.innerRadius_m, x2: b.outerRadius_m, y1: zc - b.length_m / 2, y2: zc + b.length_m / 2 };
}

/** Coil field per ampere at points sharing a radius, by lattice sums over each layer (layer-lattice.ts). */
function latticeField(layers: readonly WindingLayer[], r: number, zmin: number, zmax: number): (z: number) => { hz: number; hr: number } {
  const parts = layers.map((L) => {
    const d = Math.max(Math.abs(L.radius_m - r), 1e-9);
    const h = Math.max(Math.min(L.pitch_m, d / 4), 1e-7);
    return {
      sign: L.sign,
      hz: new LayerLattice(L, (zeta) => loopField(L.radius_m, 0, r, zeta).hz, true, zmin, zmax, h),
      hr: r === 0 ? null : new LayerLattice(L, (zeta) => loopField(L.radius_m, 0, r, zeta).hr, false, zmin, zmax, h),
    };
  });
  return (z) => {
    let hz = 0;
    let hr = 0;
    for (const p of parts) {
      hz += p.sign * p.hz.value(z);
      if (p.hr) hr += p.sign * p.hr.value(z);
    }
    return { hz, hr };
  };
}

/**
 * Builds the coil, the coupled loops and the probes of a fixture given by its geometry.
 * Throws InputError (paths relative to the fixture section: `windings[i]...`, `part...`,
 * `bodies[i]...`) for impossible geometry.
 */
export function buildFixture(spec: FixtureGeometrySpec): FixtureBuild {
  if (!spec.windings?.length) {
    throw new InputError({ code: 'design.missing-field', path: 'windings', value: spec.windings, expected: 'at least one winding', problem: 'no winding is given' });
  }
  const windings = spec.windings.map((w, i) => {
    try {
      return resolveWinding(w, i);
    } catch (e) {
      if (e instanceof InputError) throw e.prefixed(`windings[${i}]`);
      throw e;
    }
  });
  const layers = windings.flatMap((w) => w.layerList);
  const notes: string[] = [];

  // bodies: the conductive part first, then the others
  const bodySpecs: { spec: BodySpec; path: string; isPart: boolean }[] = [];
  const part = spec.part;
  if (part) {
    if (!(part.innerRadius_m >= 0 && part.outerRadius_m > part.innerRadius_m && part.length_m > 0)) {
      throw new InputError({ code: 'design.out-of-range', path: 'part', value: part, expected: 'outer radius > inner radius ≥ 0 and length > 0', problem: 'impossible part dimensions' });
    }
    if (part.material) {
      const b: BodySpec = { name: 'part', innerRadius_m: part.innerRadius_m, outerRadius_m: part.outerRadius_m, length_m: part.length_m, material: part.material };
      if (part.centre_m !== undefined) b.centre_m = part.centre_m;
      if (part.radialShells !== undefined) b.radialShells = part.radialShells;
      if (part.axialSlices !== undefined) b.axialSlices = part.axialSlices;
      if (part.grading !== undefined) b.grading = part.grading;
      bodySpecs.push({ spec: b, path: 'part', isPart: true });
    }
  }
  (spec.bodies ?? []).forEach((b, i) => bodySpecs.push({ spec: b, path: `bodies[${i}]`, isPart: false }));

  // geometry checks: names unique, nothing overlaps
  const issues: InputIssue[] = [];
  const names = new Set<string>();
  for (const b of bodySpecs) {
    if (names.has(b.spec.name)) issues.push({ code: 'design.duplicate-name', path: `${b.path}.name`, value: b.spec.name, expected: 'a name used by one body only ("part" is the part)', problem: `"${b.spec.name}" is used twice` });
    names.add(b.spec.name);
  }
  const rects: { rect: Rect; path: string; what: string }[] = [
    ...windings.map((w, i) => ({ rect: windingRect(w), path: `windings[${i}]`, what: `winding "${w.name}"` })),
    ...bodySpecs.map((b) => ({ rect: bodyRect(b.spec), path: b.path, what: `body "${b.spec.name}"` })),
  ];
  for (let i = 0; i < rects.length; i++)
    for (let j = i + 1; j < rects.length; j++)
      if (rectOverlap(rects[i].rect, rects[j].rect))
        issues.push({ code: 'design.inconsistent', path: rects[j].path, value: undefined, expected: `a section that does not overlap ${rects[i].what}`, problem: `it overlaps ${rects[i].what}` });
  if (part && !part.material) {
    const zc = part.centre_m ?? 0;
    const pr: Rect = { x1: part.innerRadius_m, x2: part.outerRadius_m, y1: zc - part.length_m / 2, y2: zc + part.length_m / 2 };
    windings.forEach((w, i) => {
      if (rectOverlap(pr, windingRect(w))) issues.push({ code: 'design.inconsistent', path: 'part', value: undefined, expected: `a part that does not overlap winding ${i + 1}`, problem: `it overlaps winding "${w.name}"` });
    });
  }
  if (issues.length) throw new InputError(issues);

  const meshes = bodySpecs.map((b) => {
    try {
      return meshBody(b.spec);
    } catch (e) {
      if (e instanceof InputError) throw e.prefixed(b.path);
      throw e;
    }
  });
  const network = buildShellNetwork(meshes, layers);

  // coil figures
  const inductance_H = layersInductance_H(layers);
  const windingInductances_H = windings.map((w) => layersInductance_H(w.layerList));
  const resistance20_Ohm = windings.reduce((s, w) => s + w.resistance20_Ohm, 0);
  const heatCapacity_JpK = windings.reduce((s, w) => s + w.heatCapacity_JpK, 0);
  const mass_kg = windings.reduce((s, w) => s + w.mass_kg, 0);
  const conductorLength_m = windings.reduce((s, w) => s + w.conductorLength_m, 0);
  const tempCoeff_perK = windings.reduce((s, w) => s + w.tempCoeff20_perK * w.resistance20_Ohm, 0) / resistance20_Ohm;
  const metals = new Set(windings.map((w) => w.metal));
  const coil: FixtureBuild['coil'] = {
    inductance_H,
    resistance20_Ohm,
    tempCoeff_perK,
    heatCapacity_JpK,
    mass_kg,
    conductorLength_m,
    conductorArea_m2: Math.min(...windings.map((w) => w.conductorArea_m2)),
  };
  if (metals.size === 1) coil.conductor = windings[0].metal;
  else notes.push('The windings are of different metals: the coil is heated as one conductor with a resistance-weighted temperature coefficient.');
  if (windings.length > 1 && new Set(windings.map((w) => w.conductorArea_m2)).size > 1) {
    notes.push('The windings have different conductor sections; the smallest is used for the adiabatic (IEC 60949) check.');
  }

  // probes
  const zLo = Math.min(...windings.map((w) => w.centre_m - w.length_m / 2));
  const zHi = Math.max(...windings.map((w) => w.centre_m + w.length_m / 2));
  const points: { name: string; r_m: number; z_m: number }[] = [];
  let partVolume: PartVolume | undefined;
  let partField: VolumeFieldStats | undefined;
  if (part) {
    const zc = part.centre_m ?? 0;
    partVolume = { innerRadius_m: part.innerRadius_m, outerRadius_m: part.outerRadius_m, length_m: part.length_m, centre_m: zc };
    // static coil field over the part: lattice sums at each sampling radius
    const fieldAtR = new Map<number, (z: number) => { hz: number; hr: number }>();
    const pv = partVolume;
    partField = volumeFieldStats((r, z) => {
      let f = fieldAtR.get(r);
      if (!f) {
        f = latticeField(layers, r, pv.centre_m - pv.length_m / 2, pv.centre_m + pv.length_m / 2);
        fieldAtR.set(r, f);
      }
      return f(z);
    }, partVolume);
    points.push({ name: 'part', r_m: part.innerRadius_m, z_m: zc });
    points.push({ name: 'part surface', r_m: part.outerRadius_m, z_m: zc });
    const c = partField.minAt;
    if (Math.hypot(c.r_m - part.innerRadius_m, c.z_m - zc) > 1e-9 * part.outerRadius_m) points.push({ name: 'part weakest point', r_m: c.r_m, z_m: c.z_m });
  } else {
    points.push({ name: 'part', r_m: 0, z_m: (zLo + zHi) / 2 });
    notes.push('No part geometry is given: probe 0 ("part") is the centre of the windings.');
  }
  for (const p of spec.points ?? []) points.push(p);
  const probes: FieldProbe[] = points.map((p) => ({ name: p.name, coil_ApmPerA: layersField(layers, p.r_m, p.z_m).hz, loops_ApmPerA: loopFieldsAt(network, p.r_m, p.z_m) }));
  if (partField && partField.min_ApmPerA < 0.9 * probes[0].coil_ApmPerA) {
    notes.push(
      `The coil's field is uneven over the part: its weakest point (r = ${mm(partField.minAt.r_m)}, z = ${mm(partField.minAt.z_m)}) sees ${((100 * partField.min_ApmPerA) / probes[0].coil_ApmPerA).toFixed(0)} % of the field at the part's centre; see the probe "part weakest point".`,
    );
  }

  // loops for the engine
  const T0 = spec.initialTemperature_C ?? 20;
  const coupled: CoupledLoop[] = network.loops.map((l) => ({
    name: l.name,
    inductance_H: l.inductance_H,
    mutualToCoil_H: l.mutualToCoil_H,
    resistance20_Ohm: l.resistance20_Ohm,
    tempCoeff_perK: l.tempCoeff_perK,
    heatCapacity_JpK: l.heatCapacity_JpK,
    initialTemperature_C: T0,
  }));
  const loopMutual_H = network.L.map((row) => row.slice());

  // bodies
  const bodies: BodyInfo[] = [];
  let first = 0;
  meshes.forEach((mesh, b) => {
    const s = mesh.spec;
    const sigma = 1 / s.material.resistivity20_Ohm_m;
    const solid = s.innerRadius_m === 0;
    const t = s.outerRadius_m - s.innerRadius_m;
    const count = mesh.cells.length;
    bodies.push({
      name: s.name,
      material: s.material.name,
      resistivity20_Ohm_m: s.material.resistivity20_Ohm_m,
      innerRadius_m: s.innerRadius_m,
      outerRadius_m: s.outerRadius_m,
      length_m: s.length_m,
      centre_m: mesh.centre_m,
      radialShells: mesh.radialEdges.length - 1,
      axialSlices: mesh.axialEdges.length - 1,
      firstLoop: first,
      loopCount: count,
      heatCapacity_JpK: coupled.slice(first, first + count).reduce((x, l) => x + l.heatCapacity_JpK, 0),
      diffusionTime_s: solid ? MU0_HpM * sigma * s.outerRadius_m ** 2 : (MU0_HpM * sigma * t * (s.outerRadius_m + s.innerRadius_m)) / 4,
      diffusionTimeBasis: solid ? 'µ0·σ·a² (solid cylinder)' : 'µ0·σ·t·r/2 (tube wall as one shorted turn)',
      ferromagnetic: s.material.ferromagnetic,
      isPart: bodySpecs[b].isPart,
    });
    if (s.material.ferromagnetic) {
      notes.push(`Body "${s.name}" is ${s.material.name}, which is ferromagnetic: the eddy model treats it as non-magnetic (µ0), right once it is saturated, but it under-estimates its shielding during the first rise.`);
    }
    first += count;
  });

  // published estimates beside ours
  const estimates: Estimate[] = [];
  windings.forEach((w, i) => {
    const ours = windingInductances_H[i];
    const rMean = (w.innerRadius_m + w.outerRadius_m) / 2;
    if (w.layers === 1) {
      estimates.push({ winding: w.name, quantity: 'inductance_H', formula: "Nagaoka's coefficient (current sheet)", source: 'Nagaoka 1909; Grover, Inductance Calculations, Table 36', value: nagaokaInductance_H(rMean, w.length_m, w.turns), ours, applies: true, accuracy: 'exact for a current sheet; a wound coil differs by Rosa’s corrections, of order 1/N' });
      estimates.push({ winding: w.name, quantity: 'inductance_H', formula: 'Wheeler single-layer', source: 'Wheeler, Proc. IRE 16, 1928', value: wheelerSingleLayer_H(rMean, w.length_m, w.turns), ours, applies: wheelerSingleLayerApplies(rMean, w.length_m), accuracy: 'about 1 % for ℓ > 0.8·r' });
    } else {
      const depth = w.outerRadius_m - w.innerRadius_m;
      estimates.push({ winding: w.name, quantity: 'inductance_H', formula: 'Wheeler multilayer', source: 'Wheeler, Proc. IRE 16, 1928', value: wheelerMultilayer_H(rMean, w.length_m, depth, w.turns), ours, applies: wheelerMultilayerApplies(rMean, w.length_m, depth), accuracy: 'about 1 % when 6r, 9ℓ and 10c are similar' });
      if (isBrooksShape(w.innerRadius_m, w.outerRadius_m, w.length_m, 0.05)) {
        estimates.push({ winding: w.name, quantity: 'inductance_H', formula: 'Brooks coil', source: 'Grover, Inductance Calculations', value: brooksInductance_H(rMean, w.turns), ours, applies: true, accuracy: 'exact for the Brooks proportions, uniform current density' });
      }
    }
    estimates.push({
      winding: w.name,
      quantity: 'centreField_ApmPerA',
      formula: 'Montgomery thick solenoid (centre field)',
      source: 'Montgomery, Solenoid Magnet Design, 1969',
      value: thickSolenoidCentreField_ApmPerA(w.innerRadius_m, w.outerRadius_m, w.length_m, w.turns),
      ours: layersField(w.layerList, 0, w.centre_m).hz,
      applies: true,
      accuracy: 'exact for a uniform current density; discrete turns differ by a fraction of a per cent',
    });
  });

  const info: FixtureInfo = {
    windings: windings.map(({ layerList: _omit, ...rest }) => rest),
    turns: windings.reduce((s, w) => s + w.turns, 0),
    conductorLength_m,
    resistance20_Ohm,
    mass_kg,
    heatCapacity_JpK,
    inductance_H,
    windingInductances_H,
    estimates,
    probePoints: points,
    bodies,
    notes,
    couplingEvaluations: network.coilCouplingEvaluations,
  };
  if (partVolume) info.part = partVolume;
  if (partField) info.partField = partField;
  return { coil, coupled, loopMutual_H, probes, info, network };
}
