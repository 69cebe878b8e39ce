import { describe, expect, it } from 'vitest';
import { energyBalance } from './energy-balance.js';

describe('energyBalance(terms)', () => {
  const terms = {
    initial_J: 100,
    capacitorFinal_J: 10,
    inductorFinal_J: 5,
    esr_J: 20,
    switch_J: 5,
    cable_J: 10,
    coil_J: 40,
    diode_J: 6,
    loops_J: [3, 1],
  };

  it('is zero when the terms add up to the initial energy (conservation, exact)', () => {
    expect(energyBalance(terms).relativeError).toBe(0);
  });

  it('reports |initial − Σ|/initial when they do not', () => {
    const b = energyBalance({ ...terms, coil_J: 40.01 });
    expect(b.relativeError).toBeCloseTo(1e-4, 12);
    expect(b.dissipated_J.loops).toEqual([3, 1]);
  });

  it('never returns NaN (a non-finite term gives 1, i.e. a failed balance)', () => {
    expect(energyBalance({ ...terms, coil_J: Number.NaN }).relativeError).toBe(1);
  });
});
