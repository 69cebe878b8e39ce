import { describe, expect, it } from 'vitest';
import { shotReportHtml, verdictCounts } from './html.js';
import { rlcShot } from './__fixtures__/rlc.js';
import { allElements, parseXml, textOf } from './__fixtures__/xml.js';
import { formatQuantity } from './quantity.js';
import type { Verdict } from '../model/verdict.js';

const verdict: Verdict = {
  items: [
    { id: 'field.part', item: 'Peak field at the part', value: 2.6e6, limit: 2.4e6, unit: 'A/m', margin: 2.6 / 2.4 - 1, status: 'pass', note: 'Required field (user setting).' },
    { id: 'switch.i2t', item: 'Switch I²t <rated>', value: 3e6, limit: 2e6, unit: 'A²s', margin: -0.5, status: 'fail', note: 'Datasheet & derating.' },
  ],
  overall: 'fail',
};

describe('shotReportHtml({station, result, verdict})', () => {
  const { station, result } = rlcShot({ freewheel: true, twoProbes: true });
  const html = shotReportHtml({ station, result, verdict, subtitle: 'design file: line-3.yaml' });
  const root = parseXml(html, { voidElements: ['meta', 'br'] });
  const els = allElements(root);

  it('is one well-formed document with no script, no link and no external URL in any src or href', () => {
    expect(els.filter((e) => e.name === 'html')).toHaveLength(1);
    expect(els.some((e) => e.name === 'script' || e.name === 'link' || e.name === 'iframe')).toBe(false);
    for (const e of els) {
      for (const [k, v] of Object.entries(e.attrs)) {
        if (/^(src|href|xlink:href|srcset|action)$/i.test(k)) expect(v, `${e.name} ${k}`).not.toMatch(/^(https?:)?\/\//i);
      }
    }
    expect(html).not.toMatch(/(src|href)\s*=\s*"(https?:)?\/\//i);
    expect(html).not.toMatch(/url\(\s*['"]?(https?:)?\/\//i);
    expect(html).not.toMatch(/@import/);
    // the browser is told to load nothing at all
    const csp = els.find((e) => e.name === 'meta' && e.attrs['http-equiv'] === 'Content-Security-Policy');
    expect(csp?.attrs.content).toContain("default-src 'none'");
  });

  it('puts the safety notice first in the body, with the stored energy ½·C·V0² (2816 J, closed form)', () => {
    const body = els.find((e) => e.name === 'body')!;
    const firstSection = body.children.find((c) => c.name === 'section')!;
    expect(firstSection.attrs.class).toBe('safety');
    expect(body.children.findIndex((c) => c === firstSection)).toBeLessThan(body.children.findIndex((c) => c.name === 'table'));
    expect(textOf(firstSection)).toContain('2.82 kJ');
  });

  it('shows the station as understood with units, the figures, the verdict table and the plot', () => {
    const all = textOf(root);
    expect(all).toContain('Station as understood');
    expect(all).toContain(formatQuantity(station.bank.capacitance_F, 'F'));
    expect(all).toContain(formatQuantity(station.coil.inductance_H, 'H'));
    expect(all).toContain(formatQuantity(result.figures.peakCurrent_A, 'A'));
    expect(els.filter((e) => e.name === 'tr' && e.attrs.class === 'status-fail')).toHaveLength(1);
    expect(all).toContain('Switch I²t <rated>'); // escaped in the source, read back as text
    expect(html).toContain('Switch I²t &lt;rated&gt;');
    expect(els.filter((e) => e.name === 'svg')).toHaveLength(1);
    expect(all).toContain('design file: line-3.yaml');
  });

  it('says when no verdict was computed', () => {
    const h = shotReportHtml({ station, result });
    expect(h).toContain('No verdict was computed');
    expect(h).not.toContain('id="verdict"');
  });
});

describe('verdictCounts', () => {
  it('counts only the statuses present and says when no limit was checked', () => {
    expect(verdictCounts(verdict)).toBe('1 failed, 1 passed');
    const info = { ...verdict.items[0], status: 'info' as const };
    expect(verdictCounts({ items: [info], overall: 'pass' })).toBe('no limit checked; 1 for information');
  });
});
