/**
 * Energy balance of one shot (conservation of energy; Nilsson & Riedel, *Electric Circuits*,
 * power and energy in RLC circuits):
 *
 *   ½·C·V0² = ½·C·v_end² + W_mag,end + Σ (resistive and device losses)
 *
 * where W_mag = ½·iᵀ·L·i over all meshes and loops (mutuals included; for a nonlinear coil its
 * own term is i·λ(i) − co-energy), and the losses are the engine's accumulators: ∫ESR·i_s², the
 * switch ∫(V_T0 + r_T·i_s)·i_s, the cable ∫R_w·i², the coil and each loop C_th·ΔT (= ∫i²·R(T)),
 * the diode ∫(V_F0 + r_F·i_d)·i_d. The relative error measures the integration error only:
 * the model conserves energy exactly.
 */
import type { EnergyBalance } from '../model/result.js';

export interface EnergyTerms {
  initial_J: number;
  capacitorFinal_J: number;
  inductorFinal_J: number;
  esr_J: number;
  switch_J: number;
  cable_J: number;
  coil_J: number;
  diode_J: number;
  loops_J: number[];
}

/** Threshold above which a shot carries the `energy.balance` warning. */
export const ENERGY_BALANCE_WARN = 1e-6;

export function energyBalance(t: EnergyTerms): EnergyBalance {
  let sum = t.capacitorFinal_J + t.inductorFinal_J + t.esr_J + t.switch_J + t.cable_J + t.coil_J + t.diode_J;
  for (const l of t.loops_J) sum += l;
  const rel = t.initial_J > 0 ? Math.abs(t.initial_J - sum) / t.initial_J : Math.abs(t.initial_J - sum);
  return {
    initial_J: t.initial_J,
    capacitorFinal_J: t.capacitorFinal_J,
    inductorFinal_J: t.inductorFinal_J,
    dissipated_J: {
      esr: t.esr_J,
      switch: t.switch_J,
      cable: t.cable_J,
      coil: t.coil_J,
      diode: t.diode_J,
      loops: t.loops_J.slice(),
    },
    relativeError: Number.isFinite(rel) ? rel : 1,
  };
}
