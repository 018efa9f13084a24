/**
 * Undo history entries (ARCHITECTURE.md section 4): immer patches and inverse patches of one user step, plus the
 * selection before and after it, so undo puts the user back where the step started. Each entry also keeps the
 * document before and after the step: immer shares every unchanged part between them, so they cost little, and
 * undo/redo swap them in at once instead of replaying patches (which copies whole bend lists on a large sheet).
 */
import type { Patch } from 'immer';
import type { CoilDocument } from '@/lib/engine/types';
import type { Selection } from './session';

export interface HistoryEntry {
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
  selectionBefore: Selection;
  selectionAfter: Selection;
  documentBefore: CoilDocument;
  documentAfter: CoilDocument;
}

/** Longest undo history kept; older steps fall off the start. */
export const HISTORY_LIMIT = 200;

/** An open gesture (a drag, a slider): its steps collect here and become one entry when it ends. */
export interface OpenGesture {
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
  selectionBefore: Selection;
  documentBefore: CoilDocument;
}
