import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { candidateFeedCounts, serpentineCircuiting } from '@/lib/engine/generators';
import {
  classifyArrangement,
  segmentsIntersect,
  TOPOLOGY_ERROR_CODES,
  traceCircuits,
  trappedLowPoints,
  tubeIndex,
} from '@/lib/engine/topology';
import type { Circuiting } from '@/lib/engine/types';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { bend, docWith, stub, t } from './doc-fixture';

const codes = (c: Circuiting, rows = 2, tubes = 2) => traceCircuits(docWith(rows, tubes, c)).errors.map((e) => e.code).sort();

// 2 rows x 2 tubes, two counterflow circuits of 2 passes each (common practice: full serpentine, ENGINEERING.md 2.2).
const twoByTwo: Circuiting = {
  bends: [bend('opposite', t(2, 1), t(1, 1)), bend('opposite', t(2, 2), t(1, 2))],
  supply: [stub('connection', t(2, 2)), stub('connection', t(2, 1))],
  return: [stub('connection', t(1, 1)), stub('connection', t(1, 2))],
};

describe('traceCircuits: a valid drawing', () => {
  const topo = traceCircuits(docWith(2, 2, twoByTwo));
  it('is valid with two circuits numbered by supply position (top first)', () => {
    expect(topo.errors).toEqual([]);
    expect(topo.valid).toBe(true);
    expect(topo.circuits.map((c) => c.supply.tube)).toEqual([t(2, 1), t(2, 2)]);
    expect(topo.circuits.map((c) => c.index)).toEqual([1, 2]);
  });
  it('follows the water: tubes in water order, bends oriented from tube a to tube b', () => {
    const c = topo.circuits[0];
    expect(c.tubes).toEqual([t(2, 1), t(1, 1)]);
    expect(c.passes).toBe(2);
    expect(c.bends).toHaveLength(1);
    expect(c.bends[0]).toMatchObject({ end: 'opposite', a: t(2, 1), b: t(1, 1), kind: 'hairpin', adjacent: true, crossover: false });
    expect(c.bends[0].radius_m).toBeCloseTo(Math.hypot(0.03175 / 2, 0.0275) / 2, 12);
  });
  it('classifies counterflow with CFI 1 and reports header positions (ENGINEERING.md 2.3, 2.4)', () => {
    const c = topo.circuits[0];
    expect(c.arrangement).toBe('counterflow');
    expect(c.counterflowIndex).toBe(1);
    expect(c.startsInLastRow).toBe(true);
    expect(c.endsInFirstRow).toBe(true);
    expect(c.connectionsSameEnd).toBe(true);
    expect(c.supplyAtBottom).toBe(true);
    expect(c.returnAtTop).toBe(true);
  });
  it('maps every tube to its circuit', () => {
    const g = { tubesPerRow: 2 };
    expect(topo.tubeCircuit[tubeIndex(g, t(1, 1))]).toBe(1);
    expect(topo.tubeCircuit[tubeIndex(g, t(2, 2))]).toBe(2);
    expect(topo.tubeCircuit.every((n) => n > 0)).toBe(true);
  });
});

describe('traceCircuits: every error has a stable code (ENGINEERING.md 2.1 T1-T7)', () => {
  it('tube not in any circuit -> tube-unused (T1)', () => {
    const c = { bends: [], supply: [stub('connection', t(1, 1))], return: [stub('opposite', t(1, 1))] };
    expect(codes(c, 1, 2)).toEqual(['tube-unused']);
  });
  it('bend joining a tube to itself -> bend-self', () => {
    expect(codes({ ...twoByTwo, bends: [...twoByTwo.bends, bend('connection', t(1, 1), t(1, 1))] })).toContain('bend-self');
  });
  it('two bends on one tube end -> tube-end-conflict and the extra bend dangles', () => {
    const c = { ...twoByTwo, bends: [...twoByTwo.bends, bend('opposite', t(2, 1), t(2, 2))] };
    expect(codes(c)).toEqual(['bend-dangling', 'tube-end-conflict', 'tube-end-conflict']);
  });
  it('a bend and a stub on one tube end -> tube-end-conflict', () => {
    const c = { ...twoByTwo, bends: [...twoByTwo.bends, bend('connection', t(2, 1), t(2, 2))] };
    expect(codes(c)).toContain('tube-end-conflict');
  });
  it('a bend that no water reaches -> bend-dangling', () => {
    const c: Circuiting = {
      bends: [bend('opposite', t(1, 1), t(1, 2)), bend('opposite', t(2, 1), t(2, 2))],
      supply: [stub('connection', t(1, 1))],
      return: [stub('connection', t(1, 2))],
    };
    expect(codes(c)).toEqual(['bend-dangling']);
  });
  it('path ending at a bare tube end -> circuit-no-return', () => {
    const c = { ...twoByTwo, return: [stub('connection', t(1, 1))] };
    expect(codes(c)).toEqual(['circuit-no-return']);
  });
  it('tubes that lead to a return with no supply -> circuit-no-supply', () => {
    const c = { ...twoByTwo, supply: [stub('connection', t(2, 1))] };
    expect(codes(c)).toEqual(['circuit-no-supply']);
  });
  it('bends in a ring with no header -> closed-loop', () => {
    const c: Circuiting = {
      bends: [bend('opposite', t(1, 1), t(1, 2)), bend('connection', t(1, 1), t(1, 2)), bend('opposite', t(2, 1), t(2, 2))],
      supply: [stub('connection', t(2, 1))],
      return: [stub('connection', t(2, 2))],
    };
    expect(codes(c)).toEqual(['closed-loop']);
  });
  it('water leaving where a supply stub sits -> supply-at-outlet', () => {
    const c: Circuiting = {
      bends: [bend('opposite', t(1, 1), t(1, 2)), bend('opposite', t(2, 1), t(2, 2))],
      supply: [stub('connection', t(1, 1)), stub('connection', t(1, 2)), stub('connection', t(2, 1))],
      return: [stub('connection', t(2, 2))],
    };
    expect(codes(c)).toContain('supply-at-outlet');
  });
  it('supply stubs on both faces -> supply-faces-mixed; returns on both faces -> return-faces-mixed (T7)', () => {
    const c: Circuiting = {
      bends: [bend('opposite', t(2, 1), t(1, 1))],
      supply: [stub('connection', t(2, 1)), stub('opposite', t(2, 2))],
      return: [stub('connection', t(1, 1)), stub('connection', t(1, 2))],
    };
    // row 2 tube 2 enters at the opposite end and leaves at the connection end: one pass to ... nothing, so also no return
    expect(codes({ ...c, bends: [...c.bends, bend('connection', t(2, 2), t(1, 2))], return: [stub('connection', t(1, 1)), stub('opposite', t(1, 2))] })).toEqual(
      ['return-faces-mixed', 'supply-faces-mixed'],
    );
  });
  it('crossing bends on one face -> bends-cross, unless one is a crossover (T5)', () => {
    // 1 row x 4 tubes: bends 1-3 and 2-4 on the opposite end overlap along the row.
    const c: Circuiting = {
      bends: [bend('opposite', t(1, 1), t(1, 3)), bend('opposite', t(1, 2), t(1, 4))],
      supply: [stub('connection', t(1, 1)), stub('connection', t(1, 2))],
      return: [stub('connection', t(1, 3)), stub('connection', t(1, 4))],
    };
    expect(codes(c, 1, 4)).toEqual(['bends-cross']);
    const marked = { ...c, bends: [c.bends[0], { ...c.bends[1], crossover: true }] };
    expect(codes(marked, 1, 4)).toEqual([]);
    // 2 rows x 2 tubes: the X of row 1 tube 1 - row 2 tube 2 and row 1 tube 2 - row 2 tube 1.
    const x: Circuiting = {
      bends: [bend('opposite', t(2, 2), t(1, 1)), bend('opposite', t(2, 1), t(1, 2))],
      supply: [stub('connection', t(2, 2)), stub('connection', t(2, 1))],
      return: [stub('connection', t(1, 1)), stub('connection', t(1, 2))],
    };
    expect(codes(x)).toEqual(['bends-cross']);
  });
  it('the same tube reached twice -> tube-in-two-circuits', () => {
    const c: Circuiting = { bends: [], supply: [stub('connection', t(1, 1)), stub('opposite', t(1, 1))], return: [] };
    expect(codes(c, 1, 1)).toContain('tube-in-two-circuits');
  });
  it('tubes outside the coil (documents that skipped the schema) -> tube-outside-coil, no throw', () => {
    const c: Circuiting = { bends: [bend('opposite', t(3, 1), t(1, 1))], supply: [stub('connection', t(1, 9))], return: [] };
    expect(codes(c, 2, 2)).toContain('tube-outside-coil');
  });
  it('bare tubes are reported once, listing every tube', () => {
    const topo = traceCircuits(docWith(4, 6, { bends: [], supply: [], return: [] }));
    const unused = topo.errors.filter((e) => e.code === 'tube-unused');
    expect(unused).toHaveLength(1);
    expect(unused[0].tubes).toHaveLength(24);
    expect(unused[0].message).toContain('24 tubes belong to no circuit');
  });
  it('no supply at all -> no-circuits', () => {
    expect(codes({ bends: [], supply: [], return: [] }, 1, 1)).toEqual(['no-circuits', 'tube-unused']);
  });
});

describe('arrangement, low points and segment intersection', () => {
  it('classifies row sequences (ENGINEERING.md 2.3)', () => {
    expect(classifyArrangement([4, 3, 2, 1])).toEqual({ arrangement: 'counterflow', counterflowIndex: 1 });
    expect(classifyArrangement([1, 2, 3])).toEqual({ arrangement: 'parallel', counterflowIndex: -1 });
    expect(classifyArrangement([3, 3, 2, 3, 1])).toEqual({ arrangement: 'mixed', counterflowIndex: 1 / 3 });
    expect(classifyArrangement([2, 2])).toEqual({ arrangement: 'single-row', counterflowIndex: 0 });
  });
  it('trapped low points: interior tubes lower than both sides; low ends drain (common practice, ENGINEERING.md 2.4)', () => {
    // row 4 (even, low) -> row 3 (high) -> row 2 (low) -> row 1 (high): row 2 is trapped, row 4 is an end.
    expect(trappedLowPoints([t(4, 1), t(3, 1), t(2, 1), t(1, 1)])).toEqual([t(2, 1)]);
    // a vertical run down and back up in one row pair: tubes 1,2,3 of row 1 then 3,2,1 of row 3 (same heights)
    expect(trappedLowPoints([t(1, 1), t(1, 2), t(1, 3), t(3, 3), t(3, 2), t(3, 1)])).toEqual([t(1, 3), t(3, 3)]);
    expect(trappedLowPoints([t(1, 3), t(1, 2), t(1, 1)])).toEqual([]);
  });
  it('segment intersection excludes separated segments and finds touching and overlapping ones', () => {
    const p = (x: number, y: number) => ({ x, y });
    expect(segmentsIntersect(p(0, 0), p(2, 2), p(0, 2), p(2, 0))).toBe(true);
    expect(segmentsIntersect(p(0, 0), p(0, 2), p(0, 1), p(0, 3))).toBe(true);
    expect(segmentsIntersect(p(0, 0), p(0, 1), p(0, 2), p(0, 3))).toBe(false);
    expect(segmentsIntersect(p(0, 0), p(1, 1), p(1, 0), p(2, 1))).toBe(false);
  });
});

describe('traceCircuits: warnings', () => {
  const warningCodes = (c: Circuiting, rows: number, tubes: number) => traceCircuits(docWith(rows, tubes, c)).warnings.map((w) => w.code);
  it('non-adjacent hairpin -> hairpin-not-adjacent (T5)', () => {
    const c: Circuiting = { bends: [bend('opposite', t(1, 1), t(1, 3)), bend('opposite', t(1, 2), t(1, 4), true)], supply: [stub('connection', t(1, 1)), stub('connection', t(1, 2))], return: [stub('connection', t(1, 3)), stub('connection', t(1, 4))] };
    const w = traceCircuits(docWith(1, 4, c)).warnings.find((x) => x.code === 'hairpin-not-adjacent');
    expect(w?.severity).toBe('warning');
    expect(w?.circuits).toEqual([1, 2]);
  });
  it('odd passes -> odd-passes warning and the opposite-end-brazed info (v1 decision 12, T4)', () => {
    const c = serpentineCircuiting({ rows: 3, tubesPerRow: 2 }, 2);
    const topo = traceCircuits(docWith(3, 2, c));
    expect(topo.valid).toBe(true);
    expect(topo.circuits.every((x) => x.passes === 3 && !x.connectionsSameEnd && x.return.end === 'opposite')).toBe(true);
    expect(topo.warnings.map((x) => x.code)).toEqual(expect.arrayContaining(['odd-passes', 'opposite-end-brazed']));
  });
  it('unequal circuits -> unequal-passes', () => {
    expect(warningCodes(serpentineCircuiting({ rows: 4, tubesPerRow: 6 }, 5), 4, 6)).toContain('unequal-passes');
  });
  it('parallel flow -> not-counterflow', () => {
    const topo = traceCircuits(docWith(4, 6, serpentineCircuiting({ rows: 4, tubesPerRow: 6 }, 6, { direction: 'parallel' })));
    expect(topo.valid).toBe(true);
    expect(topo.circuits.every((c) => c.arrangement === 'parallel' && c.counterflowIndex === -1)).toBe(true);
    expect(topo.warnings.find((w) => w.code === 'not-counterflow')?.circuits).toEqual([1, 2, 3, 4, 5, 6]);
  });
  it('trapped low points are info, and a warning with water and freezing air', () => {
    const doc = docWith(4, 2, serpentineCircuiting({ rows: 4, tubesPerRow: 2 }, 2));
    expect(traceCircuits(doc).warnings.find((w) => w.code === 'trapped-low-point')?.severity).toBe('info');
    const cold = { ...doc, conditions: { ...doc.conditions, minimumAirTemperature_C: -10 } };
    expect(traceCircuits(cold).warnings.find((w) => w.code === 'trapped-low-point')?.severity).toBe('warning');
  });
  it('a full-serpentine starting point has no errors and no design warnings beyond drainage', () => {
    const topo = traceCircuits(docWith(4, 24, serpentineCircuiting({ rows: 4, tubesPerRow: 24 }, 24)));
    expect(topo.valid).toBe(true);
    expect(topo.warnings.map((w) => w.code)).toEqual(['trapped-low-point']);
  });
});

// ---- property tests ----
const sizes = fc.record({ rows: fc.integer({ min: 1, max: 8 }), tubesPerRow: fc.integer({ min: 1, max: 16 }) });
const knownCodes = new Set<string>(TOPOLOGY_ERROR_CODES);

describe('traceCircuits: properties (fast-check)', () => {
  it('generated circuitings trace valid with every tube in exactly one circuit', () => {
    fc.assert(
      fc.property(sizes.chain((s) => fc.record({ s: fc.constant(s), feeds: fc.constantFrom(...candidateFeedCounts(s).map((c) => c.feeds)) })), ({ s, feeds }) => {
        const topo = traceCircuits(docWith(s.rows, s.tubesPerRow, serpentineCircuiting(s, feeds)));
        expect(topo.errors).toEqual([]);
        expect(topo.circuits).toHaveLength(feeds);
        const seen = topo.circuits.flatMap((c) => c.tubes.map((x) => `${x.row}:${x.tube}`));
        expect(new Set(seen).size).toBe(s.rows * s.tubesPerRow);
        expect(seen).toHaveLength(s.rows * s.tubesPerRow);
        expect(topo.tubeCircuit.every((n) => n >= 1 && n <= feeds)).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it('mutated drawings (bends deleted, moved or duplicated) give coded errors and never throw', () => {
    const mutation = fc.record({ kind: fc.constantFrom('delete', 'move', 'duplicate', 'flip'), pick: fc.nat(), row: fc.nat(), tube: fc.nat() });
    fc.assert(
      fc.property(sizes, fc.nat(), fc.array(mutation, { minLength: 1, maxLength: 4 }), (s, f, muts) => {
        const offered = candidateFeedCounts(s);
        const feeds = offered[f % offered.length].feeds;
        const c = serpentineCircuiting(s, feeds);
        const bends = [...c.bends];
        for (const m of muts) {
          if (bends.length === 0) break;
          const i = m.pick % bends.length;
          if (m.kind === 'delete') bends.splice(i, 1);
          else if (m.kind === 'duplicate') bends.push({ ...bends[i] });
          else if (m.kind === 'flip') bends[i] = { ...bends[i], end: bends[i].end === 'connection' ? 'opposite' : 'connection' };
          else bends[i] = { ...bends[i], b: { row: 1 + (m.row % s.rows), tube: 1 + (m.tube % s.tubesPerRow) } };
        }
        const doc = docWith(s.rows, s.tubesPerRow, { ...c, bends });
        const topo = traceCircuits(doc);
        for (const e of topo.errors) expect(knownCodes.has(e.code)).toBe(true);
        if (topo.valid) {
          expect(new Set(topo.circuits.flatMap((x) => x.tubes.map((r) => `${r.row}:${r.tube}`))).size).toBe(s.rows * s.tubesPerRow);
        } else {
          expect(topo.errors.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 150 },
    );
  });

  it('arbitrary schema-valid drawings never throw', () => {
    const drawing = sizes.chain((s) => {
      const ref = fc.record({ row: fc.integer({ min: 1, max: s.rows }), tube: fc.integer({ min: 1, max: s.tubesPerRow }) });
      const face = fc.constantFrom('connection' as const, 'opposite' as const);
      return fc.record({
        s: fc.constant(s),
        bends: fc.array(fc.record({ end: face, a: ref, b: ref, crossover: fc.option(fc.boolean(), { nil: undefined }) }), { maxLength: 40 }),
        supply: fc.array(fc.record({ end: face, tube: ref }), { maxLength: 10 }),
        ret: fc.array(fc.record({ end: face, tube: ref }), { maxLength: 10 }),
      });
    });
    fc.assert(
      fc.property(drawing, ({ s, bends, supply, ret }) => {
        const cleaned = bends.map((b) => (b.crossover === undefined ? { end: b.end, a: b.a, b: b.b } : b));
        const doc = docWith(s.rows, s.tubesPerRow, { bends: cleaned, supply, return: ret });
        expect(coilDocumentSchema.safeParse(doc).success).toBe(true);
        const topo = traceCircuits(doc);
        for (const e of topo.errors) {
          expect(knownCodes.has(e.code)).toBe(true);
          expect(e.message.length).toBeGreaterThan(10);
        }
        expect(topo.valid).toBe(topo.errors.length === 0);
      }),
      { numRuns: 250 },
    );
  });
});
