/**
 * The pulse plot of one shot as a standalone SVG (built in Node, no DOM): four panels on one
 * time axis (coil current, capacitor voltage, field at the part, coil temperature), the circuit
 * phases as numbered shaded bands with dashed rules at each event, and the key figures written
 * on the plot (peak current and its time, peak field, the end of the pulse, reverse voltage,
 * final temperature). Scales and ticks come from d3-scale, line paths from d3-shape.
 */
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import type { ShotResult } from '../model/result.js';
import { formatPercent, formatQuantity } from './quantity.js';
import { PHASE_LABELS } from './sections.js';
import { bottomAxis, leftAxis } from './svg/axis.js';
import { el, svgRoot, text, textWidth } from './svg/svg.js';
import { BAND, DASHES, FONT, FONT_SMALL, FONT_TITLE, INK, MUTED, OKABE_ITO, SERIES } from './svg/style.js';

export interface PulsePlotOptions {
  /** Total width, px (default 820). */
  width?: number;
  /** Height of each panel's plotting area, px (default 140). */
  panelHeight?: number;
  /** Title line (default "Pulse"). */
  title?: string;
  /** Prefix for element ids, unique per document when several plots share a page (default "pulse"). */
  id?: string;
  /** End of the time axis, s (default: the last sample, or the end of the pulse if later). */
  tEnd_s?: number;
}

interface Series {
  name: string;
  values: readonly number[];
  color: string;
  dash?: string;
}

interface Panel {
  key: string;
  title: string;
  unit: string;
  series: Series[];
  /** include zero in the y range */
  zero: boolean;
}

const MAX_PHASES_LISTED = 12;

/** Indices to draw: all samples if few; else first/min/max/last per pixel column (keeps the envelope). */
export function decimate(t: readonly number[], ys: readonly (readonly number[])[], x: (t: number) => number): number[] {
  const n = t.length;
  const [r0, r1] = [x(t[0]), x(t[n - 1])];
  const columns = Math.max(1, Math.ceil(Math.abs(r1 - r0)));
  if (n <= 4 * columns) return Array.from({ length: n }, (_, j) => j);
  const keep = new Set<number>();
  let col = -1;
  let first = 0;
  const flush = (end: number) => {
    if (col < 0) return;
    keep.add(first);
    keep.add(end);
    for (const y of ys) {
      let lo = first;
      let hi = first;
      for (let j = first; j <= end; j++) {
        if (y[j] < y[lo]) lo = j;
        if (y[j] > y[hi]) hi = j;
      }
      keep.add(lo);
      keep.add(hi);
    }
  };
  for (let j = 0; j < n; j++) {
    const c = Math.floor(x(t[j]));
    if (c !== col) {
      flush(j - 1);
      col = c;
      first = j;
    }
  }
  flush(n - 1);
  return [...keep].sort((a, b) => a - b);
}

function yDomain(series: readonly Series[], idx: readonly number[], zero: boolean): [number, number] {
  let lo = zero ? 0 : Infinity;
  let hi = zero ? 0 : -Infinity;
  for (const s of series) {
    for (const j of idx) {
      const v = s.values[j];
      if (Number.isFinite(v)) {
        if (v < lo) lo = v;
        if (v > hi) hi = v;
      }
    }
  }
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) return [0, 1];
  if (hi - lo <= 1e-12 * Math.max(1, Math.abs(hi))) {
    const pad = Math.abs(hi) > 0 ? Math.abs(hi) * 0.05 : 1;
    return [lo - pad, hi + pad];
  }
  // headroom above the highest point for the annotation written there
  return [lo, hi + 0.15 * (hi - lo)];
}

/** Place a label near (x, y) inside [x0, x1] × [top, bottom]: right of the point if it fits, else left. */
function labelAt(x: number, y: number, s: string, x0: number, x1: number, top: number, bottom: number, cls: string): string {
  const w = textWidth(s, FONT);
  const right = x + 8 + w <= x1;
  const tx = right ? x + 8 : Math.max(x0 + 2, x - 8 - w);
  let ty = y - 7;
  if (ty < top + FONT) ty = y + FONT + 6;
  if (ty > bottom - 2) ty = bottom - 4;
  return text(tx, ty, s, {
    class: cls,
    fill: INK,
    stroke: '#ffffff',
    'stroke-width': 3,
    'paint-order': 'stroke',
    'stroke-linejoin': 'round',
  });
}

/** The whole pulse plot. */
export function pulsePlotSvg(result: ShotResult, options: PulsePlotOptions = {}): string {
  const W = options.width ?? 820;
  const PH = options.panelHeight ?? 140;
  const id = options.id ?? 'pulse';
  const left = 82;
  const right = 24;
  const x0 = left;
  const x1 = W - right;
  const w = result.waveform;
  const f = result.figures;
  const n = w.t_s.length;
  const tLast = n > 0 ? w.t_s[n - 1] : 0;
  const tEnd = options.tEnd_s ?? Math.max(tLast, Number.isFinite(f.endOfPulse_s) ? f.endOfPulse_s : 0, 1e-9);
  const x = scaleLinear().domain([0, tEnd]).range([x0, x1]).nice(8);

  // --- series ---------------------------------------------------------------------------------
  const hasDiode = w.diodeCurrent_A.some((v) => Math.abs(v) > 0);
  const currentSeries: Series[] = [{ name: 'coil current', values: w.coilCurrent_A, color: OKABE_ITO.blue }];
  if (hasDiode) currentSeries.push({ name: 'freewheel diode current', values: w.diodeCurrent_A, color: OKABE_ITO.vermillion, dash: DASHES[1] });
  const probeNames = result.probes.map((p) => p.name);
  const fieldSeries: Series[] = w.field_Apm.map((values, k) => ({
    name: probeNames[k] ?? `probe ${k}`,
    values,
    color: SERIES[(k + 2) % SERIES.length],
    dash: DASHES[k % DASHES.length],
  }));
  const panels: Panel[] = [
    { key: 'current', title: 'Coil current', unit: 'A', series: currentSeries, zero: true },
    { key: 'voltage', title: 'Capacitor voltage', unit: 'V', series: [{ name: 'capacitor voltage', values: w.capacitorVoltage_V, color: OKABE_ITO.vermillion }], zero: true },
    { key: 'field', title: w.field_Apm.length > 1 ? 'Field at the part (by probe)' : 'Field at the part', unit: 'A/m', series: fieldSeries, zero: true },
    { key: 'temperature', title: 'Coil temperature', unit: '°C', series: [{ name: 'coil temperature', values: w.coilTemperature_C, color: OKABE_ITO.orange }], zero: false },
  ];
  const idx = n > 0 ? decimate(w.t_s, panels.flatMap((p) => p.series.map((s) => s.values)), x) : [];

  // --- phase legend lines (wrapped) -------------------------------------------------------------
  const phases = result.phases;
  const legendItems = phases.slice(0, MAX_PHASES_LISTED).map(
    (p, k) =>
      `${k + 1} ${PHASE_LABELS[p.name] ?? p.name} ${formatQuantity(p.start_s, 's')} – ${formatQuantity(p.end_s, 's')} (${p.endReason})`,
  );
  if (phases.length > MAX_PHASES_LISTED) legendItems.push(`… and ${phases.length - MAX_PHASES_LISTED} more phases`);
  const legendLines: string[] = [];
  {
    let cur = 'Phases: ';
    for (const [k, item] of legendItems.entries()) {
      const piece = (k > 0 ? ' · ' : '') + item;
      if (textWidth(cur + piece, FONT_SMALL) > x1 - x0 && cur !== 'Phases: ') {
        legendLines.push(cur);
        cur = item;
      } else cur += piece;
    }
    legendLines.push(cur);
  }

  const titleY = 22;
  const stripTop = 34;
  const stripH = 16;
  const legendTop = stripTop + stripH + 14;
  const firstPanelTop = legendTop + legendLines.length * 13 + 24;
  const gap = 34;
  const panelTops = panels.map((_, k) => firstPanelTop + k * (PH + gap));
  const lastBottom = panelTops[panelTops.length - 1] + PH;
  const H = lastBottom + 48;

  const body: string[] = [];
  body.push(el('rect', { x: 0, y: 0, width: W, height: H, fill: '#ffffff' }));
  body.push(text(x0, titleY, options.title ?? 'Pulse', { 'font-size': FONT_TITLE, 'font-weight': 'bold', fill: INK }));

  // --- phase strip ------------------------------------------------------------------------------
  const strip: string[] = [];
  for (const [k, p] of phases.entries()) {
    const a = x(Math.max(0, p.start_s));
    const b = x(Math.min(x.domain()[1], p.end_s));
    if (!(b > a)) continue;
    strip.push(el('rect', { x: a, y: stripTop, width: b - a, height: stripH, fill: BAND[k % 2], stroke: MUTED, 'stroke-width': 0.6 }));
    const full = `${k + 1} ${PHASE_LABELS[p.name] ?? p.name}`;
    const label = textWidth(full, FONT_SMALL) + 6 < b - a ? full : textWidth(String(k + 1), FONT_SMALL) + 4 < b - a ? String(k + 1) : '';
    if (label) strip.push(text((a + b) / 2, stripTop + 12, label, { 'text-anchor': 'middle', 'font-size': FONT_SMALL, fill: INK }));
  }
  body.push(el('g', { class: 'phase-strip' }, strip));
  body.push(
    el(
      'g',
      { class: 'phase-legend' },
      legendLines.map((l, k) => text(x0, legendTop + k * 13, l, { 'font-size': FONT_SMALL, fill: MUTED })),
    ),
  );

  // --- panels -----------------------------------------------------------------------------------
  const boundaries = phases.slice(1).map((p) => p.start_s);
  const endOfPulse = f.endOfPulse_s;
  const gridSpans = panelTops.map((t) => [t, t + PH] as const);
  for (const [k, panel] of panels.entries()) {
    const top = panelTops[k];
    const bottom = top + PH;
    const y = scaleLinear().domain(yDomain(panel.series, idx, panel.zero)).range([bottom, top]).nice(5);
    const g: string[] = [];
    // bands
    for (const [j, p] of phases.entries()) {
      const a = x(Math.max(0, p.start_s));
      const b = x(Math.min(x.domain()[1], p.end_s));
      if (b > a) g.push(el('rect', { x: a, y: top, width: b - a, height: PH, fill: BAND[j % 2], class: 'phase-band' }));
    }
    // grid and axes
    g.push(leftAxis(y, { name: panel.title.toLowerCase().replace(' (by probe)', ''), unit: panel.unit }, x0, x1));
    g.push(bottomAxis(x, { name: 'time since firing', unit: 's' }, bottom, [gridSpans[k]], k === panels.length - 1));
    const [d0, d1] = y.domain();
    if (d0 < 0 && d1 > 0) g.push(el('line', { x1: x0, x2: x1, y1: y(0), y2: y(0), stroke: MUTED, 'stroke-width': 0.8 }));
    // phase rules
    for (const tb of boundaries) {
      g.push(el('line', { x1: x(tb), x2: x(tb), y1: top, y2: bottom, stroke: MUTED, 'stroke-dasharray': '3 3', class: 'phase-rule' }));
    }
    if (Number.isFinite(endOfPulse) && endOfPulse <= x.domain()[1]) {
      g.push(el('line', { x1: x(endOfPulse), x2: x(endOfPulse), y1: top, y2: bottom, stroke: INK, 'stroke-dasharray': '8 2 1 2', class: 'end-of-pulse' }));
    }
    // series
    for (const s of panel.series) {
      const path = line<number>()
        .defined((j) => Number.isFinite(s.values[j]) && Number.isFinite(w.t_s[j]))
        .x((j) => x(w.t_s[j]))
        .y((j) => y(s.values[j]))
        .digits(1)(idx);
      if (path) g.push(el('path', { d: path, fill: 'none', stroke: s.color, 'stroke-width': 1.8, 'stroke-dasharray': s.dash, class: 'series', 'data-series': s.name }));
    }
    // panel title and series key (line sample + name: colour is never the only cue)
    g.push(text(x0, top - 8, panel.title, { 'font-weight': 'bold', fill: INK, class: 'panel-title' }));
    let kx = x1;
    for (const s of [...panel.series].reverse()) {
      const wName = textWidth(s.name, FONT_SMALL);
      kx -= wName;
      g.push(text(kx, top - 8, s.name, { 'font-size': FONT_SMALL, fill: INK }));
      kx -= 26;
      g.push(el('line', { x1: kx, x2: kx + 20, y1: top - 11.5, y2: top - 11.5, stroke: s.color, 'stroke-width': 1.8, 'stroke-dasharray': s.dash }));
      kx -= 12;
    }
    // annotations
    if (panel.key === 'current' && Number.isFinite(f.peakCurrent_A)) {
      const px_ = x(f.timeOfPeak_s);
      const py = y(f.peakCurrent_A);
      g.push(el('circle', { cx: px_, cy: py, r: 3.5, fill: '#ffffff', stroke: INK, 'stroke-width': 1.4, class: 'mark-peak-current' }));
      g.push(labelAt(px_, py, `peak ${formatQuantity(f.peakCurrent_A, 'A')} at ${formatQuantity(f.timeOfPeak_s, 's')}`, x0, x1, top, bottom, 'label-peak-current'));
      if (Number.isFinite(endOfPulse) && endOfPulse <= x.domain()[1]) {
        const s = `end of pulse ${formatQuantity(endOfPulse, 's')}`;
        const ex = x(endOfPulse);
        const fits = ex + 4 + textWidth(s, FONT_SMALL) <= x1;
        g.push(
          text(fits ? ex + 4 : ex - 4, bottom - 6, s, {
            'text-anchor': fits ? 'start' : 'end',
            'font-size': FONT_SMALL,
            fill: INK,
            stroke: '#ffffff',
            'stroke-width': 3,
            'paint-order': 'stroke',
            class: 'label-end-of-pulse',
          }),
        );
      }
    }
    if (panel.key === 'voltage' && f.peakReverseVoltage_V < 0) {
      let jMin = 0;
      for (const j of idx) if (w.capacitorVoltage_V[j] < w.capacitorVoltage_V[jMin]) jMin = j;
      const vx = x(w.t_s[jMin]);
      const vy = y(f.peakReverseVoltage_V);
      g.push(el('circle', { cx: vx, cy: vy, r: 3.5, fill: '#ffffff', stroke: INK, 'stroke-width': 1.4, class: 'mark-reverse' }));
      g.push(labelAt(vx, vy + 2 * FONT + 4, `reverse ${formatQuantity(f.peakReverseVoltage_V, 'V')} (${formatPercent(-f.reverseVoltage_pct / 100).replace('−', '')} of charge)`, x0, x1, top, bottom, 'label-reverse'));
    }
    if (panel.key === 'field' && Number.isFinite(f.peakField_Apm)) {
      const fx = x(f.timeOfPeakField_s);
      const fy = y(f.peakField_Apm);
      g.push(el('circle', { cx: fx, cy: fy, r: 3.5, fill: '#ffffff', stroke: INK, 'stroke-width': 1.4, class: 'mark-peak-field' }));
      g.push(labelAt(fx, fy, `peak ${formatQuantity(f.peakField_Apm, 'A/m')} (µ0·H ${formatQuantity(f.peakFluxDensity_T, 'T')}) at ${formatQuantity(f.timeOfPeakField_s, 's')}`, x0, x1, top, bottom, 'label-peak-field'));
    }
    if (panel.key === 'temperature' && n > 0) {
      const tx = x(w.t_s[n - 1]);
      const ty = y(w.coilTemperature_C[n - 1]);
      g.push(labelAt(tx, ty, `${formatQuantity(w.coilTemperature_C[n - 1], '°C')} at the end (rise ${formatQuantity(f.coilTemperatureRise_K, 'K')})`, x0, x1, top, bottom, 'label-temperature'));
    }
    body.push(el('g', { class: `panel panel-${panel.key}` }, g));
  }

  const desc =
    `Coil current, capacitor voltage, field at the part and coil temperature against time since firing. ` +
    `Peak current ${formatQuantity(f.peakCurrent_A, 'A')} at ${formatQuantity(f.timeOfPeak_s, 's')}; ` +
    `peak field at the part ${formatQuantity(f.peakField_Apm, 'A/m')}; end of pulse ${formatQuantity(f.endOfPulse_s, 's')}. ` +
    `Phases: ${phases.map((p) => `${p.name} ${formatQuantity(p.start_s, 's')} to ${formatQuantity(p.end_s, 's')}`).join(', ')}.`;
  return svgRoot(W, H, options.title ?? 'Pulse', desc, body, id);
}
