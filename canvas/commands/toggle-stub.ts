/**
 * Mark a tube end as a supply or return header stub. Marking the same stub again removes it (a toggle); any other
 * connection on that tube end is replaced.
 */
import type { CoilDocument, EndFace, TubeRef } from '@/lib/engine/types';
import { clearTubeEnd, insideGrid, sameTube } from './tube-ends';

export interface ToggleStubArgs { kind: 'supply' | 'return'; end: EndFace; tube: TubeRef }

export function toggleStub(doc: CoilDocument, { kind, end, tube }: ToggleStubArgs): void {
  if (!insideGrid(tube, doc.geometry.rows, doc.geometry.tubesPerRow)) return;
  const c = doc.circuiting;
  const already = c[kind].some((s) => s.end === end && sameTube(s.tube, tube));
  clearTubeEnd(c, end, tube);
  if (!already) c[kind].push({ end, tube: { ...tube } });
}
