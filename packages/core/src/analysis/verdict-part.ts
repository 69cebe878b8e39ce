/**
 * Verdict items about the part: peak field against the required field, the estimated fraction
 * of saturation, the field in multiples of H_cJ, and the part's eddy heating against its
 * maximum working temperature.
 *
 * Field: the worst (lowest) peak over probe 0 and every probe whose name starts with "part"
 * (e.g. "part centre", "part surface", "part minimum"). Required field: the user's, else the
 * grade's saturation field. margin = H/H_req − 1, warn below the user's margin, fail below 0.
 * Heating: the hottest coupled loop whose name starts with the part prefix, against the grade's
 * maximum working temperature; margin = (T_max − T)/(T_max − T_start).
 */
import { closest } from 'fastest-levenshtein';
import type { ShotResult } from '../model/result.js';
import type { VerdictItem } from '../model/verdict.js';
import { InputError } from '../design/errors.js';
import { MAGNET_GRADE_IDS, applyMagnetOverrides, magnetGrade, type MagnetGrade } from '../materials/magnet-grades.js';
import { SWITCHING_SPREAD, saturationFraction, saturationModelNote } from './saturation.js';
import { VERDICT_DEFAULTS, type PartJudgeInput } from '../model/judge-inputs.js';
import { infoItem, judgedItem, marginAtLeast, marginTemperature } from './verdict-item.js';

/** The library grade with the overrides applied; an unknown id is an InputError at `part.grade`. */
export function resolvePartGrade(part: PartJudgeInput): MagnetGrade {
  const g = magnetGrade(part.grade);
  if (!g) {
    throw new InputError({
      code: 'design.not-one-of',
      path: 'part.grade',
      value: part.grade,
      problem: `${JSON.stringify(part.grade)} is not a grade in the library`,
      expected: `one of ${MAGNET_GRADE_IDS.join(', ')}`,
      suggestion: closest(part.grade.toLowerCase(), [...MAGNET_GRADE_IDS]),
    });
  }
  return applyMagnetOverrides(g, part.overrides);
}

/** The part's probes: probe 0 and those named "part…"; returns the one with the lowest peak. */
export function worstPartProbe(result: ShotResult): { name: string; peakField_Apm: number; names: string[] } | undefined {
  const probes = result.probes.filter((p, i) => i === 0 || /^part/i.test(p.name.trim()));
  if (probes.length === 0) return undefined;
  let worst = probes[0];
  for (const p of probes) if (Math.abs(p.peakField_Apm) < Math.abs(worst.peakField_Apm) || Number.isNaN(p.peakField_Apm)) worst = p;
  return { name: worst.name, peakField_Apm: Math.abs(worst.peakField_Apm), names: probes.map((p) => p.name) };
}

const fmtMA = (h: number) => `${(h / 1e6).toPrecision(3)} MA/m`;
const pct = (m: number) => `${Number((m * 100).toPrecision(3))} %`;

export function judgePart(result: ShotResult, part: PartJudgeInput): VerdictItem[] {
  const grade = resolvePartGrade(part);
  const items: VerdictItem[] = [];
  const fieldMargin = part.fieldMargin ?? VERDICT_DEFAULTS.fieldMargin;

  const probe = worstPartProbe(result);
  const field = probe ? probe.peakField_Apm : result.figures.peakField_Apm;
  const where = probe && probe.names.length > 1 ? `worst of ${probe.names.join(', ')}: ${probe.name}` : 'at the part';
  const required = part.requiredField_Apm ?? grade.saturationField_Apm.value;
  const requiredBasis =
    part.requiredField_Apm !== undefined
      ? 'required field: user setting'
      : `required field: saturation field of ${grade.id}, ${grade.saturationField_Apm.source}`;
  items.push(
    judgedItem(
      {
        id: 'field.part',
        item: 'Peak field at the part',
        value: field,
        limit: required,
        unit: 'A/m',
        margin: marginAtLeast(field, required),
        note: `${where}; ${requiredBasis}; ${pct(fieldMargin)} headroom wanted. If short: raise the charge voltage or the field per ampere.`,
      },
      fieldMargin,
    ),
  );

  const sigma = part.switchingSpread ?? SWITCHING_SPREAD[grade.mechanism];
  const frac = saturationFraction(field, grade.saturationField_Apm.value, sigma);
  items.push(infoItem('part.saturation', 'Saturation reached (estimate)', frac * 100, '%', saturationModelNote(sigma)));

  const hcj = grade.intrinsicCoercivity_Apm.value;
  items.push(
    infoItem(
      'part.field-over-hcj',
      'Peak field / H_cJ',
      field / hcj,
      '',
      `H_cJ = ${fmtMA(hcj)} (${grade.intrinsicCoercivity_Apm.source}); common practice asks 2 to 3 × H_cJ, more for rare-earth grades (DOMAIN.md).`,
    ),
  );

  const prefix = (part.loopPrefix ?? VERDICT_DEFAULTS.partLoopPrefix).toLowerCase();
  const partLoops = result.loops.filter((l) => l.name.trim().toLowerCase().startsWith(prefix));
  const tLimit = grade.maxWorkingTemperature_C.value;
  if (partLoops.length === 0) {
    items.push(
      infoItem(
        'part.temperature',
        'Part temperature (eddy heating)',
        Number.NaN,
        '°C',
        `Not judged: no coupled loop named "${prefix}…" (model the part's conductive shells to see its eddy heating).`,
        tLimit,
      ),
    );
  } else {
    let hot = partLoops[0];
    for (const l of partLoops) if (l.finalTemperature_C > hot.finalTemperature_C || Number.isNaN(l.finalTemperature_C)) hot = l;
    const start = hot.finalTemperature_C - hot.temperatureRise_K;
    const margin_K = part.temperatureMargin_K ?? VERDICT_DEFAULTS.temperatureMargin_K;
    const requiredMargin = tLimit > start ? margin_K / (tLimit - start) : 0;
    items.push(
      judgedItem(
        {
          id: 'part.temperature',
          item: 'Part temperature (eddy heating)',
          value: hot.finalTemperature_C,
          limit: tLimit,
          unit: '°C',
          margin: marginTemperature(hot.finalTemperature_C, tLimit, start),
          note: `hottest part loop: ${hot.name}; limit: maximum working temperature of ${grade.id}, ${grade.maxWorkingTemperature_C.source}; ${margin_K} K headroom wanted. If high: a shorter pulse or a lower-loss part.`,
        },
        requiredMargin,
      ),
    );
  }
  return items;
}
