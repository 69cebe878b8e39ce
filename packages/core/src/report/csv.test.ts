import { describe, expect, it } from 'vitest';
import { csvField, waveformToCsv } from './csv.js';
import { rlcShot } from './__fixtures__/rlc.js';

/** A small RFC 4180 reader for the check (quoted fields with doubled quotes). */
function parseCsvLine(line: string): string[] {
  const out: string[] = [];
  let cur = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"' && line[i + 1] === '"') {
        cur += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else cur += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      out.push(cur);
      cur = '';
    } else cur += ch;
  }
  out.push(cur);
  return out;
}

describe('waveformToCsv(result)', () => {
  const { result } = rlcShot({ twoProbes: true, samples: 50 });
  result.loops.push({ name: 'sleeve, outer', peakCurrent_A: 0, temperatureRise_K: 0, finalTemperature_C: 20 });
  result.waveform.loopCurrents_A.push(result.waveform.t_s.map(() => 0));
  result.waveform.loopTemperatures_C.push(result.waveform.t_s.map(() => 20));
  const csv = waveformToCsv(result);
  const lines = csv.trimEnd().split('\n');

  it('has a header of SI-unit columns, one per waveform array and probe and loop', () => {
    expect(parseCsvLine(lines[0])).toEqual([
      't_s',
      'capacitorVoltage_V',
      'coilCurrent_A',
      'switchCurrent_A',
      'diodeCurrent_A',
      'field_Apm[part surface]',
      'field_Apm[part centre]',
      'coilTemperature_C',
      'loopCurrent_A[sleeve, outer]',
      'loopTemperature_C[sleeve, outer]',
    ]);
  });

  it('has one row per sample whose numbers read back to the waveform (10 significant figures)', () => {
    expect(lines).toHaveLength(1 + result.waveform.t_s.length);
    for (const j of [0, 7, result.waveform.t_s.length - 1]) {
      const row = parseCsvLine(lines[1 + j]).map(Number);
      expect(row).toHaveLength(10);
      const expected = [result.waveform.t_s[j], result.waveform.capacitorVoltage_V[j], result.waveform.coilCurrent_A[j]];
      for (let c = 0; c < 3; c++) {
        // relative 1e-9 (10 significant figures), absolute floor for values that are exactly 0
        expect(Math.abs(row[c] - expected[c])).toBeLessThanOrEqual(1e-9 * Math.abs(expected[c]) + 1e-300);
      }
      expect(row[5]).toBeCloseTo(result.waveform.field_Apm[0][j], 3);
    }
  });

  it('quotes fields per RFC 4180 and writes NaN as an empty field', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "x"')).toBe('"say ""x"""');
    expect(csvField('plain')).toBe('plain');
    const { result: r2 } = rlcShot({ samples: 4 });
    r2.waveform.coilCurrent_A[1] = NaN;
    expect(parseCsvLine(waveformToCsv(r2).split('\n')[2])[2]).toBe('');
  });
});
