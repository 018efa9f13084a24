import { describe, expect, it } from 'vitest';
import { candidateFeedCounts, serpentineCircuiting } from '@/lib/engine/generators';
import { traceCircuits } from '@/lib/engine/topology';
import { docWith } from './doc-fixture';

const key = (r: { row: number; tube: number }) => `${r.row}:${r.tube}`;

describe('serpentineCircuiting: every candidate feed count (rows 1-8, tubes high 4, 6, 12, 24)', () => {
  for (let rows = 1; rows <= 8; rows++) {
    for (const tubesPerRow of [4, 6, 12, 24]) {
      it(`${rows} rows x ${tubesPerRow} tubes`, () => {
        const g = { rows, tubesPerRow };
        const offered = candidateFeedCounts(g);
        // full, half and double serpentine are always offered where they exist (ENGINEERING.md 2.2)
        const feeds = offered.map((c) => c.feeds);
        expect(feeds).toContain(tubesPerRow);
        expect(feeds).toContain(tubesPerRow / 2);
        if (rows >= 2) expect(feeds).toContain(2 * tubesPerRow);
        for (const cand of offered) {
          const topo = traceCircuits(docWith(rows, tubesPerRow, serpentineCircuiting(g, cand.feeds)));
          expect(topo.errors, `${cand.feeds} feeds`).toEqual([]);
          expect(topo.circuits).toHaveLength(cand.feeds);
          const used = topo.circuits.flatMap((c) => c.tubes.map(key));
          expect(used).toHaveLength(rows * tubesPerRow);
          expect(new Set(used).size).toBe(rows * tubesPerRow);
          const passes = topo.circuits.map((c) => c.passes);
          expect(Math.min(...passes)).toBe(cand.passes.min);
          expect(Math.max(...passes)).toBe(cand.passes.max);
          expect(cand.passes.max - cand.passes.min).toBeLessThanOrEqual(2);
          expect(topo.circuits.every((c) => c.connectionsSameEnd === cand.even)).toBe(true);
          // counterflow discipline: never parallel or mixed; every supply on the connection end
          expect(topo.circuits.every((c) => c.arrangement === 'counterflow' || c.arrangement === 'single-row')).toBe(true);
          expect(topo.circuits.every((c) => c.supply.end === 'connection')).toBe(true);
          expect(topo.warnings.map((w) => w.code)).not.toContain('hairpin-not-adjacent');
          // When the feeds divide the tubes high, each circuit runs the full depth: row N in, row 1 out.
          if (tubesPerRow % cand.feeds === 0 && rows > 1) {
            expect(topo.circuits.every((c) => c.startsInLastRow && c.endsInFirstRow && c.arrangement === 'counterflow')).toBe(true);
          }
        }
      });
    }
  }
});

describe('serpentineCircuiting: the named circuitings (vendor usage, ENGINEERING.md 2.2)', () => {
  const passesOf = (rows: number, tubes: number, feeds: number) =>
    traceCircuits(docWith(rows, tubes, serpentineCircuiting({ rows, tubesPerRow: tubes }, feeds))).circuits.map((c) => c.passes);
  it('full serpentine: one tube per row per circuit', () => {
    expect(passesOf(4, 24, 24).every((p) => p === 4)).toBe(true);
  });
  it('half serpentine: two tubes per row per circuit, twice the passes, supply at the bottom', () => {
    const topo = traceCircuits(docWith(4, 24, serpentineCircuiting({ rows: 4, tubesPerRow: 24 }, 12)));
    expect(topo.circuits.every((c) => c.passes === 8 && c.supplyAtBottom)).toBe(true);
    expect(topo.circuits[0].tubes.slice(0, 3)).toEqual([{ row: 4, tube: 2 }, { row: 4, tube: 1 }, { row: 3, tube: 1 }]);
  });
  it('double serpentine: twice the feeds, half the passes', () => {
    expect(passesOf(4, 24, 48).every((p) => p === 2)).toBe(true);
    expect(passesOf(6, 12, 24).every((p) => p === 3)).toBe(true);
  });
  it('24 tubes high x 8 rows: fed 24 -> 8 passes, fed 32 -> 6 passes (vendor note quoted in ENGINEERING.md 2.2)', () => {
    expect(passesOf(8, 24, 24).every((p) => p === 8)).toBe(true);
    expect(passesOf(8, 24, 32).every((p) => p === 6)).toBe(true);
  });
  it('parallel-flow twin mirrors the rows', () => {
    const topo = traceCircuits(docWith(4, 6, serpentineCircuiting({ rows: 4, tubesPerRow: 6 }, 6, { direction: 'parallel' })));
    expect(topo.valid).toBe(true);
    expect(topo.circuits.every((c) => c.arrangement === 'parallel' && c.tubes[0].row === 1)).toBe(true);
  });
  it('refuses impossible counts with RangeError (odd tube total split into an even number of equal-parity circuits)', () => {
    expect(() => serpentineCircuiting({ rows: 1, tubesPerRow: 3 }, 2)).toThrow(RangeError);
    expect(() => serpentineCircuiting({ rows: 2, tubesPerRow: 3 }, 0)).toThrow(RangeError);
    expect(() => serpentineCircuiting({ rows: 2, tubesPerRow: 3 }, 7)).toThrow(RangeError);
  });
});
