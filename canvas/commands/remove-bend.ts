/** Remove the bend joining two tubes on one end face (either order). */
import type { CoilDocument, EndFace, TubeRef } from '@/lib/engine/types';
import { sameTube } from './tube-ends';

export interface RemoveBendArgs { end: EndFace; a: TubeRef; b: TubeRef }

export function removeBend(doc: CoilDocument, { end, a, b }: RemoveBendArgs): void {
  const i = doc.circuiting.bends.findIndex(
    (x) => x.end === end && ((sameTube(x.a, a) && sameTube(x.b, b)) || (sameTube(x.a, b) && sameTube(x.b, a))),
  );
  if (i >= 0) doc.circuiting.bends.splice(i, 1);
}
