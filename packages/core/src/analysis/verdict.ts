/**
 * The engineering verdict on one shot: judgeShot(station, inputs, result) -> Verdict.
 *
 * Each group of checks runs only when its inputs are given (a design without a `ratings`
 * section gets no rating items); the magnetic pressure on the winding is always reported.
 * Item grading (analysis/verdict-item.ts): fail beyond the hard limit, warn inside it but short
 * of the user's margin, pass otherwise, info for figures that are not judged. Overall: the
 * worst judged status.
 *
 * Groups: part (verdict-part.ts), winding temperature and production rate (verdict-heating.ts),
 * winding mechanics (verdict-winding.ts), device and capacitor ratings (verdict-ratings.ts),
 * bleeder (verdict-bleeder.ts).
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { Verdict, VerdictItem } from '../model/verdict.js';
import type { JudgeInputs } from '../model/judge-inputs.js';
import { overallStatus } from './verdict-item.js';
import { judgePart } from './verdict-part.js';
import { judgeHeating } from './verdict-heating.js';
import { judgeWinding } from './verdict-winding.js';
import { judgeRatings } from './verdict-ratings.js';
import { judgeBleeder } from './verdict-bleeder.js';

/** Judge one simulated shot. Throws InputError only for an unknown grade or insulation class. */
export function judgeShot(station: Station, inputs: JudgeInputs, result: ShotResult): Verdict {
  const items: VerdictItem[] = [];
  if (inputs.part) items.push(...judgePart(result, inputs.part));
  if (inputs.production) items.push(...judgeHeating(station, result, inputs.production));
  items.push(...judgeWinding(station, result, inputs.ratings?.winding));
  if (inputs.ratings) items.push(...judgeRatings(station, result, inputs.ratings));
  if (inputs.bleeder) items.push(...judgeBleeder(station, inputs.bleeder));
  return { items, overall: overallStatus(items) };
}
