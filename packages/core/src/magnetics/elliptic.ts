/**
 * Complete elliptic integrals of the first and second kind, as a thin wrapper over stdlib.
 *
 *   K(m) = ∫0^{π/2} dθ / √(1 − m·sin²θ),    E(m) = ∫0^{π/2} √(1 − m·sin²θ) dθ
 *
 * The argument is the PARAMETER m = k² (k the modulus), as in stdlib and DLMF §19.2 (written
 * there with k). stdlib evaluates both by Fukushima's piecewise minimax approximations
 * (Fukushima 2009, 2015), to about machine precision on 0 ≤ m < 1; K(1) = ∞, E(1) = 1;
 * m > 1 gives NaN. Every formula in magnetics/ that DLMF or Grover writes with k calls these
 * with m = k².
 */
import ellipk from '@stdlib/math-base-special-ellipk';
import ellipe from '@stdlib/math-base-special-ellipe';

/** K(m), complete elliptic integral of the first kind; m = k² (parameter, not modulus). stdlib's function itself (no extra call). */
export const ellipticK: (m: number) => number = ellipk;

/** E(m), complete elliptic integral of the second kind; m = k² (parameter, not modulus). stdlib's function itself (no extra call). */
export const ellipticE: (m: number) => number = ellipe;
