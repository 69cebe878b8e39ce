import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../design/parse.js';
import { simulateDesign } from '../analysis/design-shot.js';
import { evaluateDesign, evaluatePoint } from './evaluateDesign.js';
import { parseDesignPath } from './designPath.js';

const example = (name: string) => readFileSync(fileURLToPath(new URL(`../../../../examples/${name}`, import.meta.url)), 'utf8');
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);

describe('evaluateDesign(design): one sweep point carries the warnings of `fluxkick shot`', () => {
  it('a yoke whose λ(i) table misses its tolerance: the row says yoke.table-tolerance, as simulateDesign does', () => {
    // tableTolerance 1e-14 is below what the knot cap can reach, so the table reports ok = false
    const text = example('yoke-bench.yaml').replace('\nyoke:\n', '\nyoke:\n  tableTolerance: 1e-14\n');
    const design = parseDesign(text, 'yoke.yaml');
    const row = evaluateDesign(design);
    expect(codes(row.warnings)).toContain('yoke.table-tolerance');
    expect(codes(simulateDesign(design).result.warnings)).toContain('yoke.table-tolerance');
  });

  it('a pulse too short to get into a conductive part: the row says part.not-penetrated once; a long pulse does not', () => {
    // geometry example with 1 µF and no freewheel diode: the thyristor ends the pulse at the first
    // current zero, long before the diffusion time µ0·σ·a² of the part (analysis/penetration.ts)
    const text = example('geometry-station.yaml');
    const short = parseDesign(text.replace('capacitance: 3300 uF', 'capacitance: 1 uF').replace(/freewheel:.*\n/, ''), 'g.yaml');
    const row = evaluateDesign(short);
    expect(codes(row.warnings).filter((c) => c === 'part.not-penetrated')).toHaveLength(1);
    // the same set of warning codes as the shot command's core call
    expect(new Set(codes(row.warnings))).toEqual(new Set(codes(simulateDesign(short).result.warnings)));
    expect(codes(evaluateDesign(parseDesign(text, 'g.yaml')).warnings)).not.toContain('part.not-penetrated');
  });

  it('evaluatePoint: a swept value the schema refuses is the row’s error, naming the field', () => {
    const design = parseDesign(example('demo-station.yaml'), 'demo.yaml');
    const out = evaluatePoint(design, [parseDesignPath('bank.capacitance')!], [-1e-3]);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.error).toContain('bank.capacitance');
  });
});
