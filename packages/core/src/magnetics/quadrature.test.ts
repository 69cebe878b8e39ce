import { describe, expect, it } from 'vitest';
import { gaussLegendre, gaussLegendreOn } from './quadrature.js';

describe('gaussLegendre(n)', () => {
  it('the 2-point rule is ±1/√3 with weights 1 (A&S Table 25.4)', () => {
    const r = gaussLegendre(2);
    expect(r.nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(r.weights[0]).toBeCloseTo(1, 15);
  });
  it('the 5-point rule matches A&S Table 25.4 (0.906179845938664, weight 0.236926885056189; centre weight 0.568888888888889)', () => {
    const r = gaussLegendre(5);
    expect(r.nodes[4]).toBeCloseTo(0.906179845938664, 14);
    expect(r.weights[4]).toBeCloseTo(0.236926885056189, 14);
    expect(r.weights[2]).toBeCloseTo(0.568888888888889, 14);
  });
  for (const n of [1, 3, 6, 9]) {
    it(`the ${n}-point rule integrates x^k exactly for k ≤ ${2 * n - 1} (defining property)`, () => {
      for (let k = 0; k <= 2 * n - 1; k++) {
        const { x, w } = gaussLegendreOn(n, 0.5, 2);
        const q = x.reduce((s, xi, i) => s + w[i] * xi ** k, 0);
        const exact = (2 ** (k + 1) - 0.5 ** (k + 1)) / (k + 1);
        expect(q / exact).toBeCloseTo(1, 12);
      }
    });
  }
});
