import { describe, expect, it } from 'vitest';
import {
  allowedSurgeCurrent_A,
  equivalentHalfSineDuration_s,
  halfSineI2t_A2s,
  ratedI2t_A2s,
  surgeBasisDuration_s,
} from './ratings.js';

describe('ratings', () => {
  it('surgeBasisDuration_s: half a period of 50 Hz and of 60 Hz', () => {
    expect(surgeBasisDuration_s('10ms')).toBe(0.01);
    expect(surgeBasisDuration_s('8.3ms')).toBeCloseTo(8.333e-3, 6);
  });

  // REFERENCES.md: the fusing integral of a half-sine surge is I²t = I_TSM²·t/2.
  // Independent check: midpoint-rule integral of (I·sin(πt/T))² over one half period, 10 000 strips
  // (relative error far below 1e-9 for this smooth periodic integrand).
  it('halfSineI2t_A2s = I²·t/2 and matches the integral of a half-sine squared', () => {
    const I = 10e3;
    const T = 0.01;
    expect(halfSineI2t_A2s(I, T)).toBeCloseTo(5e5, 6);
    const n = 10_000;
    let s = 0;
    for (let k = 0; k < n; k++) s += (I * Math.sin((Math.PI * (k + 0.5)) / n)) ** 2 * (T / n);
    expect(s / halfSineI2t_A2s(I, T)).toBeCloseTo(1, 9);
  });

  it('equivalentHalfSineDuration_s inverts the half-sine relation; an exponential decay I0·e^(−t/τ) gives τ', () => {
    expect(equivalentHalfSineDuration_s(10e3, halfSineI2t_A2s(10e3, 3e-3))).toBeCloseTo(3e-3, 12);
    // ∫(I0 e^(−t/τ))² dt = I0²·τ/2 (closed form) → t_eq = τ
    const tau = 4e-3;
    expect(equivalentHalfSineDuration_s(5e3, (5e3 ** 2 * tau) / 2)).toBeCloseTo(tau, 12);
    expect(equivalentHalfSineDuration_s(0, 1)).toBeNaN();
  });

  it('allowedSurgeCurrent_A: equal-I²t rule, floored at 1 ms', () => {
    expect(allowedSurgeCurrent_A(10e3, 0.01, 0.01)).toBeCloseTo(10e3, 6);
    expect(allowedSurgeCurrent_A(10e3, 0.01, 2.5e-3)).toBeCloseTo(20e3, 6);
    expect(allowedSurgeCurrent_A(10e3, 0.01, 0.04)).toBeCloseTo(5e3, 6);
    // below the floor the 1 ms value holds: 10 kA·√10
    expect(allowedSurgeCurrent_A(10e3, 0.01, 0.2e-3)).toBeCloseTo(10e3 * Math.sqrt(10), 6);
    expect(allowedSurgeCurrent_A(10e3, 0.01, 0.2e-3, 0.1e-3)).toBeCloseTo(10e3 * Math.sqrt(50), 6);
    expect(allowedSurgeCurrent_A(10e3, 0.01, 0)).toBeNaN();
  });

  it('allowedSurgeCurrent_A above the floor is the same check as I²t against the rated I²t', () => {
    const Itsm = 8e3;
    const base = 1 / 120;
    for (const [Ip, t] of [[12e3, 3e-3], [20e3, 1.5e-3], [6e3, 20e-3]] as const) {
      const i2t = halfSineI2t_A2s(Ip, t);
      const teq = equivalentHalfSineDuration_s(Ip, i2t);
      expect(Ip <= allowedSurgeCurrent_A(Itsm, base, teq)).toBe(i2t <= ratedI2t_A2s(Itsm, base));
    }
  });

  it('ratedI2t_A2s prefers the given rating', () => {
    expect(ratedI2t_A2s(10e3, 0.01)).toBeCloseTo(5e5, 6);
    expect(ratedI2t_A2s(10e3, 0.01, 4.2e5)).toBe(4.2e5);
  });
});
