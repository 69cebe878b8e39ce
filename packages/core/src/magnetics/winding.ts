/**
 * A winding of rectangular cross-section on the coil axis, from its dimensions to its turns.
 *
 * Geometry (all SI): the winding window runs from innerRadius to outerRadius and over `length`
 * along the axis, centred at `centre`. The conductor is round (bare diameter d, or an AWG size by
 * ASTM B258) or rectangular (bare width w along the axis × height h across it, optional corner
 * radius), with an insulation build b: the increase of each outer dimension due to the insulation
 * (both sides together, as wire standards quote it — common practice).
 *
 *   outer size:  round d_o = d + b;  rectangular w_o = w + b, h_o = h + b
 *   pitch:       axial p_z = w_o/√f_p, radial p_r = h_o/√f_p      (packing factor f_p ≤ 1, default 1)
 *                or, with a fill factor f (copper area / window area), the cell w_o·s × h_o·s with
 *                s = √(A/(f·w_o·h_o)) so that one turn's cell holds A/f
 *   turns/layer: given, or ⌊length/p_z⌋;   layers: given, or ⌊(r_o − r_i)/p_r⌋
 *   outer radius, when only layers are given: r_i + layers·p_r
 *
 * Turns are placed at the centres of a regular layers × turnsPerLayer grid over the window; the
 * helix pitch and the layer-to-layer crossovers are ignored, and leads are not counted.
 *
 *   conductor length ℓ = Σ_layers turnsPerLayer·2π·r_j
 *   area A: round π·d²/4; rectangular w·h − (4 − π)·r_c²
 *   R20 = ρ20·ℓ/A;  mass = density·A·ℓ;  heat capacity = mass·c_p       (materials/conductors.ts)
 *
 * Each turn becomes a circular filament at its grid point whose own cross-section has GMD g
 * (round: (d/2)·e^(−1/4); rectangular: Maxwell's rectangle GMD) for its self term (mutual.ts).
 */
import { InputError } from '../design/errors.js';
import { CONDUCTORS, type ConductorName } from '../materials/conductors.js';
import { rectangleGmd_m, roundWireGmd_m } from './mutual.js';
import { awgDiameter_m } from './wire-gauge.js';

export type ConductorSpec =
  | {
      shape: 'round';
      /** Bare diameter, m. Give this or `awg`. */
      diameter_m?: number;
      /** AWG gauge number (0000 = −3), ASTM B258. */
      awg?: number;
      /** Increase of the diameter due to insulation (both sides), m. Default 0. */
      insulationBuild_m?: number;
    }
  | {
      shape: 'rectangular';
      /** Bare width along the coil axis, m. */
      width_m: number;
      /** Bare height across the winding (radial), m. */
      height_m: number;
      /** Corner radius of the bare conductor, m. Default 0. */
      cornerRadius_m?: number;
      /** Increase of each outer dimension due to insulation (both sides), m. Default 0. */
      insulationBuild_m?: number;
    };

export interface WindingSpec {
  name?: string;
  innerRadius_m: number;
  /** Give outerRadius_m or layers (or both). */
  outerRadius_m?: number;
  layers?: number;
  /** Winding length along the axis, m. */
  length_m: number;
  turnsPerLayer?: number;
  /** Axial position of the winding's centre, m. Default 0. */
  centre_m?: number;
  conductor: ConductorSpec;
  /** Fraction (0, 1] of the ideal square stacking achieved; scales both pitches by 1/√f. Default 1. */
  packingFactor?: number;
  /** Copper area / window area; when given it sets the pitches instead of packingFactor. */
  fillFactor?: number;
  /** Default copper. */
  metal?: ConductorName;
  /** Current sense relative to the coil's terminals: aiding (+1) or opposing (−1). Default aiding. */
  sense?: 'aiding' | 'opposing';
}

/** One layer: `turns` filaments at radius r, starting at z0 and `pitch` apart. */
export interface WindingLayer {
  radius_m: number;
  z0_m: number;
  pitch_m: number;
  turns: number;
  /** +1 aiding, −1 opposing. */
  sign: number;
  /** GMD of one turn's conductor from itself, m. */
  gmd_m: number;
}

export interface Winding {
  name: string;
  turns: number;
  layers: number;
  turnsPerLayer: number;
  innerRadius_m: number;
  outerRadius_m: number;
  length_m: number;
  centre_m: number;
  /** Distance between turn centres along the axis and across layers, m. */
  axialPitch_m: number;
  radialPitch_m: number;
  /** Bare conductor cross-section, m². */
  conductorArea_m2: number;
  conductorLength_m: number;
  resistance20_Ohm: number;
  tempCoeff20_perK: number;
  mass_kg: number;
  heatCapacity_JpK: number;
  metal: ConductorName;
  /** Achieved copper area / window area. */
  fillFactor: number;
  /** Bare diameter of a round conductor, m (undefined for rectangular). */
  wireDiameter_m?: number;
  sign: number;
  layerList: WindingLayer[];
}

const EPS = 1e-9;

function fail(path: string, value: unknown, expected: string, problem: string, code = 'design.inconsistent'): never {
  throw new InputError({ code, path, value, expected, problem });
}

/** Resolves a winding's dimensions into turns, layers, filaments and conductor figures. Throws InputError on impossible geometry. */
export function resolveWinding(spec: WindingSpec, index = 0): Winding {
  const name = spec.name ?? `winding ${index + 1}`;
  const c = spec.conductor;
  const build = c.insulationBuild_m ?? 0;
  if (build < 0) fail('conductor.insulationBuild', build, 'an insulation build of 0 or more', 'negative build', 'design.out-of-range');
  let area: number;
  let wo: number;
  let ho: number;
  let gmd: number;
  let wireDiameter: number | undefined;
  if (c.shape === 'round') {
    let d = c.diameter_m;
    if (d === undefined) {
      if (c.awg === undefined) fail('conductor', c, 'a round conductor with `diameter` or `awg`', 'neither is given', 'design.missing-field');
      d = awgDiameter_m(c.awg);
      if (!Number.isFinite(d)) fail('conductor.awg', c.awg, 'an AWG gauge from 0000 to 56', 'not a gauge', 'design.out-of-range');
    } else if (c.awg !== undefined && Math.abs(awgDiameter_m(c.awg) - d) > 1e-6) {
      fail('conductor', c, 'either `diameter` or `awg`, or both agreeing', `AWG ${c.awg} is ${(awgDiameter_m(c.awg) * 1e3).toFixed(3)} mm, not ${(d * 1e3).toFixed(3)} mm`);
    }
    if (!(d > 0)) fail('conductor.diameter', d, 'a diameter greater than 0', 'not positive', 'design.out-of-range');
    area = (Math.PI * d * d) / 4;
    wo = ho = d + build;
    gmd = roundWireGmd_m(d);
    wireDiameter = d;
  } else {
    const { width_m: w, height_m: h } = c;
    const rc = c.cornerRadius_m ?? 0;
    if (!(w > 0)) fail('conductor.width', w, 'a width greater than 0', 'not positive', 'design.out-of-range');
    if (!(h > 0)) fail('conductor.height', h, 'a height greater than 0', 'not positive', 'design.out-of-range');
    if (rc < 0 || 2 * rc > Math.min(w, h)) fail('conductor.cornerRadius', rc, `a corner radius from 0 to half the smaller side (${(Math.min(w, h) / 2) * 1e3} mm)`, 'out of range', 'design.out-of-range');
    area = w * h - (4 - Math.PI) * rc * rc;
    wo = w + build;
    ho = h + build;
    gmd = rectangleGmd_m(w, h);
  }

  let pz: number;
  let pr: number;
  if (spec.fillFactor !== undefined) {
    const f = spec.fillFactor;
    if (!(f > 0 && f <= 1)) fail('fillFactor', f, 'a fill factor in (0, 1]', 'out of range', 'design.out-of-range');
    const s = Math.sqrt(area / (f * wo * ho));
    if (s < 1 - EPS) {
      fail('fillFactor', f, `at most ${(area / (wo * ho)).toFixed(3)} for this conductor and insulation (one turn's outer outline)`, 'the conductor cannot be packed that densely');
    }
    pz = wo * s;
    pr = ho * s;
  } else {
    const p = spec.packingFactor ?? 1;
    if (!(p > 0 && p <= 1)) fail('packingFactor', p, 'a packing factor in (0, 1]', 'out of range', 'design.out-of-range');
    pz = wo / Math.sqrt(p);
    pr = ho / Math.sqrt(p);
  }

  const ri = spec.innerRadius_m;
  if (!(ri > 0)) fail('innerRadius', ri, 'an inner radius greater than 0', 'not positive', 'design.out-of-range');
  const len = spec.length_m;
  if (!(len > 0)) fail('length', len, 'a winding length greater than 0', 'not positive', 'design.out-of-range');

  const tpl = spec.turnsPerLayer ?? Math.floor(len / pz + EPS);
  if (!(Number.isInteger(tpl) && tpl >= 1)) {
    fail(spec.turnsPerLayer === undefined ? 'length' : 'turnsPerLayer', spec.turnsPerLayer ?? len, `room for at least one turn (axial pitch ${(pz * 1e3).toFixed(3)} mm)`, spec.turnsPerLayer === undefined ? 'the winding is shorter than one conductor' : 'not a whole number of at least 1');
  }
  if (tpl * pz > len * (1 + EPS)) {
    fail('turnsPerLayer', tpl, `at most ${Math.floor(len / pz + EPS)} turns in ${(len * 1e3).toFixed(2)} mm at an axial pitch of ${(pz * 1e3).toFixed(3)} mm`, 'the turns do not fit the winding length');
  }

  let layers: number;
  let ro: number;
  if (spec.layers !== undefined) {
    layers = spec.layers;
    if (!(Number.isInteger(layers) && layers >= 1)) fail('layers', layers, 'a whole number of layers, at least 1', 'not a whole number of at least 1', 'design.out-of-range');
    if (spec.outerRadius_m !== undefined) {
      ro = spec.outerRadius_m;
      if (layers * pr > (ro - ri) * (1 + EPS) + EPS * ri) {
        fail('layers', layers, `at most ${Math.floor((ro - ri) / pr + EPS)} layers between radii ${(ri * 1e3).toFixed(2)} and ${(ro * 1e3).toFixed(2)} mm at a radial pitch of ${(pr * 1e3).toFixed(3)} mm`, 'the layers do not fit the winding depth');
      }
    } else {
      ro = ri + layers * pr;
    }
  } else {
    if (spec.outerRadius_m === undefined) fail('outerRadius', undefined, '`outerRadius` or `layers`', 'neither is given', 'design.missing-field');
    ro = spec.outerRadius_m;
    if (!(ro > ri)) fail('outerRadius', ro, `an outer radius greater than the inner radius (${ri * 1e3} mm)`, 'not greater', 'design.out-of-range');
    layers = Math.floor((ro - ri) / pr + EPS);
    if (layers < 1) fail('outerRadius', ro, `room for at least one layer (radial pitch ${(pr * 1e3).toFixed(3)} mm)`, 'the winding is thinner than one conductor');
  }

  const metal = spec.metal ?? 'copper';
  const mat = CONDUCTORS[metal];
  const centre = spec.centre_m ?? 0;
  const sign = spec.sense === 'opposing' ? -1 : 1;
  const dr = (ro - ri) / layers;
  const dz = len / tpl;
  const layerList: WindingLayer[] = [];
  let conductorLength = 0;
  for (let j = 0; j < layers; j++) {
    const r = ri + (j + 0.5) * dr;
    layerList.push({ radius_m: r, z0_m: centre - len / 2 + 0.5 * dz, pitch_m: dz, turns: tpl, sign, gmd_m: gmd });
    conductorLength += tpl * 2 * Math.PI * r;
  }
  const turns = layers * tpl;
  const mass = mat.density_kgpm3 * area * conductorLength;
  const out: Winding = {
    name,
    turns,
    layers,
    turnsPerLayer: tpl,
    innerRadius_m: ri,
    outerRadius_m: ro,
    length_m: len,
    centre_m: centre,
    axialPitch_m: dz,
    radialPitch_m: dr,
    conductorArea_m2: area,
    conductorLength_m: conductorLength,
    resistance20_Ohm: (mat.resistivity20_Ohm_m * conductorLength) / area,
    tempCoeff20_perK: mat.tempCoeff20_perK,
    mass_kg: mass,
    heatCapacity_JpK: mass * mat.specificHeat_JpkgK,
    metal,
    fillFactor: (turns * area) / (len * (ro - ri)),
    sign,
    layerList,
  };
  if (wireDiameter !== undefined) out.wireDiameter_m = wireDiameter;
  return out;
}
