/**
 * Undo history entries (ARCHITECTURE.md section 4): immer patches and inverse patches of one user step, plus the
 * selection before and after it, so undo puts the user back where the step started.
 */
import type { Patch } from 'immer';
import type { Selection } from './session';

export interface HistoryEntry {
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
  selectionBefore: Selection;
  selectionAfter: Selection;
}

/** Longest undo history kept; older steps fall off the start. */
export const HISTORY_LIMIT = 200;

/** An open gesture (a drag, a slider): its steps collect here and become one entry when it ends. */
export interface OpenGesture {
  label: string;
  patches: Patch[];
  inversePatches: Patch[];
  selectionBefore: Selection;
}
