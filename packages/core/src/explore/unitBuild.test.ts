import { describe, expect, it } from 'vitest';
import { unitBuild } from './unitBuild.js';

// Series/parallel combination (Nilsson & Riedel, Electric Circuits: capacitors in series add
// as reciprocals, resistors and inductors in series add, parallel branches combine as reciprocals).
describe('unitBuild(unit, series, parallel)', () => {
  const unit = { capacitance_F: 1e-3, voltage_V: 900, esr_Ohm: 0.02, esl_H: 60e-9 };

  it('matches the combination rules for 3 in series × 4 strings', () => {
    const b = unitBuild(unit, 3, 4);
    // Series: 1/C_s = 3/C_u → C_u/3; four strings in parallel: 4·C_u/3.
    expect(b.capacitance_F).toBeCloseTo((4 * 1e-3) / 3, 15);
    expect(b.ratedVoltage_V).toBe(2700);
    // Series: 3·ESR_u per string; four equal strings in parallel: (3·ESR_u)/4.
    expect(b.esr_Ohm).toBeCloseTo(0.015, 15);
    expect(b.esl_H).toBeCloseTo(45e-9, 20);
    expect(b.units).toBe(12);
  });

  it('stores s·p times the unit’s energy at the rated voltage (½·C·V² with C = pC_u/s, V = sV_u)', () => {
    for (const [s, p] of [[1, 1], [2, 5], [4, 3]] as const) {
      const b = unitBuild(unit, s, p);
      const unitEnergy = 0.5 * unit.capacitance_F * unit.voltage_V ** 2;
      expect(0.5 * b.capacitance_F * b.ratedVoltage_V ** 2).toBeCloseTo(s * p * unitEnergy, 9);
    }
  });
});
