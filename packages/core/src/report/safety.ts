/**
 * The safety notice shown with every human-readable output that involves a charged bank.
 *
 * Text of our own. It states the stored energy ½·C·V0² and the charge voltage, names the
 * hazards (lethal stored energy, recharge by dielectric absorption, fixture burst, pinching by
 * magnetized parts, effects on implanted medical devices and nearby electronics), lists the
 * usual precautions (common practice) and defers to local electrical codes and qualified,
 * licensed practice. It makes no claim that a design satisfies any code or standard.
 */

import type { Station } from '../model/station.js';
import { formatQuantity } from './quantity.js';

/** What the notice needs: the energy stored in the bank and its charge voltage. */
export interface ChargedBank {
  /** ½·C·V0², J. */
  storedEnergy_J: number;
  /** Charge voltage, V. */
  voltage_V: number;
}

export type NoticeFormat = 'text' | 'markdown' | 'html';

/** Title line of the notice. */
export const SAFETY_TITLE = 'Safety: this design describes a charged capacitor bank';

/** Hazards, one sentence each, in our own words. */
export const SAFETY_HAZARDS: readonly string[] = [
  'The energy stored in the bank can kill. Treat the bank, the switch, the cable and the fixture as live until they have been discharged and shorted.',
  'Capacitors take back part of their charge after a discharge (dielectric absorption): a bank that read zero volts can be dangerous again minutes later. Keep it shorted while idle.',
  'A fixture that fails under magnetic pressure or overheating can burst and throw fragments of winding, potting or part.',
  'Magnetized parts pull hard on steel and on each other: they pinch fingers and can shatter on impact.',
  'The pulsed field can upset or damage implanted medical devices (pacemakers, defibrillators, pumps) and nearby electronics, instruments and magnetic media.',
];

/** Usual precautions (common practice). */
export const SAFETY_PRECAUTIONS: readonly string[] = [
  'bleeder resistors across the bank that bring it to a safe voltage within a set time;',
  'a grounding stick applied to every terminal before anyone touches the circuit;',
  'an enclosure interlocked so that opening it disconnects the charger and dumps the bank;',
  'eye and hearing protection for everyone near the fixture;',
  'work done only by qualified personnel who know this station.',
];

/** Deference to codes and practice; deliberately claims nothing about any standard. */
export const SAFETY_DEFERENCE =
  'These notes are a reminder, not a safety assessment. Local electrical codes and the judgement of qualified, licensed practitioners govern the design, installation and operation of the station; the results of this program do not replace them.';

function bankOf(source: Station | ChargedBank): ChargedBank {
  if ('bank' in source) {
    const { capacitance_F, voltage_V } = source.bank;
    return { storedEnergy_J: 0.5 * capacitance_F * voltage_V * voltage_V, voltage_V };
  }
  return source;
}

/** The opening sentence with energy and voltage, e.g. "The bank is charged to 1.6 kV and holds 2.82 kJ." */
export function safetyHeadline(source: Station | ChargedBank): string {
  const b = bankOf(source);
  return `The bank is charged to ${formatQuantity(b.voltage_V, 'V')} and holds ${formatQuantity(b.storedEnergy_J, 'J')}.`;
}

function wrap(text: string, width: number, indent = '', firstIndent = indent): string[] {
  const words = text.split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let line = firstIndent;
  let empty = true;
  for (const w of words) {
    if (!empty && line.length + 1 + w.length > width) {
      lines.push(line);
      line = indent + w;
    } else {
      line += (empty ? '' : ' ') + w;
    }
    empty = false;
  }
  if (!empty) lines.push(line);
  return lines;
}

/** Minimal HTML escaping for text content and attribute values. */
export function escapeHtml(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/**
 * The safety notice for a station (or a bank given as stored energy and voltage), as plain text
 * (wrapped at 78 columns), Markdown or an HTML fragment (`<section class="safety">`).
 */
export function safetyNotice(source: Station | ChargedBank, format: NoticeFormat = 'text'): string {
  const headline = safetyHeadline(source);
  if (format === 'markdown') {
    return [
      `> **${SAFETY_TITLE}.** ${headline}`,
      '>',
      ...SAFETY_HAZARDS.map((h) => `> - ${h}`),
      '>',
      '> Usual precautions (common practice):',
      '>',
      ...SAFETY_PRECAUTIONS.map((p) => `> - ${p}`),
      '>',
      `> ${SAFETY_DEFERENCE}`,
      '',
    ].join('\n');
  }
  if (format === 'html') {
    return [
      '<section class="safety" role="note" aria-label="Safety notice">',
      `<h2>${escapeHtml(SAFETY_TITLE)}</h2>`,
      `<p class="headline"><strong>${escapeHtml(headline)}</strong></p>`,
      '<ul class="hazards">',
      ...SAFETY_HAZARDS.map((h) => `<li>${escapeHtml(h)}</li>`),
      '</ul>',
      '<p>Usual precautions (common practice):</p>',
      '<ul class="precautions">',
      ...SAFETY_PRECAUTIONS.map((p) => `<li>${escapeHtml(p)}</li>`),
      '</ul>',
      `<p class="deference">${escapeHtml(SAFETY_DEFERENCE)}</p>`,
      '</section>',
      '',
    ].join('\n');
  }
  const width = 78;
  const lines = [
    `!! ${SAFETY_TITLE.toUpperCase()} !!`,
    ...wrap(headline, width),
    '',
    ...SAFETY_HAZARDS.flatMap((h) => wrap(h, width, '  ', '- ')),
    '',
    'Usual precautions (common practice):',
    ...SAFETY_PRECAUTIONS.flatMap((p) => wrap(p, width, '  ', '- ')),
    '',
    ...wrap(SAFETY_DEFERENCE, width),
    '',
  ];
  return lines.join('\n');
}
