import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { judgeRatings } from './verdict-ratings.js';
import { byId, hasId, fixtureResult, fixtureStation, rank } from './verdict-fixtures.test-util.js';

const station = fixtureStation();
const result = fixtureResult(); // switch 30 kA, I²t 1.5e6 A²s, di/dt 40 A/µs; diode 28 kA, 2.0e6 A²s; reversal 5 %; V0 1600 V

describe('judgeRatings', () => {
  // Equivalent half-sine: t = 2·I²t/Ip² = 2·1.5e6/(30e3)² = 3.333 ms.
  // Equal-I²t rule (approximation, common practice): allowed = I_TSM·√(10 ms/3.333 ms) = I_TSM·√3.
  it('switch.surge scales the 10 ms surge rating to the equivalent half-sine (pass, warn, fail)', () => {
    const s = (Itsm: number) => byId(judgeRatings(station, result, { switch: { surgeCurrent_A: Itsm } }), 'switch.surge');
    expect(s(25e3).limit).toBeCloseTo(25e3 * Math.sqrt(3), 6);
    expect(s(25e3).margin).toBeCloseTo(1 - 30e3 / (25e3 * Math.sqrt(3)), 12);
    expect(s(25e3).status).toBe('pass'); // 30.7 % headroom, 20 % wanted
    expect(s(20e3).status).toBe('warn'); // 13.4 %
    expect(s(15e3).status).toBe('fail');
    expect(s(25e3).note).toMatch(/equal-I²t rule/);
  });

  it('switch.surge on an 8.3 ms basis, and the 1 ms floor for short pulses', () => {
    const s83 = byId(judgeRatings(station, result, { switch: { surgeCurrent_A: 25e3, surgeBasis: '8.3ms' } }), 'switch.surge');
    expect(s83.limit).toBeCloseTo(25e3 * Math.sqrt(1 / 120 / (1 / 300)), 6);
    // a 0.5 ms equivalent pulse: I²t = (30 kA)²·0.5 ms/2; the rule stops at 1 ms → I_TSM·√10
    const short = fixtureResult({ figures: { i2tSwitch_A2s: (30e3 ** 2 * 0.5e-3) / 2 } });
    expect(byId(judgeRatings(station, short, { switch: { surgeCurrent_A: 10e3 } }), 'switch.surge').limit).toBeCloseTo(10e3 * Math.sqrt(10), 6);
    expect(byId(judgeRatings(station, short, { switch: { surgeCurrent_A: 10e3 }, surgeFloor_s: 0.25e-3 }), 'switch.surge').limit).toBeCloseTo(10e3 * Math.sqrt(20), 6);
  });

  // REFERENCES.md: half-sine fusing integral I²t = I_TSM²·t/2: 25 kA on 10 ms → 3.125e6 A²s.
  it('switch.i2t against the rating derived by I²t = I_TSM²·t/2, or the given one', () => {
    const derived = byId(judgeRatings(station, result, { switch: { surgeCurrent_A: 25e3 } }), 'switch.i2t');
    expect(derived.limit).toBeCloseTo(3.125e6, 3);
    expect(derived.status).toBe('pass');
    expect(derived.note).toMatch(/I_TSM²·t\/2/);
    const i2t = (r: number) => byId(judgeRatings(station, result, { switch: { i2t_A2s: r } }), 'switch.i2t').status;
    expect(i2t(1.6e6)).toBe('warn');
    expect(i2t(1.4e6)).toBe('fail');
    expect(hasId(judgeRatings(station, result, { switch: { i2t_A2s: 1.6e6 } }), 'switch.surge')).toBe(false);
  });

  it('switch.didt and switch.blocking: pass, warn, fail', () => {
    const d = (r: number) => byId(judgeRatings(station, result, { switch: { didt_Aps: r } }), 'switch.didt').status;
    expect([d(100e6), d(45e6), d(30e6)]).toEqual(['pass', 'warn', 'fail']);
    const b = (r: number) => byId(judgeRatings(station, result, { switch: { blockingVoltage_V: r } }), 'switch.blocking').status;
    expect([b(2200), b(1800), b(1500)]).toEqual(['pass', 'warn', 'fail']);
  });

  // Diode: 28 kA, 2.0e6 A²s → t_eq = 2·2e6/28e3² = 5.102 ms; allowed = I_FSM·√(10/5.102).
  it('diode.surge and diode.i2t use the diode figures; no diode items when the station has no diode', () => {
    const items = judgeRatings(station, result, { diode: { surgeCurrent_A: 30e3 } });
    expect(byId(items, 'diode.surge').limit).toBeCloseTo(30e3 * Math.sqrt(0.01 / ((2 * 2e6) / 28e3 ** 2)), 6);
    expect(byId(items, 'diode.i2t').value).toBe(2e6);
    expect(hasId(items, 'diode.didt')).toBe(false);
    expect(judgeRatings(fixtureStation({ freewheel: null }), result, { diode: { surgeCurrent_A: 30e3 } })).toEqual([]);
  });

  it('capacitor.voltage, capacitor.reverse and capacitor.peak-current (per unit): pass, warn, fail', () => {
    const c = (cap: object, id: string) => byId(judgeRatings(station, result, { capacitor: cap }), id);
    expect([2200, 1900, 1500].map((v) => c({ voltage_V: v }, 'capacitor.voltage').status)).toEqual(['pass', 'warn', 'fail']);
    expect([20, 6, 4].map((v) => c({ reverse_pct: v }, 'capacitor.reverse').status)).toEqual(['pass', 'warn', 'fail']);
    const shared = c({ peakCurrent_A: 15e3, units: 3 }, 'capacitor.peak-current');
    expect(shared.value).toBe(10e3);
    expect(shared.status).toBe('pass');
    expect(shared.item).toMatch(/3 in parallel/);
    expect(c({ peakCurrent_A: 15e3 }, 'capacitor.peak-current').status).toBe('fail');
  });

  it('a "Not computed" warn when the engine could not give a figure', () => {
    const nan = fixtureResult({ figures: { peakDidt_Aps: Number.NaN } });
    const d = byId(judgeRatings(station, nan, { switch: { didt_Aps: 100e6 } }), 'switch.didt');
    expect(d.status).toBe('warn');
    expect(d.note).toMatch(/^Not computed/);
  });

  it('a larger required margin never turns a fail into a pass (property, every rating item)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.9, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }), fc.double({ min: 5e3, max: 80e3, noNaN: true }), (a, b, rating) => {
        const inp = (m: number) => ({
          margin: m,
          switch: { surgeCurrent_A: rating, didt_Aps: rating * 2e3, blockingVoltage_V: rating / 15 },
          diode: { surgeCurrent_A: rating },
          capacitor: { voltage_V: rating / 15, reverse_pct: rating / 3e3, peakCurrent_A: rating },
        });
        const lo = judgeRatings(station, result, inp(Math.min(a, b)));
        const hi = judgeRatings(station, result, inp(Math.max(a, b)));
        return lo.every((it, k) => rank(hi[k].status) <= rank(it.status));
      }),
      { numRuns: 100 },
    );
  });
});
