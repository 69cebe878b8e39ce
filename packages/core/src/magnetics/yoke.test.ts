import { describe, expect, it } from 'vitest';
import { saturatedYokeSpec, yokeCurrentForPartField, yokeInductanceLimits, yokeNetwork, yokeOperatingPoint, type YokeSpec } from './yoke.js';
import { MU0_HpM, linearMaterial, steelCurve } from '../materials/steels.js';

const lowCarbon = steelCurve('low-carbon-steel')!;

/** A C-frame bench fixture (invented numbers: used for properties, never as an oracle). */
const cFrame: YokeSpec = {
  turns: 400,
  yoke: [
    { name: 'core', length_m: 0.12, area_m2: 16e-4, material: lowCarbon },
    { name: 'back', length_m: 0.2, area_m2: 16e-4, material: lowCarbon },
  ],
  poles: [{ name: 'tip', length_m: 0.03, area_m2: 4e-4, material: lowCarbon }],
  gaps: [{ name: 'clearance', length_m: 0.4e-3, area_m2: 4e-4 }],
  part: { length_m: 6e-3, area_m2: 3.5e-4, recoilPermeability: 1.05 },
  leakage: [{ name: 'pole-to-pole', length_m: 0.03, area_m2: 30e-4 }],
};

describe('yoke fixture', () => {
  it('linear limit: with near-ideal steel and no leakage, φ = N·I/(R_gap + R_part + R_core) → N·I/(R_gap + R_part) (series magnetic circuit, closed form), rel 1e-9', () => {
    const ideal = linearMaterial(1e6, 'near-ideal steel');
    const spec: YokeSpec = {
      turns: 250,
      yoke: [{ name: 'core', length_m: 0.3, area_m2: 9e-4, material: ideal }],
      poles: [],
      gaps: [{ name: 'g', length_m: 1e-3, area_m2: 5e-4 }],
      part: { length_m: 5e-3, area_m2: 5e-4, recoilPermeability: 1.05 },
      leakage: [],
    };
    const Rg = 1e-3 / (MU0_HpM * 5e-4);
    const Rp = 5e-3 / (1.05 * MU0_HpM * 5e-4);
    const Rc = 0.3 / (1e6 * MU0_HpM * 9e-4);
    const I = 12;
    const phi = (250 * I) / (Rg + Rp + Rc);
    // The core's share is below 1e-4: the gap-only formula holds to that order.
    expect(Rc / (Rg + Rp)).toBeLessThan(1e-4);
    const op = yokeOperatingPoint(spec, I);
    expect(Math.abs(op.fluxLinkage_Wb / (250 * phi) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(op.partFluxDensity_T / (phi / 5e-4) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(op.partField_Apm / (phi / (1.05 * MU0_HpM * 5e-4)) - 1)).toBeLessThan(1e-9);
    expect(Math.abs(op.incrementalInductance_H / (250 ** 2 / (Rg + Rp + Rc)) - 1)).toBeLessThan(1e-9);
  });

  it('small-current inductance uses the steel’s initial permeability: L0 = N²/Σ R (closed form with µ_i = dB/dH at 0), rel 1e-9', () => {
    const spec: YokeSpec = { ...cFrame, leakage: [] };
    const mu = lowCarbon.differentialPermeability_HpM(0);
    const R =
      0.12 / (mu * 16e-4) + 0.2 / (mu * 16e-4) + 0.03 / (mu * 4e-4) + 0.4e-3 / (MU0_HpM * 4e-4) + 6e-3 / (1.05 * MU0_HpM * 3.5e-4);
    const { smallCurrent_H } = yokeInductanceLimits(spec);
    expect(Math.abs(smallCurrent_H / (400 ** 2 / R) - 1)).toBeLessThan(1e-9);
  });

  it('leakage share is P_leak/(P_leak + P_useful) for linear steel, whatever the core reluctance in series (parallel permeances, closed form), rel 1e-9', () => {
    const ideal = linearMaterial(1e4, 'linear steel');
    const spec: YokeSpec = { ...cFrame, yoke: [{ name: 'core', length_m: 0.3, area_m2: 16e-4, material: ideal }], poles: [] };
    const Pleak = (MU0_HpM * 30e-4) / 0.03;
    const Puse = 1 / (0.4e-3 / (MU0_HpM * 4e-4) + 6e-3 / (1.05 * MU0_HpM * 3.5e-4));
    const expected = Pleak / (Pleak + Puse);
    expect(Math.abs(yokeOperatingPoint(spec, 0).leakageFraction / expected - 1)).toBeLessThan(1e-9);
    expect(Math.abs(yokeOperatingPoint(spec, 50).leakageFraction / expected - 1)).toBeLessThan(1e-9);
  });

  it('λ(i) rises monotonically and is odd (issue requirement; no hysteresis in the model)', () => {
    let prev = -Infinity;
    for (let i = -3000; i <= 3000; i += 7.5) {
      const op = yokeOperatingPoint(cFrame, i);
      expect(op.converged).toBe(true);
      expect(op.fluxLinkage_Wb).toBeGreaterThan(prev);
      expect(op.incrementalInductance_H).toBeGreaterThan(0);
      prev = op.fluxLinkage_Wb;
    }
    expect(yokeOperatingPoint(cFrame, -321).fluxLinkage_Wb).toBeCloseTo(-yokeOperatingPoint(cFrame, 321).fluxLinkage_Wb, 12);
  });

  it('saturation lowers the field per ampere as current rises (issue requirement): past its maximum H_part/i never rises, and it falls by well over half by 5 kA', () => {
    // Below the knee the steel's permeability still rises (the toe of the initial curve), so
    // H_part/i first rises a little; the check starts at its maximum.
    const samples: number[] = [];
    for (let i = 0.01; i <= 5000; i *= 1.15) samples.push(yokeOperatingPoint(cFrame, i).partField_Apm / i);
    const peak = samples.indexOf(Math.max(...samples));
    for (let k = peak + 1; k < samples.length; k++) expect(samples[k]).toBeLessThanOrEqual(samples[k - 1] * (1 + 1e-12));
    expect(samples[samples.length - 1]).toBeLessThan(0.5 * samples[peak]);
    // The toe is small: the initial value is within 1 % of the maximum for this steel and gap.
    expect(samples[0]).toBeGreaterThan(0.99 * samples[peak]);
  });

  it('incremental inductance never falls below the fully saturated value (Rayleigh’s monotonicity law) and tends to it at high current', () => {
    const { saturated_H, smallCurrent_H } = yokeInductanceLimits(cFrame);
    expect(smallCurrent_H).toBeGreaterThan(saturated_H);
    for (let i = 0.5; i < 1e6; i *= 2.3) expect(yokeOperatingPoint(cFrame, i).incrementalInductance_H).toBeGreaterThanOrEqual(saturated_H * (1 - 1e-9));
    // Far above every table top the steel acts as µ0 incrementally: equal within 1e-9.
    expect(Math.abs(yokeOperatingPoint(cFrame, 1e7).incrementalInductance_H / saturated_H - 1)).toBeLessThan(1e-9);
    // saturatedYokeSpec keeps the geometry
    expect(yokeNetwork(saturatedYokeSpec(cFrame)).branches.length).toBe(yokeNetwork(cFrame).branches.length);
  });

  it('reports the steel flux densities, with the narrow pole tip saturating first', () => {
    const op = yokeOperatingPoint(cFrame, 15);
    const tip = op.steel.find((s) => s.name === 'pole:tip')!;
    const core = op.steel.find((s) => s.name === 'yoke:core')!;
    expect(tip.fluxDensity_T).toBeGreaterThan(core.fluxDensity_T);
    expect(tip.saturation).toBeGreaterThan(core.saturation);
  });

  it('yokeCurrentForPartField inverts the part field (rel 1e-9)', () => {
    for (const target of [1e4, 2e5, 1.5e6]) {
      const r = yokeCurrentForPartField(cFrame, target);
      expect(Math.abs(yokeOperatingPoint(cFrame, r.current_A).partField_Apm / target - 1)).toBeLessThan(1e-9);
      expect(r.iterations).toBeLessThan(100);
    }
    expect(Number.isNaN(yokeCurrentForPartField(cFrame, 0).current_A)).toBe(true);
  });

  it('rejects a spec with no yoke member or no turns', () => {
    expect(() => yokeNetwork({ ...cFrame, yoke: [] })).toThrow(RangeError);
    expect(() => yokeNetwork({ ...cFrame, turns: 0 })).toThrow(RangeError);
  });
});
