/**
 * What a read-only sheet marks on top of the circuiting: compare highlights (bends and header stubs added, removed
 * or changed between two versions) and comment markers at the tube, bend or circuit a comment is pinned to.
 * Pure functions, so the rules are tested without rendering.
 */
import type { Bend, Stub, TubeRef } from '@/lib/engine/types';
import type { CommentPin, CompareReply } from '@/lib/schema/api-versions';

export type ChangeTone = 'added' | 'removed' | 'changed';

export type SheetHighlight =
  | { kind: 'bend'; bend: Bend; tone: ChangeTone }
  | { kind: 'stub'; stubKind: 'supply' | 'return'; stub: Stub; tone: ChangeTone };

/** Marks for the earlier (`a`) or later (`b`) sheet of a comparison: what left, what arrived, what changed. */
export function compareHighlights(diff: Pick<CompareReply, 'bends' | 'stubs'>, side: 'a' | 'b'): SheetHighlight[] {
  const out: SheetHighlight[] = [];
  const gone = side === 'a' ? diff.bends.removed : diff.bends.added;
  for (const bend of gone) out.push({ kind: 'bend', bend, tone: side === 'a' ? 'removed' : 'added' });
  for (const c of diff.bends.changed) out.push({ kind: 'bend', bend: side === 'a' ? c.before : c.after, tone: 'changed' });
  const stubs = side === 'a' ? diff.stubs.removed : diff.stubs.added;
  for (const s of stubs) out.push({ kind: 'stub', stubKind: s.kind, stub: s.stub, tone: side === 'a' ? 'removed' : 'added' });
  for (const c of diff.stubs.changed) {
    const s = side === 'a' ? c.before : c.after;
    out.push({ kind: 'stub', stubKind: s.kind, stub: s.stub, tone: 'changed' });
  }
  return out;
}

export function changeCount(diff: Pick<CompareReply, 'bends' | 'stubs'>): { added: number; removed: number; changed: number } {
  return {
    added: diff.bends.added.length + diff.stubs.added.length,
    removed: diff.bends.removed.length + diff.stubs.removed.length,
    changed: diff.bends.changed.length + diff.stubs.changed.length,
  };
}

/** The tube a pin is drawn at: the tube itself, the first tube of a bend, or the supply tube of a circuit. */
export function pinAnchor(pin: CommentPin, circuits: readonly { index: number; tubes: TubeRef[] }[]): TubeRef[] {
  switch (pin.kind) {
    case 'tube':
      return [{ row: pin.row, tube: pin.tube }];
    case 'bend':
      return [pin.a, pin.b];
    case 'circuit': {
      const c = circuits.find((x) => x.index === pin.index);
      return c && c.tubes.length > 0 ? [c.tubes[0]] : [];
    }
  }
}
