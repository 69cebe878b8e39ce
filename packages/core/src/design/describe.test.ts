import { describe, expect, it } from 'vitest';
import { parseDesign, parseStation } from './parse.js';
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
  });
});
