/** React bindings for the editor and view stores. */
import { useStore } from 'zustand';
import type { EditorState, EditorStore } from './store';
import type { ViewState, ViewStore } from './view-store';

export function useEditor<T>(store: EditorStore, selector: (s: EditorState) => T): T {
  return useStore(store, selector);
}

export function useView<T>(store: ViewStore, selector: (s: ViewState) => T): T {
  return useStore(store, selector);
}
