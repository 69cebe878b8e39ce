import { describe, expect, it } from 'vitest';
import { rlDecayWithDrop, seriesRlcClosedForm } from './closed-form.js';

// Self-consistency of the closed forms (Nilsson & Riedel, natural response of the series RLC
// circuit): each must satisfy i = −C·dv/dt and the series KVL v = R·i + L·di/dt, with v(0) = V0,
// i(0) = 0, di/dt(0) = V0/L. Derivatives by central differences (h = 1e-9 of the time scale;
// tolerance 1e-6 relative covers their O(h²) and rounding error).
const cases = [
  { name: 'underdamped', C_F: 2e-3, L_H: 200e-6, R_Ohm: 0.05, V0_V: 1000 },
  { name: 'overdamped', C_F: 2e-3, L_H: 200e-6, R_Ohm: 2, V0_V: 1000 },
  { name: 'critically damped', C_F: 2e-3, L_H: 200e-6, R_Ohm: 2 * Math.sqrt(200e-6 / 2e-3), V0_V: 1000 },
];

describe('seriesRlcClosedForm', () => {
  for (const c of cases) {
    it(`${c.name}: satisfies i = −C dv/dt, v = R i + L di/dt, and the initial conditions`, () => {
      const r = seriesRlcClosedForm(c, 1e-12);
      expect(r.damping).toBe(c.name);
      const T = Math.sqrt(c.L_H * c.C_F);
      const h = 1e-6 * T;
      expect(r.current_A(0)).toBe(0);
      expect(r.capacitorVoltage_V(0)).toBeCloseTo(c.V0_V, 9);
      for (const t of [0.1 * T, 0.7 * T, 1.5 * T, 2.5 * T]) {
        const di = (r.current_A(t + h) - r.current_A(t - h)) / (2 * h);
        const dv = (r.capacitorVoltage_V(t + h) - r.capacitorVoltage_V(t - h)) / (2 * h);
        const i = r.current_A(t);
        const v = r.capacitorVoltage_V(t);
        const iScale = c.V0_V / Math.sqrt(c.L_H / c.C_F);
        expect(Math.abs(i + c.C_F * dv) / iScale).toBeLessThan(1e-6);
        expect(Math.abs(v - c.R_Ohm * i - c.L_H * di) / c.V0_V).toBeLessThan(1e-6);
      }
      // the peak is where di/dt = 0
      const tp = r.peakTime_s;
      const dip = (r.current_A(tp + h) - r.current_A(tp - h)) / (2 * h);
      expect(Math.abs(dip) * T / r.peakCurrent_A).toBeLessThan(1e-6);
    });
  }

  it('underdamped: current zero at π/ωd', () => {
    const r = seriesRlcClosedForm(cases[0]);
    expect(Math.abs(r.current_A(r.firstZero_s)) / r.peakCurrent_A).toBeLessThan(1e-12);
  });
});

describe('rlDecayWithDrop', () => {
  it('satisfies L di/dt = −R i − V_d with i(0) = I0 (first-order RL with a constant source)', () => {
    const p = { L_H: 2e-4, R_Ohm: 0.05, drop_V: 1.2, I0_A: 3000 };
    const f = rlDecayWithDrop(p);
    expect(f(0)).toBeCloseTo(3000, 9);
    const h = 1e-9;
    for (const t of [1e-4, 3e-3, 1e-2]) {
      const di = (f(t + h) - f(t - h)) / (2 * h);
      expect(Math.abs(p.L_H * di + p.R_Ohm * f(t) + p.drop_V)).toBeLessThan(1e-5);
    }
  });
});
