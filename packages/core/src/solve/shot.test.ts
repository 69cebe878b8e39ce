import { describe, expect, it } from 'vitest';
import { rlDecayWithDrop, seriesRlcClosedForm } from '../analysis/closed-form.js';
import { makeStation, simulateChecked } from './shot.test-util.js';

/** Relative error of a against b. */
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('simulateShot: series RLC natural response (Nilsson & Riedel, natural response of the series RLC circuit)', () => {
  // No device drops, no diode, thyristor stops at the current zero. Tolerance 1e-6 relative:
  // the engine runs at relTol 1e-9 and locates events to 1e-12 s, so 1e-6 leaves a wide margin
  // while still failing on any modelling error (a wrong sign or factor is ≫ 1e-6).
  const C = 2e-3;
  const L = 200e-6;
  const V0 = 1000;
  const cases = [
    { name: 'underdamped', R: 0.05 },
    { name: 'critically damped', R: 2 * Math.sqrt(L / C) },
    { name: 'overdamped', R: 1.5 },
  ];
  for (const c of cases) for (const method of ['odex', 'stiff'] as const) {
    it(`${c.name}, ${method} integrator: peak current, its time and the waveform at several points to 1e-6`, () => {
      const cf = seriesRlcClosedForm({ C_F: C, L_H: L, R_Ohm: c.R, V0_V: V0 }, 1e-12);
      expect(cf.damping).toBe(c.name);
      const st = makeStation({ C, V0, L1: L, R1: c.R, solver: { samples: 401, tMax_s: 8 * cf.peakTime_s, method } });
      const r = simulateChecked(st);
      expect(rel(r.figures.peakCurrent_A, cf.peakCurrent_A)).toBeLessThan(1e-6);
      // the peak is flat: its time is set by where di/dt = 0, located to ~1e-9 of the period
      expect(Math.abs(r.figures.timeOfPeak_s - cf.peakTime_s) / cf.peakTime_s).toBeLessThan(1e-6);
      const w = r.waveform;
      let checked = 0;
      for (let j = 0; j < w.t_s.length; j += 20) {
        const i = cf.current_A(w.t_s[j]);
        if (Math.abs(i) < 0.05 * cf.peakCurrent_A) continue;
        expect(rel(w.coilCurrent_A[j], i)).toBeLessThan(1e-6);
        expect(Math.abs(w.capacitorVoltage_V[j] - cf.capacitorVoltage_V(w.t_s[j])) / V0).toBeLessThan(1e-6);
        checked++;
      }
      expect(checked).toBeGreaterThan(5);
      if (c.name === 'underdamped') {
        // current zero at π/ωd, where the thyristor stops; the capacitor keeps −V0·e^(−απ/ωd)
        expect(r.phases.map((p) => p.endReason)).toEqual(['current-zero']);
        expect(rel(r.figures.endOfPulse_s, cf.firstZero_s)).toBeLessThan(1e-6);
        expect(rel(r.figures.finalCapacitorVoltage_V, cf.capacitorVoltage_V(cf.firstZero_s))).toBeLessThan(1e-6);
      }
    });
  }

  it('I²t of the switch equals the coil loss over R (∫i²R dt, conservation) for a constant R', () => {
    const st = makeStation({ C, V0, L1: L, R1: 0.05, solver: { samples: 0 } });
    const r = simulateChecked(st);
    expect(rel(r.figures.i2tSwitch_A2s * 0.05, r.energy.dissipated_J.coil)).toBeLessThan(1e-8);
  });
});

describe('simulateShot: freewheel decay (first-order RL natural response with the diode drop)', () => {
  it('follows i = (I0 + V_F0/R′)·e^(−t R′/L) − V_F0/R′ after the diode takes the current, R′ = R_1 + r_F', () => {
    const vF0 = 0.9;
    const rF = 3e-4;
    const R1 = 0.02;
    const L1 = 300e-6;
    const st = makeStation({
      C: 1e-3,
      V0: 800,
      L1,
      R1,
      esl: 0.1e-6,
      cableL: 0.5e-6,
      cableR: 1e-3,
      diode: { position: 'fixture', thresholdVoltage_V: vF0, slopeResistance_Ohm: rF },
      solver: { samples: 1001 },
    });
    const r = simulateChecked(st);
    const fw = r.phases.find((p) => p.name === 'freewheel');
    expect(fw).toBeDefined();
    const w = r.waveform;
    const j0 = w.t_s.indexOf(fw!.start_s);
    expect(j0).toBeGreaterThan(0);
    const I0 = w.coilCurrent_A[j0];
    const cf = rlDecayWithDrop({ L_H: L1, R_Ohm: R1 + rF, drop_V: vF0, I0_A: I0 });
    let checked = 0;
    for (let j = j0; j < w.t_s.length && w.t_s[j] <= fw!.end_s; j += 10) {
      const i = cf(w.t_s[j] - fw!.start_s);
      if (i < 0.02 * I0) continue;
      expect(rel(w.coilCurrent_A[j], i)).toBeLessThan(1e-6);
      checked++;
    }
    expect(checked).toBeGreaterThan(10);
    // the current reaches zero where the closed form does: t = (L/R′)·ln(1 + I0·R′/V_F0)
    const tZero = (L1 / (R1 + rF)) * Math.log(1 + (I0 * (R1 + rF)) / vF0);
    expect(rel(fw!.end_s - fw!.start_s, tZero)).toBeLessThan(1e-6);
    expect(fw!.endReason).toBe('diode-off');
  });
});

describe('simulateShot: commutation with the diode at the fixture end', () => {
  it('the diode current rises continuously from zero and the switch current falls to zero over a finite time', () => {
    const st = makeStation({
      C: 2e-3,
      V0: 1000,
      L1: 200e-6,
      R1: 0.03,
      esl: 0.2e-6,
      cableL: 1.5e-6,
      cableR: 2e-3,
      sw: { thresholdVoltage_V: 1.2, slopeResistance_Ohm: 4e-4 },
      diode: { position: 'fixture', thresholdVoltage_V: 0.9, slopeResistance_Ohm: 3e-4 },
      solver: { samples: 4001 },
    });
    const r = simulateChecked(st);
    expect(r.phases.map((p) => p.name)).toEqual(['discharge', 'commutation', 'freewheel']);
    const com = r.phases[1];
    const duration = com.end_s - com.start_s;
    // the commutation loop (C, L_ss = ESL + L_w) rings at √(L_ss·C) ≈ 60 µs: finite, not instantaneous
    expect(duration).toBeGreaterThan(1e-6);
    const w = r.waveform;
    const j0 = w.t_s.indexOf(com.start_s);
    const j1 = w.t_s.indexOf(com.end_s);
    expect(j0).toBeGreaterThan(0);
    expect(j1).toBeGreaterThan(j0 + 3);
    expect(w.diodeCurrent_A[j0]).toBeCloseTo(0, 6);
    expect(Math.abs(w.switchCurrent_A[j1])).toBeLessThan(1e-6 * r.figures.peakCurrent_A);
    // no jump: between successive samples the diode current changes by no more than the largest
    // switch |di/dt| allows (during commutation di_d/dt ≈ −di_s/dt, the coil current being slow)
    for (let j = j0; j < j1 + 3; j++) {
      const dt = w.t_s[j + 1] - w.t_s[j];
      expect(Math.abs(w.diodeCurrent_A[j + 1] - w.diodeCurrent_A[j])).toBeLessThanOrEqual(1.1 * r.figures.peakDidt_Aps * dt + 1e-6);
    }
    // diode current rises monotonically during commutation, switch current falls monotonically
    for (let j = j0; j < j1; j++) {
      expect(w.diodeCurrent_A[j + 1]).toBeGreaterThanOrEqual(w.diodeCurrent_A[j] - 1e-9);
      expect(w.switchCurrent_A[j + 1]).toBeLessThanOrEqual(w.switchCurrent_A[j] + 1e-9);
    }
    expect(r.figures.i2tDiode_A2s).toBeGreaterThan(0);
  });
});
