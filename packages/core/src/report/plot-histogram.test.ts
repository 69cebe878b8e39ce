import { describe, expect, it } from 'vitest';
import { histogramSummary, histogramSvg } from './plot-histogram.js';
import { allElements, parseXml, textOf } from './__fixtures__/xml.js';

// 100 evenly spread values 0.5, 1.5, ..., 99.5: every bin of width 5 holds exactly 5 of them.
const values = Array.from({ length: 100 }, (_, i) => i + 0.5);

describe('histogramSvg(input)', () => {
  it('is well-formed, with axis titles, and its bars count every finite value once', () => {
    const svg = histogramSvg({ values: [...values, NaN], name: 'peak current', unit: 'A' });
    const els = allElements(parseXml(svg));
    const texts = els.filter((e) => e.name === 'text').map(textOf);
    expect(texts).toContain('peak current (A)');
    expect(texts).toContain('runs');
    const bars = els.filter((e) => e.name === 'rect' && (e.attrs.class ?? '').startsWith('bar'));
    const counts = bars.map((b) => Number(b.attrs['data-count']));
    expect(counts.reduce((a, b) => a + b, 0)).toBe(100);
    expect(new Set(counts)).toEqual(new Set([5])); // d3 ticks(20) on [0, 100]: step 5
    expect(texts.some((t) => t.includes('not computed: 1'))).toBe(true);
  });

  it('splits the bins at the limit and hatches the bars beyond it (58 values above 42)', () => {
    const svg = histogramSvg({ values, name: 'switch I²t', unit: 'A²s', limit: { value: 42, label: 'rating', kind: 'max' } });
    const els = allElements(parseXml(svg));
    const beyond = els.filter((e) => e.attrs.class === 'bar bar-beyond');
    expect(beyond.every((b) => Number(b.attrs['data-x0']) >= 42)).toBe(true);
    expect(beyond.reduce((a, b) => a + Number(b.attrs['data-count']), 0)).toBe(58);
    expect(beyond.every((b) => b.attrs.fill.startsWith('url(#'))).toBe(true);
    expect(svg).toContain('beyond the limit (hatched bars): 58 (58 %)');
  });
});

describe('histogramSvg(input): a limit away from the values', () => {
  // 1000 values spread evenly over [2.9, 3.2] MA/m (peak fields of a tolerance run), the required field at 2.4 MA/m
  const spread = Array.from({ length: 1000 }, (_, i) => 2.9e6 + (0.3e6 * (i + 0.5)) / 1000);
  const svg = histogramSvg({ values: spread, name: 'peak field', unit: 'A/m', limit: { value: 2.4e6, label: 'required field', kind: 'min' } });
  const els = allElements(parseXml(svg));
  const bars = els.filter((e) => e.name === 'rect' && (e.attrs.class ?? '').startsWith('bar'));

  it('bins the values over their own range (d3 ticks(20) on [2.9, 3.2] MA/m: step 20 kA/m, 15 bars), not over the axis stretched to the limit', () => {
    expect(bars).toHaveLength(15);
    expect(bars.reduce((a, b) => a + Number(b.attrs['data-count']), 0)).toBe(1000);
    for (const b of bars) expect(Number(b.attrs['data-x1']) - Number(b.attrs['data-x0'])).toBeCloseTo(2e4, 6);
  });

  it('keeps the limit rule off the axis line: it is drawn right of the plot’s left edge', () => {
    const rule = els.find((e) => e.name === 'line' && e.attrs.class === 'limit')!;
    const axisLeft = 86; // x0 of the plot area (plot-histogram.ts)
    expect(Number(rule.attrs.x1)).toBeGreaterThan(axisLeft + 5);
    expect(svg).toContain('beyond the limit (hatched bars): 0 (0 %)');
  });
});

describe('histogramSummary(input)', () => {
  it('gives R-7 quantiles (Hyndman & Fan 1996, type 7: the d3-array definition)', () => {
    // type 7: h = (n − 1)·p; median of 0.5..99.5 = 50; 5 %: h = 4.95 -> 4.5 + 0.95 = 5.45
    const s = histogramSummary({ values, name: 'x', unit: 'A', limit: { value: 10, label: 'need', kind: 'min' } });
    expect(s.n).toBe(100);
    expect(s.median).toBeCloseTo(50, 12);
    expect(s.q05).toBeCloseTo(5.45, 12);
    expect(s.q95).toBeCloseTo(94.55, 12);
    expect(s.beyond).toBe(10); // 0.5 .. 9.5 are below the required 10
  });
});
