import { describe, expect, it } from 'vitest';
import { ellipticE, ellipticK } from './elliptic.js';

describe('ellipticK(m), ellipticE(m) take the parameter m = k²', () => {
  it('K(0) = E(0) = π/2 (DLMF 19.6.1)', () => {
    expect(ellipticK(0)).toBeCloseTo(Math.PI / 2, 15);
    expect(ellipticE(0)).toBeCloseTo(Math.PI / 2, 15);
  });

  it('K(1/2) and E(1/2) match Abramowitz & Stegun Table 17.1 at m = 0.5 (printed to 15 digits)', () => {
    // A&S Table 17.1, m = 0.5 (α = 45°): K = 1.85407 46773 01372, E = 1.35064 38810 47676.
    expect(ellipticK(0.5)).toBeCloseTo(1.85407467730137, 13);
    expect(ellipticE(0.5)).toBeCloseTo(1.35064388104768, 13);
  });

  it('Legendre relation E·K′ + E′·K − K·K′ = π/2 holds at m = 0.3 (DLMF 19.7.1)', () => {
    const m = 0.3;
    const K = ellipticK(m);
    const E = ellipticE(m);
    const Kp = ellipticK(1 - m);
    const Ep = ellipticE(1 - m);
    expect(E * Kp + Ep * K - K * Kp).toBeCloseTo(Math.PI / 2, 13);
  });

  it('K grows like ln(4/k′) + (m′/4)(ln(4/k′) − 1) as m → 1 (DLMF 19.12.1)', () => {
    // m′ = 2^-30 makes 1 − m′ exact in binary; the next term of the expansion is O(m′²·ln) ≈ 1e-17.
    const mp = 2 ** -30;
    const L = Math.log(4 / Math.sqrt(mp));
    expect(ellipticK(1 - mp)).toBeCloseTo(L + (mp / 4) * (L - 1), 12);
    expect(ellipticE(1)).toBe(1);
  });

  it('the modulus form would be wrong: K at parameter 0.5 is not K at modulus 0.5', () => {
    // K(k = 0.5) = K(m = 0.25) = 1.68575 03548 12596 (A&S Table 17.1, m = 0.25)
    expect(ellipticK(0.25)).toBeCloseTo(1.685750354812596, 13);
    expect(Math.abs(ellipticK(0.5) - 1.685750354812596)).toBeGreaterThan(0.1);
  });
});
