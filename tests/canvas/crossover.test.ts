/**
 * Crossover bends (ENGINEERING.md 2.1 T5, common practice: two bends on one face must not cross unless one is a
 * crossover on a second layer): the command, its undo step, how the sheet draws it and how a tap finds it.
 */
import { describe, expect, it } from 'vitest';
import { produce } from 'immer';
import { setCrossover } from '@/canvas/commands/set-crossover';
import { createEditorStore } from '@/canvas/store';
import { sheetAnalysis } from '@/canvas/analysis';
import { buildDrawing, buildSheetLayout, hitBend, spotOf, tubeKey } from '@/canvas/render-model';
import { serpentineCircuiting } from '@/lib/engine/generators';
import { traceCircuits } from '@/lib/engine/topology';
import type { CoilDocument } from '@/lib/engine/types';
import { circuitColour } from '@/canvas/palette';
import { smallCoil } from './fixture';

const t = (row: number, tube: number) => ({ row, tube });

/** Two bends on the connection end that cross: 1-1 to 2-2 and 1-2 to 2-1 (2 rows staggered). */
function crossingBends(): CoilDocument {
  const doc = smallCoil(2, 4);
  doc.circuiting.bends = [
    { end: 'connection', a: t(1, 1), b: t(2, 2) },
    { end: 'connection', a: t(1, 2), b: t(2, 1) },
    { end: 'opposite', a: t(1, 3), b: t(1, 4) },
  ];
  return doc;
}

describe('setCrossover command', () => {
  it('marks and unmarks a bend in place, found in either tube order', () => {
    const doc = crossingBends();
    const marked = produce(doc, (d: CoilDocument) => setCrossover(d, { end: 'connection', a: t(2, 1), b: t(1, 2), crossover: true }));
    expect(marked.circuiting.bends[1]).toEqual({ end: 'connection', a: t(1, 2), b: t(2, 1), crossover: true });
    expect(marked.circuiting.bends[0].crossover).toBeUndefined();
    const unmarked = produce(marked, (d: CoilDocument) => setCrossover(d, { end: 'connection', a: t(1, 2), b: t(2, 1), crossover: false }));
    expect(unmarked.circuiting.bends[1]).toEqual({ end: 'connection', a: t(1, 2), b: t(2, 1) });
  });

  it('changes nothing for a bend on the other face or a bend already in that state', () => {
    const doc = crossingBends();
    expect(produce(doc, (d: CoilDocument) => setCrossover(d, { end: 'opposite', a: t(1, 1), b: t(2, 2), crossover: true }))).toBe(doc);
    expect(produce(doc, (d: CoilDocument) => setCrossover(d, { end: 'connection', a: t(1, 1), b: t(2, 2), crossover: false }))).toBe(doc);
  });

  it('toggling through the store is one undo step each way and clears the crossing error', () => {
    const store = createEditorStore(crossingBends());
    const crossing = () => traceCircuits(store.getState().document).errors.some((e) => e.code === 'bends-cross');
    expect(crossing()).toBe(true);
    expect(store.getState().dispatch('setCrossover', { end: 'connection', a: t(1, 1), b: t(2, 2), crossover: true })).toBe(true);
    expect(store.getState().past.at(-1)?.label).toBe('Crossover');
    expect(crossing()).toBe(false);
    store.getState().undo();
    expect(store.getState().document.circuiting.bends[0].crossover).toBeUndefined();
    expect(crossing()).toBe(true);
    store.getState().redo();
    expect(store.getState().document.circuiting.bends[0].crossover).toBe(true);
    expect(store.getState().dispatch('setCrossover', { end: 'connection', a: t(1, 1), b: t(2, 2), crossover: true })).toBe(false);
    expect(store.getState().past).toHaveLength(1);
  });
});

describe('crossover drawing', () => {
  it('draws a crossover bowed, with a bridge mark, and a plain bend straight without one', () => {
    const doc = produce(crossingBends(), (d: CoilDocument) => setCrossover(d, { end: 'connection', a: t(1, 1), b: t(2, 2), crossover: true }));
    const layout = buildSheetLayout(doc.geometry);
    const drawing = buildDrawing(layout, doc.circuiting, sheetAnalysis(traceCircuits(doc), null), { face: 'connection', selection: null });
    const [cross, plain] = drawing.bends;
    expect(cross.crossover).toBe(true);
    expect(cross.d).toMatch(/Q/);
    expect(cross.bridge).toMatch(/^M[\d.]+ [\d.]+A/);
    expect(plain.crossover).toBe(false);
    expect(plain.d).not.toMatch(/Q/);
    expect(plain.bridge).toBeNull();
  });

  it('marks the selected bend and its two tubes', () => {
    const doc = smallCoil(2, 4);
    doc.circuiting = serpentineCircuiting(doc.geometry, 2);
    const bend = doc.circuiting.bends.find((b) => b.end === 'opposite')!;
    const layout = buildSheetLayout(doc.geometry);
    const analysis = sheetAnalysis(traceCircuits(doc), null);
    expect(analysis.errorTubes).toEqual([]);
    const drawing = buildDrawing(layout, doc.circuiting, analysis, { face: 'opposite', selection: { kind: 'bend', end: bend.end, a: bend.b, b: bend.a } });
    expect(drawing.bends.filter((b) => b.selected).map((b) => [b.a, b.b])).toEqual([[bend.a, bend.b]]);
    const plain = buildDrawing(layout, doc.circuiting, analysis, { face: 'opposite', selection: null });
    const width = (d: typeof drawing, key: string) => d.tubes.find((x) => x.key === key)!.strokeWidth;
    for (const end of [bend.a, bend.b]) expect(width(drawing, tubeKey(end))).toBeGreaterThan(width(plain, tubeKey(end)));
  });
});

describe('hitBend', () => {
  it('finds the bend under a point on its line and nothing far from every bend', () => {
    const doc = smallCoil(2, 4);
    doc.circuiting.bends = [{ end: 'opposite', a: t(1, 1), b: t(1, 2) }];
    const layout = buildSheetLayout(doc.geometry);
    const p = spotOf(layout, t(1, 1))!;
    const q = spotOf(layout, t(1, 2))!;
    expect(hitBend(layout, doc.circuiting, 'opposite', (p.x + q.x) / 2, (p.y + q.y) / 2)).toEqual({ end: 'opposite', a: t(1, 1), b: t(1, 2) });
    expect(hitBend(layout, doc.circuiting, 'connection', (p.x + q.x) / 2, (p.y + q.y) / 2)).toBeNull();
    const far = spotOf(layout, t(2, 4))!;
    expect(hitBend(layout, doc.circuiting, 'opposite', far.x, far.y)).toBeNull();
  });
});

describe('circuit colours while a circuit is broken', () => {
  // Not an engineering check: the editor's colouring rule (circuits keep their colour while another is broken).
  it('match the circuit numbers on a complete drawing and stay put when one circuit breaks', () => {
    const doc = smallCoil(4, 12);
    doc.circuiting = serpentineCircuiting(doc.geometry, 12);
    const layout = buildSheetLayout(doc.geometry);
    const draw = (d: CoilDocument) => buildDrawing(layout, d.circuiting, sheetAnalysis(traceCircuits(d), null), { face: 'opposite', selection: null });
    const before = draw(doc);
    const topology = traceCircuits(doc);
    expect(topology.valid).toBe(true);
    for (const c of topology.circuits) {
      for (const tube of c.tubes) expect(before.tubes.find((x) => x.key === tubeKey(tube))!.fill).toBe(circuitColour(c.index - 1));
    }
    const first = topology.circuits[0];
    const broken = produce(doc, (d: CoilDocument) => {
      d.circuiting.bends = d.circuiting.bends.filter((b) => !(b.end === 'opposite' && b.a.row === first.tubes[0].row && b.a.tube === first.tubes[0].tube) && !(b.end === 'opposite' && b.b.row === first.tubes[0].row && b.b.tube === first.tubes[0].tube));
    });
    expect(traceCircuits(broken).circuits.length).toBe(topology.circuits.length - 1);
    const after = draw(broken);
    const firstKeys = new Set(first.tubes.map(tubeKey));
    for (const look of after.tubes) {
      if (firstKeys.has(look.key)) continue;
      expect(look.fill).toBe(before.tubes.find((x) => x.key === look.key)!.fill);
    }
  });
});
