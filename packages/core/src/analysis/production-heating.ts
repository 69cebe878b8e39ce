/**
 * Winding temperature at production rate: repeated adiabatic shots with first-order cooling
 * between them.
 *
 * MODEL. One shot heats the winding adiabatically by ΔT (the pulse is far shorter than any
 * cooling time; the engine's `coilTemperatureRise_K`). Between shots the winding, a single
 * lumped heat capacity C_th, cools to the ambient by Newton's law with time constant
 * τ = C_th/(h·A) (h: convection coefficient, W/(m²·K); A: cooling surface, m²) or a τ the user
 * measured. With a cycle time t_c = 60 s / (shots per minute) and r = e^(−t_c/τ):
 *
 *   excess after shot n:   x_n = ΔT + r·x_(n−1),   x_1 = ΔT
 *   so                     x_n = ΔT·(1 − rⁿ)/(1 − r)
 *   steady state:          T_peak,ss = T_amb + ΔT/(1 − e^(−t_cycle/τ))          (geometric series)
 *
 * RESISTANCE RISE (accounted for when α20 is known). The per-shot rise depends on the starting
 * temperature through R(T) = R20·(1 + α20·(T − 20)). With the same current waveform and
 * constant heat capacity, C·dT/dt = i²·R(T) integrates to (the adiabatic form behind IEC 60949)
 *   (β + T_f)/(β + T_i) = k,   β = 1/α20 − 20 °C,   k = exp(α20·R20·∫i²dt / C)
 * so ΔT(T_i) = (k − 1)·(β + T_i): k is read from the engine's shot (start T_0, rise ΔT_0):
 * k = (β + T_0 + ΔT_0)/(β + T_0). The cycle map T_start → T_amb + r·(k·(T_start + β) − β − T_amb)
 * has the fixed point
 *   T_start,ss = [T_amb·(1 − r) + r·β·(k − 1)]/(1 − r·k),   T_peak,ss = k·(T_start,ss + β) − β,
 * which exists when r·k < 1; otherwise the temperature runs away (no steady state). As k → 1
 * it reduces to the geometric-series form above. Holding the current waveform fixed while R
 * rises overstates the heat slightly (a hotter coil draws a little less current), so this is on
 * the safe side.
 *
 * HIGHEST RATE for a limit T_lim (insulation class minus the user's margin): the steady peak
 * equals T_lim when r* = (T_start,max − T_amb)/(T_lim − T_amb), T_start,max = (T_lim + β)/k − β
 * (linear model: T_lim − ΔT); t_c = −τ·ln(r*), rate = 60/t_c per minute. If one shot from the
 * ambient already exceeds T_lim, the rate is 0.
 *
 * ASSUMPTIONS: uniform winding temperature (no hot spot), heat capacity of the conductor only
 * (a potted winding's extra mass cools more slowly but also heats less; both ignored),
 * cooling to a fixed ambient, the pulse itself negligible in the cycle time.
 */

export interface ProductionHeatingInput {
  /** Adiabatic rise of one shot from shotStart_C, K (engine: figures.coilTemperatureRise_K). */
  shotRise_K: number;
  /** Winding temperature at the start of the simulated shot, °C (station.coil.initialTemperature_C). */
  shotStart_C: number;
  /** α20, 1/K; 0 ignores the resistance rise (per-shot rise independent of the start temperature). */
  tempCoeff_perK: number;
  /** Ambient (cooling medium) temperature, °C. */
  ambient_C: number;
  /** Thermal time constant of the winding, s. */
  timeConstant_s: number;
}

/** τ = C_th/(h·A), s. NaN unless all inputs are positive. */
export function thermalTimeConstant(heatCapacity_JpK: number, convection_WpM2K: number, area_m2: number): number {
  if (!(heatCapacity_JpK > 0) || !(convection_WpM2K > 0) || !(area_m2 > 0)) return Number.NaN;
  return heatCapacity_JpK / (convection_WpM2K * area_m2);
}

/** β = 1/α20 − 20 °C (the temperature where the linear resistance law reaches zero, negated). */
function beta(alpha: number): number {
  return 1 / alpha - 20;
}

/** True when the resistance rise is modelled (α20 > 0). */
function usesResistanceRise(input: ProductionHeatingInput): boolean {
  return input.tempCoeff_perK > 0;
}

/** Per-shot rise ratio k = (β + T_0 + ΔT_0)/(β + T_0); 1 + ... only meaningful when α20 > 0. */
function riseRatio(input: ProductionHeatingInput): number {
  const b = beta(input.tempCoeff_perK);
  return (b + input.shotStart_C + input.shotRise_K) / (b + input.shotStart_C);
}

/** Adiabatic rise of one shot that starts at start_C, K. */
export function shotRiseFrom(input: ProductionHeatingInput, start_C: number): number {
  if (!usesResistanceRise(input)) return input.shotRise_K;
  return (riseRatio(input) - 1) * (beta(input.tempCoeff_perK) + start_C);
}

function cooling(input: ProductionHeatingInput, shotsPerMinute: number): number {
  if (!(shotsPerMinute > 0)) return 0;
  return Math.exp(-(60 / shotsPerMinute) / input.timeConstant_s);
}

/**
 * Peak temperature after each of the first n shots, starting from the ambient, °C (the direct
 * recursion; the steady state below is its limit).
 */
export function peakTemperatures(input: ProductionHeatingInput, shotsPerMinute: number, n: number): number[] {
  const r = cooling(input, shotsPerMinute);
  const peaks: number[] = [];
  let start = input.ambient_C;
  for (let i = 0; i < n; i++) {
    const peak = start + shotRiseFrom(input, start);
    peaks.push(peak);
    start = input.ambient_C + (peak - input.ambient_C) * r;
  }
  return peaks;
}

export interface SteadyState {
  /** Steady-state peak temperature (just after a shot), °C; Infinity on runaway. */
  peak_C: number;
  /** Steady-state temperature just before a shot, °C; Infinity on runaway. */
  start_C: number;
  /** Per-shot rise at the steady state, K. */
  rise_K: number;
  /** True when no steady state exists (r·k ≥ 1 with the resistance rise). */
  runaway: boolean;
}

/** Steady-state temperatures at a given rate (closed forms in the header). */
export function steadyState(input: ProductionHeatingInput, shotsPerMinute: number): SteadyState {
  const r = cooling(input, shotsPerMinute);
  const Ta = input.ambient_C;
  if (!usesResistanceRise(input)) {
    const peak = Ta + input.shotRise_K / (1 - r);
    return { peak_C: peak, start_C: peak - input.shotRise_K, rise_K: input.shotRise_K, runaway: false };
  }
  const k = riseRatio(input);
  const b = beta(input.tempCoeff_perK);
  if (r * k >= 1) return { peak_C: Infinity, start_C: Infinity, rise_K: Infinity, runaway: true };
  const start = (Ta * (1 - r) + r * b * (k - 1)) / (1 - r * k);
  const peak = k * (start + b) - b;
  return { peak_C: peak, start_C: start, rise_K: peak - start, runaway: false };
}

/**
 * Highest rate, shots per minute, whose steady-state peak stays at or below limit_C.
 * 0 when one shot from the ambient already exceeds it; Infinity when a shot heats nothing.
 */
export function maxShotsPerMinute(input: ProductionHeatingInput, limit_C: number): number {
  const Ta = input.ambient_C;
  if (!(limit_C > Ta)) return 0;
  if (!(input.shotRise_K > 0)) return Infinity;
  let startMax: number;
  if (usesResistanceRise(input)) {
    const b = beta(input.tempCoeff_perK);
    startMax = (limit_C + b) / riseRatio(input) - b;
  } else {
    startMax = limit_C - input.shotRise_K;
  }
  if (startMax < Ta) return 0;
  const rStar = (startMax - Ta) / (limit_C - Ta);
  if (rStar <= 0) return 0;
  const tCycle = -input.timeConstant_s * Math.log(rStar);
  return 60 / tCycle;
}
