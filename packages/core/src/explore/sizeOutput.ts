/**
 * Bank sizing outputs: plain text (target, the least-energy bank, what binds, why the
 * neighbouring choices were not taken, every candidate, the safety notice) and JSON (SI, NaN as
 * null). The unit-build rules are printed with every unit-based result.
 */
import { formatQuantity } from '../report/quantity.js';
import { safetyNotice } from '../report/safety.js';
import type { BankCandidate, SizeResult } from './sizeBank.js';

export const UNIT_BUILD_RULES = 'C = p·C_u/s, V_rating = s·V_u, ESR = s·ESR_u/p, ESL = s·ESL_u/p (s units in series per string, p strings in parallel)';

const q = formatQuantity;

function candidateLabel(c: BankCandidate): string {
  return c.build ? `${c.build.series}s × ${c.build.parallel}p = ${q(c.capacitance_F, 'F')}` : q(c.capacitance_F, 'F');
}

export function sizeToText(r: SizeResult, designName?: string): string {
  const lines: string[] = [];
  lines.push(`Bank sizing${designName ? ` of "${designName}"` : ''}: the part needs ${q(r.requiredField_Apm, 'A/m')} + ${(r.margin * 100).toFixed(0)} % margin = ${q(r.targetField_Apm, 'A/m')}`);
  lines.push(`Each charge voltage is solved (bracket + Brent) so that the field lies within [target, target·(1 + ${r.relTol})].`);
  if (r.unit) {
    const u = r.unit;
    lines.push(`Built from units of ${q(u.capacitance_F, 'F')}, ${q(u.voltage_V, 'V')}, ESR ${q(u.esr_Ohm, 'Ω')}, ESL ${q(u.esl_H, 'H')}: ${UNIT_BUILD_RULES}.`);
  }
  lines.push(`Capacitance searched: ${q(r.capacitanceRange[0], 'F')} to ${q(r.capacitanceRange[1], 'F')}; ${r.candidates.length} candidates${r.interrupted ? ' (interrupted)' : ''}, ${r.wallTime_s.toFixed(1)} s.`);
  lines.push('');
  const b = r.best;
  if (b) {
    lines.push(`Least-energy bank: ${candidateLabel(b)} charged to ${q(b.voltage_V, 'V')}, storing ${q(b.energy_J, 'J')} (field ${q(b.field_Apm, 'A/m')}).`);
    if (b.build) {
      lines.push(`  ${b.build.units} units: ${b.build.series} in series × ${b.build.parallel} strings; rated ${q(b.build.ratedVoltage_V, 'V')}, ESR ${q(b.build.esr_Ohm, 'Ω')}, ESL ${q(b.build.esl_H, 'H')}.`);
    }
    lines.push(`Binding: ${r.binding.text}.`);
    if (b.tightest) lines.push(`Closest other limit: ${b.tightest.id}, margin ${(b.tightest.margin * 100).toFixed(1)} %.`);
    if (r.neighbours.length) {
      lines.push('Neighbouring choices:');
      for (const n of r.neighbours) lines.push(`  ${n.label}: ${n.why}`);
    }
  } else {
    lines.push(`No bank in the range meets every limit: ${r.binding.text}.`);
  }
  lines.push('');
  lines.push('Candidates:');
  const rows = [['capacitance', 'voltage', 'energy', 'feasible', 'why'], ...r.candidates.map((c) => [candidateLabel(c), q(c.voltage_V, 'V'), q(c.energy_J, 'J'), c.feasible ? 'yes' : 'no', c.why])];
  const widths = rows[0]!.map((_, i) => Math.max(...rows.map((x) => [...x[i]!].length)));
  for (const x of rows) lines.push(`  ${x.map((cell, i) => (i === x.length - 1 ? cell : i === 0 || i === 3 ? cell.padEnd(widths[i]!) : cell.padStart(widths[i]!))).join('  ')}`);
  if (b) lines.push('', safetyNotice({ storedEnergy_J: b.energy_J, voltage_V: b.voltage_V }, 'text').trimEnd());
  return `${lines.join('\n')}\n`;
}

export function sizeToJson(r: SizeResult, designName?: string): Record<string, unknown> {
  const strip = (c: BankCandidate) => {
    const { result, ...rest } = c;
    return { ...rest, ...(result ? { figures: result.figures, verdict: result.items, overall: result.overall } : {}) };
  };
  const value = {
    kind: 'size',
    ...(designName !== undefined ? { design: designName } : {}),
    mode: r.mode,
    requiredField_Apm: r.requiredField_Apm,
    margin: r.margin,
    targetField_Apm: r.targetField_Apm,
    relTol: r.relTol,
    capacitanceRange_F: r.capacitanceRange,
    ...(r.unit ? { unit: r.unit, unitBuildRules: UNIT_BUILD_RULES } : {}),
    best: r.best ? strip(r.best) : null,
    binding: r.binding,
    neighbours: r.neighbours.map((n) => ({ label: n.label, why: n.why, capacitance_F: n.candidate.capacitance_F, build: n.candidate.build, voltage_V: n.candidate.voltage_V, energy_J: n.candidate.energy_J, feasible: n.candidate.feasible })),
    candidates: r.candidates.map(strip),
    completed: r.completed,
    interrupted: r.interrupted,
    threads: r.threads,
    wallTime_s: r.wallTime_s,
  };
  return JSON.parse(JSON.stringify(value, (_k, v) => (typeof v === 'number' && !Number.isFinite(v) ? null : v))) as Record<string, unknown>;
}
