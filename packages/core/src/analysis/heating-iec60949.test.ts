import { describe, expect, it } from 'vitest';
import { ALUMINIUM, COPPER } from '../materials/conductors.js';
import { simulateShot } from '../solve/shot.js';
import { makeStation } from '../solve/shot.test-util.js';
import { adiabaticFinalTemperature, adiabaticI2t, iec60949K, kPerMm2 } from './heating-iec60949.js';

const materials = [
  { m: COPPER, K: 226, checks: [[70, 160, 115], [90, 250, 143]] },
  { m: ALUMINIUM, K: 148, checks: [[70, 160, 76], [90, 250, 94]] },
] as const;

describe('IEC 60949 adiabatic short-circuit heating', () => {
  for (const { m, K, checks } of materials) {
    const k = iec60949K(m.iec60949VolumetricHeat_JpKm3, m.iec60949Beta_K, m.resistivity20_Ohm_m);

    it(`${m.name}: K = ${K} A·s^½/mm² (IEC 60949, to its printed digits)`, () => {
      expect(Math.round(kPerMm2(k))).toBe(K);
    });

    for (const [ti, tf, printed] of checks) {
      it(`${m.name}: K·√ln((θf + β)/(θi + β)) for ${ti} → ${tf} °C is ${printed} (IEC 60949 / REFERENCES.md, printed digits)`, () => {
        // the standard's tables use K at its printed digits (226, 148)
        const v = K * Math.sqrt(Math.log((tf + m.iec60949Beta_K) / (ti + m.iec60949Beta_K)));
        expect(Math.round(v)).toBe(printed);
        // the two forms of the formula are inverse to each other (exact)
        const S = 50e-6;
        const i2t = adiabaticI2t(S, k, m.iec60949Beta_K, ti, tf);
        expect(adiabaticFinalTemperature(i2t, S, k, m.iec60949Beta_K, ti)).toBeCloseTo(tf, 9);
      });
    }

    it(`${m.name}: a shot's coil temperature equals the IEC 60949 θf for the shot's I²t (same physics; 1e-6)`, () => {
      // A coil of cross-section S and length ℓ: R20 = ρ20·ℓ/S, C_th = σc·S·ℓ, α20 = 1/(β + 20).
      // The thyristor without diode carries the coil current, so i2tSwitch is the coil's I²t.
      const S = 1e-6;
      const len = 10;
      const beta = m.iec60949Beta_K;
      const st = makeStation({
        C: 4e-3,
        V0: 1500,
        L1: 300e-6,
        R1: (m.resistivity20_Ohm_m * len) / S,
        alpha: 1 / (beta + 20),
        cth: m.iec60949VolumetricHeat_JpKm3 * S * len,
        T0: 40,
        solver: { samples: 0 },
      });
      const r = simulateShot(st);
      expect(r.figures.coilTemperatureRise_K).toBeGreaterThan(50); // a real heating, not a rounding
      const tf = adiabaticFinalTemperature(r.figures.i2tSwitch_A2s, S, k, beta, 40);
      expect(Math.abs(r.figures.coilFinalTemperature_C - tf) / (tf - 40)).toBeLessThan(1e-6);
    });
  }
});
