/**
 * Iron-yoke fixture: a coil of N turns on a steel yoke, the part held in the yoke's working gap.
 * Reduces the fixture description to a magnetic network (magnetic-circuit.ts) and answers the
 * operating point at a coil current: flux linkage, incremental inductance, co-energy, the field
 * in the part, flux densities in the steel and the leakage share.
 *
 * Network (node 0 = one pole face, node 1 = the other):
 *
 *    node 0 ──[yoke legs, in series, coil MMF N·i]──> node 1
 *    node 1 ──[leakage paths, in parallel]──────────> node 0
 *    node 1 ──[pole pieces]──[gaps]──[part]─────────> node 0
 *
 *  - yoke legs and pole pieces: steel, R = ℓ/(µ(H)·A) with the steel's B–H curve;
 *  - gaps (clearances, shims, non-magnetic holders): air, R = ℓ/(µ0·A);
 *  - part: linear with its recoil permeability µ_rec (about 1.05 for rare-earth magnets,
 *    DOMAIN.md), R = ℓ/(µ_rec·µ0·A). The part's own remanence is left out: the field it sees
 *    is the field the coil applies through it (the usual magnetizing-fixture approximation);
 *  - leakage: flux from pole to pole that misses the part, either a permeance P (H) or an
 *    air path of length ℓ and area A (P = µ0·A/ℓ).
 * The field at the part is H_part = F_part/ℓ_part (A/m), F_part the MMF across the part.
 * Sources: the magnetic-circuit method of any electrical-machines text (e.g. Fitzgerald &
 * Kingsley, "Electric Machinery", ch. 1); leakage as a parallel permeance is the classic
 * permeance model (Roters, "Electromagnetic Devices", 1941).
 */

import { solveMagneticCircuit, type MagneticBranch, type MagneticNetwork, type MagneticSolution } from './magnetic-circuit.js';
import { MU0_HpM, linearMaterial, type BHCurve } from '../materials/steels.js';

/** A steel member of the yoke: mean flux-path length, cross-section, material. */
export interface YokeSteel {
  name: string;
  /** Mean flux-path length, m (> 0). */
  length_m: number;
  /** Cross-section, m² (> 0). */
  area_m2: number;
  material: BHCurve;
}

/** A non-magnetic gap in series with the part. */
export interface YokeGap {
  name: string;
  /** Gap length along the flux, m (> 0). */
  length_m: number;
  /** Effective area (fringing included if the user wishes), m² (> 0). */
  area_m2: number;
}

/** A leakage path between the pole faces: a permeance, or an air path. */
export type YokeLeakage = { name: string; permeance_H: number } | { name: string; length_m: number; area_m2: number };

/** The part in the working gap. */
export interface YokePart {
  /** Length along the magnetizing direction, m (> 0). */
  length_m: number;
  /** Cross-section normal to it, m² (> 0). */
  area_m2: number;
  /** Relative recoil permeability µ_rec (≥ 1; about 1.05 for sintered NdFeB, DOMAIN.md, typical). */
  recoilPermeability: number;
}

/** A yoke fixture in SI units (the design section resolves units and material names into this). */
export interface YokeSpec {
  /** Coil turns N (> 0). */
  turns: number;
  /** Steel path that carries the coil (core, back iron, return legs), in series. At least one. */
  yoke: YokeSteel[];
  /** Steel pole pieces between the leakage path and the working gap (may be empty). */
  poles: YokeSteel[];
  /** Non-magnetic gaps in series with the part (may be empty). */
  gaps: YokeGap[];
  part: YokePart;
  /** Leakage paths parallel to pole pieces + gaps + part (may be empty). */
  leakage: YokeLeakage[];
}

/** Flux density in one steel member at the operating point. */
export interface YokeSteelState {
  name: string;
  fluxDensity_T: number;
  fieldStrength_Apm: number;
  /** Polarization J = B − µ0H over the material's J at the top of its table (≈1: saturated). */
  saturation: number;
}

/** Operating point of a yoke fixture at one coil current. */
export interface YokeOperatingPoint {
  current_A: number;
  /** λ = N·φ_yoke, Wb-turns. */
  fluxLinkage_Wb: number;
  /** dλ/di, H. */
  incrementalInductance_H: number;
  /** ∫0^i λ di', J. */
  coEnergy_J: number;
  /** Magnetic energy i·λ − co-energy, J. */
  magneticEnergy_J: number;
  /** H in the part, A/m. */
  partField_Apm: number;
  /** dH_part/di, (A/m)/A. */
  partFieldPerAmpere_ApmPerA: number;
  /** B in the part, T. */
  partFluxDensity_T: number;
  /** Share of the yoke flux that bypasses the part through the leakage paths (0…1). */
  leakageFraction: number;
  steel: YokeSteelState[];
  converged: boolean;
  /** The raw network solution (node potentials allow a warm start at a neighbouring current). */
  solution: MagneticSolution;
}

const YOKE_PREFIX = 'yoke:';
const POLE_PREFIX = 'pole:';
const PART = 'part';

/** Networks already built (a spec is treated as immutable once used). */
const networks = new WeakMap<YokeSpec, MagneticNetwork>();

/** Builds the magnetic network of a yoke fixture. Throws RangeError on an impossible spec (the design layer validates user input first). */
export function yokeNetwork(spec: YokeSpec): MagneticNetwork {
  let net = networks.get(spec);
  if (!net) {
    net = buildYokeNetwork(spec);
    networks.set(spec, net);
  }
  return net;
}

function buildYokeNetwork(spec: YokeSpec): MagneticNetwork {
  if (!(spec.turns > 0)) throw new RangeError(`yoke: turns must be > 0 (got ${spec.turns})`);
  if (spec.yoke.length === 0) throw new RangeError('yoke: at least one yoke member is needed');
  if (!(spec.part.recoilPermeability > 0)) throw new RangeError(`yoke: part recoil permeability must be > 0 (got ${spec.part.recoilPermeability})`);
  const branches: MagneticBranch[] = [];
  let nodes = 2;
  // Yoke chain 0 → … → 1, the coil MMF on the first member.
  let at = 0;
  spec.yoke.forEach((leg, k) => {
    const to = k === spec.yoke.length - 1 ? 1 : nodes++;
    branches.push({
      name: YOKE_PREFIX + leg.name,
      from: at,
      to,
      turns: k === 0 ? spec.turns : 0,
      element: { kind: 'material', length_m: leg.length_m, area_m2: leg.area_m2, material: leg.material },
    });
    at = to;
  });
  for (const l of spec.leakage) {
    const element =
      'permeance_H' in l
        ? { kind: 'permeance' as const, permeance_H: l.permeance_H }
        : { kind: 'material' as const, length_m: l.length_m, area_m2: l.area_m2, material: linearMaterial(1, 'air') };
    branches.push({ name: 'leakage:' + l.name, from: 1, to: 0, element });
  }
  // Working chain 1 → poles → gaps → part → 0.
  at = 1;
  for (const p of spec.poles) {
    const to = nodes++;
    branches.push({ name: POLE_PREFIX + p.name, from: at, to, element: { kind: 'material', length_m: p.length_m, area_m2: p.area_m2, material: p.material } });
    at = to;
  }
  for (const g of spec.gaps) {
    const to = nodes++;
    branches.push({ name: 'gap:' + g.name, from: at, to, element: { kind: 'material', length_m: g.length_m, area_m2: g.area_m2, material: linearMaterial(1, 'air') } });
    at = to;
  }
  branches.push({
    name: PART,
    from: at,
    to: 0,
    element: { kind: 'material', length_m: spec.part.length_m, area_m2: spec.part.area_m2, material: linearMaterial(spec.part.recoilPermeability, 'part') },
  });
  return { nodes, branches };
}

/** Reads the yoke quantities off a solved network. */
export function yokeStateFromSolution(spec: YokeSpec, net: MagneticNetwork, s: MagneticSolution): YokeOperatingPoint {
  const part = s.branches[s.branches.length - 1];
  const yokeFlux = s.branches[0].flux_Wb;
  const steel: YokeSteelState[] = [];
  net.branches.forEach((b, k) => {
    if (b.element.kind !== 'material' || !(b.name.startsWith(YOKE_PREFIX) || b.name.startsWith(POLE_PREFIX))) return;
    const st = s.branches[k];
    const mat = b.element.material;
    const j = Math.abs(st.fluxDensity_T) - MU0_HpM * Math.abs(st.fieldStrength_Apm);
    steel.push({
      name: b.name,
      fluxDensity_T: st.fluxDensity_T,
      fieldStrength_Apm: st.fieldStrength_Apm,
      saturation: Number.isFinite(mat.saturationPolarization_T) ? j / mat.saturationPolarization_T : 0,
    });
  });
  return {
    current_A: s.current_A,
    fluxLinkage_Wb: s.fluxLinkage_Wb,
    incrementalInductance_H: s.incrementalInductance_H,
    coEnergy_J: s.coEnergy_J,
    magneticEnergy_J: s.current_A * s.fluxLinkage_Wb - s.coEnergy_J,
    partField_Apm: part.mmf_A / spec.part.length_m,
    partFieldPerAmpere_ApmPerA: part.mmfPerAmpere / spec.part.length_m,
    partFluxDensity_T: part.fluxDensity_T,
    leakageFraction: yokeFlux === 0 ? leakageFractionLinear(s) : 1 - part.flux_Wb / yokeFlux,
    steel,
    converged: s.converged,
    solution: s,
  };
}

function leakageFractionLinear(s: MagneticSolution): number {
  // At zero current use the flux sensitivities (the small-signal split).
  const y = s.branches[0].fluxPerAmpere_WbpA;
  const p = s.branches[s.branches.length - 1].fluxPerAmpere_WbpA;
  return y === 0 ? 0 : 1 - p / y;
}

/** Operating point at coil current `current_A` (warm start optional). */
export function yokeOperatingPoint(spec: YokeSpec, current_A: number, warmStart?: YokeOperatingPoint): YokeOperatingPoint {
  const net = yokeNetwork(spec);
  const s = solveMagneticCircuit(net, current_A, warmStart ? { initialPotentials_A: warmStart.solution.nodePotentials_A } : {});
  return yokeStateFromSolution(spec, net, s);
}

/** The same fixture with every steel replaced by its slope above the table (µ0): the fully saturated incremental behaviour. */
export function saturatedYokeSpec(spec: YokeSpec): YokeSpec {
  const air = (m: YokeSteel): YokeSteel => ({ ...m, material: linearMaterial(1, 'saturated steel (incremental µ0)') });
  return { ...spec, yoke: spec.yoke.map(air), poles: spec.poles.map(air) };
}

/**
 * Small-current and fully saturated incremental inductances, H. By Rayleigh's monotonicity law
 * (a network's conductance never falls when a branch conductance rises; e.g. Doyle & Snell,
 * "Random Walks and Electric Networks", 1984, ch. 1.4), and since every steel has dB/dH ≥ µ0,
 * dλ/di ≥ saturated_H at every current. Hence the magnetic energy is at least ½·saturated_H·i²
 * and a bank of C charged to V0 can never push more than V0·√(C/saturated_H) through the coil.
 */
export function yokeInductanceLimits(spec: YokeSpec): { smallCurrent_H: number; saturated_H: number; partFieldPerAmpereSmall_ApmPerA: number } {
  const small = yokeOperatingPoint(spec, 0);
  const sat = yokeOperatingPoint(saturatedYokeSpec(spec), 0);
  return { smallCurrent_H: small.incrementalInductance_H, saturated_H: sat.incrementalInductance_H, partFieldPerAmpereSmall_ApmPerA: small.partFieldPerAmpere_ApmPerA };
}

/**
 * The coil current that gives the field `target_Apm` in the part (H_part rises with i).
 * Method: bracket from the small-current slope (saturation only lowers the field per ampere,
 * so the root is at or above target/slope), then the Illinois variant of regula falsi on
 * H_part(i) − target with warm-started network solves. Returns NaN for a non-positive target.
 */
export function yokeCurrentForPartField(spec: YokeSpec, target_Apm: number, relTol = 1e-10): { current_A: number; point: YokeOperatingPoint; iterations: number } {
  if (!(target_Apm > 0)) {
    const point = yokeOperatingPoint(spec, 0);
    return { current_A: NaN, point, iterations: 0 };
  }
  let p0 = yokeOperatingPoint(spec, 0);
  let a = 0;
  let fa = -target_Apm;
  let b = target_Apm / p0.partFieldPerAmpere_ApmPerA;
  let pb = yokeOperatingPoint(spec, b, p0);
  let fb = pb.partField_Apm - target_Apm;
  let iterations = 0;
  while (fb < 0 && iterations < 200) {
    a = b;
    fa = fb;
    p0 = pb;
    b *= 2;
    pb = yokeOperatingPoint(spec, b, pb);
    fb = pb.partField_Apm - target_Apm;
    iterations++;
  }
  let side = 0;
  let best = pb;
  for (; iterations < 300; iterations++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const pc = yokeOperatingPoint(spec, c, best);
    const fc = pc.partField_Apm - target_Apm;
    best = pc;
    if (Math.abs(fc) <= relTol * target_Apm || Math.abs(b - a) <= 1e-15 * b) return { current_A: c, point: pc, iterations };
    if (fc * fb > 0) {
      b = c;
      fb = fc;
      if (side === 1) fa /= 2;
      side = 1;
    } else {
      a = c;
      fa = fc;
      if (side === -1) fb /= 2;
      side = -1;
    }
  }
  return { current_A: best.current_A, point: best, iterations };
}
