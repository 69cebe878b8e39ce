import { describe, expect, it } from 'vitest';
import { safetyNotice, safetyHeadline } from './safety.js';
import { rlcStation } from './__fixtures__/rlc.js';

// Positive claims of conformity the notice must never make.
const CLAIMS = /\b(compl(y|ies|ied|iant|iance)|certif(y|ied|ies|ication)|conform(s|ing|ity)?|approved)\b/i;

describe('safetyNotice(station, format)', () => {
  const station = rlcStation({ capacitance_F: 2.2e-3, voltage_V: 1600 });

  it('states the stored energy ½·C·V0² and the charge voltage (capacitor energy, closed form)', () => {
    // ½ · 2.2e-3 F · (1600 V)² = 2816 J exactly
    const h = safetyHeadline(station);
    expect(h).toContain('2.82 kJ');
    expect(h).toContain('1.6 kV');
    expect(safetyHeadline({ storedEnergy_J: 2816, voltage_V: 1600 })).toBe(h);
  });

  for (const format of ['text', 'markdown', 'html'] as const) {
    it(`${format}: names every hazard, the usual precautions and defers to codes`, () => {
      const s = safetyNotice(station, format).toLowerCase().replace(/\s+/g, ' ');
      for (const word of [
        'kill',
        'dielectric absorption',
        'burst',
        'pinch',
        'implanted medical devices',
        'electronics',
        'bleeder',
        'grounding stick',
        'interlocked',
        'eye and hearing protection',
        'qualified personnel',
        'local electrical codes',
        'licensed',
      ]) {
        expect(s, word).toContain(word);
      }
    });
    it(`${format}: claims conformity with nothing`, () => {
      expect(safetyNotice(station, format)).not.toMatch(CLAIMS);
    });
  }

  it('text wraps at 78 columns and html is escaped markup in one section', () => {
    for (const line of safetyNotice(station, 'text').split('\n')) expect(line.length).toBeLessThanOrEqual(78);
    const html = safetyNotice(station, 'html');
    expect(html.match(/<section/g)).toHaveLength(1);
    expect(html).toContain('</section>');
    const md = safetyNotice(station, 'markdown');
    expect(md.split('\n').filter((l) => l !== '').every((l) => l.startsWith('>'))).toBe(true);
  });
});
