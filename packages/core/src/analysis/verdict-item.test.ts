import { describe, expect, it } from 'vitest';
import type { VerdictItem } from '../model/verdict.js';
import {
  infoItem,
  judgedItem,
  marginAtLeast,
  marginAtMost,
  marginTemperature,
  overallStatus,
  statusFromMargin,
} from './verdict-item.js';

describe('verdict grading rules', () => {
  it('statusFromMargin: fail below 0, warn below the required margin, pass otherwise, warn for NaN', () => {
    expect(statusFromMargin(-0.01, 0.2)).toBe('fail');
    expect(statusFromMargin(0, 0.2)).toBe('warn');
    expect(statusFromMargin(0.19, 0.2)).toBe('warn');
    expect(statusFromMargin(0.2, 0.2)).toBe('pass');
    expect(statusFromMargin(Number.NaN, 0)).toBe('warn');
    expect(statusFromMargin(-Infinity, 0)).toBe('fail');
    expect(statusFromMargin(Infinity, 0.2)).toBe('pass');
    // exactly at the margin despite rounding: 1 − 1600/2000 = 0.19999999999999996
    expect(statusFromMargin(1 - 1600 / 2000, 0.2)).toBe('pass');
    expect(statusFromMargin(1 - 2000 / 2000, 0)).toBe('pass');
  });

  it('marginAtMost, marginAtLeast and marginTemperature follow their definitions', () => {
    expect(marginAtMost(80, 100)).toBeCloseTo(0.2, 15);
    expect(marginAtMost(120, 100)).toBeCloseTo(-0.2, 15);
    expect(marginAtMost(1, 0)).toBeNaN();
    expect(marginAtLeast(3, 2.4)).toBeCloseTo(0.25, 15);
    expect(marginAtLeast(Number.NaN, 2)).toBeNaN();
    // 25 °C start, 155 °C class, 90 °C reached: (155 − 90)/(155 − 25) = 0.5
    expect(marginTemperature(90, 155, 25)).toBeCloseTo(0.5, 15);
    expect(marginTemperature(90, 20, 25)).toBeNaN();
  });

  it('judgedItem marks a non-finite value as warn with "Not computed"', () => {
    const base = { id: 'x', item: 'X', value: Number.NaN, limit: 1, unit: 'A', margin: Number.NaN, note: 'basis' };
    const it1 = judgedItem(base, 0.1);
    expect(it1.status).toBe('warn');
    expect(it1.note).toMatch(/^Not computed/);
    expect(judgedItem({ ...base, value: 0.5, margin: 0.5 }, 0.1).status).toBe('pass');
  });

  it('overallStatus takes the worst judged status and ignores info items', () => {
    const mk = (status: VerdictItem['status']): VerdictItem => ({ ...infoItem('a', 'A', 1, '', 'n'), status });
    expect(overallStatus([])).toBe('pass');
    expect(overallStatus([mk('info'), mk('pass')])).toBe('pass');
    expect(overallStatus([mk('pass'), mk('warn'), mk('info')])).toBe('warn');
    expect(overallStatus([mk('warn'), mk('fail'), mk('pass')])).toBe('fail');
    expect(infoItem('a', 'A', 1, 'V', 'n').margin).toBeNaN();
  });
});
