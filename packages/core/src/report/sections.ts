/**
 * The content of a shot summary as plain tables (strings already formatted with engineering
 * units), shared by the text, Markdown and HTML renderers so the three say the same thing.
 * Values are formatted by `formatQuantity` (units/format.ts); labels come from FIGURES.
 */
import type { Station } from '../model/station.js';
import type { PhaseName, ShotResult, Warning } from '../model/result.js';
import type { Verdict, VerdictStatus } from '../model/verdict.js';
import { FIGURES, FIGURE_KEYS } from './figures.js';
import { formatPercent, formatPlain, formatQuantity } from './quantity.js';

export interface Column {
  header: string;
  align: 'left' | 'right';
}
export interface Row {
  cells: string[];
  /** Set on verdict rows (the renderers may colour or mark them). */
  status?: VerdictStatus;
}
export interface Table {
  id: string;
  title: string;
  columns: Column[];
  rows: Row[];
  /** Lines printed after the table. */
  notes?: string[];
}

const L = (header: string): Column => ({ header, align: 'left' });
const R = (header: string): Column => ({ header, align: 'right' });
const q = formatQuantity;

export const PHASE_LABELS: Record<PhaseName, string> = {
  discharge: 'discharge',
  commutation: 'commutation',
  freewheel: 'freewheel',
  reverse: 'reverse (ring-down)',
  'loops-decay': 'loops decay',
};

export const STATUS_LABELS: Record<VerdictStatus, string> = { pass: 'PASS', warn: 'WARN', fail: 'FAIL', info: 'info' };

/** The station as understood, one row per value, with units. */
export function stationTable(station: Station): Table {
  const rows: Row[] = [];
  const add = (element: string, quantity: string, value: string) => rows.push({ cells: [element, quantity, value] });
  const b = station.bank;
  add('bank', 'capacitance', q(b.capacitance_F, 'F'));
  add('bank', 'charge voltage', q(b.voltage_V, 'V'));
  add('bank', 'series resistance (ESR)', q(b.esr_Ohm, 'Ω'));
  add('bank', 'series inductance (ESL)', q(b.esl_H, 'H'));
  add('bank', 'stored energy ½·C·V0²', q(0.5 * b.capacitance_F * b.voltage_V ** 2, 'J'));
  const sw = station.switch;
  add('switch', 'kind', sw.kind === 'thyristor' ? 'thyristor (turns off at current zero)' : 'bidirectional (thyristor with antiparallel diode)');
  add('switch', 'threshold voltage V_T0', q(sw.thresholdVoltage_V, 'V'));
  add('switch', 'slope resistance r_T', q(sw.slopeResistance_Ohm, 'Ω'));
  const fw = station.freewheel;
  if (!fw) add('freewheel diode', 'fitted', 'none');
  else {
    add('freewheel diode', 'position', fw.position === 'bank' ? 'at the bank end of the cable' : 'at the fixture end of the cable');
    add('freewheel diode', 'threshold voltage V_F0', q(fw.thresholdVoltage_V, 'V'));
    add('freewheel diode', 'slope resistance r_F', q(fw.slopeResistance_Ohm, 'Ω'));
  }
  add('cable', 'resistance', q(station.cable.resistance_Ohm, 'Ω'));
  add('cable', 'inductance', q(station.cable.inductance_H, 'H'));
  const c = station.coil;
  add('coil', c.nonlinear ? 'inductance (small current; iron yoke, nonlinear)' : 'inductance', q(c.inductance_H, 'H'));
  add('coil', 'resistance at 20 °C', q(c.resistance20_Ohm, 'Ω'));
  add('coil', 'temperature coefficient α20', `${formatPlain(c.tempCoeff_perK)} /K`);
  add('coil', 'heat capacity', q(c.heatCapacity_JpK, 'J/K'));
  add('coil', 'temperature at firing', q(c.initialTemperature_C, '°C'));
  if (c.conductor) add('coil', 'conductor', c.conductor);
  if (c.mass_kg !== undefined) add('coil', 'conductor mass', q(c.mass_kg * 1000, 'g'));
  if (c.conductorArea_m2 !== undefined) add('coil', 'conductor cross-section', q(c.conductorArea_m2, 'm²'));
  if (c.conductorLength_m !== undefined) add('coil', 'conductor length', q(c.conductorLength_m, 'm'));
  // one row per coupled loop (a fixture given by geometry has dozens of eddy shells)
  for (const loop of station.coupled) {
    add(
      `loop "${loop.name}"`,
      'L · M to coil · R at 20 °C · heat capacity',
      [q(loop.inductance_H, 'H'), q(loop.mutualToCoil_H, 'H'), q(loop.resistance20_Ohm, 'Ω'), q(loop.heatCapacity_JpK, 'J/K')].join(' · '),
    );
  }
  for (const [k, p] of station.probes.entries()) {
    add(`probe "${p.name}"${k === 0 ? ' (the part)' : ''}`, 'field per coil ampere', `${formatPlain(p.coil_ApmPerA)} (A/m)/A`);
  }
  const s = station.solver;
  add('solver', 'method', s.method);
  add('solver', 'relative tolerance', formatPlain(s.relTol));
  add('solver', 'time limit', q(s.tMax_s, 's'));
  return { id: 'station', title: 'Station as understood', columns: [L('element'), L('quantity'), L('value')], rows };
}

/** Phases with their start and end (event) times. */
export function phasesTable(result: ShotResult): Table {
  return {
    id: 'phases',
    title: 'Phases',
    columns: [L('phase'), R('start'), R('end'), R('duration'), L('ended by')],
    rows: result.phases.map((p) => ({
      cells: [PHASE_LABELS[p.name] ?? p.name, q(p.start_s, 's'), q(p.end_s, 's'), q(p.end_s - p.start_s, 's'), p.endReason],
    })),
  };
}

/** The figures, labelled from FIGURES. */
export function figuresTable(result: ShotResult): Table {
  return {
    id: 'figures',
    title: 'Figures',
    columns: [L('figure'), R('value')],
    rows: FIGURE_KEYS.map((k) => {
      const m = FIGURES[k];
      const v = result.figures[k];
      return { cells: [m.label, m.unit === '1' ? formatPlain(v) : q(v, m.unit)] };
    }),
  };
}

/** Peak field per probe and loop figures, when there is more than the part's probe or any loop. */
export function probesAndLoopsTables(result: ShotResult): Table[] {
  const out: Table[] = [];
  if (result.probes.length > 1) {
    out.push({
      id: 'probes',
      title: 'Field at each probe',
      columns: [L('probe'), R('peak field'), R('µ0·H'), R('at')],
      rows: result.probes.map((p) => ({
        cells: [p.name, q(p.peakField_Apm, 'A/m'), q(4e-7 * Math.PI * p.peakField_Apm, 'T'), q(p.timeOfPeak_s, 's')],
      })),
    });
  }
  if (result.loops.length > 0) {
    out.push({
      id: 'loops',
      title: 'Coupled loops',
      columns: [L('loop'), R('peak current'), R('temperature rise'), R('final temperature')],
      rows: result.loops.map((l) => ({
        cells: [l.name, q(l.peakCurrent_A, 'A'), q(l.temperatureRise_K, 'K'), q(l.finalTemperature_C, '°C')],
      })),
    });
  }
  return out;
}

/** Where the stored energy went. */
export function energyTable(result: ShotResult): Table {
  const e = result.energy;
  const share = (x: number) => (e.initial_J > 0 ? `${formatPlain((100 * x) / e.initial_J)} %` : 'n/a');
  const row = (where: string, x: number): Row => ({ cells: [where, q(x, 'J'), share(x)] });
  const d = e.dissipated_J;
  const rows: Row[] = [
    row('stored at firing', e.initial_J),
    row('left in the bank', e.capacitorFinal_J),
    row('left in the inductances', e.inductorFinal_J),
    row('lost in bank ESR', d.esr),
    row('lost in the switch', d.switch),
    row('lost in the cable', d.cable),
    row('lost in the coil', d.coil),
    row('lost in the freewheel diode', d.diode),
    ...d.loops.map((x, k) => row(`lost in loop "${result.loops[k]?.name ?? k}"`, x)),
  ];
  return {
    id: 'energy',
    title: 'Energy balance',
    columns: [L('where'), R('energy'), R('share of stored')],
    rows,
    notes: [`Balance closes to ${formatPlain(e.relativeError)} of the stored energy (relative error).`],
  };
}

/** Warnings as a table (empty rows when none). */
export function warningsTable(warnings: readonly Warning[]): Table {
  return {
    id: 'warnings',
    title: 'Warnings',
    columns: [L('severity'), L('code'), L('message')],
    rows: warnings.map((w) => ({ cells: [w.severity, w.code, w.message] })),
  };
}

/** The verdict: item, value, limit, margin, status (and the note of each item). */
export function verdictTable(verdict: Verdict): Table {
  return {
    id: 'verdict',
    title: `Verdict: ${STATUS_LABELS[verdict.overall]}`,
    columns: [L('item'), R('value'), R('limit'), R('margin'), L('status'), L('basis')],
    rows: verdict.items.map((v) => ({
      cells: [
        v.item,
        q(v.value, v.unit),
        Number.isNaN(v.limit) ? '–' : q(v.limit, v.unit),
        Number.isNaN(v.margin) ? '–' : formatPercent(v.margin),
        STATUS_LABELS[v.status],
        v.note,
      ],
      status: v.status,
    })),
  };
}

/** The verdict tables in reading order after the safety notice. */
export function shotTables(station: Station, result: ShotResult, verdict?: Verdict | null): Table[] {
  return [
    stationTable(station),
    phasesTable(result),
    figuresTable(result),
    ...probesAndLoopsTables(result),
    energyTable(result),
    warningsTable(result.warnings),
    ...(verdict ? [verdictTable(verdict)] : []),
  ];
}
