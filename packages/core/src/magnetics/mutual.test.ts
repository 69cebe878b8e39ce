import { describe, expect, it } from 'vitest';
import { MU0_HpM } from './constants.js';
import { filamentMutual_H, loopSelf_H, maxwellBracket, rectangleGmd_m, roundWireGmd_m } from './mutual.js';

/**
 * Neumann's double line integral for two coaxial circles, reduced to one angle:
 *   M = (µ0·a·b/2)·∫0^{2π} cos φ / √(a² + b² + d² − 2ab·cos φ) dφ
 * evaluated by the trapezoid rule, which converges geometrically for a smooth periodic integrand.
 * An independent route to the same quantity (no elliptic integrals).
 */
function neumann(a: number, b: number, d: number, n = 20000): number {
  let s = 0;
  for (let i = 0; i < n; i++) {
    const phi = (2 * Math.PI * i) / n;
    s += Math.cos(phi) / Math.sqrt(a * a + b * b + d * d - 2 * a * b * Math.cos(phi));
  }
  return ((MU0_HpM * a * b) / 2) * s * ((2 * Math.PI) / n);
}

describe('filamentMutual_H(a, b, d): Maxwell, coaxial filaments', () => {
  const cases: [number, number, number][] = [
    [0.05, 0.05, 0.01],
    [0.05, 0.08, 0.0],
    [0.02, 0.1, 0.05],
    [0.1, 0.1, 0.3],
    [0.01, 0.01, 0.2], // m ≈ 0.01: series branch
    [0.03, 0.04, 0.12], // m close to the 0.1 branch point
  ];
  for (const [a, b, d] of cases) {
    it(`matches Neumann's integral at a=${a}, b=${b}, d=${d} within 1e-10 relative (quadrature error ≪ 1e-10)`, () => {
      const ref = neumann(a, b, d);
      expect(Math.abs(filamentMutual_H(a, b, d) / ref - 1)).toBeLessThan(1e-10);
    });
  }

  it('is symmetric in a and b and even in d', () => {
    expect(filamentMutual_H(0.03, 0.07, 0.02)).toBeCloseTo(filamentMutual_H(0.07, 0.03, -0.02), 20);
  });

  it('the series and elliptic branches of the bracket agree across m = 0.1 (1e-11 relative; the step in k is 2e-12)', () => {
    const k = Math.sqrt(0.1);
    const series = maxwellBracket(k * (1 - 1e-12));
    const direct = maxwellBracket(k * (1 + 1e-12));
    expect(Math.abs(series / direct - 1)).toBeLessThan(1e-11);
  });

  it('tends to the dipole limit µ0·π·a²b²/(2d³) far away (closed form of two magnetic dipoles)', () => {
    const a = 0.01;
    const b = 0.02;
    const d = 100;
    const dipole = (MU0_HpM * Math.PI * a * a * b * b) / (2 * d ** 3);
    expect(Math.abs(filamentMutual_H(a, b, d) / dipole - 1)).toBeLessThan(1e-6);
  });

  it('close equal loops: M → µ0·a·(ln(8a/d) − 2) as d/a → 0 (Maxwell; Grover ch. 13), error O((d/a)²·ln)', () => {
    const a = 1;
    const d = 1e-4;
    expect(Math.abs(filamentMutual_H(a, a, d) / (MU0_HpM * a * (Math.log(8 * a / d) - 2)) - 1)).toBeLessThan(1e-7);
  });
});

describe('geometric mean distances and loop self inductance', () => {
  it('square: g = 0.44705·side, thin strip: g = 0.22313·width (Grover, Inductance Calculations, Table 1)', () => {
    expect(rectangleGmd_m(1, 1)).toBeCloseTo(0.44705, 5);
    expect(rectangleGmd_m(1, 1e-9)).toBeCloseTo(0.22313, 5);
    expect(rectangleGmd_m(1, 0)).toBeCloseTo(0.22313, 5);
  });

  it('round wire: loopSelf_H with g = ρ·e^(−1/4) equals µ0·a·(ln(8a/ρ) − 7/4) (REFERENCES.md)', () => {
    const a = 0.1;
    const rho = 0.001;
    expect(loopSelf_H(a, roundWireGmd_m(2 * rho))).toBeCloseTo(MU0_HpM * a * (Math.log((8 * a) / rho) - 1.75), 15);
  });

  it('a thin square-section loop, split into 24×24 filaments and summed with Maxwell, approaches µ0·a·(ln(8a/g) − 2) (Rosa/Grover GMD method), within 2e-4', () => {
    // Independent route: the average of Maxwell mutuals over pairs of sub-filaments, each sub-filament's
    // own term from the same GMD formula at the sub-cell scale (its weight is 1/n² of the total).
    const a = 0.1;
    const s = 0.002; // section 2 mm × 2 mm, s/a = 0.02 so the thin-loop error is ~(s/a)² ≈ 4e-4·ln
    const n = 24;
    const h = s / n;
    const pts: [number, number][] = [];
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) pts.push([a - s / 2 + (i + 0.5) * h, -s / 2 + (j + 0.5) * h]);
    let sum = 0;
    for (let p = 0; p < pts.length; p++)
      for (let q = 0; q < pts.length; q++)
        sum += p === q ? loopSelf_H(pts[p][0], rectangleGmd_m(h, h)) : filamentMutual_H(pts[p][0], pts[q][0], pts[p][1] - pts[q][1]);
    const subdivided = sum / pts.length ** 2;
    expect(Math.abs(subdivided / loopSelf_H(a, rectangleGmd_m(s, s)) - 1)).toBeLessThan(2e-4);
  });
});
