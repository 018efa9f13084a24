/** Erase whatever is connected to one tube end (its bend or its stub) on one end face. */
import type { CoilDocument, EndFace, TubeRef } from '@/lib/engine/types';
import { clearTubeEnd } from './tube-ends';

export interface EraseTubeEndArgs { end: EndFace; tube: TubeRef }

export function eraseTubeEnd(doc: CoilDocument, { end, tube }: EraseTubeEndArgs): void {
  clearTubeEnd(doc.circuiting, end, tube);
}
