import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../design/parse.js';
import { designToStation } from '../design/to-station.js';
import type { YokeCoil } from '../magnetics/yoke-coil.js';
import { simulateShot } from '../solve/shot.js';
import { judgeInputsFromDesign } from './verdict-design.js';
import { judgeShot } from './verdict.js';
import { simulateDesign, withStationWarnings } from './design-shot.js';
import { fixtureResult, fixtureStation } from './verdict-fixtures.test-util.js';

const example = (name: string) => readFileSync(fileURLToPath(new URL(`../../../../examples/${name}`, import.meta.url)), 'utf8');

describe('withStationWarnings(station, result)', () => {
  // The yoke example's station carries a YokeCoil whose table ends at table.maxCurrent_A.
  const yokeStation = designToStation(parseDesign(example('yoke-bench.yaml'), 'yoke-bench.yaml'));
  const table = (yokeStation.coil.nonlinear as YokeCoil).table;

  it('adds yoke.table-range when the shot went beyond the yoke table', () => {
    const result = fixtureResult({ figures: { peakCurrent_A: 1.5 * table.maxCurrent_A }, warnings: [] });
    const out = withStationWarnings(yokeStation, result);
    expect(out.warnings.map((w) => w.code)).toContain('yoke.table-range');
    expect(result.warnings).toEqual([]); // the engine's result is not mutated
  });

  it('adds nothing for a shot inside the table, nor for a coil without a table', () => {
    const inside = fixtureResult({ figures: { peakCurrent_A: 0.5 * table.maxCurrent_A }, warnings: [] });
    expect(withStationWarnings(yokeStation, inside).warnings.filter((w) => w.code === 'yoke.table-range')).toEqual([]);
    const linear = fixtureResult({ figures: { peakCurrent_A: 1e9 }, warnings: [] });
    expect(withStationWarnings(fixtureStation(), linear)).toBe(linear);
  });

  it('does not repeat a warning the engine already gave', () => {
    const w = { code: 'yoke.table-range', message: 'from the engine', severity: 'warning' as const };
    const result = fixtureResult({ figures: { peakCurrent_A: 2 * table.maxCurrent_A }, warnings: [w] });
    expect(withStationWarnings(yokeStation, result).warnings.filter((x) => x.code === 'yoke.table-range')).toEqual([w]);
  });
});

describe('simulateDesign(design)', () => {
  it('gives the same station, shot figures and verdict as the separate calls', () => {
    const design = parseDesign(example('demo-station.yaml'), 'demo-station.yaml');
    const shot = simulateDesign(design, 'demo-station.yaml');
    const station = designToStation(design, 'demo-station.yaml');
    const result = simulateShot(station);
    expect(shot.station).toEqual(station);
    expect(shot.result.figures).toEqual(result.figures);
    expect(shot.verdict).toEqual(judgeShot(station, judgeInputsFromDesign(design), result));
  });
});
