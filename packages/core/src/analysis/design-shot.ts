/**
 * One shot of a design file as the CLI runs it, for library users too: the station from the
 * design, the engine's shot (simulateShot), the warnings that depend on how the station was
 * built, and the verdict from the design's check sections (part, ratings, production, bleeder).
 *
 * Station warnings: the engine integrates whatever NonlinearCoil it is given and knows nothing
 * of how that coil was tabulated. A yoke fixture's λ(i) table (magnetics/yoke-coil.ts) may have
 * missed its tolerance or been exceeded by the shot's peak current; yokeCoilWarnings says so,
 * and `withStationWarnings` appends those warnings to the shot's (codes already present are
 * not repeated). Call it after simulateShot when you build stations yourself.
 *
 * Penetration: with coupled loops, penetrationFigures (analysis/penetration.ts) gives the
 * equivalent frequency, skin depths, diffusion times and the centre/surface field ratio; its
 * `part.not-penetrated` warning joins the shot's warnings.
 */
import type { Design } from '../design/schema.js';
import { designToStation } from '../design/to-station.js';
import { yokeCoilWarnings } from '../magnetics/yoke-coil.js';
import type { ShotResult } from '../model/result.js';
import type { Station } from '../model/station.js';
import type { Verdict } from '../model/verdict.js';
import { simulateShot, type SimulateOptions } from '../solve/shot.js';
import { judgeInputsFromDesign } from './verdict-design.js';
import { judgeShot } from './verdict.js';
import { fixtureBuildOf } from '../design/sections/fixture-geometry.js';
import { penetrationFigures, type PenetrationFigures } from './penetration.js';

/** The shot with the warnings that come from how its station was built (a yoke coil's table). */
export function withStationWarnings(station: Station, result: ShotResult): ShotResult {
  const extra = yokeCoilWarnings(station.coil.nonlinear, result.figures.peakCurrent_A).filter(
    (w) => !result.warnings.some((r) => r.code === w.code),
  );
  return extra.length ? { ...result, warnings: [...result.warnings, ...extra] } : result;
}

/**
 * Eddy currents: how far the field got into the part (bodies known when the fixture is given by
 * geometry). With coupled loops, the penetration figures and the shot with their warning
 * (`part.not-penetrated`) added once; without, the shot unchanged. Works on a shot without
 * waveform samples too (the peak ratio needs only the probes' peaks).
 */
export function withPenetration(design: Design, station: Station, result: ShotResult): { result: ShotResult; penetration?: PenetrationFigures } {
  if (station.coupled.length === 0) return { result };
  const penetration = penetrationFigures(station, fixtureBuildOf(design)?.build.info, result);
  const extra = penetration.warnings.filter((w) => !result.warnings.some((r) => r.code === w.code));
  return { result: extra.length ? { ...result, warnings: [...result.warnings, ...extra] } : result, penetration };
}

export interface DesignShot {
  station: Station;
  /** The engine's shot plus the station warnings (see withStationWarnings). */
  result: ShotResult;
  /** Verdict from the design's check sections (winding forces are judged even without them). */
  verdict: Verdict;
  /** Penetration figures (analysis/penetration.ts) when the station has coupled loops; their warning is in `result`. */
  penetration?: PenetrationFigures;
}

/**
 * Simulate one discharge of a parsed design and judge it.
 * @param name shown as the station's file name in errors (e.g. the design path).
 */
export function simulateDesign(design: Design, name?: string, options: SimulateOptions = {}): DesignShot {
  const station = designToStation(design, name);
  const { result, penetration } = withPenetration(design, station, withStationWarnings(station, simulateShot(station, options)));
  const shot: DesignShot = { station, result, verdict: judgeShot(station, judgeInputsFromDesign(design), result) };
  if (penetration) shot.penetration = penetration;
  return shot;
}
