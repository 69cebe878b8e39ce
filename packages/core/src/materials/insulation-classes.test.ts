import { describe, expect, it } from 'vitest';
import { INSULATION_CLASSES, insulationClass, insulationClassLabel, insulationClassNames } from './insulation-classes.js';

describe('insulation classes', () => {
  // IEC 60085 thermal classes (REFERENCES.md): 90 (Y), 105 (A), 120 (E), 130 (B), 155 (F), 180 (H), 200 (N), 220 (R), 250.
  it('INSULATION_CLASSES lists the IEC 60085 classes and letters in ascending order', () => {
    expect(INSULATION_CLASSES.map((c) => c.temperature_C)).toEqual([90, 105, 120, 130, 155, 180, 200, 220, 250]);
    expect(INSULATION_CLASSES.map((c) => c.letter)).toEqual(['Y', 'A', 'E', 'B', 'F', 'H', 'N', 'R', '']);
  });

  it('insulationClass(key) finds a class by number, numeric string or letter (IEC 60085)', () => {
    expect(insulationClass(155)?.letter).toBe('F');
    expect(insulationClass('180')?.letter).toBe('H');
    expect(insulationClass('h')?.temperature_C).toBe(180);
    expect(insulationClass(' B ')?.temperature_C).toBe(130);
    expect(insulationClass(250)?.temperature_C).toBe(250);
  });

  it('insulationClass(key) returns undefined for a name that is not a class', () => {
    expect(insulationClass(150)).toBeUndefined();
    expect(insulationClass('Z')).toBeUndefined();
    expect(insulationClass('')).toBeUndefined();
  });

  it('insulationClassLabel and insulationClassNames spell each class', () => {
    expect(insulationClassLabel(insulationClass('F')!)).toBe('155 °C (F)');
    expect(insulationClassLabel(insulationClass(250)!)).toBe('250 °C');
    expect(insulationClassNames()).toContain('R');
    expect(insulationClassNames()).toContain('250');
    expect(insulationClassNames()).toHaveLength(17);
  });
});
