/**
 * Draw the fields of a tolerance run: sample j sets field k to nominal_k·(1 + δ_jk).
 *
 *   uniform (default): δ = x·(2u − 1), u uniform in [0, 1): every value within ±x equally likely.
 *   normal:            δ = (x/3)·z, z standard normal truncated to |z| ≤ 3 by redrawing: the stated
 *                      ±x is three standard deviations, and no draw falls outside it.
 *
 * All draws come from one seeded generator in a fixed order (sample by sample, field by field),
 * so a run is reproduced exactly by its seed whatever the number of worker threads.
 */
import { seededRandom } from './random.js';

export type ToleranceDistribution = 'uniform' | 'normal';

export interface ToleranceDraw {
  nominal: number;
  /** Relative half-width x (0.1 for ±10 %). */
  fraction: number;
}

/** values[j][k]: sample j, field k. */
export function drawTolerances(fields: readonly ToleranceDraw[], samples: number, seed: number, distribution: ToleranceDistribution = 'uniform'): number[][] {
  const rnd = seededRandom(seed);
  const out: number[][] = [];
  for (let j = 0; j < samples; j++) {
    const row: number[] = [];
    for (const f of fields) {
      let delta: number;
      if (distribution === 'uniform') delta = f.fraction * (2 * rnd.uniform() - 1);
      else {
        let z = rnd.normal();
        while (Math.abs(z) > 3) z = rnd.normal();
        delta = (f.fraction / 3) * z;
      }
      row.push(f.nominal * (1 + delta));
    }
    out.push(row);
  }
  return out;
}
