/**
 * The visual style of our plots: plain, print-friendly (white ground, dark ink, light grid),
 * colour-blind-safe line colours from the palette of Okabe & Ito ("Color Universal Design",
 * 2008), and every series also told apart by a dash pattern and a text label, so a grey-scale
 * print or a reader who cannot tell the colours apart loses nothing.
 */

export const INK = '#1a1a1a';
export const GRID = '#d9d9d9';
export const MUTED = '#595959';
/** Fills of alternating phase bands (first phase white). */
export const BAND = ['#ffffff', '#ebebeb'] as const;

/** Okabe–Ito colours (Okabe & Ito, 2008). */
export const OKABE_ITO = {
  blue: '#0072B2',
  vermillion: '#D55E00',
  bluishGreen: '#009E73',
  reddishPurple: '#CC79A7',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  yellow: '#F0E442',
  black: '#000000',
} as const;

/** Dash patterns in series order: solid, long dash, dots, dash-dot. */
export const DASHES = [undefined, '7 3', '2 3', '8 3 2 3'] as const;

/** Series colours in order (the yellow is left out: too pale on white). */
export const SERIES = [
  OKABE_ITO.blue,
  OKABE_ITO.vermillion,
  OKABE_ITO.bluishGreen,
  OKABE_ITO.reddishPurple,
  OKABE_ITO.orange,
  OKABE_ITO.skyBlue,
] as const;

export const FONT = 11;
export const FONT_SMALL = 10;
export const FONT_TITLE = 14;
