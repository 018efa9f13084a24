/**
 * Circuit colours for drawings and reports. Colour-blind-safe: the Okabe-Ito set (Okabe, M. and Ito, K. (2008),
 * "Color Universal Design (CUD): how to make figures and presentations that are friendly to colorblind people",
 * J*FLY, https://jfly.uni-koeln.de/color/). Black is kept for ink and yellow is dropped because it is too faint on
 * white paper, which leaves six hues. Coils often have more circuits than six, so every further lap through the
 * hues changes the line pattern (solid, dashed, dotted), and drawings also print the circuit number.
 *
 * Pure data with no Node or React imports, so the app could share it (it could move to components/ui later).
 */

export interface OkabeItoColour { name: string; hex: string }

/** The eight Okabe-Ito colours in the order of the original article. */
export const OKABE_ITO: readonly OkabeItoColour[] = [
  { name: 'black', hex: '#000000' },
  { name: 'orange', hex: '#E69F00' },
  { name: 'sky blue', hex: '#56B4E9' },
  { name: 'bluish green', hex: '#009E73' },
  { name: 'yellow', hex: '#F0E442' },
  { name: 'blue', hex: '#0072B2' },
  { name: 'vermillion', hex: '#D55E00' },
  { name: 'reddish purple', hex: '#CC79A7' },
];

/** Hues used for circuits, ordered so that neighbouring circuit numbers contrast strongly. */
export const CIRCUIT_HUES: readonly string[] = ['#0072B2', '#E69F00', '#009E73', '#CC79A7', '#D55E00', '#56B4E9'];

/** SVG stroke-dasharray per lap through the hues, in multiples of the stroke width (empty = solid). */
const DASH_PATTERNS: readonly (readonly number[])[] = [[], [3, 1.6], [0.9, 1.3]];

/** Neutral ink for tubes and bends that belong to no circuit (an invalid or unfinished circuiting). */
export const UNASSIGNED_COLOUR = '#8A8F98';
/** Ink for the sheet, labels and arrows. */
export const INK = '#1F2328';
export const INK_MUTED = '#5B6270';
export const SHEET_FILL = '#F4F5F7';

export interface CircuitStyle {
  colour: string;
  /** Dash pattern as multiples of the stroke width; empty for a solid line. */
  dash: readonly number[];
}

/**
 * Style of circuit number `ordinal` (0-based position in the result's circuit list): hue cycles through
 * CIRCUIT_HUES, the dash pattern changes with each lap.
 */
export function circuitStyle(ordinal: number): CircuitStyle {
  if (!Number.isInteger(ordinal) || ordinal < 0) return { colour: UNASSIGNED_COLOUR, dash: [] };
  const hue = CIRCUIT_HUES[ordinal % CIRCUIT_HUES.length];
  const lap = Math.floor(ordinal / CIRCUIT_HUES.length) % DASH_PATTERNS.length;
  return { colour: hue, dash: DASH_PATTERNS[lap] };
}
