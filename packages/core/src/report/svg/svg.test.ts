import { describe, expect, it } from 'vitest';
import { el, esc, px, svgRoot, text } from './svg.js';
import { parseXml } from '../__fixtures__/xml.js';

describe('svg string helpers', () => {
  it('esc escapes markup characters', () => {
    expect(esc('a < b & "c" > d')).toBe('a &lt; b &amp; &quot;c&quot; &gt; d');
  });
  it('el drops empty attributes, rounds numbers to 0.1 px and self-closes without children', () => {
    expect(el('line', { x1: 1.234, x2: 5, stroke: undefined, hidden: false, d: null })).toBe('<line x1="1.2" x2="5"/>');
    expect(el('g', { class: 'a"b' }, ['<x/>', '<y/>'])).toBe('<g class="a&quot;b"><x/><y/></g>');
    expect(px(2.06)).toBe(2.1);
  });
  it('svgRoot makes a well-formed standalone figure with title and description', () => {
    const s = svgRoot(100, 50, 'T <1>', 'D & more', [text(1, 2, 'x < y')], 'ab');
    const root = parseXml(s).children[0];
    expect(root.name).toBe('svg');
    expect(root.attrs.viewBox).toBe('0 0 100 50');
    expect(root.attrs['aria-labelledby']).toBe('ab-title ab-desc');
    expect(root.children.map((c) => c.name)).toEqual(['title', 'desc', 'text']);
  });
});
