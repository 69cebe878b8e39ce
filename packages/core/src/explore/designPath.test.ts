import { describe, expect, it } from 'vitest';
import { isInputError } from '../design/errors.js';
import { parseDesignPath, readDesignPath, withDesignValues } from './designPath.js';

const design = {
  name: 'Test line',
  bank: { capacitance: '2200 uF', voltage: 1600, esr: '4 mohm' },
  switch: { kind: 'thyristor' },
  coupled: [
    { name: 'sleeve', resistance: '0.2 mohm' },
    { name: 'hub', resistance: 1e-4 },
  ],
};
const source = { option: '--vary', value: 'x=1:2:3', expected: 'PATH=start:stop:count' };

describe('parseDesignPath(text)', () => {
  it('reads dotted paths and list indices in both spellings', () => {
    expect(parseDesignPath('bank.capacitance')).toEqual({ segments: ['bank', 'capacitance'], text: 'bank.capacitance' });
    expect(parseDesignPath('coupled[1].resistance')!.segments).toEqual(['coupled', 1, 'resistance']);
    expect(parseDesignPath('coupled.1.resistance')!.text).toBe('coupled[1].resistance');
  });
  it('refuses text that is not a path', () => {
    expect(parseDesignPath('')).toBeNull();
    expect(parseDesignPath('bank..voltage')).toBeNull();
    expect(parseDesignPath('bank voltage')).toBeNull();
  });
});

describe('readDesignPath(design, path, source)', () => {
  it('returns the number or quantity string at the path', () => {
    expect(readDesignPath(design, 'bank.capacitance', source).value).toBe('2200 uF');
    expect(readDesignPath(design, 'bank.voltage', source).value).toBe(1600);
    expect(readDesignPath(design, 'coupled[1].resistance', source).value).toBe(1e-4);
  });

  it('names the option, its value and the nearest field for a misspelt path', () => {
    let err: unknown;
    try {
      readDesignPath(design, 'bank.capacitence', source);
    } catch (e) {
      err = e;
    }
    expect(isInputError(err)).toBe(true);
    if (!isInputError(err)) return;
    expect(err.code).toBe('option.invalid');
    expect(err.path).toBe('--vary');
    expect(err.value).toBe('x=1:2:3');
    expect(err.suggestion).toBe('bank.capacitance');
    expect(err.message).toContain('has no field "capacitence"');
    expect(err.message).toContain('capacitance, voltage, esr');
  });

  it('refuses a path to a section, a text field or past the end of a list', () => {
    expect(() => readDesignPath(design, 'bank', source)).toThrow(/bank is a section/);
    expect(() => readDesignPath(design, 'switch.kind', source)).not.toThrow(); // a string: the quantity parser decides later
    expect(() => readDesignPath(design, 'coupled[2].resistance', source)).toThrow(/has 2 entries/);
    expect(() => readDesignPath(design, 'bank[0]', source)).toThrow(/not a list/);
    expect(() => readDesignPath(design, 'name.first', source)).toThrow(/no field "first"/);
  });
});

describe('withDesignValues(design, assignments)', () => {
  it('writes values at the paths, leaves the input untouched and shares untouched sections', () => {
    const before = JSON.stringify(design);
    const out = withDesignValues(design, [
      { path: parseDesignPath('bank.voltage')!, value: 1800 },
      { path: parseDesignPath('coupled[0].resistance')!, value: 3e-4 },
    ]);
    expect(out.bank.voltage).toBe(1800);
    expect(out.bank.capacitance).toBe('2200 uF');
    expect(out.coupled[0]!.resistance).toBe(3e-4);
    expect(out.coupled[1]).toBe(design.coupled[1]);
    expect(out.switch).toBe(design.switch);
    expect(Array.isArray(out.coupled)).toBe(true);
    expect(JSON.stringify(design)).toBe(before);
  });
});
