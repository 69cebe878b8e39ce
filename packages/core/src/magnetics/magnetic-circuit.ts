/**
 * Nonlinear magnetic circuit: a network of reluctances driven by coil MMFs, solved for the
 * fluxes by Newton's method.
 *
 * Model (the magnetic-circuit analogue of a resistive network; e.g. Fitzgerald & Kingsley,
 * "Electric Machinery", ch. 1; Hughes, "Electrical and Electronic Technology", magnetic circuits):
 * each branch b joins node `from` to node `to` and holds one element, a length ℓ of a material
 * with cross-section A and law B(H) (steel leg, air gap with µr = 1, magnet part with its
 * recoil permeability), or a lumped permeance P (a leakage path). A coil of N_b turns on the
 * branch adds an MMF N_b·i in the direction from → to. With node magnetic potentials u
 * (node 0 the reference, u_0 = 0):
 *   F_b = u_from − u_to + N_b·i              MMF across the element, A
 *   φ_b = A·B(F_b/ℓ)   or   φ_b = P·F_b       flux from → to, Wb
 *   Σ_b (±φ_b) = 0 at every node             flux continuity (Kirchhoff's current law)
 * Method: nodal analysis, Newton's method on the node potentials. The flux law of every
 * element is monotone (dφ/dF ≥ 0), so continuity is the stationarity condition of the convex
 * potential Φ(u) = Σ_b G_b(F_b), G_b(F) = ∫0^F φ_b dF' (the branch co-energy); Newton's step
 * with a line search on Φ along the step (bisection of its monotone directional derivative)
 * therefore converges from any start.
 * The Jacobian is the weighted Laplacian Σ_b (dφ_b/dF)·a_b·a_bᵀ, solved by Gaussian elimination.
 *
 * Outputs, for the coil current i:
 *   λ = Σ_b N_b·φ_b                            flux linkage, Wb-turns
 *   dλ/di by implicit differentiation of the continuity equations (exact for the model)
 *   W'(i) = ∫0^i λ di' = Σ_b G_b(F_b)          co-energy (Tellegen: Σ φ_b·dF_b = λ·di at equilibrium)
 * Range: any connected network whose laws are monotone; the initial (anhysteretic-like)
 * curve only: no hysteresis, no eddy currents in the steel, uniform flux in each element.
 */

import type { BHCurve } from '../materials/steels.js';

/** One element of a branch. */
export type MagneticElement =
  | {
      kind: 'material';
      /** Mean path length ℓ, m (> 0). */
      length_m: number;
      /** Cross-section A, m² (> 0). */
      area_m2: number;
      /** Material law B(H). */
      material: BHCurve;
    }
  | {
      kind: 'permeance';
      /** Lumped permeance P = φ/F, H (= Wb/A, ≥ 0). */
      permeance_H: number;
    };

export interface MagneticBranch {
  name: string;
  /** Node where the branch flux leaves (0 is the reference node). */
  from: number;
  /** Node where the branch flux arrives. */
  to: number;
  element: MagneticElement;
  /** Coil turns around this branch: an MMF turns·i acting from → to (default 0). */
  turns?: number;
}

export interface MagneticNetwork {
  /** Number of nodes, reference node 0 included. */
  nodes: number;
  branches: MagneticBranch[];
}

export interface BranchState {
  name: string;
  /** Flux from → to, Wb. */
  flux_Wb: number;
  /** MMF across the element (the source excluded), A. */
  mmf_A: number;
  /** Flux density B = φ/A, T (NaN for a lumped permeance). */
  fluxDensity_T: number;
  /** Field strength H = F/ℓ, A/m (NaN for a lumped permeance). */
  fieldStrength_Apm: number;
  /** dφ/di, Wb/A. */
  fluxPerAmpere_WbpA: number;
  /** dF/di, A/A. */
  mmfPerAmpere: number;
}

export interface MagneticSolution {
  current_A: number;
  branches: BranchState[];
  /** Node magnetic potentials, A (node 0 = 0). */
  nodePotentials_A: number[];
  /** λ = Σ N_b·φ_b, Wb-turns. */
  fluxLinkage_Wb: number;
  /** dλ/di, H. */
  incrementalInductance_H: number;
  /** ∫0^i λ di' = Σ_b G_b(F_b), J. */
  coEnergy_J: number;
  iterations: number;
  converged: boolean;
  /** Largest flux-continuity residual at a node after the last iteration, Wb. */
  residual_Wb: number;
}

export interface SolveOptions {
  /** Starting node potentials (e.g. the solution at a neighbouring current). */
  initialPotentials_A?: readonly number[];
  /** Relative tolerance on flux continuity (default 1e-12 of the largest branch flux). */
  relTol?: number;
  /** Newton iteration limit (default 100). */
  maxIterations?: number;
}

interface ElementLaw {
  flux: number;
  slope: number;
}

function elementLaw(e: MagneticElement, mmf: number): ElementLaw {
  if (e.kind === 'permeance') return { flux: e.permeance_H * mmf, slope: e.permeance_H };
  const h = mmf / e.length_m;
  return { flux: e.area_m2 * e.material.fluxDensity_T(h), slope: (e.area_m2 * e.material.differentialPermeability_HpM(h)) / e.length_m };
}

function elementCoEnergy(e: MagneticElement, mmf: number): number {
  if (e.kind === 'permeance') return 0.5 * e.permeance_H * mmf * mmf;
  return e.area_m2 * e.length_m * e.material.coEnergyDensity_Jpm3(mmf / e.length_m);
}

/** Checks the structure of a network; returns the first problem or null. */
export function checkMagneticNetwork(net: MagneticNetwork): string | null {
  if (!Number.isInteger(net.nodes) || net.nodes < 2) return `a network needs at least 2 nodes (got ${net.nodes})`;
  const seen = new Array<boolean>(net.nodes).fill(false);
  const adj: number[][] = Array.from({ length: net.nodes }, () => []);
  for (const b of net.branches) {
    for (const n of [b.from, b.to]) {
      if (!Number.isInteger(n) || n < 0 || n >= net.nodes) return `branch ${b.name}: node ${n} is outside 0…${net.nodes - 1}`;
    }
    if (b.from === b.to) return `branch ${b.name}: both ends on node ${b.from}`;
    const e = b.element;
    if (e.kind === 'material' && !(e.length_m > 0 && e.area_m2 > 0)) return `branch ${b.name}: length and area must be > 0`;
    if (e.kind === 'permeance' && !(e.permeance_H >= 0)) return `branch ${b.name}: permeance must be ≥ 0`;
    if (b.turns !== undefined && !Number.isFinite(b.turns)) return `branch ${b.name}: turns must be finite`;
    adj[b.from].push(b.to);
    adj[b.to].push(b.from);
  }
  const stack = [0];
  seen[0] = true;
  while (stack.length) {
    const n = stack.pop()!;
    for (const m of adj[n]) if (!seen[m]) {
      seen[m] = true;
      stack.push(m);
    }
  }
  const lost = seen.indexOf(false);
  if (lost >= 0) return `node ${lost} is not connected to the reference node 0`;
  return null;
}

/** Structure checks already made (networks are treated as immutable once solved). */
const checkedNetworks = new WeakMap<MagneticNetwork, string | null>();

/** Solves A·x = b in place by Gaussian elimination with partial pivoting (small dense systems). */
function solveDense(A: number[][], b: number[]): number[] {
  const n = b.length;
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(A[r][c]) > Math.abs(A[p][c])) p = r;
    if (p !== c) {
      [A[p], A[c]] = [A[c], A[p]];
      [b[p], b[c]] = [b[c], b[p]];
    }
    const piv = A[c][c];
    for (let r = c + 1; r < n; r++) {
      const f = A[r][c] / piv;
      if (f === 0) continue;
      for (let k = c; k < n; k++) A[r][k] -= f * A[c][k];
      b[r] -= f * b[c];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let k = r + 1; k < n; k++) s -= A[r][k] * x[k];
    x[r] = s / A[r][r];
  }
  return x;
}

/**
 * Solves the network for the coil current `current_A`. Throws RangeError when the network
 * itself is malformed (see checkMagneticNetwork); numerical trouble is reported as
 * `converged: false` with the residual, never thrown.
 */
export function solveMagneticCircuit(net: MagneticNetwork, current_A: number, options: SolveOptions = {}): MagneticSolution {
  let problem = checkedNetworks.get(net);
  if (problem === undefined) {
    problem = checkMagneticNetwork(net);
    checkedNetworks.set(net, problem);
  }
  if (problem) throw new RangeError(`magnetic network: ${problem}`);
  const relTol = options.relTol ?? 1e-12;
  const maxIterations = options.maxIterations ?? 100;
  const m = net.nodes - 1; // unknowns: nodes 1 … n−1
  const B = net.branches;
  const turns = B.map((b) => b.turns ?? 0);
  const u = new Array<number>(net.nodes).fill(0);
  if (options.initialPotentials_A && options.initialPotentials_A.length === net.nodes) {
    for (let k = 1; k < net.nodes; k++) u[k] = options.initialPotentials_A[k];
  }
  const drops = (pot: number[]) => B.map((b, k) => pot[b.from] - pot[b.to] + turns[k] * current_A);
  const potential = (pot: number[]) => drops(pot).reduce((s, f, k) => s + elementCoEnergy(B[k].element, f), 0);

  let iterations = 0;
  let converged = false;
  let residual = Infinity;
  let laws: ElementLaw[] = [];
  let F = drops(u);
  for (; iterations <= maxIterations; iterations++) {
    F = drops(u);
    laws = B.map((b, k) => elementLaw(b.element, F[k]));
    const grad = new Array<number>(m).fill(0);
    const H = Array.from({ length: m }, () => new Array<number>(m).fill(0));
    let fluxScale = 0;
    for (let k = 0; k < B.length; k++) {
      const { from, to } = B[k];
      const { flux, slope } = laws[k];
      fluxScale = Math.max(fluxScale, Math.abs(flux));
      if (from > 0) grad[from - 1] += flux;
      if (to > 0) grad[to - 1] -= flux;
      // Keep the Jacobian definite even where a law is locally flat.
      const s = Math.max(slope, 1e-30);
      if (from > 0) H[from - 1][from - 1] += s;
      if (to > 0) H[to - 1][to - 1] += s;
      if (from > 0 && to > 0) {
        H[from - 1][to - 1] -= s;
        H[to - 1][from - 1] -= s;
      }
    }
    residual = grad.reduce((a, g) => Math.max(a, Math.abs(g)), 0);
    if (residual <= relTol * fluxScale || fluxScale === 0) {
      converged = true;
      break;
    }
    if (iterations === maxIterations) break;
    const step = solveDense(H, grad.map((g) => -g));
    // Line search on the convex potential Φ along the Newton direction. Its directional
    // derivative g(t) = stepᵀ·∇Φ(u + t·step) increases with t, so the full step is kept when it
    // does not pass the minimum along the line (g(1) ≤ 0), when Φ drops, or when g(1) is already
    // tiny; otherwise the sign change of g is bisected (no cancellation near convergence, unlike
    // a test on Φ alone).
    const phi0 = potential(u);
    const g0 = step.reduce((s, d, k) => s + d * grad[k], 0); // < 0 for a descent direction
    const at = (t: number) => {
      const p = u.slice();
      for (let k = 0; k < m; k++) p[k + 1] = u[k + 1] + t * step[k];
      return p;
    };
    const dirDeriv = (p: number[]) => {
      const f = drops(p);
      let g = 0;
      for (let k = 0; k < B.length; k++) {
        const flux = elementLaw(B[k].element, f[k]).flux;
        const a = (B[k].from > 0 ? step[B[k].from - 1] : 0) - (B[k].to > 0 ? step[B[k].to - 1] : 0);
        g += a * flux;
      }
      return g;
    };
    let trial = at(1);
    const g1 = dirDeriv(trial);
    if (!(g1 <= 0 || potential(trial) < phi0 || Math.abs(g1) <= 1e-3 * Math.abs(g0))) {
      let lo = 0;
      let hi = 1;
      trial = at(0.5);
      for (let ls = 0; ls < 60; ls++) {
        const t = 0.5 * (lo + hi);
        trial = at(t);
        const g = dirDeriv(trial);
        if (g <= 0 && g >= 0.5 * g0) break;
        if (g > 0) hi = t;
        else lo = t;
        if (ls === 59) trial = at(lo);
      }
    }
    let moved = 0;
    for (let k = 1; k < net.nodes; k++) moved = Math.max(moved, Math.abs(trial[k] - u[k]));
    for (let k = 1; k < net.nodes; k++) u[k] = trial[k];
    const uScale = u.reduce((a, v) => Math.max(a, Math.abs(v)), Math.abs(current_A * Math.max(...turns.map(Math.abs))));
    if (moved <= 1e-15 * uScale) {
      // Stalled at the floating-point floor: accept when the residual is already tiny.
      F = drops(u);
      laws = B.map((b, k) => elementLaw(b.element, F[k]));
      const g2 = new Array<number>(m).fill(0);
      for (let k = 0; k < B.length; k++) {
        if (B[k].from > 0) g2[B[k].from - 1] += laws[k].flux;
        if (B[k].to > 0) g2[B[k].to - 1] -= laws[k].flux;
      }
      residual = g2.reduce((a, g) => Math.max(a, Math.abs(g)), 0);
      const scale = laws.reduce((a, l) => Math.max(a, Math.abs(l.flux)), 0);
      converged = residual <= 1e-9 * scale;
      break;
    }
  }

  // Sensitivities by implicit differentiation: J·du/di = −∂(continuity)/∂i.
  const Jm = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const rhs = new Array<number>(m).fill(0);
  for (let k = 0; k < B.length; k++) {
    const { from, to } = B[k];
    const s = Math.max(laws[k].slope, 1e-30);
    if (from > 0) Jm[from - 1][from - 1] += s;
    if (to > 0) Jm[to - 1][to - 1] += s;
    if (from > 0 && to > 0) {
      Jm[from - 1][to - 1] -= s;
      Jm[to - 1][from - 1] -= s;
    }
    if (from > 0) rhs[from - 1] -= s * turns[k];
    if (to > 0) rhs[to - 1] += s * turns[k];
  }
  const du = m > 0 ? solveDense(Jm, rhs) : [];
  const dU = [0, ...du];
  let lambda = 0;
  let dLambda = 0;
  let coEnergy = 0;
  const branches: BranchState[] = B.map((b, k) => {
    const e = b.element;
    const dF = dU[b.from] - dU[b.to] + turns[k];
    const dPhi = laws[k].slope * dF;
    lambda += turns[k] * laws[k].flux;
    dLambda += turns[k] * dPhi;
    coEnergy += elementCoEnergy(e, F[k]);
    return {
      name: b.name,
      flux_Wb: laws[k].flux,
      mmf_A: F[k],
      fluxDensity_T: e.kind === 'material' ? laws[k].flux / e.area_m2 : NaN,
      fieldStrength_Apm: e.kind === 'material' ? F[k] / e.length_m : NaN,
      fluxPerAmpere_WbpA: dPhi,
      mmfPerAmpere: dF,
    };
  });
  return {
    current_A,
    branches,
    nodePotentials_A: u,
    fluxLinkage_Wb: lambda,
    incrementalInductance_H: dLambda,
    coEnergy_J: coEnergy,
    iterations,
    converged,
    residual_Wb: residual,
  };
}
