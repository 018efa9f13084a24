/**
 * Derived geometry of a staggered plate-fin tube bank (ENGINEERING.md section 1.3) and the positions of tube
 * centres on the end face (section 1.3 item 12). SI throughout.
 */
import type { Bend, Geometry, TubeRef } from '@/lib/engine/types';

export interface DerivedGeometry {
  /** D_i = D_o - 2 t_w, m (1.3 item 1; no expansion allowance). */
  insideDiameter_m: number;
  /** D_c = D_o + 2 delta_f, m (1.3 item 2). */
  collarDiameter_m: number;
  /** N_f = L_f / F_p (not rounded: the areas use the exact ratio; the bill of materials rounds). */
  finCount: number;
  /** Clear gap between fins s = F_p - delta_f, m. */
  finSpacing_m: number;
  /** H = N_T P_t, m. */
  finHeight_m: number;
  /** Coil depth in the air direction D = N_R P_l, m. */
  depth_m: number;
  /** A_fr = H L_f, m2. */
  faceArea_m2: number;
  /** Minimum free-flow area over face area (1.3 item 5). */
  sigma: number;
  /** A_c = sigma A_fr, m2. */
  minFreeFlowArea_m2: number;
  /** sec(theta) of a wavy fin (1 for plain fins). */
  finAreaFactor: number;
  /** A_f, both faces, holes removed, edges neglected, times sec(theta) for wavy fins, m2 (1.3 item 6). */
  finArea_m2: number;
  /** A_p = pi D_c (L_f - N_f delta_f) N_T N_R, m2 (1.3 item 7). */
  primaryArea_m2: number;
  /** A_o = A_f + A_p, m2. */
  outsideArea_m2: number;
  /** A_f / A_o. */
  finAreaFraction: number;
  /** Kays-London hydraulic diameter D_h = 4 A_c D / A_o, m (1.3 item 9). */
  hydraulicDiameter_m: number;
  /** A_i = pi D_i L_f N_T N_R, straight tubes only, m2 (1.3 item 10). */
  insideArea_m2: number;
  /** A_pt = pi D_o L_f N_T N_R, m2 (1.3 item 11). */
  bareTubeArea_m2: number;
  /** A_x = pi D_i^2 / 4, flow area of one tube, m2. */
  tubeFlowArea_m2: number;
  /** N_T N_R. */
  tubeCount: number;
  /** Air-side area of one tube's share of the bank, m2 (A_o / tubeCount). */
  outsideAreaPerTube_m2: number;
  /** Fin area of one tube's share, m2. */
  finAreaPerTube_m2: number;
  /** Primary area of one tube, m2. */
  primaryAreaPerTube_m2: number;
  /** Inside area of one tube, m2. */
  insideAreaPerTube_m2: number;
}

/**
 * Derived geometry of a staggered plate-fin bank, ENGINEERING.md section 1.3 items 1-11.
 * Minimum free-flow area: gap = a if a <= 2b else 2b with a = P_t - D_c, b = sqrt((P_t/2)^2 + P_l^2) - D_c;
 * sigma = gap (F_p - delta_f) / (P_t F_p). Wavy fins multiply the fin term by sec(theta) = sqrt(x_f^2 + p_d^2) / x_f.
 * Example (reference coil of 1.3, 4 rows): sigma = 0.555680, A_f = 68.2346 m2, A_o = 72.7324 m2, D_h = 3.1230 mm.
 * Throws RangeError for a geometry with no free flow area or no inside diameter (impossible inputs).
 */
export function deriveGeometry(g: Geometry): DerivedGeometry {
  const Do = g.tubeOuterDiameter_m;
  const Di = Do - 2 * g.tubeWall_m;
  const Dc = Do + 2 * g.fin.thickness_m;
  const Pt = g.transversePitch_m;
  const Pl = g.rowPitch_m;
  const Fp = g.fin.pitch_m;
  const df = g.fin.thickness_m;
  const Lf = g.finnedLength_m;
  if (!(Di > 0)) throw new RangeError('tube wall leaves no inside diameter');
  if (!(Fp > df)) throw new RangeError('fin pitch must exceed fin thickness');

  const tubeCount = g.rows * g.tubesPerRow;
  const finCount = Lf / Fp;
  const H = g.tubesPerRow * Pt;
  const D = g.rows * Pl;
  const faceArea = H * Lf;

  const a = Pt - Dc;
  const b = Math.hypot(Pt / 2, Pl) - Dc;
  const gap = a <= 2 * b ? a : 2 * b;
  if (!(gap > 0)) throw new RangeError('tube pitches leave no free flow area between fin collars');
  const sigma = (gap * (Fp - df)) / (Pt * Fp);

  const finAreaFactor =
    g.fin.type === 'wavy' && g.fin.waveDepth_m !== undefined && g.fin.waveHalfLength_m !== undefined
      ? Math.hypot(g.fin.waveHalfLength_m, g.fin.waveDepth_m) / g.fin.waveHalfLength_m
      : 1;
  const finArea = 2 * finCount * (H * D - (tubeCount * Math.PI * Dc * Dc) / 4) * finAreaFactor;
  const primaryArea = Math.PI * Dc * (Lf - finCount * df) * tubeCount;
  const outsideArea = finArea + primaryArea;
  const minFreeFlowArea = sigma * faceArea;
  const insideArea = Math.PI * Di * Lf * tubeCount;

  return {
    insideDiameter_m: Di,
    collarDiameter_m: Dc,
    finCount,
    finSpacing_m: Fp - df,
    finHeight_m: H,
    depth_m: D,
    faceArea_m2: faceArea,
    sigma,
    minFreeFlowArea_m2: minFreeFlowArea,
    finAreaFactor,
    finArea_m2: finArea,
    primaryArea_m2: primaryArea,
    outsideArea_m2: outsideArea,
    finAreaFraction: finArea / outsideArea,
    hydraulicDiameter_m: (4 * minFreeFlowArea * D) / outsideArea,
    insideArea_m2: insideArea,
    bareTubeArea_m2: Math.PI * Do * Lf * tubeCount,
    tubeFlowArea_m2: (Math.PI * Di * Di) / 4,
    tubeCount,
    outsideAreaPerTube_m2: outsideArea / tubeCount,
    finAreaPerTube_m2: finArea / tubeCount,
    primaryAreaPerTube_m2: primaryArea / tubeCount,
    insideAreaPerTube_m2: insideArea / tubeCount,
  };
}

/**
 * Centre of a tube on the end face, ENGINEERING.md 1.3 item 12 with rows and tubes counted from 1:
 * x = (row - 1) P_l along the air flow from row 1; y = (tube - 1) P_t DOWN from the top tube, plus P_t/2 for even
 * rows (ARCHITECTURE.md section 2: even rows sit half a transverse pitch lower).
 */
export function tubeCentre(g: Geometry, ref: TubeRef): { x_m: number; y_m: number } {
  return {
    x_m: (ref.row - 1) * g.rowPitch_m,
    y_m: (ref.tube - 1) * g.transversePitch_m + (ref.row % 2 === 0 ? g.transversePitch_m / 2 : 0),
  };
}

/**
 * Vertical position in half transverse pitches (integer), down from the top tube of row 1: 2 (tube - 1) plus 1 for
 * even rows. Integer arithmetic for adjacency and height comparisons.
 */
export function halfPitchLevel(ref: TubeRef): number {
  return 2 * (ref.tube - 1) + (ref.row % 2 === 0 ? 1 : 0);
}

/**
 * True when two tubes are neighbours a formed hairpin can join: same row +-1 tube, or the staggered neighbour in
 * the next row (ENGINEERING.md 2.1 T5).
 */
export function areNeighbours(a: TubeRef, b: TubeRef): boolean {
  const dRow = Math.abs(a.row - b.row);
  const dLevel = Math.abs(halfPitchLevel(a) - halfPitchLevel(b));
  return (dRow === 0 && dLevel === 2) || (dRow === 1 && dLevel === 1);
}

/**
 * Bend centre-line radius R_b = |p1 - p2| / 2 (ENGINEERING.md 1.3 item 12). Same-row neighbours: P_t/2;
 * next-row neighbour: sqrt((P_t/2)^2 + P_l^2)/2. Example: 1/2 in reference pitch, same row: 15.875 mm.
 */
export function bendRadius_m(g: Geometry, a: TubeRef, b: TubeRef): number {
  const p = tubeCentre(g, a);
  const q = tubeCentre(g, b);
  return Math.hypot(p.x_m - q.x_m, p.y_m - q.y_m) / 2;
}

/**
 * Internal water volume, m3: the straight tubes (N_T N_R pi D_i^2/4 L_f, straight length = finned length per v1
 * decision 2) plus, when bends are given, each bend as a half torus of centre-line length pi R_b with the tube's
 * inside cross-section. Header stubs and headers are not counted.
 */
export function internalVolume_m3(g: Geometry, bends: readonly Bend[] = []): number {
  const Di = g.tubeOuterDiameter_m - 2 * g.tubeWall_m;
  const flowArea = (Math.PI * Di * Di) / 4;
  const straight = flowArea * g.finnedLength_m * g.rows * g.tubesPerRow;
  let bendLength = 0;
  for (const b of bends) bendLength += Math.PI * bendRadius_m(g, b.a, b.b);
  return straight + flowArea * bendLength;
}
