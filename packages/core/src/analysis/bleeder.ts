/**
 * Bleeder discharge of the bank after disconnection.
 *
 * A bleeder R across a bank C charged to V0 discharges it as v(t) = V0·e^(−t/(R·C)) (first-order
 * RC natural response, any circuit-analysis text), so the time to fall to V is
 *   t = R·C·ln(V0/V)          (0 when V0 ≤ V)
 * and the bleeder dissipates V0²/R while the bank is held charged.
 *
 * GUIDANCE ONLY, never a compliance statement. Common requirements (REFERENCES.md):
 *   - NFPA 70 (US National Electrical Code), Article 460 (from memory; check the edition in
 *     force): residual voltage to 50 V or less within 1 min for capacitors rated 600 V or less,
 *     within 5 min above 600 V;
 *   - IEC 60831-1 (shunt power capacitors up to 1000 V): to 75 V or less within 3 min.
 * Dielectric absorption can bring the voltage back after the bleeder has done its work; a
 * grounding stick is still needed (DOMAIN.md hazards).
 */

/** v(t) = V0·e^(−t/RC), V. */
export function bleederVoltage_V(resistance_Ohm: number, capacitance_F: number, v0_V: number, t_s: number): number {
  return v0_V * Math.exp(-t_s / (resistance_Ohm * capacitance_F));
}

/** t = R·C·ln(V0/V), s; 0 when V0 ≤ V; NaN for non-positive R, C or V. */
export function bleederTime_s(resistance_Ohm: number, capacitance_F: number, v0_V: number, v_V: number): number {
  if (!(resistance_Ohm > 0) || !(capacitance_F > 0) || !(v_V > 0)) return Number.NaN;
  if (v0_V <= v_V) return 0;
  return resistance_Ohm * capacitance_F * Math.log(v0_V / v_V);
}

/** Power the bleeder takes at voltage V: V²/R, W. */
export function bleederPower_W(resistance_Ohm: number, v_V: number): number {
  return (v_V * v_V) / resistance_Ohm;
}

/** A common discharge requirement, shown as guidance. */
export interface BleederGuidance {
  id: string;
  /** Who states it, with the confidence of our recollection. */
  source: string;
  /** Residual voltage to reach, V. */
  voltage_V: number;
  /** Within this time, s. */
  time_s: number;
  /** When it applies, in words. */
  scope: string;
}

/** Guidance entries relevant to a bank rated (or charged) at v_V. */
export function bleederGuidance(v_V: number): BleederGuidance[] {
  const nfpa: BleederGuidance =
    v_V <= 600
      ? { id: 'nfpa70', source: 'NFPA 70 Art. 460 (from memory; check the edition in force)', voltage_V: 50, time_s: 60, scope: 'capacitors rated 600 V or less' }
      : { id: 'nfpa70', source: 'NFPA 70 Art. 460 (from memory; check the edition in force)', voltage_V: 50, time_s: 300, scope: 'capacitors rated above 600 V' };
  const iec: BleederGuidance = {
    id: 'iec60831',
    source: 'IEC 60831-1',
    voltage_V: 75,
    time_s: 180,
    scope: v_V <= 1000 ? 'shunt power capacitors up to 1000 V' : 'shunt power capacitors up to 1000 V (this bank is above its scope)',
  };
  return [nfpa, iec];
}
