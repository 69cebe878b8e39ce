import { describe, expect, it } from 'vitest';
import { formatShotText, renderTextTable } from './text.js';
import { rlcShot } from './__fixtures__/rlc.js';
import { formatQuantity } from './quantity.js';
import type { Verdict } from '../model/verdict.js';

const verdict: Verdict = {
  items: [
    { id: 'field.part', item: 'Peak field at the part', value: 2.6e6, limit: 2.4e6, unit: 'A/m', margin: 2.6 / 2.4 - 1, status: 'pass', note: 'Required field of the grade (user setting).' },
    { id: 'coil.temperature', item: 'Coil temperature', value: 150, limit: 155, unit: '°C', margin: 5 / 130, status: 'warn', note: 'IEC 60085 class F; raise the margin by cooling between shots or a longer pulse with lower current, which keeps I²t lower overall.' },
    { id: 'switch.i2t', item: 'Switch I²t', value: 3e6, limit: 2e6, unit: 'A²s', margin: -0.5, status: 'fail', note: 'Datasheet of the thyristor.' },
  ],
  overall: 'fail',
};

describe('formatShotText({station, result, verdict})', () => {
  const { station, result } = rlcShot({ freewheel: true, twoProbes: true }, [
    { code: 'solver.tolerance', message: 'Tolerance not met in the freewheel phase.', severity: 'warning' },
  ]);
  const text = formatShotText({ station, result, verdict });

  it('starts with the safety notice with the stored energy ½·C·V0² (closed form: 2816 J)', () => {
    expect(text.indexOf('SAFETY')).toBeLessThan(text.indexOf('Figures'));
    expect(text).toContain('2.82 kJ');
  });

  it('shows figures with engineering units, as the same formatter prints them', () => {
    expect(text).toContain(formatQuantity(result.figures.peakCurrent_A, 'A'));
    expect(text).toMatch(/Peak coil current\s+\d[\d.]* kA/);
    expect(text).toMatch(/Peak field at the part\s+\d[\d.]* kA\/m/);
    expect(text).toMatch(/Time of peak current\s+\d[\d.]* [µm]s/);
  });

  it('lists the phases with event times, the energy balance, the warnings and the verdict table', () => {
    expect(text).toMatch(/discharge\s+0 s\s+\d[\d.]* ms/);
    expect(text).toMatch(/freewheel\s+.*decayed/);
    expect(text).toContain('Energy balance');
    expect(text).toMatch(/lost in the coil\s+\d[\d.]* kJ/);
    expect(text).toContain('solver.tolerance');
    expect(text).toContain('Verdict: FAIL');
    // A²s takes no prefix: by the SI rule a prefix is raised with its unit, so "3 MA²s" would read 3e12 A²s
    expect(text).toMatch(/Switch I²t\s+3e6 A²s\s+2e6 A²s\s+−50 %\s+FAIL/);
    expect(text).toMatch(/Coil temperature\s+150 °C\s+155 °C\s+\+3\.85 %\s+WARN/);
    expect(text).toContain('part centre');
  });

  it('is plain text without colour unless asked; with colour every status is still a word', () => {
    expect(text).not.toMatch(/\x1b\[/);
    const coloured = formatShotText({ station, result, verdict, color: true });
    expect(coloured).toMatch(/\x1b\[31m.*FAIL/);
    expect(coloured.replace(/\x1b\[[0-9;]*m/g, '')).toBe(text);
  });

  it('can leave out the station table', () => {
    expect(text).toContain('Station as understood');
    expect(formatShotText({ station, result, showStation: false })).not.toContain('Station as understood');
  });
});

describe('renderTextTable', () => {
  it('aligns right columns and wraps a long last column under itself', () => {
    const s = renderTextTable({
      id: 't',
      title: 'T',
      columns: [{ header: 'a', align: 'left' }, { header: 'n', align: 'right' }, { header: 'note', align: 'left' }],
      rows: [{ cells: ['x', '1', 'word '.repeat(30).trim()] }, { cells: ['yy', '22', 'short'] }],
    }, false, 20);
    const lines = s.split('\n');
    // lines: title, underline, header, rule, row 1 and its continuation lines, row 2
    const row1 = lines[4];
    const row2 = lines[lines.length - 1];
    expect(row2.startsWith('  yy  22  short')).toBe(true);
    expect(row1.startsWith('  x    1  word')).toBe(true);
    const continuation = lines.slice(5, -1);
    expect(continuation.length).toBeGreaterThan(3);
    for (const l of continuation) expect(l.startsWith(' '.repeat(10) + 'word')).toBe(true);
    for (const l of lines.slice(4)) expect(l.length).toBeLessThanOrEqual(10 + 20);
  });
});
