/**
 * From a parsed design file to the verdict's inputs: the `part`, `ratings`, `production` and
 * `bleeder` sections (design/sections/*.ts) converted to plain SI JudgeInputs. A section left
 * out of the design gives no inputs, so its checks are not made.
 *
 * @example
 * const design = loadDesign('station.yaml');
 * const station = designToStation(design);
 * const verdict = judgeShot(station, judgeInputsFromDesign(design), simulateShot(station));
 */
import type { Design } from '../design/schema.js';
import type { JudgeInputs } from '../model/judge-inputs.js';
import { partToJudge } from '../design/sections/part.js';
import { ratingsToJudge } from '../design/sections/ratings.js';
import { productionToJudge } from '../design/sections/production.js';
import { bleederToJudge } from '../design/sections/bleeder.js';

export function judgeInputsFromDesign(design: Design): JudgeInputs {
  const out: JudgeInputs = {};
  if (design.part) out.part = partToJudge(design.part);
  if (design.ratings) out.ratings = ratingsToJudge(design.ratings);
  if (design.production) out.production = productionToJudge(design.production);
  if (design.bleeder) out.bleeder = bleederToJudge(design.bleeder);
  return out;
}
