/**
 * The editor store: zustand holding the coil document, the session and the undo history. Every document change
 * goes through dispatch(command, args), which runs the command's immer recipe with patches and records a
 * history entry. View state (pan, zoom, hover) lives in view-store.ts, never here.
 */
import { applyPatches, enablePatches, produceWithPatches, type Patch } from 'immer';
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { CoilDocument, TubeRef } from '@/lib/engine/types';
import { commandLabels, commands, type CommandArgs, type CommandName } from './commands';
import { HISTORY_LIMIT, type HistoryEntry, type OpenGesture } from './history';
import { initialSession, type FaceShown, type Selection, type SessionState, type Tool } from './session';

enablePatches();

export interface DispatchOptions {
  /** Selection after the step (default: unchanged). */
  selection?: Selection;
  /** History label (default: the command's label). */
  label?: string;
}

export interface EditorState {
  document: CoilDocument;
  /** Increases with every change of the document (dispatch, undo, redo, load): results are matched to it. */
  documentVersion: number;
  session: SessionState;
  past: HistoryEntry[];
  future: HistoryEntry[];
  gesture: OpenGesture | null;

  /** Replace the document (opening a coil, reloading the server's draft): clears history, adds no entry. */
  load(document: CoilDocument): void;
  /** Apply one command; returns true when the document changed. */
  dispatch<N extends CommandName>(name: N, args: CommandArgs<N>, options?: DispatchOptions): boolean;
  /** Start a gesture: the commands dispatched until endGesture become one undo step. */
  beginGesture(label: string): void;
  endGesture(): void;
  /** Abandon a gesture: its changes are rolled back and nothing is recorded. */
  cancelGesture(): void;
  undo(): void;
  redo(): void;
  setTool(tool: Tool): void;
  setFace(face: FaceShown): void;
  select(selection: Selection): void;
  setPendingTube(tube: TubeRef | null): void;
}

export type EditorStore = StoreApi<EditorState>;

export function createEditorStore(initial: CoilDocument): EditorStore {
  return createStore<EditorState>()((set, get) => {
    const applyStep = (entry: HistoryEntry, direction: 'undo' | 'redo') => {
      const s = get();
      // Every change of the document is in the history, so the entry's snapshot is exactly what the patches
      // would rebuild; the patches are replayed only if that ever stops holding.
      const expected = direction === 'undo' ? entry.documentAfter : entry.documentBefore;
      const target = direction === 'undo' ? entry.documentBefore : entry.documentAfter;
      const patches: Patch[] = direction === 'undo' ? entry.inversePatches : entry.patches;
      set({
        document: s.document === expected ? target : applyPatches(s.document, patches),
        documentVersion: s.documentVersion + 1,
        session: {
          ...s.session,
          pendingTube: null,
          selection: direction === 'undo' ? entry.selectionBefore : entry.selectionAfter,
        },
      });
    };

    return {
      document: initial,
      documentVersion: 0,
      session: initialSession,
      past: [],
      future: [],
      gesture: null,

      load(document) {
        set((s) => ({
          document,
          documentVersion: s.documentVersion + 1,
          past: [],
          future: [],
          gesture: null,
          session: { ...s.session, selection: null, pendingTube: null },
        }));
      },

      dispatch(name, args, options = {}) {
        const s = get();
        const recipe = commands[name] as (doc: CoilDocument, a: CommandArgs<typeof name>) => void;
        const [next, patches, inversePatches] = produceWithPatches(s.document, (draft: CoilDocument) => {
          recipe(draft, args);
        });
        const selectionAfter = options.selection === undefined ? s.session.selection : options.selection;
        if (patches.length === 0) {
          if (options.selection !== undefined) set({ session: { ...s.session, selection: selectionAfter } });
          return false;
        }
        const session = { ...s.session, selection: selectionAfter };
        if (s.gesture) {
          set({
            document: next,
            documentVersion: s.documentVersion + 1,
            session,
            gesture: {
              ...s.gesture,
              patches: [...s.gesture.patches, ...patches],
              inversePatches: [...inversePatches, ...s.gesture.inversePatches],
            },
          });
          return true;
        }
        const entry: HistoryEntry = {
          label: options.label ?? commandLabels[name],
          patches,
          inversePatches,
          selectionBefore: s.session.selection,
          selectionAfter,
          documentBefore: s.document,
          documentAfter: next,
        };
        set({
          document: next,
          documentVersion: s.documentVersion + 1,
          session,
          past: [...s.past, entry].slice(-HISTORY_LIMIT),
          future: [],
        });
        return true;
      },

      beginGesture(label) {
        const s = get();
        if (s.gesture) s.endGesture();
        set({ gesture: { label, patches: [], inversePatches: [], selectionBefore: get().session.selection, documentBefore: get().document } });
      },

      endGesture() {
        const s = get();
        const g = s.gesture;
        if (!g) return;
        if (g.patches.length === 0) {
          set({ gesture: null });
          return;
        }
        const entry: HistoryEntry = {
          label: g.label,
          patches: g.patches,
          inversePatches: g.inversePatches,
          selectionBefore: g.selectionBefore,
          selectionAfter: s.session.selection,
          documentBefore: g.documentBefore,
          documentAfter: s.document,
        };
        set({ gesture: null, past: [...s.past, entry].slice(-HISTORY_LIMIT), future: [] });
      },

      cancelGesture() {
        const s = get();
        const g = s.gesture;
        if (!g) return;
        if (g.patches.length === 0) {
          set({ gesture: null, session: { ...s.session, selection: g.selectionBefore, pendingTube: null } });
          return;
        }
        set({
          gesture: null,
          document: g.documentBefore,
          documentVersion: s.documentVersion + 1,
          session: { ...s.session, selection: g.selectionBefore, pendingTube: null },
        });
      },

      undo() {
        if (get().gesture) get().cancelGesture();
        const s = get();
        const entry = s.past[s.past.length - 1];
        if (!entry) return;
        set({ past: s.past.slice(0, -1), future: [...s.future, entry] });
        applyStep(entry, 'undo');
      },

      redo() {
        if (get().gesture) get().cancelGesture();
        const s = get();
        const entry = s.future[s.future.length - 1];
        if (!entry) return;
        set({ future: s.future.slice(0, -1), past: [...s.past, entry] });
        applyStep(entry, 'redo');
      },

      setTool(tool) {
        set((s) => ({ session: { ...s.session, tool, pendingTube: null } }));
      },
      setFace(face) {
        set((s) => ({ session: { ...s.session, face, pendingTube: null } }));
      },
      select(selection) {
        set((s) => ({ session: { ...s.session, selection } }));
      },
      setPendingTube(tube) {
        set((s) => ({ session: { ...s.session, pendingTube: tube } }));
      },
    };
  });
}
