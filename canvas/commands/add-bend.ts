/**
 * Draw a bend (hairpin or return bend) between two tube ends on one end face. A tube end takes one connection,
 * so whatever was on either end before is replaced; drawing the same bend again changes nothing.
 */
import type { CoilDocument, EndFace, TubeRef } from '@/lib/engine/types';
import { clearTubeEnd, insideGrid, sameTube } from './tube-ends';

export interface AddBendArgs { end: EndFace; a: TubeRef; b: TubeRef; crossover?: boolean }

export function addBend(doc: CoilDocument, { end, a, b, crossover }: AddBendArgs): void {
  const { rows, tubesPerRow } = doc.geometry;
  if (sameTube(a, b) || !insideGrid(a, rows, tubesPerRow) || !insideGrid(b, rows, tubesPerRow)) return;
  const c = doc.circuiting;
  const existing = c.bends.find(
    (x) => x.end === end && ((sameTube(x.a, a) && sameTube(x.b, b)) || (sameTube(x.a, b) && sameTube(x.b, a))),
  );
  if (existing && Boolean(existing.crossover) === Boolean(crossover)) return;
  clearTubeEnd(c, end, a);
  clearTubeEnd(c, end, b);
  c.bends.push(crossover ? { end, a: { ...a }, b: { ...b }, crossover: true } : { end, a: { ...a }, b: { ...b } });
}
