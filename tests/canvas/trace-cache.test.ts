/**
 * The trace cache shared by the editor and the live solve: one trace per document object, a new trace for the new
 * document an edit makes. Circuiting rules: ENGINEERING.md 2.1 (common practice).
 */
import { describe, expect, it } from 'vitest';
import { createEditorStore } from '@/canvas/store';
import { traceOf } from '@/canvas/trace-cache';
import { traceCircuits } from '@/lib/engine/topology';
import { smallCoil } from './fixture';

const t = (row: number, tube: number) => ({ row, tube });

describe('traceOf', () => {
  it('traces a document once and gives the same trace back', () => {
    const doc = smallCoil(2, 4);
    const first = traceOf(doc);
    expect(traceOf(doc)).toBe(first);
    expect(first).toEqual(traceCircuits(doc));
  });

  it('traces the new document an edit makes, and matches a fresh trace of it', () => {
    const store = createEditorStore(smallCoil(2, 4));
    const before = traceOf(store.getState().document);
    expect(store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) })).toBe(true);
    const doc = store.getState().document;
    const after = traceOf(doc);
    expect(after).not.toBe(before);
    expect(after).toEqual(traceCircuits(doc));
    expect(after).not.toEqual(before); // the bend changed the trace, so a stale cached one would show
  });
});
