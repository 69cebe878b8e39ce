import { describe, expect, it } from 'vitest';
import type { NonlinearCoil } from '../model/station.js';
import { makeStation, simulateChecked } from './shot.test-util.js';

/**
 * A synthetic saturating coil (closed form, not a material model): λ(i) = L0·Is·tanh(i/Is),
 * dλ/di = L0/cosh²(i/Is), co-energy ∫0^i λ di' = L0·Is²·ln cosh(i/Is). For Is → ∞ it is the
 * linear coil L0.
 */
function tanhCoil(L0: number, Is: number, fieldPerA: number): NonlinearCoil {
  const lncosh = (x: number) => Math.abs(x) + Math.log1p(Math.exp(-2 * Math.abs(x))) - Math.LN2;
  return {
    fluxLinkage_Wb: (i) => L0 * Is * Math.tanh(i / Is),
    incrementalInductance_H: (i) => L0 / Math.cosh(i / Is) ** 2,
    fieldAtPart_Apm: (i) => fieldPerA * Is * Math.tanh(i / Is),
    coEnergy_J: (i) => L0 * Is * Is * lncosh(i / Is),
  };
}

describe('simulateShot: nonlinear (iron-yoke) coil, dλ/dt = L_inc(i)·di/dt', () => {
  const L0 = 200e-6;
  const base = { C: 2e-3, V0: 1000, L1: L0, R1: 0.05, solver: { samples: 101 } };

  it('reduces to the linear coil when the saturation current is huge (Is = 1e9 A): same waveform to 1e-7', () => {
    const lin = simulateChecked(makeStation(base));
    const nl = simulateChecked(makeStation({ ...base, coil: { nonlinear: tanhCoil(L0, 1e9, 100) } }));
    expect(Math.abs(nl.figures.peakCurrent_A - lin.figures.peakCurrent_A) / lin.figures.peakCurrent_A).toBeLessThan(1e-7);
    expect(Math.abs(nl.figures.peakField_Apm - lin.figures.peakField_Apm) / lin.figures.peakField_Apm).toBeLessThan(1e-7);
    for (let j = 0; j < lin.waveform.t_s.length; j += 10) {
      expect(Math.abs(nl.waveform.coilCurrent_A[j] - lin.waveform.coilCurrent_A[j]) / lin.figures.peakCurrent_A).toBeLessThan(1e-7);
    }
  });

  it('saturating (Is at half the linear peak): energy balance with i·λ − co-energy as stored energy, higher and earlier peak', () => {
    const lin = simulateChecked(makeStation(base));
    const Is = 0.5 * lin.figures.peakCurrent_A;
    for (const diode of [null, { position: 'fixture' as const, thresholdVoltage_V: 0.9, slopeResistance_Ohm: 3e-4 }]) {
      const nl = simulateChecked(
        makeStation({ ...base, diode, esl: 0.2e-6, cableL: 1e-6, coil: { nonlinear: tanhCoil(L0, Is, 100) } }),
      );
      // a saturated coil has less inductance: more current, sooner (the λ(i) curve bends down)
      expect(nl.figures.peakCurrent_A).toBeGreaterThan(1.05 * lin.figures.peakCurrent_A);
      expect(nl.figures.timeOfPeak_s).toBeLessThan(lin.figures.timeOfPeak_s);
      // the field at the part follows fieldAtPart_Apm(i), which saturates at 100·Is
      expect(nl.figures.peakField_Apm).toBeLessThan(100 * Is);
    }
  });
});
