/**
 * Shared helpers for commands: a tube end is one tube on one end face, and it takes at most one connection
 * (a bend or a header stub, ENGINEERING.md 2.1 T2).
 */
import { current, isDraft, type Draft } from 'immer';
import type { Circuiting, EndFace, TubeRef } from '@/lib/engine/types';

export function sameTube(a: TubeRef, b: TubeRef): boolean {
  return a.row === b.row && a.tube === b.tube;
}

/**
 * The array as it stands, without drafting its items: filtering a drafted array through the immer proxy drafts
 * every bend it reads (hundreds on a large sheet), which was most of the cost of an erase.
 */
function plain<T>(xs: T[]): T[] {
  return isDraft(xs) ? (current<T[]>(xs as Draft<T[]>) as T[]) : xs;
}

/** Removes every bend and stub that uses `tube` on `end`; returns how many connections were removed. */
export function clearTubeEnd(c: Circuiting, end: EndFace, tube: TubeRef): number {
  const before = c.bends.length + c.supply.length + c.return.length;
  c.bends = plain(c.bends).filter((b) => !(b.end === end && (sameTube(b.a, tube) || sameTube(b.b, tube))));
  c.supply = plain(c.supply).filter((s) => !(s.end === end && sameTube(s.tube, tube)));
  c.return = plain(c.return).filter((s) => !(s.end === end && sameTube(s.tube, tube)));
  return before - (c.bends.length + c.supply.length + c.return.length);
}

export function insideGrid(t: TubeRef, rows: number, tubesPerRow: number): boolean {
  return t.row >= 1 && t.row <= rows && t.tube >= 1 && t.tube <= tubesPerRow;
}
