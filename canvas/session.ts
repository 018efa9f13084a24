/**
 * Session state of the editor (ARCHITECTURE.md section 4): what is selected, which tool is active and which end
 * face is shown. Not persisted; a history step restores the selection it started from.
 */
import type { EndFace, TubeRef } from '@/lib/engine/types';

export type Tool = 'bend' | 'supply' | 'return' | 'erase' | 'select';
/** The face drawn: one end face, or both with the other one faint. */
export type FaceShown = EndFace | 'both';

export type Selection =
  | { kind: 'tube'; tube: TubeRef }
  /** A bend picked with Select (to mark or unmark it as a crossover). */
  | { kind: 'bend'; end: EndFace; a: TubeRef; b: TubeRef }
  | { kind: 'circuit'; circuit: number }
  | { kind: 'issue'; tubes: TubeRef[]; circuits: number[] }
  | null;

export interface SessionState {
  tool: Tool;
  face: FaceShown;
  selection: Selection;
  /** First tube of a bend being drawn by two taps (bend tool). */
  pendingTube: TubeRef | null;
}

export const initialSession: SessionState = { tool: 'bend', face: 'opposite', selection: null, pendingTube: null };

/** The end face a drawing tool acts on when both faces are overlaid: the connection end (headers, return bends). */
export function activeFace(face: FaceShown): EndFace {
  return face === 'both' ? 'connection' : face;
}
