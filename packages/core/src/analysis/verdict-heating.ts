/**
 * Verdict items about the winding's temperature: one shot, and at production rate
 * (analysis/production-heating.ts), against its IEC 60085 insulation class.
 *
 *   coil.temperature             final temperature of the simulated shot vs the class
 *   coil.temperature.production  steady-state peak at the user's rate vs the class
 *   production.max-rate          (info) highest rate keeping the steady peak ≤ class − margin
 *   production.time-constant     (info) τ given, or C_th/(h·A)
 * margin = (T_class − T)/(T_class − T_start); warn within the user's margin (K), fail above the class.
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { VerdictItem } from '../model/verdict.js';
import { InputError } from '../design/errors.js';
import { insulationClass, insulationClassLabel, insulationClassNames, type InsulationClass } from '../materials/insulation-classes.js';
import { maxShotsPerMinute, steadyState, thermalTimeConstant, type ProductionHeatingInput } from './production-heating.js';
import { VERDICT_DEFAULTS, type ProductionJudgeInput } from '../model/judge-inputs.js';
import { infoItem, judgedItem, marginTemperature } from './verdict-item.js';

export function resolveInsulationClass(key: number | string): InsulationClass {
  const c = insulationClass(key);
  if (!c) {
    throw new InputError({
      code: 'design.not-one-of',
      path: 'production.insulationClass',
      value: key,
      problem: `${JSON.stringify(key)} is not an IEC 60085 thermal class`,
      expected: `one of ${insulationClassNames().join(', ')}`,
    });
  }
  return c;
}

/** τ from the input (given, or C_th/(h·A)) and a phrase saying where it came from. */
export function productionTimeConstant(station: Station, p: ProductionJudgeInput): { tau_s: number; basis: string } {
  if (p.thermalTimeConstant_s !== undefined) return { tau_s: p.thermalTimeConstant_s, basis: 'τ given (user setting)' };
  const C = station.coil.heatCapacity_JpK;
  if (p.surfaceArea_m2 !== undefined && p.convection_WpM2K !== undefined) {
    const tau = thermalTimeConstant(C, p.convection_WpM2K, p.surfaceArea_m2);
    return { tau_s: tau, basis: `τ = C_th/(h·A) = ${C.toPrecision(3)} J/K / (${p.convection_WpM2K} W/(m²·K) × ${p.surfaceArea_m2.toPrecision(3)} m²)` };
  }
  return { tau_s: Number.NaN, basis: 'no thermal time constant: give production.thermalTimeConstant, or surfaceArea and convection' };
}

export function judgeHeating(station: Station, result: ShotResult, p: ProductionJudgeInput): VerdictItem[] {
  const items: VerdictItem[] = [];
  const margin_K = p.margin_K ?? VERDICT_DEFAULTS.temperatureMargin_K;
  const ambient = p.ambient_C ?? VERDICT_DEFAULTS.ambient_C;
  const cls = p.insulationClass !== undefined ? resolveInsulationClass(p.insulationClass) : undefined;
  const classNote = cls ? `limit: insulation class ${insulationClassLabel(cls)}, IEC 60085; ${margin_K} K headroom wanted` : '';

  if (cls) {
    const start = station.coil.initialTemperature_C;
    const T = result.figures.coilFinalTemperature_C;
    const lim = cls.temperature_C;
    items.push(
      judgedItem(
        {
          id: 'coil.temperature',
          item: 'Coil temperature after one shot',
          value: T,
          limit: lim,
          unit: '°C',
          margin: marginTemperature(T, lim, start),
          note: `adiabatic, from ${start} °C; ${classNote}. If high: more copper, a shorter pulse or a lower voltage.`,
        },
        lim > start ? margin_K / (lim - start) : 0,
      ),
    );
  }

  if (p.shotsPerMinute === undefined) return items;
  const { tau_s, basis } = productionTimeConstant(station, p);
  items.push(infoItem('production.time-constant', 'Winding thermal time constant', tau_s, 's', basis));
  const useRise = p.resistanceRise ?? VERDICT_DEFAULTS.resistanceRise;
  const input: ProductionHeatingInput = {
    shotRise_K: result.figures.coilTemperatureRise_K,
    shotStart_C: station.coil.initialTemperature_C,
    tempCoeff_perK: useRise ? station.coil.tempCoeff_perK : 0,
    ambient_C: ambient,
    timeConstant_s: tau_s,
  };
  const rNote = useRise ? 'R(T) rise included' : 'R(T) rise ignored';
  const ss = Number.isFinite(tau_s) ? steadyState(input, p.shotsPerMinute) : undefined;
  const peak = ss ? ss.peak_C : Number.NaN;

  if (cls) {
    const lim = cls.temperature_C;
    const base = {
      id: 'coil.temperature.production',
      item: `Coil peak temperature at ${p.shotsPerMinute}/min`,
      limit: lim,
      unit: '°C',
    };
    if (ss?.runaway) {
      items.push({
        ...base,
        value: Infinity,
        margin: -Infinity,
        status: 'fail',
        note: `no steady state: each shot heats more than the pause cools (${rNote}); ${classNote}. Lower the rate or improve cooling.`,
      });
    } else {
      items.push(
        judgedItem(
          {
            ...base,
            value: peak,
            margin: marginTemperature(peak, lim, ambient),
            note: `steady state T_amb + ΔT/(1 − e^(−t_cycle/τ)), ambient ${ambient} °C, ${rNote}; ${classNote}. If high: lower the rate or improve cooling.`,
          },
          lim > ambient ? margin_K / (lim - ambient) : 0,
        ),
      );
    }
    const maxRate = Number.isFinite(tau_s) ? maxShotsPerMinute(input, lim - margin_K) : Number.NaN;
    items.push(
      infoItem(
        'production.max-rate',
        'Highest rate within the class (shots per minute)',
        maxRate,
        '1/min',
        `shots per minute keeping the steady peak at or below ${lim - margin_K} °C (class ${insulationClassLabel(cls)} minus ${margin_K} K), ${rNote}.`,
      ),
    );
  } else {
    items.push(
      infoItem(
        'coil.temperature.production',
        `Coil peak temperature at ${p.shotsPerMinute}/min`,
        ss?.runaway ? Infinity : peak,
        '°C',
        ss?.runaway
          ? `no steady state: each shot heats more than the pause cools (${rNote}); no insulation class given.`
          : `steady state, ambient ${ambient} °C, ${rNote}; not judged: no insulation class given.`,
      ),
    );
  }
  return items;
}
