/**
 * Verdict items about the bleeder (analysis/bleeder.ts): time from the charge voltage V0 to
 * 50 V and to the user's threshold, t = R·C·ln(V0/V); the bleeder's power at V0; and the
 * common requirements of NFPA 70 Art. 460 and IEC 60831-1 shown as GUIDANCE ONLY: an item is
 * `warn` when the time is longer than the guidance time and `info` otherwise; never `pass`,
 * because nothing here states compliance with any code.
 */
import type { Station } from '../model/station.js';
import type { VerdictItem } from '../model/verdict.js';
import { bleederGuidance, bleederPower_W, bleederTime_s } from './bleeder.js';
import { VERDICT_DEFAULTS, type BleederJudgeInput } from '../model/judge-inputs.js';
import { infoItem, judgedItem, marginAtMost } from './verdict-item.js';

export function judgeBleeder(station: Station, b: BleederJudgeInput): VerdictItem[] {
  const items: VerdictItem[] = [];
  const { capacitance_F: C, voltage_V: V0 } = station.bank;
  const R = b.resistance_Ohm;
  const rc = `RC = ${(R * C).toPrecision(3)} s from ${V0} V`;
  const threshold = b.threshold_V ?? VERDICT_DEFAULTS.bleederThreshold_V;
  const tThr = bleederTime_s(R, C, V0, threshold);
  if (b.maxTime_s !== undefined) {
    items.push(
      judgedItem(
        {
          id: 'bleeder.time',
          item: `Bleeder time to ${threshold} V`,
          value: tThr,
          limit: b.maxTime_s,
          unit: 's',
          margin: marginAtMost(tThr, b.maxTime_s),
          note: `t = RC·ln(V0/V), ${rc}; limit: user setting. If long: lower the bleeder resistance (more power).`,
        },
        0,
      ),
    );
  } else {
    items.push(infoItem('bleeder.time', `Bleeder time to ${threshold} V`, tThr, 's', `t = RC·ln(V0/V), ${rc}.`));
  }
  if (threshold !== 50) {
    items.push(infoItem('bleeder.time-50V', 'Bleeder time to 50 V', bleederTime_s(R, C, V0, 50), 's', `t = RC·ln(V0/V), ${rc}.`));
  }
  for (const g of bleederGuidance(V0)) {
    const t = bleederTime_s(R, C, V0, g.voltage_V);
    const longer = t > g.time_s;
    items.push({
      id: `bleeder.guidance.${g.id}`,
      item: `Bleeder time to ${g.voltage_V} V (guidance)`,
      value: t,
      limit: g.time_s,
      unit: 's',
      margin: Number.NaN,
      status: longer ? 'warn' : 'info',
      note: `Guidance only, not a compliance statement: ${g.source}, ${g.voltage_V} V within ${g.time_s} s for ${g.scope}; ${longer ? 'this bleeder is slower' : 'this bleeder is faster'}. Local codes and licensed practice decide.`,
    });
  }
  items.push(infoItem('bleeder.power', 'Bleeder power at the charge voltage', bleederPower_W(R, V0), 'W', 'P = V0²/R while the bank is held charged; rate the resistor for it.'));
  return items;
}
