/**
 * The engine keeps its work arrays, right-hand side and step log between shots (shot.ts, Workspace).
 * A shot must not depend on what ran before it: the same station simulated fresh and after other
 * stations of the same state size (different devices, tolerances, samples) gives identical results.
 * Consistency check of our own code (no physics oracle); tolerance: exact equality, since the
 * arithmetic is the same operation for operation.
 */
import { describe, expect, it } from 'vitest';
import type { ShotResult } from '../model/result.js';
import { simulateShot } from './shot.js';
import { makeStation } from './shot.test-util.js';

function strip(r: ShotResult): unknown {
  return { ...r, solver: { ...r.solver, wallTime_s: 0 } };
}

describe('simulateShot reuse of its workspace between shots', () => {
  it('gives identical results for a station run before and after other stations', () => {
    const a = makeStation({ diode: { position: 'fixture', thresholdVoltage_V: 0.8, slopeResistance_Ohm: 1e-3 }, solver: { samples: 50 } });
    const b = makeStation({ C: 1e-3, V0: 2500, esl: 0, L1: 50e-6, sw: { kind: 'bidirectional' }, solver: { samples: 0 } });
    const c = makeStation({ R1: 0.2, alpha: 0.0039, solver: { samples: 0, method: 'stiff' } });
    const first = strip(simulateShot(a));
    simulateShot(b);
    simulateShot(c);
    simulateShot(b);
    expect(strip(simulateShot(a))).toEqual(first);
  });
});
