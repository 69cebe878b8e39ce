import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3-scale';
import { decimate, pulsePlotSvg } from './plot-pulse.js';
import { rlcShot } from './__fixtures__/rlc.js';
import { allElements, parseXml, textOf } from './__fixtures__/xml.js';
import { formatQuantity } from './quantity.js';

/** y coordinates of the points of an SVG path made of M/L commands (d3-shape line output). */
function pathYs(d: string): number[] {
  return [...d.matchAll(/[ML]([-\d.e]+),([-\d.e]+)/g)].map((m) => Number(m[2]));
}

describe('pulsePlotSvg(result)', () => {
  const { result } = rlcShot({ freewheel: true, twoProbes: true, samples: 600 });
  const svg = pulsePlotSvg(result);
  const root = parseXml(svg);
  const els = allElements(root);
  const texts = els.filter((e) => e.name === 'text').map(textOf);

  it('is well-formed SVG with a title and description', () => {
    expect(root.children).toHaveLength(1);
    expect(root.children[0].name).toBe('svg');
    expect(root.children[0].attrs.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(els.some((e) => e.name === 'title')).toBe(true);
    expect(textOf(els.find((e) => e.name === 'desc')!)).toContain(formatQuantity(result.figures.peakCurrent_A, 'A'));
  });

  it('labels every axis with its quantity and its prefixed SI unit', () => {
    for (const t of ['coil current (kA)', 'capacitor voltage (kV)', 'field at the part (kA/m)', 'coil temperature (°C)', 'time since firing (ms)']) {
      expect(texts, t).toContain(t);
    }
  });

  it('marks the phases: a band per phase in each panel, a rule at each event, numbered names in the strip', () => {
    const np = result.phases.length;
    expect(els.filter((e) => e.attrs.class === 'phase-band')).toHaveLength(4 * np);
    expect(els.filter((e) => e.attrs.class === 'phase-rule')).toHaveLength(4 * (np - 1));
    expect(texts).toContain('2 freewheel');
    expect(texts.some((t) => t.startsWith('Phases: 1 discharge'))).toBe(true);
  });

  it('annotates peak current, peak field and end of pulse with their values', () => {
    const f = result.figures;
    expect(texts).toContain(`peak ${formatQuantity(f.peakCurrent_A, 'A')} at ${formatQuantity(f.timeOfPeak_s, 's')}`);
    expect(texts.some((t) => t.startsWith(`peak ${formatQuantity(f.peakField_Apm, 'A/m')}`))).toBe(true);
    expect(texts).toContain(`end of pulse ${formatQuantity(f.endOfPulse_s, 's')}`);
  });

  it('puts the peak marker on the drawn curve (circle at the path’s highest point, within 0.2 px)', () => {
    const path = els.find((e) => e.name === 'path' && e.attrs['data-series'] === 'coil current')!;
    const top = Math.min(...pathYs(path.attrs.d));
    const mark = els.find((e) => e.attrs.class === 'mark-peak-current')!;
    // 0.1 px rounding of both the path and the circle
    expect(Math.abs(Number(mark.attrs.cy) - top)).toBeLessThanOrEqual(0.2);
  });

  it('draws one line per probe, each with its own dash pattern and a named key', () => {
    const probes = els.filter((e) => e.name === 'path' && (e.attrs['data-series'] ?? '').startsWith('part '));
    expect(probes.map((p) => p.attrs['data-series'])).toEqual(['part surface', 'part centre']);
    expect(probes[0].attrs['stroke-dasharray']).toBeUndefined();
    expect(probes[1].attrs['stroke-dasharray']).toBeDefined();
    expect(texts).toContain('part centre');
  });
});

describe('decimate(t, ys, x)', () => {
  it('keeps every sample when there are few per pixel, and the envelope when there are many', () => {
    const n = 20_000;
    const t = Array.from({ length: n }, (_, j) => j / (n - 1));
    const y = t.map((s) => Math.sin(40 * Math.PI * s) + (s > 0.5 && s < 0.5001 ? 3 : 0));
    const x = scaleLinear().domain([0, 1]).range([0, 300]);
    const idx = decimate(t, [y], x);
    expect(idx.length).toBeLessThan(n / 10);
    expect(Math.max(...idx.map((j) => y[j]))).toBe(Math.max(...y));
    expect(Math.min(...idx.map((j) => y[j]))).toBe(Math.min(...y));
    expect(idx[0]).toBe(0);
    expect(idx[idx.length - 1]).toBe(n - 1);
    const t100 = Array.from({ length: 100 }, (_, j) => j / 99);
    expect(decimate(t100, [t100.map(Math.sin)], x)).toHaveLength(100);
  });
});
