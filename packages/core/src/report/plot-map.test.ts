import { describe, expect, it } from 'vitest';
import { interpolateCividis, interpolateViridis } from 'd3-scale-chromatic';
import { mapPlotSvg, ringsToPath } from './plot-map.js';
import { allElements, parseXml, textOf } from './__fixtures__/xml.js';

const C = Array.from({ length: 9 }, (_, i) => 1e-3 + i * 0.5e-3); // 1 .. 5 mF
const V = Array.from({ length: 7 }, (_, i) => 1000 + i * 500); // 1 .. 4 kV

/** Points "x,y" of a path of M/L commands. */
function points(d: string): [number, number][] {
  return [...d.matchAll(/[ML]([-\d.e]+),([-\d.e]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

describe('mapPlotSvg(input)', () => {
  // A field linear in capacitance only: z = C / 1 mF (MA/m); the level line of z = 2.7 must be the
  // vertical line C = 2.7 mF. Marching squares with linear interpolation between cell centres
  // (d3-contour) is exact for a field linear along the cell edges, so the only error is the
  // 0.1 px rounding of the path.
  const value = V.map(() => C.map((c) => (c / 1e-3) * 1e6));
  const feasible = V.map(() => C.map((c) => c >= 3e-3 - 1e-12)); // columns 4.. (3 mF and up)
  value[0][0] = NaN;
  const svg = mapPlotSvg({
    x: { name: 'capacitance', unit: 'F', values: C },
    y: { name: 'charge voltage', unit: 'V', values: V },
    value,
    valueName: 'peak field at the part',
    valueUnit: 'A/m',
    level: { value: 2.7e6, label: 'required' },
    feasible,
  });
  const root = parseXml(svg);
  const els = allElements(root);
  const texts = els.filter((e) => e.name === 'text').map(textOf);
  const cells = els.filter((e) => e.attrs.class === 'cell');
  const xsOfCells = [...new Set(cells.map((e) => Number(e.attrs.x)))].sort((a, b) => a - b);
  const x0 = xsOfCells[0];
  const cw = xsOfCells[1] - x0;
  const centreOf = (c_F: number) => x0 + cw / 2 + ((c_F - C[0]) / (C[1] - C[0])) * cw;

  it('is well-formed SVG with both axes and the colour bar titled with units', () => {
    expect(root.children[0].name).toBe('svg');
    for (const t of ['capacitance (mF)', 'charge voltage (kV)', 'peak field at the part (MA/m)']) expect(texts).toContain(t);
  });

  it('draws the level line where the linear field crosses it (C = 2.7 mF, within 0.15 px)', () => {
    const line = els.find((e) => e.attrs.class === 'level-line')!;
    const pts = points(line.attrs.d);
    expect(pts.length).toBeGreaterThanOrEqual(2);
    for (const [x] of pts) expect(Math.abs(x - centreOf(2.7e-3))).toBeLessThanOrEqual(0.15);
    expect(texts).toContain('required 2.7 MA/m');
  });

  it('hatches exactly the feasible cells and outlines their boundary with the others', () => {
    const nFeasible = feasible.flat().filter(Boolean).length;
    const hatch = els.filter((e) => e.name === 'rect' && (e.attrs.fill ?? '').includes('-hatch') && e.attrs.width !== '22');
    expect(hatch).toHaveLength(nFeasible);
    const outline = points(els.find((e) => e.attrs.class === 'feasible-outline')!.attrs.d);
    const leftEdge = xsOfCells[4]; // left side of the 3 mF column (cells 0..3 are 1 to 2.5 mF)
    // outline and cells are both rounded to 0.1 px
    expect(Math.abs(Math.min(...outline.map(([x]) => x)) - leftEdge)).toBeLessThanOrEqual(0.1);
    expect(texts.some((t) => t.startsWith(`every limit holds (${nFeasible} of ${C.length * V.length}`))).toBe(true);
  });

  it('colours with cividis by default (colour-blind-safe), viridis on request; values also printed in cells', () => {
    const max = cells.find((e) => e.attrs.fill === interpolateCividis(1));
    expect(max).toBeDefined();
    expect(texts).toContain('5'); // 5 MA/m in the last column
    const v = mapPlotSvg(
      { x: { name: 'a', unit: 'F', values: C }, y: { name: 'b', unit: 'V', values: V }, value: V.map(() => C.map((c) => c)), valueName: 'z', valueUnit: 'A' },
      { scheme: 'viridis' },
    );
    expect(v).toContain(`fill="${interpolateViridis(1)}"`);
  });

  it('marks cells that were not computed and counts them in the key', () => {
    expect(els.filter((e) => (e.attrs.class ?? '').includes('cell-missing'))).toHaveLength(1);
    expect(texts).toContain('× not computed (1)');
  });

  it('says so when the level is never reached', () => {
    const s = mapPlotSvg({
      x: { name: 'a', unit: 'F', values: C },
      y: { name: 'b', unit: 'V', values: V },
      value: V.map(() => C.map(() => 1)),
      valueName: 'z',
      valueUnit: 'A/m',
      level: { value: 5, label: 'required' },
    });
    expect(s).toContain('(not reached in this range)');
    expect(s).not.toContain('level-line');
  });
});

describe('ringsToPath', () => {
  it('keeps only segments between cell centres when asked, the whole closed ring otherwise', () => {
    // 3 × 3 grid: centres span [0.5, 2.5]; the ring leaves that range along its bottom edge
    const ring: [number, number][] = [[0.5, 0], [2.5, 0], [2.5, 1.5], [1.5, 2.5], [0.5, 1.5], [0.5, 0]];
    const id = (g: [number, number]): [number, number] => g;
    expect(ringsToPath([ring], 3, 3, id, true)).toBe('M2.5,1.5L1.5,2.5L0.5,1.5');
    expect(ringsToPath([ring], 3, 3, id, false)).toBe('M0.5,0L2.5,0L2.5,1.5L1.5,2.5L0.5,1.5L0.5,0Z');
  });
});
