/**
 * From a parsed design (SI numbers, defaults applied) to the engine's `Station`.
 *
 * Checks physics the schema alone cannot: loop names unique and known, mutual inductances
 * given consistently, and the magnetic inductance matrix of coil + loops positive definite
 * (every coupling coefficient |k| = |M|/√(L_a·L_b) < 1, and the matrix as a whole: a
 * passive set of coupled inductors stores positive energy ½·iᵀ·L·i > 0 for any currents).
 * Problems throw `InputError` with the field path.
 *
 * EXTENDING: a section that changes the Station (coil geometry, conductive bodies, yoke
 * fixtures) adds one StationStep to STATION_STEPS; steps run in order after the base
 * conversion and before the final checks.
 */
import type { FieldProbe, Station } from '../model/station.js';
import { InputError, type InputIssue } from './errors.js';
import { nearest } from './issues.js';
import type { Design } from './schema.js';
import { bankToStation } from './sections/bank.js';
import { cableToStation } from './sections/cable.js';
import { coilToStation } from './sections/coil.js';
import { fixtureStationStep } from './sections/fixture-geometry.js';
import { hasThermalAmount } from './sections/thermal.js';
import { coupledLoopToStation } from './sections/coupled.js';
import { freewheelToStation } from './sections/freewheel.js';
import { solverToStation } from './sections/solver.js';
import { switchToStation } from './sections/switch.js';
import { yokeStationStep } from './sections/yoke.js';

/** A conversion step contributed by a section: gets the design and the station so far, returns the new station. */
export type StationStep = (design: Design, station: Station) => Station;

/** Steps added by other sections, in order (one line each). */
export const STATION_STEPS: StationStep[] = [yokeStationStep, fixtureStationStep];

/** Name given to probe 0. */
export const PART_PROBE_NAME = 'part';

function issue(path: string, code: InputIssue['code'], value: unknown, problem: string, expected: string, suggestion?: string): InputIssue {
  const i: InputIssue = { code, path, value, problem, expected };
  if (suggestion !== undefined) i.suggestion = suggestion;
  return i;
}

function baseStation(design: Design): { station: Station; issues: InputIssue[] } {
  const issues: InputIssue[] = [];
  const loops = design.coupled;
  const names = loops.map((l) => l.name);
  loops.forEach((l, i) => {
    const j = names.indexOf(l.name);
    if (j !== i) issues.push(issue(`coupled[${i}].name`, 'design.duplicate-name', l.name, `"${l.name}" is also the name of coupled[${j}]`, 'a name used by one loop only'));
  });

  // Loop-to-loop mutuals: symmetric matrix; a pair given twice must agree (to 1e-9 relative).
  const n = loops.length;
  const M: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const given: (string | null)[][] = Array.from({ length: n }, () => new Array<string | null>(n).fill(null));
  loops.forEach((l, i) => {
    for (const [other, value] of Object.entries(l.mutualTo ?? {})) {
      const path = `coupled[${i}].mutualTo.${other}`;
      const j = names.indexOf(other);
      if (j < 0) {
        issues.push(issue(path, 'design.unknown-field', value, `no coupled loop is named "${other}"`, `the name of another loop: ${names.filter((x) => x !== l.name).join(', ') || '(none)'}`, nearest(other, names)));
        continue;
      }
      if (j === i) {
        issues.push(issue(path, 'design.inconsistent', value, 'a loop cannot list a mutual inductance to itself', 'the name of another loop (its self inductance is `inductance`)'));
        continue;
      }
      const prev = given[i]![j];
      if (prev !== null && Math.abs(M[i]![j]! - value) > 1e-9 * Math.max(Math.abs(value), Math.abs(M[i]![j]!))) {
        issues.push(issue(path, 'design.inconsistent', value, `differs from ${prev} (${M[i]![j]} H)`, 'the same mutual inductance both ways, or give it once'));
        continue;
      }
      M[i]![j] = value;
      M[j]![i] = value;
      given[i]![j] = path;
      given[j]![i] = path;
    }
  });

  // coil.inductance and coil.fieldPerAmpere may be left out only when a yoke or fixture section computes them;
  // coil.resistance and the amount of conductor only when a fixture section does.
  if (!design.yoke && !design.fixture) {
    for (const k of ['inductance', 'fieldPerAmpere'] as const) {
      if (design.coil[k] === undefined) issues.push(issue(`coil.${k}`, 'design.missing-field', undefined, 'missing', k === 'inductance' ? 'an inductance (H), e.g. 180 uH (or a yoke or fixture section)' : 'a field per ampere ((A/m)/A), e.g. 95 A/m/A (or a yoke or fixture section)'));
    }
  }
  if (!design.fixture) {
    if (design.coil.resistance === undefined) issues.push(issue('coil.resistance', 'design.missing-field', undefined, 'missing', 'a resistance at 20 °C (Ω), e.g. 25 mohm (or a fixture section)'));
    if (!hasThermalAmount(design.coil)) issues.push(issue('coil.mass', 'design.missing-field', undefined, 'missing: the heating model needs the amount of conductor', 'one of mass (e.g. 2.1 kg), volume (e.g. 240 cm^3) or heatCapacity (e.g. 810 J/K) (or a fixture section)'));
  }
  const partProbe: FieldProbe = {
    name: PART_PROBE_NAME,
    coil_ApmPerA: design.coil.fieldPerAmpere ?? NaN,
    loops_ApmPerA: loops.map((l) => l.fieldPerAmpere),
  };
  const probes: FieldProbe[] = [partProbe];
  design.probes.forEach((p, k) => {
    if (p.name === PART_PROBE_NAME || design.probes.findIndex((q) => q.name === p.name) !== k) {
      issues.push(issue(`probes[${k}].name`, 'design.duplicate-name', p.name, `"${p.name}" is already used`, `a name other than "${PART_PROBE_NAME}" (the part is probe 0) and the other probes`));
    }
    for (const key of Object.keys(p.loops ?? {})) {
      if (!names.includes(key)) {
        issues.push(issue(`probes[${k}].loops.${key}`, 'design.unknown-field', p.loops![key], `no coupled loop is named "${key}"`, `a loop name: ${names.join(', ') || '(none defined)'}`, nearest(key, names)));
      }
    }
    probes.push({ name: p.name, coil_ApmPerA: p.fieldPerAmpere, loops_ApmPerA: names.map((nm) => p.loops?.[nm] ?? 0) });
  });

  const station: Station = {
    name: design.name ?? 'unnamed station',
    bank: bankToStation(design.bank),
    switch: switchToStation(design.switch),
    freewheel: freewheelToStation(design.freewheel),
    cable: cableToStation(design.cable),
    coil: coilToStation(design.coil),
    coupled: loops.map(coupledLoopToStation),
    loopMutual_H: M,
    probes,
    solver: solverToStation(design.solver),
  };
  return { station, issues };
}

/** Cholesky factorization succeeds iff the symmetric matrix is positive definite (Golub & Van Loan, Matrix Computations, §4.2). */
export function isPositiveDefinite(A: readonly (readonly number[])[]): boolean {
  const n = A.length;
  const Lc: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let j = 0; j < n; j++) {
    let d = A[j]![j]!;
    for (let k = 0; k < j; k++) d -= Lc[j]![k]! ** 2;
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    Lc[j]![j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = A[i]![j]!;
      for (let k = 0; k < j; k++) s -= Lc[i]![k]! * Lc[j]![k]!;
      Lc[i]![j] = s / ljj;
    }
  }
  return true;
}

/** Physics checks on a finished station (after every step). Returns problems, empty when fine. */
export function checkStationInductances(st: Station, loopPath: (k: number) => string = (k) => `coupled[${k}]`): InputIssue[] {
  const issues: InputIssue[] = [];
  const L1 = st.coil.inductance_H;
  const n = st.coupled.length;
  st.coupled.forEach((l, k) => {
    const kc = Math.abs(l.mutualToCoil_H) / Math.sqrt(L1 * l.inductance_H);
    if (!(kc < 1)) {
      issues.push(issue(`${loopPath(k)}.mutual`, 'design.inconsistent', l.mutualToCoil_H, `coupling coefficient |M|/√(L_coil·L_loop) = ${kc.toPrecision(4)} (loop "${l.name}")`, 'a mutual inductance smaller in size than √(L_coil·L_loop) (coupling below 1)'));
    }
  });
  for (let a = 0; a < n; a++) {
    for (let b = a + 1; b < n; b++) {
      const m = st.loopMutual_H[a]?.[b] ?? 0;
      const kc = Math.abs(m) / Math.sqrt(st.coupled[a]!.inductance_H * st.coupled[b]!.inductance_H);
      if (!(kc < 1)) {
        issues.push(issue(`${loopPath(a)}.mutualTo.${st.coupled[b]!.name}`, 'design.inconsistent', m, `coupling coefficient between "${st.coupled[a]!.name}" and "${st.coupled[b]!.name}" is ${kc.toPrecision(4)}`, 'a mutual inductance smaller in size than √(L_a·L_b)'));
      }
    }
  }
  if (issues.length === 0 && n > 0) {
    const A: number[][] = [[L1, ...st.coupled.map((l) => l.mutualToCoil_H)]];
    st.coupled.forEach((l, k) => A.push([l.mutualToCoil_H, ...st.loopMutual_H[k]!.map((m, j) => (j === k ? l.inductance_H : m))]));
    if (!isPositiveDefinite(A)) {
      issues.push(issue('coupled', 'design.inconsistent', undefined, 'the inductance matrix of coil and loops is not positive definite (the couplings are impossible together)', 'mutual inductances that a real set of conductors can have: reduce the couplings'));
    }
  }
  return issues;
}

/**
 * Convert a parsed design to the engine's Station (SI), running every StationStep.
 * Throws InputError for designs that are well-formed but physically impossible.
 */
export function designToStation(design: Design, file?: string): Station {
  const { station, issues } = baseStation(design);
  if (issues.length) throw new InputError(issues, file);
  let st = station;
  for (const step of STATION_STEPS) st = step(design, st);
  const problems = checkStationInductances(st);
  if (problems.length) throw new InputError(problems, file);
  return st;
}
