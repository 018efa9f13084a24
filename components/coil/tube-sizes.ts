/**
 * Tube sizes offered by the geometry form, with the wall and equilateral pitch that usually go with them
 * (ENGINEERING.md 1.1 table: walls and pitches as listed there, the middle of each range where it gives several).
 */
export interface TubeSize {
  id: string;
  label: string;
  outerDiameter_m: number;
  wall_m: number;
  transversePitch_m: number;
  rowPitch_m: number;
}

export const TUBE_SIZES: readonly TubeSize[] = [
  { id: '7mm', label: '7 mm', outerDiameter_m: 0.007, wall_m: 0.00028, transversePitch_m: 0.021, rowPitch_m: 0.0127 },
  { id: '3/8', label: '3/8 in', outerDiameter_m: 0.009525, wall_m: 0.000356, transversePitch_m: 0.0254, rowPitch_m: 0.022 },
  { id: '1/2', label: '1/2 in', outerDiameter_m: 0.0127, wall_m: 0.00041, transversePitch_m: 0.03175, rowPitch_m: 0.0275 },
  { id: '5/8', label: '5/8 in', outerDiameter_m: 0.015875, wall_m: 0.00051, transversePitch_m: 0.0381, rowPitch_m: 0.033 },
];

/** The listed size a diameter matches (within 0.05 mm), or null for a custom tube. */
export function tubeSizeOf(outerDiameter_m: number): TubeSize | null {
  return TUBE_SIZES.find((t) => Math.abs(t.outerDiameter_m - outerDiameter_m) < 5e-5) ?? null;
}

/** Common fin densities, fins per inch (ENGINEERING.md 1.1: 6-16 FPI for 1/2 in water coils). */
export const COMMON_FPI = [8, 10, 12, 14] as const;

/** W/(m K) per Btu/(h ft °F): 1 Btu/(h ft °F) = 1.730735 W/(m K) (from the IT Btu, foot and °F definitions). */
export const CONDUCTIVITY_IP_W_mK = 1.730735;
