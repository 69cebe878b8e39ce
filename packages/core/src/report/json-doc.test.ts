import { describe, expect, it } from 'vitest';
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { jsonOutputMarkdown } from './json-doc.js';
import { JSON_FIELDS, jsonPaths, shotToJson } from './json.js';
import { rlcShot } from './__fixtures__/rlc.js';
import type { Verdict } from '../model/verdict.js';
import type { PenetrationFigures } from '../analysis/penetration.js';

const DOC = fileURLToPath(new URL('../../../../docs/json-output.md', import.meta.url));

describe('docs/json-output.md', () => {
  it('is the document generated from JSON_FIELDS (regenerate with UPDATE_DOCS=1)', () => {
    const generated = jsonOutputMarkdown();
    if (process.env.UPDATE_DOCS) writeFileSync(DOC, generated);
    expect(readFileSync(DOC, 'utf8')).toBe(generated);
  });

  it('lists every key of a full output (waveform, verdict, loops, probes) and no key that is never output', () => {
    const { result } = rlcShot({ freewheel: true, twoProbes: true });
    // a coupled loop, so `loops[]` and `energy.dissipated_J.loops` hold elements
    result.loops.push({ name: 'sleeve', peakCurrent_A: 1, temperatureRise_K: 0.1, finalTemperature_C: 20.1 });
    result.warnings.push({ code: 'test.code', message: 'm', severity: 'info' });
    const verdict: Verdict = {
      items: [{ id: 'x', item: 'X', value: 1, limit: 2, unit: 'A', margin: 0.5, status: 'pass', note: 'n' }],
      overall: 'pass',
    };
    // penetration figures with one body (the values only fill the keys; no physics checked here)
    const penetration: PenetrationFigures = {
      riseTime_s: 1e-3,
      equivalentFrequency_Hz: 250,
      bodies: [{ name: 'part', isPart: true, solid: true, skinDepth_m: 0.01, size_m: 0.005, sizeOverSkinDepth: 0.5, diffusionTime_s: 1e-4, diffusionTimeBasis: 'b', riseOverDiffusion: 10 }],
      centreToSurfaceAtPeak: 0.9,
      centreToSurfacePeaks: 0.95,
      staticCentreToSurface: 0.95,
      penetration: 1,
      centreLag_s: 1e-6,
      warnings: [],
    };
    const paths = jsonPaths(shotToJson(result, verdict, { waveform: true, penetration }));
    const documented = new Set(JSON_FIELDS.map((f) => f.path));
    const doc = readFileSync(DOC, 'utf8');
    for (const p of paths) {
      expect(documented.has(p), p).toBe(true);
      expect(doc, p).toContain(`\`${p}\``);
    }
    for (const p of documented) expect(paths.has(p), `documented but never output: ${p}`).toBe(true);
  });
});
