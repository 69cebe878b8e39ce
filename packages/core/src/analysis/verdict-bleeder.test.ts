import { describe, expect, it } from 'vitest';
import { judgeBleeder } from './verdict-bleeder.js';
import { byId, hasId, fixtureStation } from './verdict-fixtures.test-util.js';

const station = fixtureStation(); // 2.2 mF at 1600 V

describe('judgeBleeder', () => {
  // RC natural response: t = RC·ln(V0/V). 10 kΩ · 2.2 mF = 22 s; to 50 V: 22·ln(32) = 76.25 s; to 75 V: 22·ln(21.33) = 67.29 s.
  it('bleeder.time to 50 V by default, info when no time is required', () => {
    const items = judgeBleeder(station, { resistance_Ohm: 10e3 });
    const t = byId(items, 'bleeder.time');
    expect(t.value).toBeCloseTo(22 * Math.log(32), 9);
    expect(t.status).toBe('info');
    expect(hasId(items, 'bleeder.time-50V')).toBe(false);
    expect(byId(items, 'bleeder.power').value).toBeCloseTo(1600 ** 2 / 10e3, 9);
  });

  it('bleeder.time to the user threshold is judged against the user time (pass, fail), with the 50 V time beside it', () => {
    const ok = judgeBleeder(station, { resistance_Ohm: 10e3, threshold_V: 30, maxTime_s: 120 });
    expect(byId(ok, 'bleeder.time')).toMatchObject({ status: 'pass', limit: 120 });
    expect(byId(ok, 'bleeder.time').value).toBeCloseTo(22 * Math.log(1600 / 30), 9);
    expect(byId(ok, 'bleeder.time-50V').value).toBeCloseTo(22 * Math.log(32), 9);
    expect(byId(judgeBleeder(station, { resistance_Ohm: 10e3, threshold_V: 30, maxTime_s: 60 }), 'bleeder.time').status).toBe('fail');
  });

  // NFPA 70 Art. 460 (from memory): 50 V within 5 min above 600 V; IEC 60831-1: 75 V within 3 min. Guidance only.
  it('guidance items are warn when slower than the guidance time and info otherwise — never pass', () => {
    const fast = judgeBleeder(station, { resistance_Ohm: 10e3 });
    const slow = judgeBleeder(station, { resistance_Ohm: 100e3 }); // RC = 220 s: 762 s to 50 V
    for (const id of ['bleeder.guidance.nfpa70', 'bleeder.guidance.iec60831']) {
      expect(byId(fast, id).status).toBe('info');
      expect(byId(slow, id).status).toBe('warn');
      expect(byId(fast, id).note).toMatch(/not a compliance statement/);
    }
    expect(byId(fast, 'bleeder.guidance.nfpa70').limit).toBe(300);
    expect(byId(fast, 'bleeder.guidance.iec60831').value).toBeCloseTo(22 * Math.log(1600 / 75), 9);
    expect([...fast, ...slow].some((i) => i.id.startsWith('bleeder.guidance') && i.status === 'pass')).toBe(false);
  });
});
