import { describe, expect, it } from 'vitest';
import { DEFAULT_SOLVER } from './station.js';

describe('DEFAULT_SOLVER', () => {
  it('asks for tolerances tight enough for the 1e-6 closed-form checks', () => {
    expect(DEFAULT_SOLVER.relTol).toBeLessThanOrEqual(1e-8);
    expect(DEFAULT_SOLVER.maxSteps).toBeGreaterThan(1000);
  });
});
