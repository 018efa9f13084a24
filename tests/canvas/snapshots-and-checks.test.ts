/**
 * Two speed-ups of the editor that must not change behaviour: undo/redo swap in the documents kept with each history
 * entry, and the live check of a drawing's tube references words its findings as the document schema does.
 */
import { describe, expect, it } from 'vitest';
import { createEditorStore } from '@/canvas/store';
import { tubeReferenceIssues } from '@/components/coil/use-live-solve';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { smallCoil } from './fixture';

const t = (row: number, tube: number) => ({ row, tube });

describe('history snapshots', () => {
  it('undo and redo give back the very documents before and after a step, gestures included', () => {
    const store = createEditorStore(smallCoil());
    const d0 = store.getState().document;
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    const d1 = store.getState().document;
    store.getState().beginGesture('Draw bend');
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 3), b: t(1, 4) });
    store.getState().dispatch('toggleStub', { kind: 'supply', end: 'connection', tube: t(2, 1) });
    store.getState().endGesture();
    const d2 = store.getState().document;
    store.getState().undo();
    expect(store.getState().document).toBe(d1);
    store.getState().undo();
    expect(store.getState().document).toBe(d0);
    store.getState().redo();
    store.getState().redo();
    expect(store.getState().document).toBe(d2);
  });

  it('a cancelled gesture leaves the document it started from', () => {
    const store = createEditorStore(smallCoil());
    const d0 = store.getState().document;
    store.getState().beginGesture('Draw bend');
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    store.getState().cancelGesture();
    expect(store.getState().document).toBe(d0);
    expect(store.getState().past).toHaveLength(0);
  });
});

describe('tubeReferenceIssues', () => {
  it('finds the references off the grid with the schema paths and messages', () => {
    const doc = smallCoil(2, 4);
    doc.circuiting.bends = [{ end: 'opposite', a: t(1, 1), b: t(3, 5) }];
    doc.circuiting.supply = [{ end: 'connection', tube: t(2, 4) }];
    const ours = tubeReferenceIssues(doc.circuiting, 2, 4);
    const parsed = coilDocumentSchema.safeParse(doc);
    expect(parsed.success).toBe(false);
    const schema = parsed.success ? [] : parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
    expect(ours).toEqual(schema);
    expect(ours.map((i) => i.path)).toEqual(['circuiting.bends.0.b.row', 'circuiting.bends.0.b.tube']);
  });

  it('finds nothing on a drawing inside the grid', () => {
    const doc = smallCoil(2, 4);
    doc.circuiting.bends = [{ end: 'opposite', a: t(1, 1), b: t(2, 4) }];
    expect(tubeReferenceIssues(doc.circuiting, 2, 4)).toEqual([]);
  });
});
