import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  maxShotsPerMinute,
  peakTemperatures,
  shotRiseFrom,
  steadyState,
  thermalTimeConstant,
  type ProductionHeatingInput,
} from './production-heating.js';

const linear: ProductionHeatingInput = { shotRise_K: 10, shotStart_C: 25, tempCoeff_perK: 0, ambient_C: 25, timeConstant_s: 600 };
// Copper α20 from IEC 60028 (REFERENCES.md).
const copper: ProductionHeatingInput = { ...linear, tempCoeff_perK: 0.00393 };

describe('production heating', () => {
  it('thermalTimeConstant = C/(h·A), NaN on a non-positive input', () => {
    expect(thermalTimeConstant(800, 10, 0.05)).toBeCloseTo(1600, 9);
    expect(thermalTimeConstant(800, 0, 0.05)).toBeNaN();
    expect(thermalTimeConstant(-1, 10, 0.05)).toBeNaN();
  });

  // Closed form, geometric series of first-order cooling: T = T_amb + ΔT/(1 − e^(−t_c/τ)).
  // 1 shot/min, τ = 600 s: 1 − e^(−0.1) = 0.0951626 → 25 + 10/0.0951626 = 130.0833 °C.
  it('steadyState (linear model) gives T_amb + ΔT/(1 − e^(−t_c/τ))', () => {
    const ss = steadyState(linear, 1);
    expect(ss.peak_C).toBeCloseTo(25 + 10 / (1 - Math.exp(-0.1)), 9);
    expect(ss.peak_C).toBeCloseTo(130.0833, 3);
    expect(ss.start_C).toBeCloseTo(ss.peak_C - 10, 9);
    expect(ss.runaway).toBe(false);
  });

  it('peakTemperatures: the shot-by-shot recursion converges to the steady state (both models)', () => {
    for (const inp of [linear, copper]) {
      const peaks = peakTemperatures(inp, 1, 600);
      // partial sums follow ΔT(1 − rⁿ)/(1 − r) for the linear model
      if (inp === linear) {
        const r = Math.exp(-60 / 600);
        expect(peaks[4] - 25).toBeCloseTo((10 * (1 - r ** 5)) / (1 - r), 9);
      }
      expect(peaks[599]).toBeCloseTo(steadyState(inp, 1).peak_C, 6);
    }
  });

  // IEC 60949 adiabatic law (REFERENCES.md): K²·ln((θf + β)/(θi + β)) = I²t/S², copper K = 226, β = 234.5.
  // The same I²t that takes copper from 70 to 160 °C (check value K·√ln = 115) takes it from 90 °C to
  // (90 + β)·(160 + β)/(70 + β) − β = 185.91 °C. With α20 = 1/(β + 20) the model must reproduce that exactly.
  it('shotRiseFrom follows the IEC 60949 ratio law for a shot starting hotter', () => {
    const b = 234.5;
    const inp: ProductionHeatingInput = { ...linear, shotStart_C: 70, shotRise_K: 90, tempCoeff_perK: 1 / (b + 20) };
    expect(226 * Math.sqrt(Math.log((160 + b) / (70 + b)))).toBeCloseTo(115, 0);
    const expected = ((90 + b) * (160 + b)) / (70 + b) - b;
    expect(90 + shotRiseFrom(inp, 90)).toBeCloseTo(expected, 9);
    expect(expected).toBeCloseTo(185.91, 2);
    expect(shotRiseFrom(linear, 90)).toBe(10);
  });

  it('steadyState with the resistance rise lies above the linear model and tends to it as α → 0', () => {
    expect(steadyState(copper, 1).peak_C).toBeGreaterThan(steadyState(linear, 1).peak_C);
    const tiny = { ...linear, tempCoeff_perK: 1e-9 };
    expect(steadyState(tiny, 1).peak_C).toBeCloseTo(steadyState(linear, 1).peak_C, 4);
  });

  it('steadyState reports a runaway when r·k ≥ 1, and the recursion indeed diverges', () => {
    const hot: ProductionHeatingInput = { ...copper, shotStart_C: 20, shotRise_K: 200 };
    const ss = steadyState(hot, 60);
    expect(ss.runaway).toBe(true);
    expect(ss.peak_C).toBe(Infinity);
    const peaks = peakTemperatures(hot, 60, 50);
    expect(peaks[49]).toBeGreaterThan(1e4);
  });

  it('maxShotsPerMinute: at that rate the steady peak equals the limit (both models)', () => {
    for (const inp of [linear, copper]) {
      const rate = maxShotsPerMinute(inp, 155);
      expect(rate).toBeGreaterThan(0);
      expect(steadyState(inp, rate).peak_C).toBeCloseTo(155, 6);
    }
  });

  it('maxShotsPerMinute is 0 when one shot overshoots the limit, Infinity when a shot heats nothing', () => {
    expect(maxShotsPerMinute({ ...linear, shotRise_K: 200 }, 155)).toBe(0);
    expect(maxShotsPerMinute(linear, 20)).toBe(0);
    expect(maxShotsPerMinute({ ...linear, shotRise_K: 0 }, 155)).toBe(Infinity);
  });

  it('more shots per minute never lowers the steady-state peak (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 60, noNaN: true }),
        fc.double({ min: 0.01, max: 60, noNaN: true }),
        fc.double({ min: 0.1, max: 50, noNaN: true }),
        fc.double({ min: 10, max: 5000, noNaN: true }),
        fc.boolean(),
        (a, b, dT, tau, withAlpha) => {
          const inp: ProductionHeatingInput = { shotRise_K: dT, shotStart_C: 20, tempCoeff_perK: withAlpha ? 0.00393 : 0, ambient_C: 20, timeConstant_s: tau };
          const lo = steadyState(inp, Math.min(a, b)).peak_C;
          const hi = steadyState(inp, Math.max(a, b)).peak_C;
          return hi >= lo || hi >= lo - 1e-9 * Math.abs(lo);
        },
      ),
      { numRuns: 200 },
    );
  });
});
