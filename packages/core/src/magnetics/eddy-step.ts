/**
 * Response of an eddy-current network to an ideal step of coil current (a step of applied field).
 *
 * Loops with inductance matrix L (n × n, symmetric positive definite), resistances R (diagonal)
 * and mutual inductances m to the coil obey L·di/dt + R·i = −m·dI/dt. A unit step of coil current
 * at t = 0 leaves the flux of every loop unchanged at 0+ (L·i(0+) = −m), then the currents decay
 * freely: L·di/dt = −R·i. With y = R^{1/2}·i the system becomes A·dy/dt = −y, A = R^{−1/2}·L·R^{−1/2}
 * symmetric; its eigen-decomposition A = Q·Λ·Qᵀ (symmetric-eigen.ts) gives the modes, with time
 * constants τ_k = λ_k, and
 *
 *   H(t) = H_coil + Σ_j h_j·i_j(t) = H_coil − Σ_k (gᵀ·q_k)·(c_k/λ_k)·e^(−t/λ_k),
 *   c = Qᵀ·R^{−1/2}·m,  g = R^{−1/2}·h
 *
 * for a probe whose field per ampere is H_coil from the coil and h_j from loop j. This is the
 * exact solution of the lumped network (no time stepping).
 */
import { symmetricEigen } from './symmetric-eigen.js';

export interface StepNetwork {
  /** Loop inductance matrix, H. */
  L: readonly (readonly number[])[];
  /** Loop resistances, Ω (> 0). */
  R: readonly number[];
  /** Mutual inductance of each loop to the coil, H. */
  coilMutual_H: readonly number[];
}

export interface StepModes {
  /** Modal time constants τ_k, s, ascending. */
  timeConstants_s: number[];
  /** Field at the probe per ampere of coil step: H(t) = coil − Σ amplitude_k·e^(−t/τ_k). */
  amplitude: number[];
  coil_ApmPerA: number;
}

/** Modal form of the field at one probe after a unit step of coil current. */
export function stepModes(net: StepNetwork, probeCoil_ApmPerA: number, probeLoops_ApmPerA: readonly number[]): StepModes {
  const n = net.R.length;
  const s = net.R.map((r) => 1 / Math.sqrt(r));
  const A = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => s[i] * net.L[i][j] * s[j]));
  const { values, vectors } = symmetricEigen(A);
  const sm = net.coilMutual_H.map((m, j) => s[j] * m);
  const g = probeLoops_ApmPerA.map((h, j) => s[j] * h);
  const amplitude = values.map((lam, k) => {
    const q = vectors[k];
    let c = 0;
    let gq = 0;
    for (let j = 0; j < n; j++) {
      c += q[j] * sm[j];
      gq += q[j] * g[j];
    }
    return (gq * c) / lam;
  });
  return { timeConstants_s: values, amplitude, coil_ApmPerA: probeCoil_ApmPerA };
}

/** Field per ampere at the probe at time t after the step, from its modal form. */
export function stepField(modes: StepModes, t_s: number): number {
  let h = modes.coil_ApmPerA;
  for (let k = 0; k < modes.amplitude.length; k++) h -= modes.amplitude[k] * Math.exp(-t_s / modes.timeConstants_s[k]);
  return h;
}
