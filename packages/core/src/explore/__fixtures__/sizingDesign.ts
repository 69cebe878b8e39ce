/**
 * Test fixture for sizing: the small test station with a part and ratings that limit the bank
 * from both sides (invented values, never an oracle): the capacitor's rated voltage rules out
 * small capacitances, the thyristor's I²t rating large ones.
 */
import { parseDesign } from '../../design/parse.js';
import type { Design } from '../../design/schema.js';
import { FIXTURE_YAML } from './design.js';

export function sizingDesign(extra = ''): Design {
  return parseDesign(
    `${FIXTURE_YAML}
part: { grade: ndfeb-sh, requiredField: 2.2 MA/m, fieldMargin: 10 % }
ratings:
  margin: 20 %
  capacitor: { voltage: 1.1 kV }
  switch: { i2t: 80 kA^2 s }
${extra}`,
    'sizing.yaml',
  );
}
