/**
 * Thermal fields shared by the coil and the coupled loops: conductor material, how much of it
 * (mass, volume or heat capacity directly), and the temperature at firing.
 *
 * Heat capacity C_th = m·c_p, or V·ρ_m·c_p (adiabatic heating m·c_p·dT/dt = i²R(T), DOMAIN.md);
 * c_p, density and α20 default to the conductor's values (materials/conductors.ts, with sources).
 */
import type { z } from 'zod';
import { conductor, CONDUCTOR_NAMES, type ConductorName } from '../../materials/conductors.js';
import { choice, qty, type IssueFacts } from '../quantity-schema.js';

/** Shape of the thermal fields; `conductorDefault` is the conductor when the field is omitted. */
export function thermalFields(conductorDefault: ConductorName | undefined) {
  const cond = choice(CONDUCTOR_NAMES, 'Conductor material; gives the defaults of specificHeat, tempCoeff and the density used with volume');
  return {
    conductor: conductorDefault ? cond.default(conductorDefault) : cond.optional(),
    mass: qty('mass', { positive: true, description: 'Conductor mass (give one of mass, volume, heatCapacity)' }).optional(),
    volume: qty('volume', { positive: true, description: 'Conductor volume (give one of mass, volume, heatCapacity)' }).optional(),
    heatCapacity: qty('heatCapacity', { positive: true, description: 'Heat capacity of the conductor (give one of mass, volume, heatCapacity)' }).optional(),
    specificHeat: qty('specificHeat', { positive: true, description: "Specific heat; default: the conductor's" }).optional(),
    tempCoeff: qty('tempCoeff', { description: "Temperature coefficient of resistance at 20 °C; default: the conductor's (0 when no conductor is named)" }).optional(),
    initialTemperature: qty('temperature', { min: -273.15, description: 'Conductor temperature at the moment of firing' }).default(20),
  };
}

export interface ThermalDesign {
  conductor?: ConductorName | undefined;
  mass?: number | undefined;
  volume?: number | undefined;
  heatCapacity?: number | undefined;
  specificHeat?: number | undefined;
  tempCoeff?: number | undefined;
  initialTemperature: number;
}

const AMOUNT = ['mass', 'volume', 'heatCapacity'] as const;

/** superRefine body: exactly one of mass/volume/heatCapacity, and what each needs. */
export function checkThermal(v: ThermalDesign, ctx: z.RefinementCtx): void {
  const add = (path: string, facts: IssueFacts) =>
    ctx.addIssue({ code: 'custom', path: [path], message: `${facts.problem}; expected ${facts.expected}`, params: { fluxkick: facts } });
  const given = AMOUNT.filter((k) => v[k] !== undefined);
  if (given.length === 0) {
    add('mass', {
      code: 'design.missing-field',
      problem: 'missing: the heating model needs the amount of conductor',
      expected: 'one of mass (e.g. 2.1 kg), volume (e.g. 240 cm^3) or heatCapacity (e.g. 810 J/K)',
    });
    return;
  }
  if (given.length > 1) {
    add(given[1]!, {
      code: 'design.inconsistent',
      problem: `both ${given.join(' and ')} are given`,
      expected: 'only one of mass, volume or heatCapacity',
    });
    return;
  }
  if (v.mass !== undefined && v.conductor === undefined && v.specificHeat === undefined) {
    add('specificHeat', { code: 'design.missing-field', problem: 'missing: mass needs a specific heat', expected: 'a specificHeat (e.g. 440 J/(kg K)) or a conductor (copper, aluminium)' });
  }
  if (v.volume !== undefined && v.conductor === undefined) {
    add('conductor', { code: 'design.missing-field', problem: 'missing: volume needs a conductor density', expected: 'conductor: copper or aluminium (or give mass or heatCapacity instead)' });
  }
}

/**
 * checkThermal for a coil whose amount of conductor may come from a `fixture` section: no issue
 * when none of mass/volume/heatCapacity is given (to-station.ts then requires them unless the
 * fixture geometry gives them); otherwise the same checks.
 */
export function checkThermalAmountOptional(v: ThermalDesign, ctx: z.RefinementCtx): void {
  if (AMOUNT.every((k) => v[k] === undefined)) return;
  checkThermal(v, ctx);
}

/** Whether any of mass/volume/heatCapacity is given. */
export function hasThermalAmount(v: ThermalDesign): boolean {
  return AMOUNT.some((k) => v[k] !== undefined);
}

/** Heat capacity (J/K), α20 (1/K) and mass (kg, when known) from checked thermal fields. */
export function resolveThermal(v: ThermalDesign): { heatCapacity_JpK: number; tempCoeff_perK: number; mass_kg?: number } {
  const m = v.conductor ? conductor(v.conductor) : undefined;
  const cp = v.specificHeat ?? m?.specificHeat_JpkgK;
  const tempCoeff_perK = v.tempCoeff ?? m?.tempCoeff20_perK ?? 0;
  let mass_kg = v.mass;
  if (mass_kg === undefined && v.volume !== undefined && m) mass_kg = v.volume * m.density_kgpm3;
  const heatCapacity_JpK = v.heatCapacity ?? (mass_kg !== undefined && cp !== undefined ? mass_kg * cp : NaN);
  if (!(heatCapacity_JpK > 0)) throw new Error('resolveThermal: fields were not checked (checkThermal)');
  return mass_kg === undefined ? { heatCapacity_JpK, tempCoeff_perK } : { heatCapacity_JpK, tempCoeff_perK, mass_kg };
}
