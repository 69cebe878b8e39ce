import { describe, expect, it } from 'vitest';
import { pulsePlotPathFor, shotReportMarkdown, shotReportMarkdownFiles } from './markdown.js';
import { rlcShot } from './__fixtures__/rlc.js';
import { formatQuantity } from './quantity.js';
import { parseXml } from './__fixtures__/xml.js';

describe('shotReportMarkdown', () => {
  const { station, result } = rlcShot({ freewheel: true });
  const verdict = {
    items: [{ id: 'x', item: 'Peak | field', value: 1, limit: 2, unit: 'A', margin: -0.5, status: 'fail' as const, note: 'n' }],
    overall: 'fail' as const,
  };

  it('opens with the safety notice and gives the tables with units, pipes escaped', () => {
    const md = shotReportMarkdown({ station, result, verdict });
    const lines = md.split('\n');
    expect(lines[0]).toBe(`# Shot report: ${station.name}`);
    expect(md.indexOf('> **Safety')).toBeLessThan(md.indexOf('## Station as understood'));
    expect(md).toContain('2.82 kJ'); // ½·2.2 mF·(1.6 kV)², closed form
    expect(md).toContain(`| Peak coil current | ${formatQuantity(result.figures.peakCurrent_A, 'A')} |`);
    expect(md).toContain('| Peak \\| field |');
    expect(md).toContain('**Overall verdict: FAIL**');
    // every table row has as many cells as its header
    for (const block of md.split('\n\n').filter((b) => b.startsWith('|'))) {
      const rows = block.split('\n');
      const n = rows[0].split(/(?<!\\)\|/).length;
      for (const r of rows) expect(r.split(/(?<!\\)\|/).length).toBe(n);
    }
  });

  it('links the plot when given a path, says how to get it otherwise', () => {
    expect(shotReportMarkdown({ station, result })).toContain('--svg FILE');
    expect(shotReportMarkdown({ station, result }, { pulsePlotPath: 'a b.pulse.svg' })).toContain('](a%20b.pulse.svg)');
  });

  it('returns the Markdown file and the SVG written next to it', () => {
    expect(pulsePlotPathFor('/out/report.md')).toBe('/out/report.pulse.svg');
    const files = shotReportMarkdownFiles({ station, result }, '/out/report.md');
    expect(files.map((f) => f.path)).toEqual(['/out/report.md', '/out/report.pulse.svg']);
    expect(files[0].content).toContain('](report.pulse.svg)');
    expect(() => parseXml(files[1].content)).not.toThrow();
  });
});
