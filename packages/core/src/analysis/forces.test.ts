import { describe, expect, it } from 'vitest';
import { MU0_HpM } from '../magnetics/constants.js';
import { magneticPressure_Pa, thinShellHoopStress_Pa, windingHoopStress_Pa } from './forces.js';

describe('forces', () => {
  // REFERENCES.md: magnetic pressure p = B²/(2µ0) = 397.9 kPa at 1 T (printed to 4 digits: tolerance 0.05 kPa).
  it('magneticPressure_Pa(1 T) = 397.9 kPa, and scales as B²', () => {
    expect(magneticPressure_Pa(1) / 1e3).toBeCloseTo(397.9, 1);
    expect(magneticPressure_Pa(2) / magneticPressure_Pa(1)).toBeCloseTo(4, 12);
    expect(magneticPressure_Pa(-1)).toBe(magneticPressure_Pa(1));
  });

  // Thin-walled cylinder under internal pressure (Roark's Formulas for Stress and Strain): σ = p·r/t.
  it('thinShellHoopStress_Pa = p·r/t; NaN for a non-positive radius or build', () => {
    expect(thinShellHoopStress_Pa(1e6, 0.025, 0.01)).toBeCloseTo(2.5e6, 6);
    expect(thinShellHoopStress_Pa(1e6, 0, 0.01)).toBeNaN();
    expect(thinShellHoopStress_Pa(1e6, 0.02, 0)).toBeNaN();
  });

  it('windingHoopStress_Pa uses the outer radius: larger than the mean-radius shell by (r + t/2)/r', () => {
    const B = 3.77;
    const p = magneticPressure_Pa(B);
    const s = windingHoopStress_Pa(B, 0.02, 0.01);
    expect(s).toBeCloseTo((p * 0.025) / 0.01, 3);
    expect(s / thinShellHoopStress_Pa(p, 0.02, 0.01)).toBeCloseTo(1.25, 12);
  });

  // Long solenoid (closed form): J = B0/(µ0·t), B(x) = B0·(1 − x/t) across the build; ∫J·B dx = B0²/(2µ0).
  // Checked by the midpoint rule with 1000 strips (exact for a linear integrand up to rounding: tolerance 1e-9 relative).
  it('the J×B load across a long-solenoid winding equals the magnetic pressure', () => {
    const B0 = 2.5;
    const t = 0.012;
    const J = B0 / (MU0_HpM * t);
    const n = 1000;
    let load = 0;
    for (let i = 0; i < n; i++) {
      const x = ((i + 0.5) / n) * t;
      load += J * B0 * (1 - x / t) * (t / n);
    }
    expect(load / magneticPressure_Pa(B0)).toBeCloseTo(1, 9);
  });
});
