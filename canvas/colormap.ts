/**
 * Temperature colours: viridis, the perceptually uniform colour map of van der Walt and Smith (matplotlib 1.5,
 * 2015; CC0). Eleven evenly spaced samples of the map (as the R viridisLite package lists them) interpolated
 * linearly in sRGB; the map is monotonic in lightness, so that is close enough for a legend of 10 steps.
 */
const VIRIDIS_STOPS = [
  '#440154', '#482576', '#414487', '#35608D', '#2A788E', '#21908C', '#22A884', '#43BF71', '#7AD151', '#BBDF27', '#FDE725',
] as const;

function hexToRgb(hex: string): [number, number, number] {
  const n = parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

const rgbStops = VIRIDIS_STOPS.map(hexToRgb);

/** Colour for t in [0, 1] (clamped). */
export function viridis(t: number): string {
  const x = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0)) * (rgbStops.length - 1);
  const i = Math.min(rgbStops.length - 2, Math.floor(x));
  const f = x - i;
  const a = rgbStops[i];
  const b = rgbStops[i + 1];
  const c = (k: number) => Math.round(a[k] + (b[k] - a[k]) * f).toString(16).padStart(2, '0');
  return `#${c(0)}${c(1)}${c(2)}`;
}

/** Text colour readable on a viridis fill (light on the dark end). */
export function viridisText(t: number): string {
  return t < 0.55 ? '#FFFFFF' : '#0E2A33';
}
