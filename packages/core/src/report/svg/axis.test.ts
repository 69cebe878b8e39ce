import { describe, expect, it } from 'vitest';
import { scaleLinear } from 'd3-scale';
import { axisTitle, bottomAxis, leftAxis, tickLabel } from './axis.js';
import { allElements, parseXml, textOf } from '../__fixtures__/xml.js';

describe('axes from d3-scale', () => {
  it('tickLabel shows a tick in the axis prefix without float noise', () => {
    expect(tickLabel(0.30000000000000004, 1)).toBe('0.3');
    expect(tickLabel(0.005, 1e-3)).toBe('5');
    expect(tickLabel(-1500, 1e3)).toBe('−1.5');
  });

  it('axisTitle carries the prefixed SI unit of the domain', () => {
    expect(axisTitle({ name: 'time', unit: 's' }, [0, 0.046])).toBe('time (ms)');
    expect(axisTitle({ name: 'runs', unit: '' }, [0, 80])).toBe('runs');
  });

  it('ticks are d3’s 1-2-5 ticks of the nice domain, placed by the scale', () => {
    const y = scaleLinear().domain([0, 5120]).range([200, 0]).nice(5);
    const g = parseXml(leftAxis(y, { name: 'coil current', unit: 'A' }, 50, 400));
    const labels = allElements(g).filter((e) => e.name === 'text').map(textOf);
    // d3 ticks(5) of [0, 6000] step 1000, shown in kA
    expect(labels).toEqual(['0', '1', '2', '3', '4', '5', '6', 'coil current (kA)']);
    const x = scaleLinear().domain([0, 0.0458]).range([0, 700]).nice(8);
    const b = parseXml(bottomAxis(x, { name: 'time', unit: 's' }, 300, [[0, 300]]));
    const xl = allElements(b).filter((e) => e.name === 'text').map(textOf);
    expect(xl[0]).toBe('0');
    expect(xl[xl.length - 1]).toBe('time (ms)');
    expect(xl).toContain('50');
    // without labels: grid and axis line only
    expect(bottomAxis(x, { name: 'time', unit: 's' }, 300, [], false)).not.toContain('<text');
  });
});
