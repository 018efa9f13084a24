/** The editor's history rules (ARCHITECTURE.md section 4), one rule per test name. */
import { describe, expect, it } from 'vitest';
import { createEditorStore } from '@/canvas/store';
import { smallCoil } from './fixture';

const t = (row: number, tube: number) => ({ row, tube });

function storeWithBend() {
  const store = createEditorStore(smallCoil());
  store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) });
  return store;
}

describe('editor history', () => {
  it('a change makes one entry that undo reverts and redo reapplies', () => {
    const store = storeWithBend();
    expect(store.getState().past).toHaveLength(1);
    store.getState().undo();
    expect(store.getState().document.circuiting.bends).toEqual([]);
    expect(store.getState().future).toHaveLength(1);
    store.getState().redo();
    expect(store.getState().document.circuiting.bends).toHaveLength(1);
    expect(store.getState().past).toHaveLength(1);
  });

  it('a new change clears redo', () => {
    const store = storeWithBend();
    store.getState().undo();
    expect(store.getState().future).toHaveLength(1);
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 3), b: t(1, 4) });
    expect(store.getState().future).toEqual([]);
    store.getState().redo();
    expect(store.getState().document.circuiting.bends).toEqual([{ end: 'opposite', a: t(1, 3), b: t(1, 4) }]);
  });

  it('a selection change makes no entry', () => {
    const store = storeWithBend();
    store.getState().select({ kind: 'circuit', circuit: 0 });
    store.getState().setTool('erase');
    store.getState().setFace('connection');
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().future).toHaveLength(0);
  });

  it('a command that changes nothing makes no entry', () => {
    const store = storeWithBend();
    const changed = store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 2), b: t(1, 1) });
    expect(changed).toBe(false);
    expect(store.getState().past).toHaveLength(1);
  });

  it('undo restores the selection from before the step, redo the one after', () => {
    const store = createEditorStore(smallCoil());
    store.getState().select({ kind: 'tube', tube: t(1, 1) });
    store.getState().dispatch('eraseTubeEnd', { end: 'opposite', tube: t(1, 1) }); // no change, no entry
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) }, { selection: { kind: 'circuit', circuit: 0 } });
    expect(store.getState().session.selection).toEqual({ kind: 'circuit', circuit: 0 });
    store.getState().undo();
    expect(store.getState().session.selection).toEqual({ kind: 'tube', tube: t(1, 1) });
    store.getState().redo();
    expect(store.getState().session.selection).toEqual({ kind: 'circuit', circuit: 0 });
  });

  it('a drag is one step', () => {
    const store = createEditorStore(smallCoil());
    store.getState().beginGesture('Drag');
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 3), b: t(1, 4) });
    store.getState().dispatch('toggleStub', { kind: 'supply', end: 'connection', tube: t(1, 1) });
    expect(store.getState().past).toHaveLength(0);
    store.getState().endGesture();
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().past[0].label).toBe('Drag');
    store.getState().undo();
    expect(store.getState().document.circuiting).toEqual({ bends: [], supply: [], return: [] });
    store.getState().redo();
    expect(store.getState().document.circuiting.bends).toHaveLength(2);
    expect(store.getState().document.circuiting.supply).toHaveLength(1);
  });

  it('a cancelled gesture leaves nothing', () => {
    const store = storeWithBend();
    const before = store.getState().document;
    store.getState().select({ kind: 'tube', tube: t(2, 1) });
    store.getState().beginGesture('Drag');
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 2), b: t(1, 3) }, { selection: null });
    store.getState().dispatch('addBend', { end: 'opposite', a: t(2, 1), b: t(2, 2) });
    store.getState().cancelGesture();
    expect(store.getState().document).toEqual(before);
    expect(store.getState().past).toHaveLength(1);
    expect(store.getState().future).toHaveLength(0);
    expect(store.getState().session.selection).toEqual({ kind: 'tube', tube: t(2, 1) });
  });

  it('a gesture with no change leaves nothing', () => {
    const store = storeWithBend();
    store.getState().beginGesture('Drag');
    store.getState().endGesture();
    expect(store.getState().past).toHaveLength(1);
  });

  it('loading makes no entry', () => {
    const store = storeWithBend();
    store.getState().undo();
    const other = smallCoil(4, 6);
    store.getState().load(other);
    expect(store.getState().document).toBe(other);
    expect(store.getState().past).toEqual([]);
    expect(store.getState().future).toEqual([]);
  });

  it('every document change moves the document version on, so old results can be told apart', () => {
    const store = createEditorStore(smallCoil());
    const v0 = store.getState().documentVersion;
    store.getState().dispatch('addBend', { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    const v1 = store.getState().documentVersion;
    store.getState().undo();
    const v2 = store.getState().documentVersion;
    store.getState().select(null);
    expect(v1).toBeGreaterThan(v0);
    expect(v2).toBeGreaterThan(v1);
    expect(store.getState().documentVersion).toBe(v2);
  });

  it('undo during a gesture cancels the gesture first', () => {
    const store = storeWithBend();
    store.getState().beginGesture('Drag');
    store.getState().dispatch('addBend', { end: 'opposite', a: t(2, 1), b: t(2, 2) });
    store.getState().undo();
    expect(store.getState().document.circuiting.bends).toEqual([]);
    expect(store.getState().gesture).toBeNull();
  });

  it('undo with nothing to undo does nothing', () => {
    const store = createEditorStore(smallCoil());
    const doc = store.getState().document;
    store.getState().undo();
    store.getState().redo();
    expect(store.getState().document).toBe(doc);
  });
});
