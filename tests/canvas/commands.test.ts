/** Every editor command as a pure recipe (ARCHITECTURE.md section 4). Circuiting rules: ENGINEERING.md 2.1 (common practice). */
import { describe, expect, it } from 'vitest';
import { produce } from 'immer';
import type { CoilDocument } from '@/lib/engine/types';
import { addBend } from '@/canvas/commands/add-bend';
import { removeBend } from '@/canvas/commands/remove-bend';
import { toggleStub } from '@/canvas/commands/toggle-stub';
import { eraseTubeEnd } from '@/canvas/commands/erase-tube-end';
import { setGeometry } from '@/canvas/commands/set-geometry';
import { setConditions } from '@/canvas/commands/set-conditions';
import { replaceCircuiting } from '@/canvas/commands/replace-circuiting';
import { renameCoil } from '@/canvas/commands/rename-coil';
import { smallCoil } from './fixture';

const run = <A>(doc: CoilDocument, recipe: (d: CoilDocument, a: A) => void, args: A) => produce(doc, (d: CoilDocument) => recipe(d, args));
const t = (row: number, tube: number) => ({ row, tube });

describe('addBend', () => {
  it('adds a bend between two tube ends on one face', () => {
    const next = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    expect(next.circuiting.bends).toEqual([{ end: 'opposite', a: t(1, 1), b: t(1, 2) }]);
  });
  it('replaces what was on either tube end before (a tube end takes one connection, ENGINEERING.md 2.1 T2)', () => {
    let doc = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, toggleStub, { kind: 'supply', end: 'opposite', tube: t(1, 3) });
    doc = run(doc, addBend, { end: 'opposite', a: t(1, 2), b: t(1, 3) });
    expect(doc.circuiting.bends).toEqual([{ end: 'opposite', a: t(1, 2), b: t(1, 3) }]);
    expect(doc.circuiting.supply).toEqual([]);
  });
  it('keeps bends on the other face', () => {
    let doc = run(smallCoil(), addBend, { end: 'connection', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, addBend, { end: 'opposite', a: t(1, 2), b: t(1, 3) });
    expect(doc.circuiting.bends).toHaveLength(2);
  });
  it('ignores a bend from a tube to itself or outside the sheet', () => {
    const doc = smallCoil();
    expect(run(doc, addBend, { end: 'opposite', a: t(1, 1), b: t(1, 1) })).toBe(doc);
    expect(run(doc, addBend, { end: 'opposite', a: t(1, 4), b: t(1, 5) })).toBe(doc);
  });
  it('drawing the same bend again changes nothing, in either direction', () => {
    const once = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    expect(run(once, addBend, { end: 'opposite', a: t(1, 2), b: t(1, 1) })).toBe(once);
  });
  it('can mark a bend as a crossover', () => {
    const doc = run(smallCoil(), addBend, { end: 'connection', a: t(1, 1), b: t(1, 3), crossover: true });
    expect(doc.circuiting.bends[0].crossover).toBe(true);
  });
});

describe('removeBend', () => {
  it('removes the bend in either order and leaves the others', () => {
    let doc = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, addBend, { end: 'opposite', a: t(1, 3), b: t(1, 4) });
    doc = run(doc, removeBend, { end: 'opposite', a: t(1, 2), b: t(1, 1) });
    expect(doc.circuiting.bends).toEqual([{ end: 'opposite', a: t(1, 3), b: t(1, 4) }]);
  });
  it('does nothing when the bend is on the other face', () => {
    const doc = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    expect(run(doc, removeBend, { end: 'connection', a: t(1, 1), b: t(1, 2) })).toBe(doc);
  });
});

describe('toggleStub', () => {
  it('marks a supply stub and a second tap removes it', () => {
    const on = run(smallCoil(), toggleStub, { kind: 'supply', end: 'connection', tube: t(2, 4) });
    expect(on.circuiting.supply).toEqual([{ end: 'connection', tube: t(2, 4) }]);
    const off = run(on, toggleStub, { kind: 'supply', end: 'connection', tube: t(2, 4) });
    expect(off.circuiting.supply).toEqual([]);
  });
  it('turns a supply stub into a return stub on the same tube end', () => {
    let doc = run(smallCoil(), toggleStub, { kind: 'supply', end: 'connection', tube: t(1, 1) });
    doc = run(doc, toggleStub, { kind: 'return', end: 'connection', tube: t(1, 1) });
    expect(doc.circuiting.supply).toEqual([]);
    expect(doc.circuiting.return).toEqual([{ end: 'connection', tube: t(1, 1) }]);
  });
  it('replaces a bend on that tube end', () => {
    let doc = run(smallCoil(), addBend, { end: 'connection', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, toggleStub, { kind: 'return', end: 'connection', tube: t(1, 2) });
    expect(doc.circuiting.bends).toEqual([]);
  });
});

describe('eraseTubeEnd', () => {
  it('removes the bend and the stub at that tube end only', () => {
    let doc = run(smallCoil(), addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, toggleStub, { kind: 'supply', end: 'connection', tube: t(1, 1) });
    doc = run(doc, eraseTubeEnd, { end: 'opposite', tube: t(1, 2) });
    expect(doc.circuiting.bends).toEqual([]);
    expect(doc.circuiting.supply).toHaveLength(1);
  });
});

describe('setGeometry', () => {
  it('changes fields and fin fields', () => {
    const doc = run(smallCoil(), setGeometry, { finnedLength_m: 1.5, fin: { pitch_m: 0.002 } });
    expect(doc.geometry.finnedLength_m).toBe(1.5);
    expect(doc.geometry.fin.pitch_m).toBe(0.002);
    expect(doc.geometry.fin.thickness_m).toBe(0.00015);
  });
  it('drops bends and stubs outside a smaller sheet', () => {
    let doc = run(smallCoil(2, 4), addBend, { end: 'opposite', a: t(1, 3), b: t(1, 4) });
    doc = run(doc, addBend, { end: 'opposite', a: t(1, 1), b: t(1, 2) });
    doc = run(doc, toggleStub, { kind: 'supply', end: 'connection', tube: t(2, 4) });
    doc = run(doc, setGeometry, { tubesPerRow: 3 });
    expect(doc.circuiting.bends).toEqual([{ end: 'opposite', a: t(1, 1), b: t(1, 2) }]);
    expect(doc.circuiting.supply).toEqual([]);
  });
  it('removes wave dimensions when fins become plain', () => {
    let doc = run(smallCoil(), setGeometry, { fin: { type: 'wavy', waveDepth_m: 0.0015, waveHalfLength_m: 0.003 } });
    expect(doc.geometry.fin.waveDepth_m).toBe(0.0015);
    doc = run(doc, setGeometry, { fin: { type: 'plain' } });
    expect(doc.geometry.fin.waveDepth_m).toBeUndefined();
  });
});

describe('setConditions', () => {
  it('relative humidity replaces wet bulb and back (exactly one is given, ARCHITECTURE.md 2)', () => {
    let doc = run(smallCoil(), setConditions, { air: { inletRelativeHumidity: 0.5 } });
    expect(doc.conditions.air.inletWetBulb_C).toBeUndefined();
    expect(doc.conditions.air.inletRelativeHumidity).toBe(0.5);
    doc = run(doc, setConditions, { air: { inletWetBulb_C: 18 } });
    expect(doc.conditions.air.inletRelativeHumidity).toBeUndefined();
  });
  it('plain water carries no glycol', () => {
    let doc = run(smallCoil(), setConditions, { fluid: { kind: 'propylene-glycol', glycolMassFraction: 0.3 } });
    expect(doc.conditions.fluid.glycolMassFraction).toBe(0.3);
    doc = run(doc, setConditions, { fluid: { kind: 'water' } });
    expect(doc.conditions.fluid.glycolMassFraction).toBe(0);
  });
  it('sets the part-load and freeze-check fields', () => {
    const doc = run(smallCoil(), setConditions, { minimumFlowFraction: 0.5, minimumAirTemperature_C: -10 });
    expect(doc.conditions.minimumFlowFraction).toBe(0.5);
    expect(doc.conditions.minimumAirTemperature_C).toBe(-10);
  });
});

describe('replaceCircuiting and renameCoil', () => {
  it('replaces the whole circuiting with a copy', () => {
    const circuiting = { bends: [{ end: 'opposite' as const, a: t(1, 1), b: t(2, 1) }], supply: [{ end: 'connection' as const, tube: t(2, 1) }], return: [{ end: 'connection' as const, tube: t(1, 1) }] };
    const doc = run(smallCoil(), replaceCircuiting, circuiting);
    expect(doc.circuiting).toEqual(circuiting);
    expect(doc.circuiting.bends[0]).not.toBe(circuiting.bends[0]);
  });
  it('renames the coil', () => {
    expect(run(smallCoil(), renameCoil, 'AHU-9 heating').name).toBe('AHU-9 heating');
  });
});
