import { describe, expect, it } from 'vitest';
import { currentForField, holdDesign, steadyCurrent, type CoilCooling, type DcSupply, type SteadyCoil } from './steady-current.js';
import { yokeCurrentForPartField, yokeOperatingPoint, type YokeSpec } from '../magnetics/yoke.js';
import { steelCurve } from '../materials/steels.js';

// Copper α20 = 0.00393 /K (IEC 60028, REFERENCES.md). Coil and supply numbers are invented.
const coil: SteadyCoil = { resistance20_Ohm: 2.0, tempCoeff_perK: 0.00393, heatCapacity_JpK: 900 };
const cooling: CoilCooling = { ambient_C: 25, thermalResistance_KpW: 0.8 };
const linear = (k: number) => ({ fieldAtPart_Apm: (i: number) => k * i });

describe('steadyCurrent', () => {
  it('current-limited: T = (T_amb + R_th·I²·R20·(1 − 20α))/(1 − R_th·I²·R20·α) (closed form of the linear heat balance), 1e-8 K', () => {
    const I = 6;
    const supply: DcSupply = { voltage_V: 100, currentLimit_A: I, seriesResistance_Ohm: 0.1 };
    const r = steadyCurrent(coil, supply, cooling, linear(500));
    const k = cooling.thermalResistance_KpW * I * I * coil.resistance20_Ohm;
    const T = (cooling.ambient_C + k * (1 - 20 * coil.tempCoeff_perK)) / (1 - k * coil.tempCoeff_perK);
    expect(r.mode).toBe('current-limited');
    expect(Math.abs(r.point!.coilTemperature_C - T)).toBeLessThan(1e-8);
    expect(r.point!.current_A).toBe(I);
    expect(r.point!.partField_Apm).toBeCloseTo(500 * I, 9);
    // supply voltage = I·(R_s + R(T))
    expect(r.point!.supplyVoltage_V).toBeCloseTo(I * (0.1 + 2 * (1 + 0.00393 * (T - 20))), 9);
    // τ = C·R_th/(1 − R_th·I²·R20·α): exact time constant of the linear ODE C·dT/dt = I²R(T) − (T − T_amb)/R_th
    expect(r.point!.thermalTimeConstant_s!).toBeCloseTo((900 * 0.8) / (1 - k * coil.tempCoeff_perK), 4);
  });

  it('voltage-limited with no series resistance: (T − T_amb)·R(T) = R_th·V² (quadratic in T, closed form), 1e-8 K', () => {
    const V = 12;
    const supply: DcSupply = { voltage_V: V, currentLimit_A: 100, seriesResistance_Ohm: 0 };
    const r = steadyCurrent(coil, supply, cooling, linear(500));
    // R20·(1 + α(T − 20))·(T − Ta) = R_th·V²  →  a·T² + b·T + c = 0
    const { resistance20_Ohm: R20, tempCoeff_perK: al } = coil;
    const Ta = cooling.ambient_C;
    const a = R20 * al;
    const b = R20 * (1 - 20 * al) - R20 * al * Ta;
    const c = -R20 * (1 - 20 * al) * Ta - cooling.thermalResistance_KpW * V * V;
    const T = (-b + Math.sqrt(b * b - 4 * a * c)) / (2 * a);
    expect(r.mode).toBe('voltage-limited');
    expect(Math.abs(r.point!.coilTemperature_C - T)).toBeLessThan(1e-8);
    expect(r.point!.current_A).toBeCloseTo(V / (R20 * (1 + al * (T - 20))), 10);
    // hot coil carries less current than cold: the cold state is reported too
    expect(r.cold.current_A).toBeGreaterThan(r.point!.current_A);
  });

  it('picks the mode the supply actually settles in: constant current while I_lim·(R_s + R(T)) ≤ V, else constant voltage', () => {
    const cc = steadyCurrent(coil, { voltage_V: 30, currentLimit_A: 5, seriesResistance_Ohm: 0 }, cooling, linear(1));
    expect(cc.mode).toBe('current-limited');
    expect(cc.point!.supplyVoltage_V).toBeLessThanOrEqual(30);
    const cv = steadyCurrent(coil, { voltage_V: 10, currentLimit_A: 5, seriesResistance_Ohm: 0 }, cooling, linear(1));
    expect(cv.mode).toBe('voltage-limited');
    expect(cv.point!.current_A).toBeLessThan(5);
  });

  it('reports thermal runaway when R_th·I²·R20·α20 ≥ 1 in constant-current mode (no root of the linear balance)', () => {
    const I = Math.sqrt(1.05 / (cooling.thermalResistance_KpW * coil.resistance20_Ohm * coil.tempCoeff_perK));
    const r = steadyCurrent(coil, { voltage_V: Infinity, currentLimit_A: I, seriesResistance_Ohm: 0 }, cooling, linear(1));
    expect(r.mode).toBe('runaway');
    expect(r.point).toBeNull();
    expect(r.warnings.map((w) => w.code)).toContain('steady.thermal-runaway');
  });

  it('warns when the settled temperature exceeds the allowed one (IEC 60085 class 130 as the limit)', () => {
    const r = steadyCurrent(coil, { voltage_V: 1000, currentLimit_A: 9, seriesResistance_Ohm: 0 }, cooling, linear(1), { maxTemperature_C: 130 });
    expect(r.point!.coilTemperature_C).toBeGreaterThan(130);
    expect(r.warnings.map((w) => w.code)).toContain('steady.temperature-limit');
  });

  it('target field on a linear coil: I = H/k, with the supply voltage it needs hot (closed form), and names what blocks it', () => {
    const k = 800;
    const supply: DcSupply = { voltage_V: 15, currentLimit_A: 10, seriesResistance_Ohm: 0.05 };
    const r = steadyCurrent(coil, supply, cooling, linear(k), { targetField_Apm: 4000, maxTemperature_C: 155 });
    expect(r.target!.current_A).toBeCloseTo(5, 9);
    const kk = cooling.thermalResistance_KpW * 25 * coil.resistance20_Ohm;
    const T = (cooling.ambient_C + kk * (1 - 20 * coil.tempCoeff_perK)) / (1 - kk * coil.tempCoeff_perK);
    expect(Math.abs(r.target!.point!.coilTemperature_C - T)).toBeLessThan(1e-8);
    expect(r.target!.point!.supplyVoltage_V).toBeCloseTo(5 * (0.05 + 2 * (1 + 0.00393 * (T - 20))), 8);
    expect(r.target!.reachable).toBe(r.target!.point!.supplyVoltage_V <= 15);
    const tooMuch = steadyCurrent(coil, supply, cooling, linear(k), { targetField_Apm: 11 * k, maxTemperature_C: 155 });
    expect(tooMuch.target!.reachable).toBe(false);
    expect(tooMuch.target!.limits).toEqual(expect.arrayContaining(['current-limit', 'voltage', 'temperature']));
    // 12 A would run away (R_th·I²·R20·α = 0.91: the root lies above 2000 °C) and is still over the current limit
    const runaway = steadyCurrent(coil, supply, cooling, linear(k), { targetField_Apm: 12 * k });
    expect(runaway.target!.limits).toEqual(['current-limit', 'runaway']);
  });

  it('bench electromagnet on a steel yoke: the current for a target field equals the magnetic-circuit inverse, and saturation makes it more than the linear estimate', () => {
    const steel = steelCurve('low-carbon-steel')!;
    const spec: YokeSpec = {
      turns: 800,
      yoke: [{ name: 'frame', length_m: 0.4, area_m2: 9e-4, material: steel }],
      poles: [{ name: 'tips', length_m: 0.04, area_m2: 4e-4, material: steel }],
      gaps: [],
      part: { length_m: 10e-3, area_m2: 4e-4, recoilPermeability: 1.05 },
      leakage: [{ name: 'poles', permeance_H: 1e-7 }],
    };
    const field = { fieldAtPart_Apm: (i: number) => yokeOperatingPoint(spec, i).partField_Apm };
    const target = 1.2e6;
    const r = steadyCurrent(coil, { voltage_V: 200, currentLimit_A: 50, seriesResistance_Ohm: 0 }, cooling, field, { targetField_Apm: target });
    const direct = yokeCurrentForPartField(spec, target).current_A;
    expect(Math.abs(r.target!.current_A / direct - 1)).toBeLessThan(1e-9);
    const k0 = yokeOperatingPoint(spec, 1e-3).partField_Apm / 1e-3;
    expect(r.target!.current_A).toBeGreaterThan(target / k0);
  });

  it('currentForField returns NaN for a non-positive target', () => {
    expect(Number.isNaN(currentForField(linear(3), 0))).toBe(true);
  });
});

describe('holdDesign', () => {
  const BASE = `
bank: { capacitance: 1 mF, voltage: 400 V }
switch: { kind: thyristor }
cable: { resistance: 1 mohm, inductance: 1 uH }
coil: { inductance: 2 mH, resistance: 1.5 ohm, fieldPerAmpere: 900 A/m/A, conductor: copper, mass: 0.8 kg }
`;

  it('air-core coil: field = fieldPerAmpere·I and the copper R(T) from the coil section (IEC 60028 α20 = 0.00393 /K)', async () => {
    const { parseDesign } = await import('../design/parse.js');
    const d = parseDesign(BASE + 'steady:\n  supply: { currentLimit: 4 A }\n  cooling: { thermalResistance: 2 K/W, ambient: 30 degC }\n  targetField: 2700 A/m\n', 'c.yaml');
    const r = holdDesign(d);
    expect(r.fixture).toBe('coil');
    expect(r.yoke).toBeUndefined();
    const k = 2 * 16 * 1.5;
    const T = (30 + k * (1 - 20 * 0.00393)) / (1 - k * 0.00393); // closed form (current-limited)
    expect(Math.abs(r.result.point!.coilTemperature_C - T)).toBeLessThan(1e-8);
    expect(r.result.point!.partField_Apm).toBeCloseTo(3600, 9);
    expect(r.result.target!.current_A).toBeCloseTo(3, 12);
    // heat capacity from mass × copper specific heat (385 J/(kg·K), CRC Handbook): τ = C·R_th/(1 − R_th·I²·R20·α)
    expect(r.result.point!.thermalTimeConstant_s!).toBeCloseTo((0.8 * 385 * 2) / (1 - k * 0.00393), 3);
  });

  it('overrides win over the steady section, and a missing supply or cooling is an InputError naming steady.supply / steady.cooling', async () => {
    const { parseDesign } = await import('../design/parse.js');
    const { InputError } = await import('../design/errors.js');
    const d = parseDesign(BASE + 'steady:\n  supply: { currentLimit: 4 A }\n  cooling: { thermalResistance: 2 K/W }\n', 'c.yaml');
    expect(holdDesign(d, { currentLimit_A: 2 }).result.point!.current_A).toBe(2);
    const bare = parseDesign(BASE, 'c.yaml');
    try {
      holdDesign(bare);
      throw new Error('expected InputError');
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InstanceType<typeof InputError>).issues.map((i) => i.path)).toEqual(['steady.supply', 'steady.cooling']);
    }
    expect(holdDesign(bare, { voltage_V: 6, thermalResistance_KpW: 3 }).result.mode).toBe('voltage-limited');
  });
});
