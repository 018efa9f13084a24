/** Replace the whole circuiting at once (a generator's standard circuiting, or "clear all"). */
import type { Circuiting, CoilDocument } from '@/lib/engine/types';

export function replaceCircuiting(doc: CoilDocument, circuiting: Circuiting): void {
  doc.circuiting = {
    bends: circuiting.bends.map((b) => ({ ...b, a: { ...b.a }, b: { ...b.b } })),
    supply: circuiting.supply.map((s) => ({ end: s.end, tube: { ...s.tube } })),
    return: circuiting.return.map((s) => ({ end: s.end, tube: { ...s.tube } })),
  };
}
