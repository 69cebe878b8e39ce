import { describe, expect, it } from 'vitest';
import * as shared from '../units/format.js';
import * as core from '@fluxkick/core';
import { engineeringPrefix, formatPercent, formatPlain, formatQuantity } from './quantity.js';

// The formatter's behaviour is tested in units/format.test.ts; here: one implementation only.
describe('report/quantity delegates to the shared formatter (units/format.ts)', () => {
  it('re-exports the same functions, not a second implementation', () => {
    expect(formatQuantity).toBe(shared.formatQuantity);
    expect(engineeringPrefix).toBe(shared.engineeringPrefix);
    expect(formatPercent).toBe(shared.formatPercent);
    expect(formatPlain).toBe(shared.formatNumber);
  });
  it('the public formatQuantity is that same function', () => {
    expect(core.formatQuantity).toBe(shared.formatQuantity);
  });
  it('areas take the prefix on the metre (SI brochure, 9th ed.)', () => {
    expect(formatQuantity(2.5e-6, 'm²')).toBe('2.5 mm²');
  });
});
