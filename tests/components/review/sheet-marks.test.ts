import { describe, expect, it } from 'vitest';
import { changeCount, compareHighlights, pinAnchor } from '@/components/review/sheet-marks';
import type { CompareReply } from '@/lib/schema/api-versions';

const bend = (t1: number, t2: number) => ({ end: 'opposite' as const, a: { row: 1, tube: t1 }, b: { row: 1, tube: t2 } });

const diff: Pick<CompareReply, 'bends' | 'stubs'> = {
  bends: {
    added: [bend(3, 4)],
    removed: [bend(1, 2), bend(5, 6)],
    changed: [{ before: bend(7, 8), after: { ...bend(7, 8), crossover: true } }],
  },
  stubs: {
    added: [{ kind: 'supply', stub: { end: 'connection', tube: { row: 2, tube: 1 } } }],
    removed: [],
    changed: [
      {
        before: { kind: 'return', stub: { end: 'connection', tube: { row: 1, tube: 9 } } },
        after: { kind: 'return', stub: { end: 'opposite', tube: { row: 1, tube: 9 } } },
      },
    ],
  },
};

describe('compareHighlights', () => {
  it('marks removed bends and stubs on the earlier sheet and the "before" side of changes', () => {
    const a = compareHighlights(diff, 'a');
    expect(a.filter((h) => h.tone === 'removed')).toHaveLength(2);
    expect(a.filter((h) => h.tone === 'added')).toHaveLength(0);
    const changedStub = a.find((h) => h.kind === 'stub' && h.tone === 'changed');
    expect(changedStub?.kind === 'stub' && changedStub.stub.end).toBe('connection');
  });

  it('marks added bends and stubs on the later sheet and the "after" side of changes', () => {
    const b = compareHighlights(diff, 'b');
    expect(b.filter((h) => h.tone === 'added').map((h) => h.kind)).toEqual(['bend', 'stub']);
    expect(b.filter((h) => h.tone === 'removed')).toHaveLength(0);
    const changedBend = b.find((h) => h.kind === 'bend' && h.tone === 'changed');
    expect(changedBend?.kind === 'bend' && changedBend.bend.crossover).toBe(true);
  });

  it('counts bends and header connections together', () => {
    expect(changeCount(diff)).toEqual({ added: 2, removed: 2, changed: 2 });
  });
});

describe('pinAnchor', () => {
  const circuits = [{ index: 1, tubes: [{ row: 2, tube: 4 }, { row: 1, tube: 4 }] }];

  it('anchors a tube pin at the tube and a bend pin at both of its tubes', () => {
    expect(pinAnchor({ kind: 'tube', row: 1, tube: 3 }, circuits)).toEqual([{ row: 1, tube: 3 }]);
    expect(pinAnchor({ kind: 'bend', end: 'connection', a: { row: 1, tube: 1 }, b: { row: 2, tube: 1 } }, circuits)).toHaveLength(2);
  });

  it('anchors a circuit pin at the circuit’s supply tube, and nowhere for a circuit that no longer exists', () => {
    expect(pinAnchor({ kind: 'circuit', index: 1 }, circuits)).toEqual([{ row: 2, tube: 4 }]);
    expect(pinAnchor({ kind: 'circuit', index: 9 }, circuits)).toEqual([]);
  });
});
