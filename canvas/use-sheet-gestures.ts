/**
 * Pointer gestures on the sheet (web pointer events): tap and drag to draw, one-finger or mouse drag on empty sheet
 * to pan, two-finger pinch to zoom, wheel to zoom. A bend drawn by dragging is one gesture in the history; a drag
 * that ends anywhere but on another tube, or is interrupted, is cancelled and leaves nothing.
 */
import { useCallback, useEffect, useMemo, useRef, type RefObject } from 'react';
import { Platform } from 'react-native';
import type { TubeRef } from '@/lib/engine/types';
import { hitBend, hitTube, spotOf, type SheetLayout } from './render-model';
import { activeFace } from './session';
import type { EditorStore } from './store';
import type { ViewStore } from './view-store';
import { PX_PER_MM } from './tube-sheet';

type Mode =
  | { kind: 'none' }
  | { kind: 'pan'; x0: number; y0: number; panX0: number; panY0: number; moved: boolean; tube: TubeRef | null; at: { x: number; y: number } }
  | { kind: 'draw'; from: TubeRef; x0: number; y0: number; moved: boolean }
  | { kind: 'pinch'; dist0: number; zoom0: number; midX0: number; midY0: number; panX0: number; panY0: number };

/** Pointer movement (px) under which a press counts as a tap. */
const TAP_SLOP = 6;

interface PointerLike { pointerId: number; clientX: number; clientY: number; currentTarget: unknown; pointerType?: string }

const sameTube = (a: TubeRef, b: TubeRef) => a.row === b.row && a.tube === b.tube;

export function useSheetGestures(
  store: EditorStore,
  view: ViewStore,
  layout: SheetLayout,
  viewportRef: RefObject<unknown>,
  onDragChange: (from: TubeRef | null) => void,
) {
  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const mode = useRef<Mode>({ kind: 'none' });

  const local = useCallback(
    (e: PointerLike) => {
      const el = viewportRef.current as HTMLElement | null;
      const rect = el?.getBoundingClientRect?.() ?? { left: 0, top: 0 };
      return { x: e.clientX - rect.left, y: e.clientY - rect.top };
    },
    [viewportRef],
  );
  const toSheet = useCallback(
    (p: { x: number; y: number }) => {
      const { zoom, panX, panY } = view.getState();
      return { x: (p.x - panX) / zoom / PX_PER_MM, y: (p.y - panY) / zoom / PX_PER_MM };
    },
    [view],
  );

  const tap = useCallback(
    (tube: TubeRef | null, at?: { x: number; y: number }) => {
      const s = store.getState();
      const { tool, face, pendingTube } = s.session;
      const end = activeFace(face);
      const pickBend = (p: { x: number; y: number } | undefined) => {
        const bend = tool === 'select' && p ? hitBend(layout, s.document.circuiting, end, p.x, p.y) : null;
        return bend ? ({ kind: 'bend', ...bend } as const) : null;
      };
      if (!tube) {
        s.setPendingTube(null);
        s.select(pickBend(at));
        return;
      }
      switch (tool) {
        case 'bend':
          if (!pendingTube) s.setPendingTube(tube);
          else if (sameTube(pendingTube, tube)) s.setPendingTube(null);
          else {
            s.dispatch('addBend', { end, a: pendingTube, b: tube });
            s.setPendingTube(null);
          }
          break;
        case 'supply':
        case 'return':
          s.dispatch('toggleStub', { kind: tool, end, tube });
          break;
        case 'erase':
          s.dispatch('eraseTubeEnd', { end, tube });
          break;
        case 'select': {
          // A tap on a bend's line, off the tube's own circle, picks the bend (to mark it as a crossover).
          const spot = at ? spotOf(layout, tube) : undefined;
          const onTube = !spot || !at || Math.hypot(spot.x - at.x, spot.y - at.y) <= layout.tubeRadius * 1.1;
          s.select((!onTube && pickBend(at)) || { kind: 'tube', tube });
          break;
        }
      }
    },
    [layout, store],
  );

  const reset = useCallback(() => {
    mode.current = { kind: 'none' };
    view.getState().setDragTo(null);
    onDragChange(null);
  }, [view, onDragChange]);

  const onPointerDown = useCallback(
    (e: PointerLike) => {
      const p = local(e);
      pointers.current.set(e.pointerId, p);
      (e.currentTarget as HTMLElement | null)?.setPointerCapture?.(e.pointerId);
      const v = view.getState();
      if (pointers.current.size === 2) {
        if (mode.current.kind === 'draw') store.getState().cancelGesture();
        const [a, b] = [...pointers.current.values()];
        mode.current = {
          kind: 'pinch',
          dist0: Math.hypot(a.x - b.x, a.y - b.y) || 1,
          zoom0: v.zoom,
          midX0: (a.x + b.x) / 2,
          midY0: (a.y + b.y) / 2,
          panX0: v.panX,
          panY0: v.panY,
        };
        v.setDragTo(null);
        onDragChange(null);
        return;
      }
      if (pointers.current.size > 2) return;
      const s = toSheet(p);
      const tube = hitTube(layout, s.x, s.y);
      if (tube && store.getState().session.tool === 'bend') {
        store.getState().beginGesture('Draw bend');
        mode.current = { kind: 'draw', from: tube, x0: p.x, y0: p.y, moved: false };
      } else {
        mode.current = { kind: 'pan', x0: p.x, y0: p.y, panX0: v.panX, panY0: v.panY, moved: false, tube, at: s };
      }
    },
    [layout, local, store, toSheet, view, onDragChange],
  );

  const onPointerMove = useCallback(
    (e: PointerLike) => {
      if (!pointers.current.has(e.pointerId)) {
        // No button down: a mouse hovering (touch has no hover).
        if (e.pointerType === 'mouse') {
          const s = toSheet(local(e));
          view.getState().setHover(hitTube(layout, s.x, s.y));
        }
        return;
      }
      const p = local(e);
      pointers.current.set(e.pointerId, p);
      const m = mode.current;
      const v = view.getState();
      if (m.kind === 'pan') {
        if (!m.moved && Math.hypot(p.x - m.x0, p.y - m.y0) < TAP_SLOP) return;
        m.moved = true;
        v.setView({ panX: m.panX0 + p.x - m.x0, panY: m.panY0 + p.y - m.y0 });
      } else if (m.kind === 'draw') {
        if (!m.moved && Math.hypot(p.x - m.x0, p.y - m.y0) < TAP_SLOP) return;
        if (!m.moved) onDragChange(m.from);
        m.moved = true;
        v.setDragTo(toSheet(p));
      } else if (m.kind === 'pinch' && pointers.current.size >= 2) {
        const [a, b] = [...pointers.current.values()];
        const dist = Math.hypot(a.x - b.x, a.y - b.y) || 1;
        const zoom = Math.min(8, Math.max(0.15, m.zoom0 * (dist / m.dist0)));
        const k = zoom / m.zoom0;
        const midX = (a.x + b.x) / 2;
        const midY = (a.y + b.y) / 2;
        v.setView({ zoom, panX: midX - (m.midX0 - m.panX0) * k, panY: midY - (m.midY0 - m.panY0) * k });
      }
    },
    [layout, local, toSheet, view, onDragChange],
  );

  const onPointerUp = useCallback(
    (e: PointerLike) => {
      const p = pointers.current.get(e.pointerId) ?? local(e);
      pointers.current.delete(e.pointerId);
      const m = mode.current;
      if (m.kind === 'pinch') {
        if (pointers.current.size === 0) reset();
        return;
      }
      const s = store.getState();
      if (m.kind === 'draw') {
        const at = toSheet(local(e));
        const target = hitTube(layout, at.x, at.y);
        if (!m.moved) {
          s.endGesture(); // nothing changed: no entry
          tap(m.from);
        } else if (target && !sameTube(target, m.from)) {
          s.dispatch('addBend', { end: activeFace(s.session.face), a: m.from, b: target });
          s.setPendingTube(null);
          s.endGesture();
        } else {
          s.cancelGesture();
        }
      } else if (m.kind === 'pan' && !m.moved) {
        tap(m.tube, m.at);
      }
      void p;
      reset();
    },
    [layout, local, reset, store, tap, toSheet],
  );

  const onPointerCancel = useCallback(
    (e: PointerLike) => {
      pointers.current.delete(e.pointerId);
      if (mode.current.kind === 'draw') store.getState().cancelGesture();
      reset();
    },
    [reset, store],
  );

  // Wheel zoom (web): a native listener, because the wheel must not scroll the page.
  useEffect(() => {
    if (Platform.OS !== 'web') return;
    const el = viewportRef.current as HTMLElement | null;
    if (!el?.addEventListener) return;
    const onWheel = (ev: WheelEvent) => {
      ev.preventDefault();
      const rect = el.getBoundingClientRect();
      const factor = Math.exp(-ev.deltaY * (ev.ctrlKey ? 0.01 : 0.0015));
      view.getState().zoomAbout(factor, ev.clientX - rect.left, ev.clientY - rect.top);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [view, viewportRef]);

  /** Escape: drop a half-drawn bend. */
  const cancel = useCallback(() => {
    if (mode.current.kind === 'draw') store.getState().cancelGesture();
    reset();
    store.getState().setPendingTube(null);
    store.getState().select(null);
  }, [reset, store]);

  return useMemo(() => ({ onPointerDown, onPointerMove, onPointerUp, onPointerCancel, cancel }), [onPointerDown, onPointerMove, onPointerUp, onPointerCancel, cancel]);
}
