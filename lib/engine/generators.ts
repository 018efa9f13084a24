/**
 * Standard circuitings for the editor and the examples (ENGINEERING.md 2.2 vocabulary, 2.3 counterflow, 2.4
 * supply at the bottom, v1 decision 12 headers).
 *
 * Method: the tube sheet is cut into vertical bands of consecutive tube positions. Each band is walked as one
 * counterflow meander: the air-leaving row N from the band's bottom tube upward, a step to row N-1, that row
 * downward, and so on to row 1. Every step of the meander joins neighbours (same row +-1 tube, or the staggered
 * neighbour in the next row), the row never increases along it, and meanders of different bands occupy disjoint
 * heights, so no two bends cross. Each band's meander is then cut into consecutive circuits. Any cut of a
 * counterflow meander is counterflow (or single-row), and because each circuit starts at the connection end and
 * alternates faces, circuits of even passes have both stubs on the connection end; odd-pass circuits return on the
 * opposite end, so all circuits of one coil must share the parity of their pass count (T7). The band count is
 * chosen by search: passes differing by at most two if possible, then most circuits running from row N to row 1
 * (so feeds = tubes high gives the classic full serpentine even when the row count is odd), then equal passes,
 * then even passes (both headers on the connection end).
 */
import type { Bend, Circuiting, EndFace, Geometry, Stub, TubeRef } from '@/lib/engine/types';

export interface SerpentineOptions {
  /** 'counterflow' (default): water enters row N and leaves row 1. 'parallel': the mirror image, for comparisons. */
  direction?: 'counterflow' | 'parallel';
}

export interface FeedCandidate {
  feeds: number;
  passes: { min: number; max: number };
  /** True when every circuit has an even number of passes (both headers on the connection end). */
  even: boolean;
}

interface Plan {
  /** Band widths, top band first. */
  widths: number[];
  /** Circuit lengths (passes) per band, in meander order. */
  lengths: number[][];
  even: boolean;
  spread: number;
  fullDepth: number;
}

/** Split n into c near-equal parts, all of one parity; null when impossible. */
function splitWithParity(n: number, c: number, parity: 0 | 1): number[] | null {
  if (c < 1) return null;
  const rest = n - parity * c; // parts = 2 k_i + parity, sum k_i = rest / 2
  if (rest < 0 || rest % 2 !== 0) return null;
  const pairs = rest / 2;
  const base = Math.floor(pairs / c);
  const extra = pairs % c;
  const parts = Array.from({ length: c }, (_, i) => 2 * (base + (i < extra ? 1 : 0)) + parity);
  if (parts.some((p) => p < 1)) return null;
  return parts;
}

function planFor(rows: number, tubesPerRow: number, feeds: number): Plan | null {
  const total = rows * tubesPerRow;
  if (!Number.isInteger(feeds) || feeds < 1 || feeds > total) return null;
  let best: Plan | null = null;
  let bestScore: number[] | null = null;
  for (let bands = 1; bands <= Math.min(tubesPerRow, feeds); bands++) {
    const w0 = Math.floor(tubesPerRow / bands);
    const wide = tubesPerRow % bands;
    // Wider bands at the bottom keeps the top bands regular; any order is buildable.
    const widths = Array.from({ length: bands }, (_, i) => w0 + (i >= bands - wide ? 1 : 0));
    const sizes = widths.map((w) => w * rows);
    // Circuits per band in proportion to the band's tubes (largest remaining share first).
    const counts = sizes.map(() => 1);
    for (let left = feeds - bands; left > 0; left--) {
      let pick = 0;
      for (let i = 1; i < bands; i++) if (sizes[i] / counts[i] > sizes[pick] / counts[pick]) pick = i;
      counts[pick]++;
    }
    for (const parity of [0, 1] as const) {
      const lengths = sizes.map((n, i) => splitWithParity(n, counts[i], parity));
      if (lengths.some((l) => l === null)) continue;
      const all = (lengths as number[][]).flat();
      const spread = Math.max(...all) - Math.min(...all);
      const fullDepth = (lengths as number[][]).filter((l) => l.length === 1).length;
      const plan: Plan = { widths, lengths: lengths as number[][], even: parity === 0, spread, fullDepth };
      const score = [Math.max(spread - 2, 0), -fullDepth, spread, parity, bands];
      if (!bestScore || lexLess(score, bestScore)) {
        best = plan;
        bestScore = score;
      }
    }
  }
  return best;
}

function lexLess(a: number[], b: number[]): boolean {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return a[k] < b[k];
  return false;
}

/** The counterflow meander of one band (tubes top..bottom, 1-based), row N first, starting at the bottom tube. */
function bandMeander(rows: number, top: number, bottom: number): TubeRef[] {
  const path: TubeRef[] = [];
  let upward = true;
  for (let row = rows; row >= 1; row--) {
    for (let k = 0; k <= bottom - top; k++) path.push({ row, tube: upward ? bottom - k : top + k });
    upward = !upward;
  }
  return path;
}

/**
 * Fill the tube sheet with `feeds` circuits (full serpentine: feeds = tubes high; half: tubes high / 2; double:
 * 2 x tubes high; other counts give circuits whose passes differ by as little as the sheet allows, usually at most
 * two). Counterflow, supply at the connection end at the bottom of each band, return on the connection end when
 * the passes are even. Throws RangeError when feeds is not a whole number between 1 and the tube count.
 */
export function serpentineCircuiting(geometry: Pick<Geometry, 'rows' | 'tubesPerRow'>, feeds: number, options: SerpentineOptions = {}): Circuiting {
  const { rows, tubesPerRow } = geometry;
  const plan = planFor(rows, tubesPerRow, feeds);
  if (!plan) throw new RangeError(`cannot build ${feeds} circuits in ${rows} rows x ${tubesPerRow} tubes`);
  const mirror = options.direction === 'parallel';
  const bends: Bend[] = [];
  const supply: Stub[] = [];
  const ret: Stub[] = [];
  let top = 1;
  plan.widths.forEach((w, bandNo) => {
    const meander = bandMeander(rows, top, top + w - 1).map((t) => (mirror ? { row: rows + 1 - t.row, tube: t.tube } : t));
    let at = 0;
    for (const len of plan.lengths[bandNo]) {
      const tubes = meander.slice(at, at + len);
      at += len;
      let face: EndFace = 'connection';
      supply.push({ end: face, tube: tubes[0] });
      for (let k = 0; k + 1 < tubes.length; k++) {
        face = face === 'connection' ? 'opposite' : 'connection';
        bends.push({ end: face, a: tubes[k], b: tubes[k + 1] });
      }
      ret.push({ end: face === 'connection' ? 'opposite' : 'connection', tube: tubes[tubes.length - 1] });
    }
    top += w;
  });
  return { bends, supply, return: ret };
}

/**
 * Feed counts the editor can offer: every count from 1 to twice the tubes high (and at most the tube count) whose
 * circuits differ by at most two passes, with the passes range and whether all circuits are even-pass.
 */
export function candidateFeedCounts(geometry: Pick<Geometry, 'rows' | 'tubesPerRow'>): FeedCandidate[] {
  const { rows, tubesPerRow } = geometry;
  const out: FeedCandidate[] = [];
  for (let feeds = 1; feeds <= Math.min(rows * tubesPerRow, 2 * tubesPerRow); feeds++) {
    const plan = planFor(rows, tubesPerRow, feeds);
    if (!plan || plan.spread > 2) continue;
    const all = plan.lengths.flat();
    out.push({ feeds, passes: { min: Math.min(...all), max: Math.max(...all) }, even: plan.even });
  }
  return out;
}

/**
 * Circuiting from tube lists in water order: each list is one circuit whose supply stub is on the connection end,
 * with bends on alternating faces and the return stub on the face where the water leaves the last tube
 * (ENGINEERING.md 2.1, T2-T3). Used to build test and benchmark coils from explicit paths.
 */
export function circuitingFromPaths(paths: TubeRef[][]): Circuiting {
  const bends: Bend[] = [];
  const supply: Stub[] = [];
  const ret: Stub[] = [];
  for (const tubes of paths) {
    let face: EndFace = 'connection';
    supply.push({ end: face, tube: tubes[0] });
    for (let k = 0; k + 1 < tubes.length; k++) {
      face = face === 'connection' ? 'opposite' : 'connection';
      bends.push({ end: face, a: tubes[k], b: tubes[k + 1] });
    }
    ret.push({ end: face === 'connection' ? 'opposite' : 'connection', tube: tubes[tubes.length - 1] });
  }
  return { bends, supply, return: ret };
}
