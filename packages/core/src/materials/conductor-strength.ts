/**
 * Proof stress of winding conductors, for the hoop-stress check of analysis/forces.ts.
 *
 * 0.2 % proof stress at room temperature. Copper values from the Smithells Metals Reference
 * Book (REFERENCES.md): annealed about 50 MPa, hard-drawn about 265 MPa. Aluminium values are
 * typical, from memory (EC-grade 1350: annealed O temper about 28 MPa, hard H19 about 165 MPa);
 * the conductor supplier's certificate overrides both.
 */

export type ConductorTemper = 'annealed' | 'hard';
export type WindingMetal = 'copper' | 'aluminium';

export interface ProofStress {
  /** 0.2 % proof stress, Pa. */
  value_Pa: number;
  /** Where the value comes from. */
  source: string;
}

export const CONDUCTOR_PROOF_STRESS: Readonly<Record<WindingMetal, Readonly<Record<ConductorTemper, ProofStress>>>> = {
  copper: {
    annealed: { value_Pa: 50e6, source: 'Smithells Metals Reference Book (REFERENCES.md)' },
    hard: { value_Pa: 265e6, source: 'Smithells Metals Reference Book (REFERENCES.md)' },
  },
  aluminium: {
    annealed: { value_Pa: 28e6, source: 'typical, from memory (EC-grade 1350-O)' },
    hard: { value_Pa: 165e6, source: 'typical, from memory (EC-grade 1350-H19)' },
  },
};

/** Proof stress of a conductor; copper when the metal is not known. */
export function conductorProofStress(metal: WindingMetal | undefined, temper: ConductorTemper): ProofStress {
  return CONDUCTOR_PROOF_STRESS[metal ?? 'copper'][temper];
}
