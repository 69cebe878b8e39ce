import { describe, expect, it } from 'vitest';
import besselj0 from '@stdlib/math-base-special-besselj0';
import besselj1 from '@stdlib/math-base-special-besselj1';
import { BODY_METALS } from './body-materials.js';
import { layersField } from './coil-field.js';
import { MU0_HpM } from './constants.js';
import { stepField, stepModes } from './eddy-step.js';
import { buildShellNetwork, loopFieldsAt, meshBody } from './shells.js';
import type { WindingLayer } from './winding.js';

/** Zeros of J0 by Newton's method (J0′ = −J1) from McMahon's estimate (n − 1/4)π. */
function j0Zeros(count: number): number[] {
  const out: number[] = [];
  for (let n = 1; n <= count; n++) {
    let x = (n - 0.25) * Math.PI;
    for (let i = 0; i < 50; i++) x += besselj0(x) / besselj1(x);
    out.push(x);
  }
  return out;
}

/**
 * Centre field of a long cylinder after a step of applied field (Carslaw & Jaeger, Conduction of
 * Heat in Solids, infinite cylinder with a step of surface temperature; REFERENCES.md):
 *   H(0, t)/H_applied = 1 − Σ 2/(j_n·J1(j_n))·exp(−j_n²·t/τ),  τ = µ0·σ·a²
 */
function carslawJaeger(tOverTau: number, zeros: number[]): number {
  return 1 - zeros.reduce((s, j) => s + (2 / (j * besselj1(j))) * Math.exp(-j * j * tOverTau), 0);
}

describe('step of applied field on a long cylinder: shells against Carslaw & Jaeger', () => {
  const zeros = j0Zeros(12);

  it('the zeros of J0 match Abramowitz & Stegun Table 9.5 (2.404826, 5.520078, 8.653728)', () => {
    expect(zeros[0]).toBeCloseTo(2.404826, 6);
    expect(zeros[1]).toBeCloseTo(5.520078, 6);
    expect(zeros[2]).toBeCloseTo(8.653728, 6);
  });

  // Aluminium rod, radius 10 mm, 400 mm long (40 radii: end effects at the middle below 1e-3),
  // 10 slices, inside a 1.2 m sheet solenoid of radius 13 mm (uniform applied field at the middle).
  const a = 0.01;
  const mat = BODY_METALS.aluminium;
  const tau = (MU0_HpM / mat.resistivity20_Ohm_m) * a * a;
  const coil: WindingLayer[] = [{ radius_m: 0.013, z0_m: -0.6 + 0.00025, pitch_m: 0.0005, turns: 2400, sign: 1, gmd_m: 1e-4 }];
  const hCoil = layersField(coil, 0, 0).hz;
  const times = [0.05, 0.1, 0.2, 0.4, 0.8];
  const maxError = (shells: number) => {
    const mesh = meshBody({ name: 'rod', innerRadius_m: 0, outerRadius_m: a, length_m: 0.4, material: mat, radialShells: shells, axialSlices: 10 });
    const net = buildShellNetwork([mesh], coil);
    const modes = stepModes({ L: net.L, R: net.loops.map((l) => l.resistance20_Ohm), coilMutual_H: net.loops.map((l) => l.mutualToCoil_H) }, hCoil, loopFieldsAt(net, 0, 0));
    return {
      err: Math.max(...times.map((x) => Math.abs(stepField(modes, x * tau) / hCoil - carslawJaeger(x, zeros)))),
      atZero: stepField(modes, 0) / hCoil,
    };
  };

  it('converges as shells are added: max |error| over t/τ = 0.05…0.8 falls from 4 to 8 to 16 shells; below 1.5 % at 8 and 0.5 % at 16 (discretisation error of equal shells ∝ 1/n²)', () => {
    const e4 = maxError(4);
    const e8 = maxError(8);
    const e16 = maxError(16);
    expect(e8.err).toBeLessThan(e4.err);
    expect(e16.err).toBeLessThan(e8.err);
    expect(e8.err).toBeLessThan(0.015);
    expect(e16.err).toBeLessThan(0.005);
    expect(e4.err / e16.err).toBeGreaterThan(6); // 16 for a clean second order
    // at the instant of the step the flux in every loop is kept: the centre sees (almost) nothing
    expect(Math.abs(e16.atZero)).toBeLessThan(1e-3);
  });
});

describe('stepModes on one loop', () => {
  it('a single shorted loop: H(t) = H_c − (M·h/L)·e^(−t·R/L) (first-order RL response, closed form)', () => {
    const L = 2e-6;
    const R = 1e-3;
    const M = 5e-7;
    const h = 40;
    const modes = stepModes({ L: [[L]], R: [R], coilMutual_H: [M] }, 100, [h]);
    expect(modes.timeConstants_s[0]).toBeCloseTo(L / R, 15);
    for (const t of [0, 1e-3, 5e-3]) expect(stepField(modes, t)).toBeCloseTo(100 - ((M * h) / L) * Math.exp((-t * R) / L), 10);
  });
});
