import { describe, expect, it } from 'vitest';
import { energyTable, figuresTable, shotTables, stationTable, verdictTable } from './sections.js';
import { rlcShot } from './__fixtures__/rlc.js';
import { FIGURE_KEYS } from './figures.js';

describe('summary tables', () => {
  const { station, result } = rlcShot({ freewheel: true });

  it('the station table lists every element with units', () => {
    const rows = stationTable(station).rows.map((r) => r.cells.join(' | '));
    expect(rows).toContain('bank | capacitance | 2.2 mF');
    expect(rows).toContain('coil | inductance | 180 µH');
    expect(rows).toContain('freewheel diode | position | at the bank end of the cable');
    expect(stationTable({ ...station, freewheel: null }).rows.map((r) => r.cells.join(' | '))).toContain('freewheel diode | fitted | none');
  });

  it('the station table gives each coupled loop one row with L, M, R at 20 °C and heat capacity', () => {
    const loop = (name: string) => ({ name, inductance_H: 18e-9, mutualToCoil_H: 1.24e-6, resistance20_Ohm: 8.36e-3, tempCoeff_perK: 0, heatCapacity_JpK: 1.97, initialTemperature_C: 20 });
    const withLoops = { ...station, coupled: Array.from({ length: 30 }, (_, k) => loop(`shell ${k + 1}`)) };
    const rows = stationTable(withLoops).rows.filter((r) => r.cells[0].startsWith('loop '));
    expect(rows).toHaveLength(30);
    expect(rows[0].cells).toEqual(['loop "shell 1"', 'L · M to coil · R at 20 °C · heat capacity', '18 nH · 1.24 µH · 8.36 mΩ · 1.97 J/K']);
  });

  it('the figures table has one row per documented figure', () => {
    expect(figuresTable(result).rows).toHaveLength(FIGURE_KEYS.length);
  });

  it('the energy shares of what was left and lost add up to 100 % (energy conservation)', () => {
    const rows = energyTable(result).rows.slice(1);
    const pct = rows.map((r) => Number(r.cells[2].replace(' %', '').replace('−', '-')));
    // 3 significant figures per share: the sum is within a few 0.01 % of 100
    expect(Math.abs(pct.reduce((a, b) => a + b, 0) - 100)).toBeLessThan(0.1);
  });

  it('the verdict table shows – for informative items and keeps the status on the row', () => {
    const t = verdictTable({
      items: [{ id: 'i', item: 'Info', value: 1, limit: NaN, unit: 'A', margin: NaN, status: 'info', note: '' }],
      overall: 'pass',
    });
    expect(t.rows[0].cells.slice(0, 5)).toEqual(['Info', '1 A', '–', '–', 'info']);
    expect(t.rows[0].status).toBe('info');
    expect(t.title).toBe('Verdict: PASS');
  });

  it('shotTables includes the verdict only when given, and probes/loops only when present', () => {
    expect(shotTables(station, result).map((t) => t.id)).toEqual(['station', 'phases', 'figures', 'energy', 'warnings']);
  });
});
