/**
 * Axes drawn from d3-scale: tick positions from `scale.ticks(n)` (d3's 1-2-5 rule on a
 * `.nice()` domain), labels scaled by one SI prefix chosen for the whole axis, e.g. an axis of
 * seconds up to 0.046 reads "time (ms)" with ticks 0, 10, 20, 30, 40.
 */
import type { ScaleLinear } from 'd3-scale';
import { engineeringPrefix } from '../quantity.js';
import { el, text } from './svg.js';
import { FONT, GRID, INK, MUTED } from './style.js';

/** Label of a tick value shown in `factor` units, without float noise (0.30000000000000004 -> 0.3). */
export function tickLabel(v: number, factor: number): string {
  const x = Number((v / factor).toPrecision(12));
  return (x < 0 ? '−' : '') + String(Math.abs(x));
}

export interface AxisSpec {
  /** Quantity name, e.g. "coil current". */
  name: string;
  /** SI unit, e.g. "A". */
  unit: string;
  /** Approximate number of ticks. */
  ticks?: number;
}

/** Prefix for an axis whose domain is `domain`. */
export function axisPrefix(domain: readonly number[], unit: string): { factor: number; unit: string } {
  return engineeringPrefix(Math.max(...domain.map(Math.abs)), unit);
}

/** The axis title, e.g. "coil current (kA)". */
export function axisTitle(spec: AxisSpec, domain: readonly number[]): string {
  const p = axisPrefix(domain, spec.unit);
  return p.unit ? `${spec.name} (${p.unit})` : spec.name;
}

/** Left axis at x0 with horizontal grid lines across [x0, x1]. */
export function leftAxis(y: ScaleLinear<number, number>, spec: AxisSpec, x0: number, x1: number): string {
  const ticks = y.ticks(spec.ticks ?? 5);
  const { factor } = axisPrefix(y.domain(), spec.unit);
  const parts: string[] = [];
  for (const t of ticks) {
    const yy = y(t);
    parts.push(el('line', { x1: x0, x2: x1, y1: yy, y2: yy, stroke: GRID, 'stroke-width': 0.6 }));
    parts.push(el('line', { x1: x0 - 4, x2: x0, y1: yy, y2: yy, stroke: INK }));
    parts.push(text(x0 - 6, yy + 3.5, tickLabel(t, factor), { 'text-anchor': 'end', fill: INK }));
  }
  const r = y.range();
  const [r0, r1] = [r[0], r[r.length - 1]];
  parts.push(el('line', { x1: x0, x2: x0, y1: r0, y2: r1, stroke: INK }));
  const ym = (r0 + r1) / 2;
  parts.push(
    text(x0 - 46, ym, axisTitle(spec, y.domain()), {
      transform: `rotate(-90 ${Math.round((x0 - 46) * 10) / 10} ${Math.round(ym * 10) / 10})`,
      'text-anchor': 'middle',
      fill: MUTED,
      'font-size': FONT,
    }),
  );
  return el('g', { class: 'axis axis-y' }, parts);
}

/**
 * Bottom axis at y0; vertical grid lines from y0 up to each top in `gridTops` (one per panel:
 * [top, bottom] pairs), labels only when `labels` is true.
 */
export function bottomAxis(
  x: ScaleLinear<number, number>,
  spec: AxisSpec,
  y0: number,
  gridSpans: readonly (readonly [number, number])[],
  labels = true,
): string {
  const ticks = x.ticks(spec.ticks ?? 8);
  const { factor } = axisPrefix(x.domain(), spec.unit);
  const parts: string[] = [];
  for (const t of ticks) {
    const xx = x(t);
    for (const [top, bottom] of gridSpans) parts.push(el('line', { x1: xx, x2: xx, y1: top, y2: bottom, stroke: GRID, 'stroke-width': 0.6 }));
    if (labels) {
      parts.push(el('line', { x1: xx, x2: xx, y1: y0, y2: y0 + 4, stroke: INK }));
      parts.push(text(xx, y0 + 16, tickLabel(t, factor), { 'text-anchor': 'middle', fill: INK }));
    }
  }
  const r = x.range();
  const [r0, r1] = [r[0], r[r.length - 1]];
  parts.push(el('line', { x1: r0, x2: r1, y1: y0, y2: y0, stroke: INK }));
  if (labels) parts.push(text((r0 + r1) / 2, y0 + 34, axisTitle(spec, x.domain()), { 'text-anchor': 'middle', fill: MUTED }));
  return el('g', { class: 'axis axis-x' }, parts);
}
