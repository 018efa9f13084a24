/**
 * View state of the editor: pan, zoom and the point a bend is being dragged to. Never in the history and never
 * saved with the document (ARCHITECTURE.md section 4). Pan and zoom transform a wrapper, not the SVG viewBox.
 */
import { createStore, type StoreApi } from 'zustand/vanilla';
import type { TubeRef } from '@/lib/engine/types';

export interface ViewState {
  zoom: number;
  panX: number;
  panY: number;
  /** End of the bend being dragged, in sheet millimetres, or null. */
  dragTo: { x: number; y: number } | null;
  /** Tube under the mouse (wide screens), or null. */
  hover: TubeRef | null;
  setHover(tube: TubeRef | null): void;
  setView(view: Partial<Pick<ViewState, 'zoom' | 'panX' | 'panY'>>): void;
  setDragTo(point: { x: number; y: number } | null): void;
  /** Zoom by a factor about a point of the viewport (px), keeping that point still. */
  zoomAbout(factor: number, px: number, py: number): void;
}

export const MIN_ZOOM = 0.15;
export const MAX_ZOOM = 8;

export type ViewStore = StoreApi<ViewState>;

export function createViewStore(): ViewStore {
  return createStore<ViewState>()((set, get) => ({
    zoom: 1,
    panX: 0,
    panY: 0,
    dragTo: null,
    hover: null,
    setHover(tube) {
      const h = get().hover;
      if (h === tube || (h && tube && h.row === tube.row && h.tube === tube.tube)) return;
      set({ hover: tube });
    },
    setView: (view) => set(view),
    setDragTo: (dragTo) => set({ dragTo }),
    zoomAbout(factor, px, py) {
      const { zoom, panX, panY } = get();
      const next = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, zoom * factor));
      const k = next / zoom;
      set({ zoom: next, panX: px - (px - panX) * k, panY: py - (py - panY) * k });
    },
  }));
}

/** Zoom and pan that fit a drawing of width x height (px at zoom 1) into a viewport, centred, with a margin. */
export function fitView(drawingW: number, drawingH: number, viewportW: number, viewportH: number, margin = 16) {
  const zoom = Math.min(MAX_ZOOM, Math.max(MIN_ZOOM, Math.min((viewportW - 2 * margin) / drawingW, (viewportH - 2 * margin) / drawingH)));
  return { zoom, panX: (viewportW - drawingW * zoom) / 2, panY: (viewportH - drawingH * zoom) / 2 };
}
