import { describe, expect, it } from 'vitest';
import { conductorProofStress } from './conductor-strength.js';

describe('conductorProofStress', () => {
  // Smithells Metals Reference Book (REFERENCES.md): copper annealed ~50 MPa, hard-drawn ~265 MPa.
  it('conductorProofStress(copper, temper) gives the Smithells values and names the source', () => {
    expect(conductorProofStress('copper', 'annealed').value_Pa).toBe(50e6);
    expect(conductorProofStress('copper', 'hard').value_Pa).toBe(265e6);
    expect(conductorProofStress('copper', 'hard').source).toMatch(/Smithells/);
  });

  it('conductorProofStress(undefined, temper) falls back to copper', () => {
    expect(conductorProofStress(undefined, 'annealed')).toEqual(conductorProofStress('copper', 'annealed'));
  });

  it('conductorProofStress(aluminium, temper) is marked from memory and lies below copper of the same temper', () => {
    for (const t of ['annealed', 'hard'] as const) {
      const al = conductorProofStress('aluminium', t);
      expect(al.source).toMatch(/from memory/);
      expect(al.value_Pa).toBeLessThan(conductorProofStress('copper', t).value_Pa);
    }
  });
});
