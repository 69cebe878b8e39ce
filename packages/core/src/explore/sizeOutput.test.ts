import { describe, expect, it } from 'vitest';
import { SAFETY_TITLE } from '../report/safety.js';
import { sizeBank } from './sizeBank.js';
import { sizeToJson, sizeToText, UNIT_BUILD_RULES } from './sizeOutput.js';
import { sizingDesign } from './__fixtures__/sizingDesign.js';

const design = sizingDesign();

describe('sizeToText / sizeToJson', () => {
  it('states the unit-build rules, the chosen counts, the binding limit and the neighbours', async () => {
    const r = await sizeBank(design, { threads: 0, unit: { capacitance_F: 470e-6, voltage_V: 450, esr_Ohm: 0.02, esl_H: 40e-9 }, maxSeries: 3, capacitanceRange: [300e-6, 1.2e-3] });
    const t = sizeToText(r, 'Fixture');
    expect(t).toContain(UNIT_BUILD_RULES);
    expect(t).toContain(`${r.best!.build!.series} in series × ${r.best!.build!.parallel} strings`);
    expect(t).toContain(`Binding: ${r.binding.text}`);
    for (const n of r.neighbours) expect(t).toContain(n.why);
    expect(t).toContain(SAFETY_TITLE.toUpperCase());
    const j = sizeToJson(r) as { best: { build: { series: number } }; unitBuildRules: string };
    expect(j.best.build.series).toBe(r.best!.build!.series);
    expect(j.unitBuildRules).toBe(UNIT_BUILD_RULES);
    expect(JSON.stringify(j)).not.toMatch(/NaN|Infinity/);
  });
});
