// Every example coil document in assets/examples parses with the schema; valid ones trace valid, invalid ones give
// exactly the error codes listed for them in assets/examples/index.json.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { traceCircuits } from '@/lib/engine/topology';
import { coilDocumentSchema } from '@/lib/schema/coil-document';

interface Entry { file: string; title: string; description: string; valid: boolean; expectedErrors: string[] }

const dir = path.join(__dirname, '..', '..', '..', 'assets', 'examples');
const entries: Entry[] = JSON.parse(readFileSync(path.join(dir, 'index.json'), 'utf8'));
const load = (file: string) => coilDocumentSchema.parse(JSON.parse(readFileSync(path.join(dir, file), 'utf8')));

describe('assets/examples', () => {
  it('cover water, both glycols, 1 to 12 rows, and six kinds of invalid drawing', () => {
    const docs = entries.map((e) => load(e.file));
    const kinds = new Set(docs.map((d) => d.conditions.fluid.kind));
    expect([...kinds].sort()).toEqual(['ethylene-glycol', 'propylene-glycol', 'water']);
    const rows = docs.map((d) => d.geometry.rows);
    expect(Math.min(...rows)).toBe(1);
    expect(Math.max(...rows)).toBe(12);
    expect(entries.filter((e) => !e.valid)).toHaveLength(6);
  });

  for (const entry of entries) {
    it(`${entry.file}: ${entry.valid ? 'traces valid' : `gives ${entry.expectedErrors.join(', ')}`}`, () => {
      const doc = load(entry.file);
      const topo = traceCircuits(doc);
      if (entry.valid) {
        expect(topo.errors).toEqual([]);
        expect(topo.circuits.reduce((n, c) => n + c.passes, 0)).toBe(doc.geometry.rows * doc.geometry.tubesPerRow);
      } else {
        expect([...new Set(topo.errors.map((e) => e.code))].sort()).toEqual(entry.expectedErrors);
      }
    });
  }

  it('the named examples say what they are', () => {
    const byFile = (f: string) => load(f);
    const heating = byFile('hot-water-heating-2-row.json');
    expect(heating.geometry.rows).toBe(2);
    expect(heating.conditions.fluid.inletTemperature_C).toBeGreaterThan(heating.conditions.air.inletDryBulb_C);
    const chilled = byFile('chilled-water-6-row-dehumidifying.json');
    expect(chilled.geometry.rows).toBe(6);
    expect(chilled.conditions.air.inletWetBulb_C).toBeDefined();
    const pg = byFile('propylene-glycol-40-preheat.json');
    expect(pg.conditions.fluid).toMatchObject({ kind: 'propylene-glycol', glycolMassFraction: 0.4 });
    expect(pg.conditions.air.inletDryBulb_C).toBeLessThan(0);
    const twinA = traceCircuits(byFile('twin-counterflow-4-row.json'));
    const twinB = traceCircuits(byFile('twin-parallel-flow-4-row.json'));
    expect(twinA.circuits.every((c) => c.arrangement === 'counterflow')).toBe(true);
    expect(twinB.circuits.every((c) => c.arrangement === 'parallel')).toBe(true);
    expect(traceCircuits(byFile('unequal-circuits-4-row.json')).warnings.map((w) => w.code)).toContain('unequal-passes');
    expect(traceCircuits(byFile('double-serpentine-8-row.json')).circuits).toHaveLength(48);
    expect(traceCircuits(byFile('ethylene-glycol-30-cooling-half-serpentine.json')).circuits.every((c) => c.passes === 8)).toBe(true);
  });
});
