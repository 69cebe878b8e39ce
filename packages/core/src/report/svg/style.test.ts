import { describe, expect, it } from 'vitest';
import { DASHES, OKABE_ITO, SERIES } from './style.js';

describe('plot style', () => {
  it('series colours are distinct Okabe–Ito colours (Okabe & Ito 2008), without the pale yellow', () => {
    expect(new Set(SERIES).size).toBe(SERIES.length);
    for (const c of SERIES) expect(Object.values(OKABE_ITO)).toContain(c);
    expect(SERIES).not.toContain(OKABE_ITO.yellow);
  });
  it('dash patterns are distinct, the first solid, so series differ without colour', () => {
    expect(DASHES[0]).toBeUndefined();
    expect(new Set(DASHES).size).toBe(DASHES.length);
  });
});
