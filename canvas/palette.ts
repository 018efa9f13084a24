/**
 * Circuit colours: the eight-colour palette for colour-blind readers proposed by Okabe and Ito ("Color Universal
 * Design", 2008; also Wong, "Points of view: Color blindness", Nature Methods 8, 441, 2011), with black replaced
 * by a dark grey so tube outlines stay readable. Circuits beyond the eighth reuse the colours; the editor also
 * marks each circuit's pass order, so neighbours that share a colour remain distinguishable.
 */
export const circuitPalette = [
  '#E69F00', // orange
  '#56B4E9', // sky blue
  '#009E73', // bluish green
  '#F0E442', // yellow
  '#0072B2', // blue
  '#D55E00', // vermillion
  '#CC79A7', // reddish purple
  '#5A5A5A', // dark grey (in place of black)
] as const;

export function circuitColour(index: number): string {
  const n = circuitPalette.length;
  return circuitPalette[((index % n) + n) % n];
}

/** Marks on the sheet that are not circuits. */
export const sheetColours = {
  finPack: '#F3EFE8',
  finPackEdge: '#B9B0A2',
  tubeEmpty: '#FFFFFF',
  tubeEdge: '#5E6E74',
  unassigned: '#A52A1F',
  error: '#A52A1F',
  warning: '#B07800',
  selection: '#0E2A33',
  airArrow: '#1D6B73',
  pending: '#C06A2C',
} as const;
