/**
 * Change geometry fields. When the coil loses rows or tubes, bends and stubs that reach outside the new tube
 * sheet are dropped, so the circuiting never points at tubes that do not exist.
 */
import type { CoilDocument, Fin, Geometry } from '@/lib/engine/types';
import { insideGrid } from './tube-ends';

export type SetGeometryArgs = Partial<Omit<Geometry, 'fin' | 'layout'>> & { fin?: Partial<Fin> };

export function setGeometry(doc: CoilDocument, args: SetGeometryArgs): void {
  const { fin, ...rest } = args;
  Object.assign(doc.geometry, rest);
  if (fin) Object.assign(doc.geometry.fin, fin);
  if (doc.geometry.fin.type === 'plain') {
    delete doc.geometry.fin.waveDepth_m;
    delete doc.geometry.fin.waveHalfLength_m;
  }
  const { rows, tubesPerRow } = doc.geometry;
  const inside = (t: { row: number; tube: number }) => insideGrid(t, rows, tubesPerRow);
  const c = doc.circuiting;
  if (c.bends.some((b) => !inside(b.a) || !inside(b.b))) c.bends = c.bends.filter((b) => inside(b.a) && inside(b.b));
  if (c.supply.some((s) => !inside(s.tube))) c.supply = c.supply.filter((s) => inside(s.tube));
  if (c.return.some((s) => !inside(s.tube))) c.return = c.return.filter((s) => inside(s.tube));
}
