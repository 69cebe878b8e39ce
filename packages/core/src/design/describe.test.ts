import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { YokeCoil } from '../magnetics/yoke-coil.js';
import { simulateShot } from '../solve/shot.js';
import { parseDesign, parseStation } from './parse.js';
import { designToStation } from './to-station.js';
import { describeDesign, describeOrientation, orientationFigures } from './describe.js';

const TEXT = `
name: bench
bank: { capacitance: 2200 uF, voltage: 1.6 kV, esr: 4 mohm }
freewheel: null
coil: { inductance: 180 uH, resistance: 25 mohm, mass: 2.1 kg, fieldPerAmpere: 95 A/m/A, initialTemperature: 40 degC, conductorArea: 12.5 mm^2 }
coupled: [{ name: sleeve, inductance: 36 nH, resistance: 2.3 mohm, mutual: 1.8 uH, mutualTo: {}, heatCapacity: 55 J/K }]
`;

describe('describeDesign(design)', () => {
  it('prints every given field with engineering units', () => {
    const s = describeDesign(parseDesign(TEXT, 'x.yaml'));
    const text = s.map((sec) => `${sec.title}\n${sec.rows.map((r) => `${r.label} ${r.text}`).join('\n')}`).join('\n');
    for (const want of ['capacitance 2.2 mF', 'voltage 1.6 kV', 'esr 4 mΩ', 'inductance 180 µH', 'initialTemperature 40 °C', 'fieldPerAmpere 95 (A/m)/A', 'conductorArea 12.5 mm²', 'freewheel none', 'coupled[0] (sleeve)', 'mutual 1.8 µH', 'tMax 1 s', 'method auto']) {
      expect(text).toContain(want);
    }
  });
});

describe('orientationFigures(station) (series RLC, Nilsson & Riedel; closed forms)', () => {
  it('L, R, Z0, f0, ζ from the formulas', () => {
    const st = parseStation('bank: { capacitance: 1 mF, voltage: 1 kV }\ncoil: { inductance: 1 mH, resistance: 0.2 ohm, heatCapacity: 100 J/K, fieldPerAmpere: 10 }\n', 'x.yaml');
    const f = orientationFigures(st);
    // C = 1 mF, L = 1 mH: Z0 = 1 Ω, f0 = 1/(2π·1 ms) = 159.15 Hz, ζ = 0.1, E = ½·1e-3·1e6 = 500 J (exact within rounding, 1e-12)
    expect(f.characteristicImpedance_Ohm).toBeCloseTo(1, 12);
    expect(f.naturalFrequency_Hz).toBeCloseTo(1000 / (2 * Math.PI), 9);
    expect(f.dampingRatio).toBeCloseTo(0.1, 12);
    expect(f.storedEnergy_J).toBeCloseTo(500, 9);
    expect(f.losslessPeakField_Apm).toBeCloseTo(10_000, 6);
    expect(describeOrientation(st).rows[0]!.text).toBe('500 J');
    expect(f.nonlinearCoil).toBe(false);
  });
});

describe('describeOrientation(station) for a yoke fixture', () => {
  // examples/yoke-bench.yaml: the coil's inductance falls from the small-current value as the yoke saturates
  const yaml = readFileSync(fileURLToPath(new URL('../../../../examples/yoke-bench.yaml', import.meta.url)), 'utf8');
  const station = designToStation(parseDesign(yaml, 'yoke-bench.yaml'));
  const yoke = station.coil.nonlinear as YokeCoil;
  const f = orientationFigures(station);

  it('bounds the peak with the saturated inductance, V0·√(C/(L_ext + L_sat))', () => {
    expect(f.nonlinearCoil).toBe(true);
    const Lext = station.bank.esl_H + station.cable.inductance_H;
    // closed form of the energy bound (see describe.ts header): the same arithmetic, so rounding only (1e-15 H absolute, 1e-12 relative)
    expect(f.saturatedSeriesInductance_H).toBeCloseTo(Lext + yoke.saturatedInductance_H, 15);
    expect(f.losslessPeakCurrent_A / (station.bank.voltage_V * Math.sqrt(station.bank.capacitance_F / (Lext + yoke.saturatedInductance_H)))).toBeCloseTo(1, 12);
    expect(f.losslessPeakField_Apm).toBeCloseTo(yoke.fieldAtPart_Apm(f.losslessPeakCurrent_A), 6);
  });

  it('is a true bound of the simulated shot (energy conservation), unlike V0/Z0 with the small-current L', () => {
    const r = simulateShot(station);
    expect(r.figures.peakCurrent_A).toBeLessThanOrEqual(f.losslessPeakCurrent_A);
    expect(r.figures.peakField_Apm).toBeLessThanOrEqual(f.losslessPeakField_Apm);
    // the small-current series RLC figure would have been exceeded: the misleading figure this replaces
    expect(r.figures.peakCurrent_A).toBeGreaterThan(station.bank.voltage_V / f.characteristicImpedance_Ohm);
  });

  it('says the coil is nonlinear and labels the small-current figures', () => {
    const d = describeOrientation(station);
    expect(d.title).toMatch(/nonlinear/);
    const labels = d.rows.map((r) => r.label);
    expect(labels).toContain('loop inductance, yoke saturated');
    expect(labels).toContain('peak current at most V·√(C/L_sat)');
    expect(labels.some((l) => l.startsWith('lossless peak'))).toBe(false);
  });

  it('describeDesign prints yoke lists one readable row per item, not JSON', () => {
    const rows = describeDesign(parseDesign(yaml, 'yoke-bench.yaml')).flatMap((s) => s.rows);
    const text = (label: string) => rows.find((r) => r.path === `yoke.${label}`)?.text;
    expect(text('members[0]')).toBe('core: length 80 mm, area 6 cm², steel low-carbon-steel');
    expect(text('gaps[0]')).toBe('clearance: length 200 µm, area 1.2 cm²');
    expect(text('steels')).toBe('none');
    for (const r of rows) expect(r.text).not.toMatch(/[{[]"/);
  });
});
