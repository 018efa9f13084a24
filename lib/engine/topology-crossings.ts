/**
 * T5 crossing-bend check of the tracer (ENGINEERING.md 2.1), kept apart from topology.ts because it is the hot loop
 * of a large drawing. Bends are straight segments between tube centres in the exact integer frame x = row - 1,
 * y = half-pitch level (segment intersection is invariant under positive scaling of either axis, so no metres).
 */
import type { Bend, EndFace } from '@/lib/engine/types';

/** Same as segmentsIntersect on scalar coordinates: no point objects on the hot path. */
export function segmentsIntersectXY(
  p1x: number, p1y: number, p2x: number, p2y: number,
  p3x: number, p3y: number, p4x: number, p4y: number,
): boolean {
  const d1 = Math.sign((p4x - p3x) * (p1y - p3y) - (p4y - p3y) * (p1x - p3x));
  const d2 = Math.sign((p4x - p3x) * (p2y - p3y) - (p4y - p3y) * (p2x - p3x));
  const d3 = Math.sign((p2x - p1x) * (p3y - p1y) - (p2y - p1y) * (p3x - p1x));
  const d4 = Math.sign((p2x - p1x) * (p4y - p1y) - (p2y - p1y) * (p4x - p1x));
  if (d1 * d2 < 0 && d3 * d4 < 0) return true;
  if (d1 === 0 && within(p3x, p3y, p1x, p1y, p4x, p4y)) return true;
  if (d2 === 0 && within(p3x, p3y, p2x, p2y, p4x, p4y)) return true;
  if (d3 === 0 && within(p1x, p1y, p3x, p3y, p2x, p2y)) return true;
  if (d4 === 0 && within(p1x, p1y, p4x, p4y, p2x, p2y)) return true;
  return false;
}

/** q inside the bounding box of p-r. */
function within(px: number, py: number, qx: number, qy: number, rx: number, ry: number): boolean {
  return Math.min(px, rx) <= qx && qx <= Math.max(px, rx) && Math.min(py, ry) <= qy && qy <= Math.max(py, ry);
}

/** Per-bend integer data the tracer has already computed (tube indices are -1 for unusable bends). */
export interface BendFrame {
  usable: Uint8Array;
  tubeA: Int32Array;
  tubeB: Int32Array;
  /** Integer frame of each bend's two tubes: x = row - 1, y = half-pitch level. */
  ax: Int32Array;
  ay: Int32Array;
  bx: Int32Array;
  by: Int32Array;
  rows: number;
}

/**
 * Pairs of crossing bends on one face, as [lower bend index, higher bend index], in a fixed order: bends sorted by
 * their lower x (then by index) and swept left to right; each bend is compared only with later bends whose x-range
 * starts within its own and whose y-range overlaps it. Bends sharing a tube never count as crossing. (A finer
 * bucketing by y was tried and was slower at 12 x 60: the rows are short enough for the plain sweep.)
 */
export function crossingPairs(bends: readonly Bend[], face: EndFace, f: BendFrame): [number, number][] {
  // Stable counting sort by lower x (0 .. rows - 1) of the face's usable, non-crossover bends in index order.
  const n = bends.length;
  const bucket = new Int32Array(f.rows + 1);
  let count = 0;
  for (let i = 0; i < n; i++) {
    const b = bends[i];
    if (f.usable[i] === 0 || b.end !== face || b.crossover) continue;
    bucket[Math.min(f.ax[i], f.bx[i]) + 1]++;
    count++;
  }
  for (let r = 1; r <= f.rows; r++) bucket[r] += bucket[r - 1];
  const order = new Int32Array(count);
  const x0 = new Int32Array(count);
  const x1 = new Int32Array(count);
  const y0 = new Int32Array(count);
  const y1 = new Int32Array(count);
  for (let i = 0; i < n; i++) {
    const b = bends[i];
    if (f.usable[i] === 0 || b.end !== face || b.crossover) continue;
    const lo = Math.min(f.ax[i], f.bx[i]);
    const k = bucket[lo]++;
    order[k] = i;
    x0[k] = lo;
    x1[k] = Math.max(f.ax[i], f.bx[i]);
    y0[k] = Math.min(f.ay[i], f.by[i]);
    y1[k] = Math.max(f.ay[i], f.by[i]);
  }
  const pairs: [number, number][] = [];
  const { tubeA, tubeB, ax, ay, bx, by } = f;
  for (let p = 0; p < count; p++) {
    const A = order[p];
    const ax1 = x1[p];
    const ay0 = y0[p];
    const ay1 = y1[p];
    const ta = tubeA[A];
    const tb = tubeB[A];
    for (let q = p + 1; q < count && x0[q] <= ax1; q++) {
      if (y0[q] > ay1 || y1[q] < ay0) continue;
      const B = order[q];
      const tc = tubeA[B];
      const td = tubeB[B];
      if (ta === tc || ta === td || tb === tc || tb === td) continue;
      if (segmentsIntersectXY(ax[A], ay[A], bx[A], by[A], ax[B], ay[B], bx[B], by[B])) pairs.push(A < B ? [A, B] : [B, A]);
    }
  }
  return pairs;
}
