/**
 * Seeded random numbers for tolerance runs: the same seed gives the same sequence on every
 * machine and run (xoroshiro128+ from pure-rand; 53-bit uniform doubles).
 *
 * Normal deviates by Marsaglia's polar method (G. Marsaglia and T. A. Bray, "A convenient
 * method for generating normal variables", SIAM Review 6(3), 1964): draw u, v uniform in
 * (−1, 1) until s = u² + v² lies in (0, 1), then u·√(−2 ln s / s) and v·√(−2 ln s / s) are two
 * independent standard normal deviates.
 */
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';

export interface SeededRandom {
  /** Uniform in [0, 1). */
  uniform(): number;
  /** Standard normal (mean 0, standard deviation 1). */
  normal(): number;
}

/** A seeded generator. `seed` is taken as a 32-bit integer. */
export function seededRandom(seed: number): SeededRandom {
  const rng = xoroshiro128plus(seed | 0);
  let spare: number | null = null;
  const uniform = () => uniformFloat64(rng);
  return {
    uniform,
    normal() {
      if (spare !== null) {
        const s = spare;
        spare = null;
        return s;
      }
      for (;;) {
        const u = 2 * uniform() - 1;
        const v = 2 * uniform() - 1;
        const s = u * u + v * v;
        if (s > 0 && s < 1) {
          const k = Math.sqrt((-2 * Math.log(s)) / s);
          spare = v * k;
          return u * k;
        }
      }
    },
  };
}
