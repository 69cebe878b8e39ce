/**
 * Steady current: a DC supply holds a current in the fixture coil (a bench electromagnet, an
 * iron-yoke fixture used as a DC magnetizer, or a pulse coil run on DC for a test). The same
 * questions as for a pulse station: the field at the part, the coil's temperature, and the
 * current (and supply) needed for a target field.
 *
 * Supply: set voltage V (open circuit) with a current limit I_lim and a series resistance R_s
 * (source and leads). Its current into a coil of resistance R is
 *   I = min(I_lim, V/(R_s + R))            (constant-voltage or constant-current mode).
 * Coil: R(T) = R20·(1 + α20·(T − 20 °C)) (DOMAIN.md; IEC 60028 for α20 of copper).
 * Cooling: lumped, to ambient through a thermal resistance R_th = 1/(h·A) (Newton's law of
 * cooling with a heat-transfer coefficient h over the cooled surface A). Steady state:
 *   T = T_amb + R_th·I(T)²·R(T).
 * Method: f(T) = T − T_amb − R_th·I(T)²·R(T) is scanned upward from T_amb in 0.5 K steps and
 * its first root is polished by Brent's method (solve/brent.ts): the first root is the state a
 * coil warming up from ambient settles at (f < 0 below it: heating exceeds cooling). No root
 * below T_amb + 2000 K is thermal runaway: in constant-current mode exactly when
 * R_th·I²·R20·α20 ≥ 1 (the linear equation's closed form).
 * Approach to the steady state: linearizing C_th·dT/dt = P(T) − (T − T_amb)/R_th about it gives
 * the time constant τ = C_th·R_th/(1 − R_th·dP/dT) (exact in constant-current mode, where the
 * equation is linear); 3τ reaches 95 % of the rise.
 * The field at the part comes from the fixture's field law (linear field per ampere for an
 * air-core coil, the magnetic circuit for a yoke); the current for a target field is its
 * inverse (bracketed, then Brent).
 */

import type { Warning } from '../model/result.js';
import { brentZero } from '../solve/brent.js';
import type { Design } from '../design/schema.js';
import { InputError, type InputIssue } from '../design/errors.js';
import { hasThermalAmount, resolveThermal } from '../design/sections/thermal.js';
import { fixtureBuildOf } from '../design/sections/fixture-geometry.js';
import { DEFAULT_AMBIENT_C, steadyFromDesign } from '../design/sections/steady.js';
import { yokeToSpec } from '../design/sections/yoke.js';
import { yokeCurrentForPartField, yokeOperatingPoint, type YokeOperatingPoint, type YokeSpec, type YokeSteelState } from '../magnetics/yoke.js';

/** A DC supply. */
export interface DcSupply {
  /** Set (open-circuit) voltage, V (> 0; Infinity: a pure current source). */
  voltage_V: number;
  /** Current limit, A (> 0; Infinity: a pure voltage source). */
  currentLimit_A: number;
  /** Source and lead resistance in series with the coil, Ω (≥ 0). */
  seriesResistance_Ohm: number;
}

/** The coil's resistance law and (optionally) heat capacity. */
export interface SteadyCoil {
  /** Ω at 20 °C (> 0). */
  resistance20_Ohm: number;
  /** 1/K. */
  tempCoeff_perK: number;
  /** J/K, for the time constant (optional). */
  heatCapacity_JpK?: number;
}

/** Lumped cooling to ambient. */
export interface CoilCooling {
  /** °C. */
  ambient_C: number;
  /** Thermal resistance coil → ambient, K/W (= 1/(h·A)), > 0. */
  thermalResistance_KpW: number;
}

/** Field at the part as a function of coil current (odd, increasing). */
export interface SteadyFieldLaw {
  fieldAtPart_Apm(current_A: number): number;
  /** Optional exact inverse; otherwise the analysis brackets and solves. */
  currentForField_A?(field_Apm: number): number;
}

export interface SteadyOptions {
  /** Field wanted at the part, A/m (> 0). */
  targetField_Apm?: number;
  /** Highest allowed coil temperature, °C (e.g. the insulation class, IEC 60085). */
  maxTemperature_C?: number;
}

/** One steady state. */
export interface SteadyPoint {
  current_A: number;
  /** Coil temperature, °C. */
  coilTemperature_C: number;
  temperatureRise_K: number;
  coilResistance_Ohm: number;
  /** I·R(T), V. */
  coilVoltage_V: number;
  /** I·(R_s + R(T)): what the supply's terminals must give, V. */
  supplyVoltage_V: number;
  /** I²·R(T), W. */
  coilPower_W: number;
  partField_Apm: number;
  /** τ of the approach to this state, s (undefined without a heat capacity). */
  thermalTimeConstant_s?: number;
}

export interface SteadyCurrentResult {
  /** How the supply settles: on its voltage, on its current limit, or no steady state. */
  mode: 'voltage-limited' | 'current-limited' | 'runaway';
  /** The state the coil settles at (null: runaway). */
  point: SteadyPoint | null;
  /** The coil when it is switched on cold (at ambient). */
  cold: SteadyPoint;
  target?: {
    field_Apm: number;
    /** Current for the target field, A. */
    current_A: number;
    /** The steady state when that current is held (null: runaway at that current). */
    point: SteadyPoint | null;
    /** The supply and the coil allow it. */
    reachable: boolean;
    /** What stands in the way: `current-limit`, `voltage`, `temperature`, `runaway`. */
    limits: ('current-limit' | 'voltage' | 'temperature' | 'runaway')[];
  };
  warnings: Warning[];
}

const SCAN_STEP_K = 0.5;
const SCAN_SPAN_K = 2000;

function resistanceAt(coil: SteadyCoil, t_C: number): number {
  return coil.resistance20_Ohm * (1 + coil.tempCoeff_perK * (t_C - 20));
}

function supplyCurrent(s: DcSupply, r: number): number {
  const v = Number.isFinite(s.voltage_V) ? s.voltage_V / (s.seriesResistance_Ohm + r) : Infinity;
  return Math.min(s.currentLimit_A, v);
}

/** First root of T − T_amb − R_th·P(T) above ambient, or NaN when none below T_amb + 2000 K. */
function settle(power: (t: number) => number, cooling: CoilCooling): number {
  const f = (t: number) => t - cooling.ambient_C - cooling.thermalResistance_KpW * power(t);
  let a = cooling.ambient_C;
  let fa = f(a);
  if (fa >= 0) return a;
  for (let k = 1; k * SCAN_STEP_K <= SCAN_SPAN_K; k++) {
    const b = cooling.ambient_C + k * SCAN_STEP_K;
    const fb = f(b);
    if (fb >= 0) return brentZero(f, a, b, fa, fb, 1e-10);
    a = b;
    fa = fb;
  }
  return NaN;
}

function pointAt(coil: SteadyCoil, supply: DcSupply, cooling: CoilCooling, field: SteadyFieldLaw, current_A: number, t_C: number, dPdT: number): SteadyPoint {
  const r = resistanceAt(coil, t_C);
  const p: SteadyPoint = {
    current_A,
    coilTemperature_C: t_C,
    temperatureRise_K: t_C - cooling.ambient_C,
    coilResistance_Ohm: r,
    coilVoltage_V: current_A * r,
    supplyVoltage_V: current_A * (supply.seriesResistance_Ohm + r),
    coilPower_W: current_A * current_A * r,
    partField_Apm: field.fieldAtPart_Apm(current_A),
  };
  if (coil.heatCapacity_JpK !== undefined && coil.heatCapacity_JpK > 0) {
    const denom = 1 - cooling.thermalResistance_KpW * dPdT;
    if (denom > 0) p.thermalTimeConstant_s = (coil.heatCapacity_JpK * cooling.thermalResistance_KpW) / denom;
  }
  return p;
}

function centralSlope(f: (t: number) => number, t: number): number {
  const h = 1e-3;
  return (f(t + h) - f(t - h)) / (2 * h);
}

/** Current giving `target` on an odd increasing field law: bracket by doubling, then Brent. */
export function currentForField(field: SteadyFieldLaw, target_Apm: number): number {
  if (field.currentForField_A) return field.currentForField_A(target_Apm);
  if (!(target_Apm > 0)) return NaN;
  const g = (i: number) => field.fieldAtPart_Apm(i) - target_Apm;
  let a = 0;
  let ga = g(0);
  let b = 1;
  let gb = g(b);
  for (let k = 0; k < 200 && gb < 0; k++) {
    a = b;
    ga = gb;
    b *= 2;
    gb = g(b);
  }
  if (gb < 0) return NaN;
  return brentZero(g, a, b, ga, gb, 1e-12 * b);
}

/**
 * The steady state of a coil held by a DC supply, and (optionally) what a target field needs.
 * Inputs are assumed checked (positive resistances, R_th > 0); numerical trouble becomes a warning.
 */
export function steadyCurrent(coil: SteadyCoil, supply: DcSupply, cooling: CoilCooling, field: SteadyFieldLaw, options: SteadyOptions = {}): SteadyCurrentResult {
  const warnings: Warning[] = [];
  const power = (t: number) => {
    const r = resistanceAt(coil, t);
    const i = supplyCurrent(supply, r);
    return i * i * r;
  };
  const rCold = resistanceAt(coil, cooling.ambient_C);
  const iCold = supplyCurrent(supply, rCold);
  const cold = pointAt(coil, supply, cooling, field, iCold, cooling.ambient_C, 0);
  delete cold.thermalTimeConstant_s;

  const t = settle(power, cooling);
  let mode: SteadyCurrentResult['mode'];
  let point: SteadyPoint | null = null;
  if (Number.isNaN(t)) {
    mode = 'runaway';
    warnings.push({
      code: 'steady.thermal-runaway',
      message: `No steady temperature below ${cooling.ambient_C + SCAN_SPAN_K} °C: at this supply setting the coil's heating outgrows its cooling (in constant-current mode when R_th·I²·R20·α20 ≥ 1). Lower the current or improve the cooling.`,
      severity: 'error',
    });
  } else {
    const r = resistanceAt(coil, t);
    const i = supplyCurrent(supply, r);
    mode = i >= supply.currentLimit_A ? 'current-limited' : 'voltage-limited';
    point = pointAt(coil, supply, cooling, field, i, t, centralSlope(power, t));
    if (options.maxTemperature_C !== undefined && t > options.maxTemperature_C) {
      warnings.push({
        code: 'steady.temperature-limit',
        message: `The coil settles at ${t.toFixed(1)} °C, above the allowed ${options.maxTemperature_C} °C.`,
        severity: 'error',
      });
    }
  }

  const result: SteadyCurrentResult = { mode, point, cold, warnings };
  if (options.targetField_Apm !== undefined) {
    const target = options.targetField_Apm;
    const iReq = currentForField(field, target);
    const limits: NonNullable<SteadyCurrentResult['target']>['limits'] = [];
    let tp: SteadyPoint | null = null;
    if (!Number.isFinite(iReq)) {
      warnings.push({ code: 'steady.target-unreachable', message: `No current gives ${target} A/m at the part with this fixture.`, severity: 'error' });
    } else {
      // Held at iReq (as if the supply were set to exactly that current).
      const held: DcSupply = { voltage_V: Infinity, currentLimit_A: iReq, seriesResistance_Ohm: supply.seriesResistance_Ohm };
      const heldPower = (tt: number) => iReq * iReq * resistanceAt(coil, tt);
      const tReq = settle(heldPower, cooling);
      if (iReq > supply.currentLimit_A * (1 + 1e-12)) limits.push('current-limit');
      if (Number.isNaN(tReq)) {
        limits.push('runaway');
      } else {
        tp = pointAt(coil, held, cooling, field, iReq, tReq, centralSlope(heldPower, tReq));
        if (tp.supplyVoltage_V > supply.voltage_V * (1 + 1e-12)) limits.push('voltage');
        if (options.maxTemperature_C !== undefined && tReq > options.maxTemperature_C) limits.push('temperature');
      }
      if (limits.length) {
        warnings.push({
          code: 'steady.target-unreachable',
          message: `The target field ${target} A/m needs ${iReq.toPrecision(4)} A held steady; blocked by: ${limits.join(', ')}.`,
          severity: 'warning',
        });
      }
    }
    result.target = { field_Apm: target, current_A: iReq, point: tp, reachable: Number.isFinite(iReq) && limits.length === 0, limits };
  }
  return result;
}

/** Command-line or API overrides of the design's `steady` section (SI; °C for temperatures). */
export interface HoldOverrides {
  voltage_V?: number;
  currentLimit_A?: number;
  seriesResistance_Ohm?: number;
  ambient_C?: number;
  thermalResistance_KpW?: number;
  targetField_Apm?: number;
  maxTemperature_C?: number;
}

/** Magnetic state of a yoke at a held current (for reports). */
export interface HoldYokeState {
  current_A: number;
  partFluxDensity_T: number;
  leakageFraction: number;
  /** Incremental inductance there, H (what the supply's current regulator sees). */
  incrementalInductance_H: number;
  /** Magnetic energy stored at that current, J (released into the circuit when it is switched off). */
  magneticEnergy_J: number;
  steel: YokeSteelState[];
}

/** Steady current of a design's fixture: inputs as understood, result, and (for a yoke) its magnetic state. */
export interface HoldReport {
  name: string;
  fixture: 'yoke' | 'coil';
  supply: DcSupply;
  cooling: CoilCooling;
  options: SteadyOptions;
  result: SteadyCurrentResult;
  /** Yoke state at the settled current (undefined for a coil without yoke or when the coil runs away). */
  yoke?: HoldYokeState;
  /** Yoke state at the current needed for the target field. */
  yokeAtTarget?: HoldYokeState;
}

function yokeState(op: YokeOperatingPoint): HoldYokeState {
  return {
    current_A: op.current_A,
    partFluxDensity_T: op.partFluxDensity_T,
    leakageFraction: op.leakageFraction,
    incrementalInductance_H: op.incrementalInductance_H,
    magneticEnergy_J: op.magneticEnergy_J,
    steel: op.steel,
  };
}

/**
 * The steady-current analysis of a parsed design: coil resistance and heat capacity from the
 * `coil` section, the field law from the `yoke` section (direct magnetic-circuit solves) or from
 * `coil.fieldPerAmpere`, supply and cooling from the `steady` section with `overrides` on top.
 * Throws InputError when the supply or the cooling is not given anywhere.
 */
export function holdDesign(design: Design, overrides: HoldOverrides = {}, file?: string): HoldReport {
  const base = design.steady ? steadyFromDesign(design.steady) : undefined;
  const supply: DcSupply = {
    voltage_V: overrides.voltage_V ?? base?.supply.voltage_V ?? Infinity,
    currentLimit_A: overrides.currentLimit_A ?? base?.supply.currentLimit_A ?? Infinity,
    seriesResistance_Ohm: overrides.seriesResistance_Ohm ?? base?.supply.seriesResistance_Ohm ?? 0,
  };
  const thermalResistance_KpW = overrides.thermalResistance_KpW ?? base?.cooling.thermalResistance_KpW;
  const issues: InputIssue[] = [];
  if (!Number.isFinite(supply.voltage_V) && !Number.isFinite(supply.currentLimit_A)) {
    issues.push({ code: 'design.missing-field', path: 'steady.supply', value: undefined, problem: 'missing: no supply voltage or current limit', expected: 'a steady section with supply: { voltage, currentLimit }, or --voltage and/or --current-limit' });
  }
  if (thermalResistance_KpW === undefined) {
    issues.push({ code: 'design.missing-field', path: 'steady.cooling', value: undefined, problem: 'missing: the cooling of the coil', expected: 'a steady section with cooling: { thermalResistance } (or heatTransferCoefficient and area), or --thermal-resistance' });
  }
  if (issues.length) throw new InputError(issues, file);
  const cooling: CoilCooling = { ambient_C: overrides.ambient_C ?? base?.cooling.ambient_C ?? DEFAULT_AMBIENT_C, thermalResistance_KpW: thermalResistance_KpW! };
  const options: SteadyOptions = { ...base?.options };
  if (overrides.targetField_Apm !== undefined) options.targetField_Apm = overrides.targetField_Apm;
  if (overrides.maxTemperature_C !== undefined) options.maxTemperature_C = overrides.maxTemperature_C;

  // a fixture section (design/sections/fixture-geometry.ts) gives what the coil section leaves out
  const geo = fixtureBuildOf(design)?.build;
  const th = hasThermalAmount(design.coil) ? resolveThermal(design.coil) : { tempCoeff_perK: geo?.coil.tempCoeff_perK ?? NaN, heatCapacity_JpK: geo?.coil.heatCapacity_JpK ?? NaN };
  const coil: SteadyCoil = { resistance20_Ohm: design.coil.resistance ?? geo?.coil.resistance20_Ohm ?? NaN, tempCoeff_perK: th.tempCoeff_perK, heatCapacity_JpK: th.heatCapacity_JpK };
  if (!Number.isFinite(coil.resistance20_Ohm) || !Number.isFinite(coil.heatCapacity_JpK)) {
    throw new InputError(
      { code: 'design.missing-field', path: Number.isFinite(coil.resistance20_Ohm) ? 'coil.mass' : 'coil.resistance', value: undefined, problem: 'missing', expected: 'the coil’s resistance and amount of conductor (mass, volume or heatCapacity), or a fixture section' },
      file,
    );
  }
  let field: SteadyFieldLaw;
  let spec: YokeSpec | undefined;
  if (design.yoke) {
    const s = yokeToSpec(design.yoke);
    spec = s;
    let warm: YokeOperatingPoint | undefined;
    field = {
      fieldAtPart_Apm: (i) => {
        warm = yokeOperatingPoint(s, i, warm);
        return warm.partField_Apm;
      },
      currentForField_A: (h) => yokeCurrentForPartField(s, h).current_A,
    };
  } else {
    const k = design.coil.fieldPerAmpere ?? geo?.probes[0]?.coil_ApmPerA ?? NaN;
    field = { fieldAtPart_Apm: (i) => k * i, currentForField_A: (h) => (h > 0 ? h / k : NaN) };
  }
  const result = steadyCurrent(coil, supply, cooling, field, options);
  const report: HoldReport = { name: design.name ?? 'unnamed design', fixture: spec ? 'yoke' : 'coil', supply, cooling, options, result };
  if (spec) {
    if (result.point) report.yoke = yokeState(yokeOperatingPoint(spec, result.point.current_A));
    if (result.target && Number.isFinite(result.target.current_A)) report.yokeAtTarget = yokeState(yokeOperatingPoint(spec, result.target.current_A));
  }
  return report;
}
