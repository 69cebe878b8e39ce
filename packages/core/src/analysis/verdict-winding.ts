/**
 * Verdict items about the winding's mechanics (analysis/forces.ts):
 *   winding.pressure     (info) p = B²/(2µ0) at the field the winding sees
 *   winding.hoop-stress  thin-shell estimate vs the conductor's proof stress,
 *                        required margin 1 − 1/SF (warn inside the proof stress but short of
 *                        the safety factor, fail beyond the proof stress)
 * The field at the winding defaults to the largest of: every probe's peak, the figures' peak
 * field, and (air-core coils) probe 0's coil-only field at the peak current, so that eddy
 * shielding of the part never lowers the winding's load.
 */
import type { Station } from '../model/station.js';
import type { ShotResult } from '../model/result.js';
import type { VerdictItem } from '../model/verdict.js';
import { MU0_HpM } from '../magnetics/constants.js';
import { conductorProofStress } from '../materials/conductor-strength.js';
import { HOOP_STRESS_MODEL_NOTE, magneticPressure_Pa, windingHoopStress_Pa } from './forces.js';
import { VERDICT_DEFAULTS, type WindingMechanicsInput } from '../model/judge-inputs.js';
import { infoItem, judgedItem, marginAtMost } from './verdict-item.js';

/** Largest peak field that bears on the winding, A/m, and where it came from. */
export function windingField(station: Station, result: ShotResult): { field_Apm: number; basis: string } {
  let best = Math.abs(result.figures.peakField_Apm);
  let basis = 'peak field at the part';
  for (const p of result.probes) {
    if (Math.abs(p.peakField_Apm) > best) {
      best = Math.abs(p.peakField_Apm);
      basis = `peak field at probe "${p.name}"`;
    }
  }
  const p0 = station.probes[0];
  if (!station.coil.nonlinear && p0) {
    const coilOnly = Math.abs(p0.coil_ApmPerA * result.figures.peakCurrent_A);
    if (coilOnly > best) {
      best = coilOnly;
      basis = 'coil-only field at the peak current (eddy shielding ignored)';
    }
  }
  return { field_Apm: best, basis };
}

export function judgeWinding(station: Station, result: ShotResult, w: WindingMechanicsInput | undefined): VerdictItem[] {
  const items: VerdictItem[] = [];
  const given = w?.windingField_Apm;
  const { field_Apm, basis } = given !== undefined ? { field_Apm: given, basis: 'winding field: user setting' } : windingField(station, result);
  const B = MU0_HpM * field_Apm;
  const p = magneticPressure_Pa(B);
  items.push(infoItem('winding.pressure', 'Magnetic pressure on the winding', p, 'Pa', `p = B²/(2µ0) at B = ${B.toPrecision(3)} T (${basis}).`));

  if (w?.windingRadius_m === undefined || w.windingThickness_m === undefined) return items;
  const temper = w.temper ?? VERDICT_DEFAULTS.temper;
  const lib = conductorProofStress(station.coil.conductor, temper);
  const proof = w.proofStress_Pa ?? lib.value_Pa;
  const proofBasis = w.proofStress_Pa !== undefined ? 'user setting' : `${station.coil.conductor ?? 'copper'}, ${temper}: ${lib.source}`;
  const sf = w.safetyFactor ?? VERDICT_DEFAULTS.safetyFactor;
  const sigma = windingHoopStress_Pa(B, w.windingRadius_m, w.windingThickness_m);
  items.push(
    judgedItem(
      {
        id: 'winding.hoop-stress',
        item: 'Hoop stress in the winding (estimate)',
        value: sigma,
        limit: proof,
        unit: 'Pa',
        margin: marginAtMost(sigma, proof),
        note: `${HOOP_STRESS_MODEL_NOTE} Limit: 0.2 % proof stress, ${proofBasis}; safety factor ${sf} wanted. If high: band or sleeve the winding, a harder conductor, a lower field.`,
      },
      sf > 1 ? 1 - 1 / sf : 0,
    ),
  );
  return items;
}
