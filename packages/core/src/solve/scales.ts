/**
 * Scale of each state component, for the absolute tolerances (Station.solver.absTol is relative
 * to these scales) and for the finite-difference steps of the engine.
 *
 *   current scale  I* = V0/√(L/C), the undamped LC peak (L = L_ss + L_LL at zero current)
 *   time scale     t* = √(L·C), the LC time constant
 *   loop current   I*·|M_1k|/L_k (the current a shorted loop would carry if it cancelled the
 *                  coil's flux through it), at least I*·1e-3
 *   voltage        V0;  energies ½CV0²;  I²t  I*²·t*
 *   temperature rise  ½CV0²/C_th (the rise if the whole bank energy went into that conductor)
 */
import type { CircuitRhs } from '../circuit/circuit-rhs.js';
import { ACC_COUNT, ACC_I2T_D, ACC_I2T_SW, IL, IS, TH_COIL, V, accIndex, loopCurrentIndex, loopThetaIndex } from '../circuit/state.js';

export interface Scales {
  current_A: number;
  time_s: number;
  state: Float64Array;
}

export function stateScales(rhs: CircuitRhs): Scales {
  const net = rhs.net;
  const L = net.sourceL_H + rhs.loadInductance(0);
  const C = net.capacitance_F;
  const V0 = Math.abs(net.voltage_V) || 1;
  const I = V0 / Math.sqrt(L / C);
  const T = Math.sqrt(L * C);
  const E = net.storedEnergy_J || 1;
  const s = new Float64Array(rhs.size);
  s[V] = V0;
  s[IS] = I;
  s[IL] = I;
  s[TH_COIL] = E / net.coil.heatCapacity_JpK;
  const n = rhs.nLoops;
  for (let a = 0; a < ACC_COUNT; a++) s[accIndex(n, a)] = E;
  s[accIndex(n, ACC_I2T_SW)] = I * I * T;
  s[accIndex(n, ACC_I2T_D)] = I * I * T;
  for (let k = 0; k < n; k++) {
    const l = net.loops[k];
    s[loopCurrentIndex(k)] = I * Math.max(Math.abs(l.mutualToCoil_H) / l.inductance_H, 1e-3);
    s[loopThetaIndex(n, k)] = E / l.heatCapacity_JpK;
  }
  for (let i = 0; i < s.length; i++) if (!(s[i] > 0) || !Number.isFinite(s[i])) s[i] = 1;
  return { current_A: Number.isFinite(I) && I > 0 ? I : 1, time_s: Number.isFinite(T) && T > 0 ? T : 1e-3, state: s };
}
