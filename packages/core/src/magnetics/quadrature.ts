/**
 * Gauss–Legendre quadrature nodes and weights on [−1, 1].
 *
 * Nodes are the zeros of the Legendre polynomial P_n, found by Newton's method from the
 * starting guess cos(π(i − 1/4)/(n + 1/2)), with P_n and P_n′ from the three-term recurrence;
 * weights w_i = 2/((1 − x_i²)·P_n′(x_i)²) (Abramowitz & Stegun 25.4.29; Golub & Welsch give the
 * same rule). Exact for polynomials of degree ≤ 2n − 1. Results are cached per n.
 */

export interface QuadratureRule {
  nodes: readonly number[];
  weights: readonly number[];
}

const cache = new Map<number, QuadratureRule>();

/** The n-point Gauss–Legendre rule on [−1, 1] (n ≥ 1). */
export function gaussLegendre(n: number): QuadratureRule {
  const hit = cache.get(n);
  if (hit) return hit;
  const nodes: number[] = new Array(n);
  const weights: number[] = new Array(n);
  for (let i = 0; i < Math.ceil(n / 2); i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp: number;
    for (let it = 0; it < 100; it++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) < 1e-16) break;
    }
    // recompute derivative at the converged node
    let p0 = 1;
    let p1 = x;
    for (let k = 2; k <= n; k++) {
      const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
      p0 = p1;
      p1 = p2;
    }
    dp = (n * (x * p1 - p0)) / (x * x - 1);
    const w = 2 / ((1 - x * x) * dp * dp);
    nodes[i] = -x;
    nodes[n - 1 - i] = x;
    weights[i] = w;
    weights[n - 1 - i] = w;
  }
  if (n % 2 === 1) nodes[(n - 1) / 2] = 0;
  const rule = { nodes, weights };
  cache.set(n, rule);
  return rule;
}

/** Nodes and weights of the n-point rule mapped to [a, b]. */
export function gaussLegendreOn(n: number, a: number, b: number): { x: number[]; w: number[] } {
  const { nodes, weights } = gaussLegendre(n);
  const h = (b - a) / 2;
  const c = (a + b) / 2;
  return { x: nodes.map((t) => c + h * t), w: weights.map((v) => v * h) };
}
