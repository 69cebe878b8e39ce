/**
 * From a Station (SI contract) to the circuit numbers the engine integrates: the two meshes,
 * which elements sit in which mesh, and the inductance matrix of the coupled loops.
 *
 * Circuit (docs/model.md §1):
 *
 *     bank C (v), ESR, ESL ── switch (V_T0 + r_T·|i|) ──┬── [cable R_w, L_w] ──┬── coil L_1, R_1(T)
 *                                                       D (bank end)            D (fixture end)
 *
 * A freewheel diode D (V_F0 + r_F·i_d) sits either at the bank end (right after the switch,
 * before the cable) or at the fixture end (across the coil terminals, after the cable).
 * Mesh currents: source mesh i_s (C, ESR, ESL, switch, and the cable when the diode is at the
 * fixture end), load mesh i_L (coil, and the cable when the diode is at the bank end); the diode
 * carries i_d = i_L − i_s. Without a diode both meshes are one (i_s = i_L) and the cable is put in
 * the source mesh (its place does not matter then).
 *
 * The coil couples to n shorted loops through M_1k; the loops couple to each other through M_jk
 * (Station.loopMutual_H); the source mesh couples to nothing. The full inductance matrix over
 * [i_s, i_L, i_1..i_n] is
 *
 *     ⎡ L_ss   0      0    ⎤      L_ss = ESL (+ L_w if the cable is in the source mesh)
 *     ⎢ 0      L_LL   mᵀ   ⎥      L_LL = L_1 (+ L_w if the cable is in the load mesh)
 *     ⎣ 0      m      L_lp ⎦      m_k = M_1k,  (L_lp)_jk = L_k on the diagonal, M_jk off it.
 *
 * Kirchhoff's voltage law on each mesh (Nilsson & Riedel, *Electric Circuits*, mesh analysis of
 * magnetically coupled circuits) gives L·di/dt = e(v, i, T) with the device drops as sources;
 * circuit/circuit-rhs.ts writes e for each conduction mode.
 */
import type { NonlinearCoil, Station } from '../model/station.js';

export interface LoopParams {
  name: string;
  inductance_H: number;
  mutualToCoil_H: number;
  resistance20_Ohm: number;
  tempCoeff_perK: number;
  heatCapacity_JpK: number;
  initialTemperature_C: number;
}

export interface ProbeParams {
  name: string;
  coil_ApmPerA: number;
  loops_ApmPerA: Float64Array;
}

export interface Network {
  capacitance_F: number;
  voltage_V: number;
  esr_Ohm: number;
  switchKind: 'thyristor' | 'bidirectional';
  vT0_V: number;
  rT_Ohm: number;
  /** Freewheel diode, or null. */
  diode: { position: 'bank' | 'fixture'; vF0_V: number; rF_Ohm: number } | null;
  cableR_Ohm: number;
  cableL_H: number;
  /** True when the cable carries the source-mesh current (diode at the fixture end, or no diode). */
  cableInSource: boolean;
  /** Series resistance of the source mesh without the switch slope resistance: ESR (+ R_w). */
  sourceR_Ohm: number;
  /** L_ss: ESL (+ L_w). */
  sourceL_H: number;
  /** Cable resistance in the load mesh (R_w or 0). */
  loadCableR_Ohm: number;
  /** Cable inductance in the load mesh (L_w or 0). */
  loadCableL_H: number;
  coil: {
    inductance_H: number;
    resistance20_Ohm: number;
    tempCoeff_perK: number;
    heatCapacity_JpK: number;
    initialTemperature_C: number;
    nonlinear: NonlinearCoil | null;
  };
  loops: LoopParams[];
  /** n×n loop inductance matrix, row-major, self inductances on the diagonal. */
  loopL_H: Float64Array;
  probes: ProbeParams[];
  /** ½·C·V0², J. */
  storedEnergy_J: number;
}

export function buildNetwork(station: Station): Network {
  const n = station.coupled.length;
  const d = station.freewheel;
  const cableInSource = d === null || d.position === 'fixture';
  const loopL = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    for (let k = 0; k < n; k++) {
      loopL[j * n + k] = j === k ? station.coupled[j].inductance_H : station.loopMutual_H[j]?.[k] ?? 0;
    }
  }
  // symmetrize (the contract says symmetric; average guards against tiny asymmetry in inputs)
  for (let j = 0; j < n; j++) {
    for (let k = j + 1; k < n; k++) {
      const m = 0.5 * (loopL[j * n + k] + loopL[k * n + j]);
      loopL[j * n + k] = m;
      loopL[k * n + j] = m;
    }
  }
  const C = station.bank.capacitance_F;
  const V0 = station.bank.voltage_V;
  return {
    capacitance_F: C,
    voltage_V: V0,
    esr_Ohm: station.bank.esr_Ohm,
    switchKind: station.switch.kind,
    vT0_V: station.switch.thresholdVoltage_V,
    rT_Ohm: station.switch.slopeResistance_Ohm,
    diode: d ? { position: d.position, vF0_V: d.thresholdVoltage_V, rF_Ohm: d.slopeResistance_Ohm } : null,
    cableR_Ohm: station.cable.resistance_Ohm,
    cableL_H: station.cable.inductance_H,
    cableInSource,
    sourceR_Ohm: station.bank.esr_Ohm + (cableInSource ? station.cable.resistance_Ohm : 0),
    sourceL_H: station.bank.esl_H + (cableInSource ? station.cable.inductance_H : 0),
    loadCableR_Ohm: cableInSource ? 0 : station.cable.resistance_Ohm,
    loadCableL_H: cableInSource ? 0 : station.cable.inductance_H,
    coil: {
      inductance_H: station.coil.inductance_H,
      resistance20_Ohm: station.coil.resistance20_Ohm,
      tempCoeff_perK: station.coil.tempCoeff_perK,
      heatCapacity_JpK: station.coil.heatCapacity_JpK,
      initialTemperature_C: station.coil.initialTemperature_C,
      nonlinear: station.coil.nonlinear ?? null,
    },
    loops: station.coupled.map((c) => ({
      name: c.name,
      inductance_H: c.inductance_H,
      mutualToCoil_H: c.mutualToCoil_H,
      resistance20_Ohm: c.resistance20_Ohm,
      tempCoeff_perK: c.tempCoeff_perK,
      heatCapacity_JpK: c.heatCapacity_JpK,
      initialTemperature_C: c.initialTemperature_C,
    })),
    loopL_H: loopL,
    probes: station.probes.map((p) => ({
      name: p.name,
      coil_ApmPerA: p.coil_ApmPerA,
      loops_ApmPerA: loopFields(p.loops_ApmPerA, n),
    })),
    storedEnergy_J: 0.5 * C * V0 * V0,
  };
}

/**
 * The first n loop field factors, missing ones 0. A plain loop: Float64Array.from with a mapping
 * function takes a slow generic path that showed in sweeps of short shots.
 */
function loopFields(f: readonly number[], n: number): Float64Array {
  const out = new Float64Array(n);
  for (let k = 0; k < n; k++) out[k] = f[k] ?? 0;
  return out;
}
