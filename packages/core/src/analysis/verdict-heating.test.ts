import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { isInputError } from '../design/errors.js';
import { maxShotsPerMinute, steadyState } from './production-heating.js';
import { judgeHeating, productionTimeConstant } from './verdict-heating.js';
import { byId, fixtureResult, fixtureStation, rank } from './verdict-fixtures.test-util.js';

const station = fixtureStation(); // starts at 25 °C, α20 = 0.00393 /K (IEC 60028 copper), C_th = 810 J/K

describe('judgeHeating', () => {
  it('coil.temperature: one shot against the IEC 60085 class — pass, warn within the margin, fail above', () => {
    const at = (T: number) => byId(judgeHeating(station, fixtureResult({ figures: { coilFinalTemperature_C: T, coilTemperatureRise_K: T - 25 } }), { insulationClass: 'F' }), 'coil.temperature');
    expect(at(100)).toMatchObject({ status: 'pass', limit: 155, unit: '°C' });
    expect(at(100).margin).toBeCloseTo((155 - 100) / (155 - 25), 12);
    expect(at(150).status).toBe('warn');
    expect(at(160).status).toBe('fail');
    expect(at(100).note).toMatch(/IEC 60085/);
  });

  it('only the single shot is judged when no rate is given; nothing when no class either', () => {
    expect(judgeHeating(station, fixtureResult(), { insulationClass: 180 }).map((i) => i.id)).toEqual(['coil.temperature']);
    expect(judgeHeating(station, fixtureResult(), {})).toEqual([]);
  });

  it('productionTimeConstant: given τ wins; else C_th/(h·A); else NaN with the reason', () => {
    expect(productionTimeConstant(station, { thermalTimeConstant_s: 900, surfaceArea_m2: 0.1, convection_WpM2K: 10 }).tau_s).toBe(900);
    expect(productionTimeConstant(station, { surfaceArea_m2: 0.05, convection_WpM2K: 12 }).tau_s).toBeCloseTo(810 / (12 * 0.05), 9);
    const none = productionTimeConstant(station, {});
    expect(none.tau_s).toBeNaN();
    expect(none.basis).toMatch(/thermalTimeConstant/);
  });

  it('coil.temperature.production equals the steady state of production-heating.ts, with the highest rate as info', () => {
    const p = { shotsPerMinute: 0.5, thermalTimeConstant_s: 600, insulationClass: 'H', ambient_C: 30, margin_K: 15 };
    const items = judgeHeating(station, fixtureResult(), p);
    const inp = { shotRise_K: 12, shotStart_C: 25, tempCoeff_perK: 0.00393, ambient_C: 30, timeConstant_s: 600 };
    const prod = byId(items, 'coil.temperature.production');
    expect(prod.value).toBeCloseTo(steadyState(inp, 0.5).peak_C, 9);
    expect(prod.limit).toBe(180);
    expect(prod.status).toBe('pass');
    const rate = byId(items, 'production.max-rate');
    expect(rate.status).toBe('info');
    expect(rate.value).toBeCloseTo(maxShotsPerMinute(inp, 165), 9);
    expect(byId(items, 'production.time-constant').value).toBe(600);
    // without the resistance rise: the plain geometric series
    const lin = byId(judgeHeating(station, fixtureResult(), { ...p, resistanceRise: false }), 'coil.temperature.production');
    expect(lin.value).toBeCloseTo(30 + 12 / (1 - Math.exp(-120 / 600)), 9);
    expect(lin.note).toMatch(/R\(T\) rise ignored/);
  });

  it('coil.temperature.production: warn within the margin, fail above the class, fail on runaway', () => {
    const base = { thermalTimeConstant_s: 600, insulationClass: 'F' as const, resistanceRise: false };
    const at = (rate: number) => byId(judgeHeating(station, fixtureResult(), { ...base, shotsPerMinute: rate }), 'coil.temperature.production');
    const lim = maxShotsPerMinute({ shotRise_K: 12, shotStart_C: 25, tempCoeff_perK: 0, ambient_C: 25, timeConstant_s: 600 }, 155);
    const limM = maxShotsPerMinute({ shotRise_K: 12, shotStart_C: 25, tempCoeff_perK: 0, ambient_C: 25, timeConstant_s: 600 }, 145);
    expect(at(limM * 0.9).status).toBe('pass');
    expect(at((lim + limM) / 2).status).toBe('warn');
    expect(at(lim * 1.1).status).toBe('fail');
    const runaway = byId(
      judgeHeating(station, fixtureResult({ figures: { coilTemperatureRise_K: 200, coilFinalTemperature_C: 225 } }), { thermalTimeConstant_s: 600, insulationClass: 'F', shotsPerMinute: 60 }),
      'coil.temperature.production',
    );
    expect(runaway).toMatchObject({ status: 'fail', value: Infinity });
    expect(runaway.note).toMatch(/no steady state/);
  });

  it('coil.temperature.production is warn "Not computed" when τ cannot be found, info when no class is given', () => {
    const noTau = byId(judgeHeating(station, fixtureResult(), { shotsPerMinute: 2, insulationClass: 'F' }), 'coil.temperature.production');
    expect(noTau.status).toBe('warn');
    expect(noTau.note).toMatch(/^Not computed/);
    const noClass = byId(judgeHeating(station, fixtureResult(), { shotsPerMinute: 2, thermalTimeConstant_s: 600 }), 'coil.temperature.production');
    expect(noClass.status).toBe('info');
    expect(Number.isFinite(noClass.value)).toBe(true);
  });

  it('a runaway without an insulation class is reported as info with an infinite peak', () => {
    const hot = fixtureResult({ figures: { coilTemperatureRise_K: 200, coilFinalTemperature_C: 225 } });
    const it1 = byId(judgeHeating(station, hot, { thermalTimeConstant_s: 600, shotsPerMinute: 60 }), 'coil.temperature.production');
    expect(it1).toMatchObject({ status: 'info', value: Infinity });
    expect(it1.note).toMatch(/no steady state/);
  });

  it('an unknown insulation class is an InputError at production.insulationClass', () => {
    try {
      judgeHeating(station, fixtureResult(), { insulationClass: 'Q' });
      expect.unreachable();
    } catch (e) {
      expect(isInputError(e)).toBe(true);
      expect(e).toMatchObject({ code: 'design.not-one-of', path: 'production.insulationClass' });
    }
  });

  it('more shots per minute never improves the production status (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 30, noNaN: true }), fc.double({ min: 0.05, max: 30, noNaN: true }), fc.double({ min: 1, max: 60, noNaN: true }), (a, b, dT) => {
        const r = fixtureResult({ figures: { coilTemperatureRise_K: dT, coilFinalTemperature_C: 25 + dT } });
        const st = (rate: number) => byId(judgeHeating(station, r, { shotsPerMinute: rate, thermalTimeConstant_s: 400, insulationClass: 'B' }), 'coil.temperature.production');
        const slow = st(Math.min(a, b));
        const fast = st(Math.max(a, b));
        return rank(fast.status) <= rank(slow.status) && (fast.value >= slow.value || Math.abs(fast.value - slow.value) < 1e-9);
      }),
      { numRuns: 100 },
    );
  });
});
