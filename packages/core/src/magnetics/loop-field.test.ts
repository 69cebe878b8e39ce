import { describe, expect, it } from 'vitest';
import { loopField, loopFieldOnAxis } from './loop-field.js';

/**
 * Direct Biot–Savart integration around the filament (independent of the elliptic closed form):
 * dH = I/(4π)·dl × R/|R|³, with dl = a·dφ·(−sin φ, cos φ, 0) at (a cos φ, a sin φ, z0), field point
 * (r, 0, z). Trapezoid rule in φ: geometric convergence for a smooth periodic integrand.
 */
function biotSavart(a: number, z0: number, r: number, z: number, n = 20000): { hz: number; hr: number } {
  let hx = 0;
  let hz = 0;
  for (let i = 0; i < n; i++) {
    const phi = (2 * Math.PI * i) / n;
    const c = Math.cos(phi);
    const s = Math.sin(phi);
    const Rx = r - a * c;
    const Ry = -a * s;
    const Rz = z - z0;
    const R3 = (Rx * Rx + Ry * Ry + Rz * Rz) ** 1.5;
    // dl × R with dl = a(−s, c, 0)
    hx += (a * c * Rz) / R3;
    hz += (-a * s * Ry - a * c * Rx) / R3;
  }
  const w = (2 * Math.PI) / n / (4 * Math.PI);
  return { hz: hz * w, hr: hx * w };
}

describe('loopField(a, z0, r, z): Biot–Savart of a circular filament in closed form', () => {
  const pts: [number, number][] = [
    [0.3, 0.2],
    [0.9, 0.05],
    [1.2, -0.4],
    [2.5, 1.0],
    [0.01, 0.5], // near the axis: series branch of H_r
    [0.5, 0],
  ];
  for (const [r, z] of pts) {
    it(`matches direct Biot–Savart quadrature at (r, z) = (${r}, ${z}) for a = 1 within 1e-9 relative`, () => {
      const got = loopField(1, 0, r, z);
      const ref = biotSavart(1, 0, r, z);
      expect(Math.abs(got.hz - ref.hz)).toBeLessThan(1e-9 * Math.abs(ref.hz));
      expect(Math.abs(got.hr - ref.hr)).toBeLessThan(1e-9 * Math.max(Math.abs(ref.hr), 1e-12));
    });
  }

  it('on its axis equals a²/(2(a² + z²)^{3/2}); at the centre 1/(2a) (single loop, any physics text)', () => {
    const a = 0.05;
    expect(loopField(a, 0, 0, 0).hz).toBeCloseTo(1 / (2 * a), 12);
    expect(loopField(a, 0.01, 0, 0.04).hz).toBeCloseTo(loopFieldOnAxis(a, 0.01, 0.04), 12);
    // a hair off the axis joins continuously (r = 1e-9·a)
    expect(loopField(a, 0.01, a * 1e-9, 0.04).hz / loopFieldOnAxis(a, 0.01, 0.04)).toBeCloseTo(1, 12);
  });

  it('H_r near the axis equals (3/4)·a²·ζ·r/(a² + ζ²)^{5/2} (first-order expansion of the on-axis field, ∇·H = 0)', () => {
    const a = 1;
    const r = 1e-6;
    const zeta = 0.7;
    const expected = (0.75 * a * a * zeta * r) / (a * a + zeta * zeta) ** 2.5;
    expect(loopField(a, 0, r, zeta).hr / expected).toBeCloseTo(1, 9);
  });

  it('the two H_r branches meet at m = 0.05 (1e-10 relative)', () => {
    // choose r so that m = 4ar/S crosses 0.05: a = 1, ζ = 0.5
    const a = 1;
    const zeta = 0.5;
    const f = (r: number) => (4 * a * r) / ((a + r) ** 2 + zeta * zeta) - 0.05;
    let lo = 0;
    let hi = 0.5;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) < 0) lo = mid;
      else hi = mid;
    }
    const below = loopField(a, 0, lo * (1 - 1e-12), zeta).hr;
    const above = loopField(a, 0, hi * (1 + 1e-12), zeta).hr;
    expect(Math.abs(below / above - 1)).toBeLessThan(1e-10);
  });
});
