/**
 * Writes the example coil documents to assets/examples/ (one JSON file each, plus index.json listing them with the
 * error codes an invalid drawing must give). Run: npx tsx scripts/make-examples.ts
 * The valid examples are built with the circuiting generators; the invalid ones are a valid drawing with one
 * deliberate mistake, written out by hand below.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { serpentineCircuiting } from '@/lib/engine/generators';
import { defaultConditions, startingPointGeometry } from '@/lib/engine/starting-points';
import type { Circuiting, CoilDocument, Conditions, Geometry } from '@/lib/engine/types';

export interface ExampleEntry {
  file: string;
  title: string;
  description: string;
  valid: boolean;
  /** For invalid drawings: the distinct topology error codes expected, sorted. */
  expectedErrors: string[];
}

interface Example {
  entry: ExampleEntry;
  doc: CoilDocument;
}

const geometry = (id: 'half-inch' | 'five-eighths-inch', rows: number, tubesPerRow: number, finnedLength_m = 1.2192): Geometry => {
  // Starting points stop at 8 rows; deeper examples reuse the 8-row sheet with more rows.
  const g = startingPointGeometry(id, { rows: Math.min(rows, 8), tubesPerRow, finnedLength_m });
  return { ...g, rows };
};

const make = (name: string, g: Geometry, circuiting: Circuiting, conditions: Conditions): CoilDocument => ({
  schemaVersion: 1,
  name,
  geometry: g,
  circuiting,
  conditions,
});

const valid = (file: string, title: string, description: string, doc: CoilDocument): Example => ({
  entry: { file, title, description, valid: true, expectedErrors: [] },
  doc,
});

function buildExamples(): Example[] {
  const out: Example[] = [];

  // 2-row hot-water heating coil: the geometry and conditions of check E1 (ENGINEERING.md 4.7).
  {
    const g = geometry('half-inch', 2, 24);
    const c = defaultConditions('heating', g, 24);
    c.air = { faceVelocity_m_s: 2.5, inletDryBulb_C: 10, inletRelativeHumidity: 0.3, altitude_m: 0 };
    c.fluid = { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 80, massFlow_kg_s: 1.0 };
    out.push(valid('hot-water-heating-2-row.json', '2-row hot-water heating coil',
      '1/2 in tubes, 24 high, full serpentine (24 circuits x 2 passes, counterflow), water 80 °C at 1.0 kg/s, air 10 °C.',
      make('Example: 2-row hot-water heating coil', g, serpentineCircuiting(g, 24), c)));
  }

  // 6-row chilled-water dehumidifying coil, wavy fins, full serpentine.
  {
    const g = geometry('half-inch', 6, 24);
    g.fin = { ...g.fin, type: 'wavy', waveDepth_m: 0.0015, waveHalfLength_m: 0.00635 };
    const c = defaultConditions('cooling', g, 24);
    c.air = { faceVelocity_m_s: 2.3, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 };
    c.fluid = { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 6.5, massFlow_kg_s: 3.2 };
    out.push(valid('chilled-water-6-row-dehumidifying.json', '6-row chilled-water dehumidifying coil',
      '1/2 in tubes, wavy fins, 24 high, full serpentine (24 x 6 passes), chilled water 6.5 °C, air 27/19.5 °C.',
      make('Example: 6-row chilled-water dehumidifying coil', g, serpentineCircuiting(g, 24), c)));
  }

  // 40 % propylene glycol preheat coil with freezing entering air.
  {
    const g = geometry('half-inch', 2, 24);
    const c = defaultConditions('heating', g, 12);
    c.air = { faceVelocity_m_s: 2.5, inletDryBulb_C: -15, inletRelativeHumidity: 0.7, altitude_m: 0 };
    c.fluid = { kind: 'propylene-glycol', glycolMassFraction: 0.4, inletTemperature_C: 60, massFlow_kg_s: 1.6 };
    c.minimumAirTemperature_C = -18;
    out.push(valid('propylene-glycol-40-preheat.json', '40 % propylene glycol preheat coil',
      '1/2 in tubes, 2 rows x 24 high, half serpentine (12 x 4 passes); 40 % propylene glycol at 60 °C; outdoor air down to -18 °C.',
      make('Example: glycol preheat coil', g, serpentineCircuiting(g, 12), c)));
  }

  // 30 % ethylene glycol cooling coil, half serpentine.
  {
    const g = geometry('half-inch', 4, 24);
    const c = defaultConditions('cooling', g, 12);
    c.fluid = { kind: 'ethylene-glycol', glycolMassFraction: 0.3, inletTemperature_C: 4, massFlow_kg_s: 2.4 };
    out.push(valid('ethylene-glycol-30-cooling-half-serpentine.json', '30 % ethylene glycol cooling coil',
      '1/2 in tubes, 4 rows x 24 high, half serpentine (12 x 8 passes), 30 % ethylene glycol at 4 °C.',
      make('Example: ethylene glycol cooling coil', g, serpentineCircuiting(g, 12), c)));
  }

  // Counterflow and its parallel-flow twin.
  {
    const g = geometry('half-inch', 4, 16);
    const c = defaultConditions('cooling', g, 16);
    out.push(valid('twin-counterflow-4-row.json', 'Counterflow twin',
      '4 rows x 16 high, full serpentine, water enters the air-leaving row and leaves the air-entering row.',
      make('Example: twin A, counterflow', g, serpentineCircuiting(g, 16), c)));
    out.push(valid('twin-parallel-flow-4-row.json', 'Parallel-flow twin',
      'The same coil circuited the other way round: water enters the air-entering row (parallel flow, warned).',
      make('Example: twin B, parallel flow', g, serpentineCircuiting(g, 16, { direction: 'parallel' }), c)));
  }

  // Double serpentine, 8 rows.
  {
    const g = geometry('half-inch', 8, 24);
    const c = defaultConditions('cooling', g, 48);
    out.push(valid('double-serpentine-8-row.json', '8-row double serpentine',
      '1/2 in tubes, 8 rows x 24 high, 48 circuits x 4 passes.',
      make('Example: 8-row double serpentine', g, serpentineCircuiting(g, 48), c)));
  }

  // Unequal circuits: 20 feeds on 96 tubes.
  {
    const g = geometry('half-inch', 4, 24);
    const c = defaultConditions('cooling', g, 20);
    out.push(valid('unequal-circuits-4-row.json', 'Unequal circuits',
      '4 rows x 24 high fed 20 circuits: passes differ between circuits (warned), all counterflow.',
      make('Example: unequal circuits', g, serpentineCircuiting(g, 20), c)));
  }

  // 12-row deep coil, full serpentine.
  {
    const g = geometry('half-inch', 12, 24);
    const c = defaultConditions('cooling', g, 24);
    c.fluid = { ...c.fluid, inletTemperature_C: 5.5 };
    out.push(valid('chilled-water-12-row.json', '12-row deep chilled-water coil',
      '1/2 in tubes, 12 rows x 24 high, full serpentine (24 x 12 passes).',
      make('Example: 12-row chilled-water coil', g, serpentineCircuiting(g, 24), c)));
  }

  // 3-row 5/8 in coil: odd passes, return header on the opposite end.
  {
    const g = geometry('five-eighths-inch', 3, 20);
    const c = defaultConditions('heating', g, 20);
    out.push(valid('hot-water-3-row-odd-passes.json', '3-row coil with odd passes',
      '5/8 in tubes, 3 rows x 20 high, full serpentine with 3 passes: the return header sits on the opposite end (warned).',
      make('Example: 3-row heating coil, opposite-end return', g, serpentineCircuiting(g, 20), c)));
  }

  // 1-row booster coil.
  {
    const g = geometry('half-inch', 1, 12, 0.9144);
    const c = defaultConditions('heating', g, 6);
    out.push(valid('booster-1-row.json', '1-row booster heating coil',
      '1/2 in tubes, 1 row x 12 high, 6 circuits of 2 passes (single-row circuits).',
      make('Example: 1-row booster coil', g, serpentineCircuiting(g, 6), c)));
  }

  // ---- invalid drawings: a valid 2-row x 8 coil with one mistake each ----
  const g = geometry('half-inch', 2, 8, 0.6096);
  const c = defaultConditions('cooling', g, 8);
  const good = serpentineCircuiting(g, 8); // circuit k: supply row 2 tube k, opposite-end bend to row 1 tube k, return row 1 tube k
  const invalid = (file: string, title: string, description: string, circuiting: Circuiting, expectedErrors: string[]): Example => ({
    entry: { file, title, description, valid: false, expectedErrors: [...expectedErrors].sort() },
    doc: make(`Example (invalid): ${title}`, g, circuiting, c),
  });
  const isTube = (r: { row: number; tube: number }, row: number, tube: number) => r.row === row && r.tube === tube;

  out.push(invalid('invalid-dangling-bend.json', 'Dangling bend',
    'Tube 3 has lost both header stubs, so its bend joins tubes no water reaches.',
    { ...good, supply: good.supply.filter((s) => s.tube.tube !== 3), return: good.return.filter((s) => s.tube.tube !== 3) },
    ['bend-dangling']));
  out.push(invalid('invalid-missing-return.json', 'Missing return',
    'The return stub of row 1 tube 5 is missing: the water of that circuit has nowhere to go.',
    { ...good, return: good.return.filter((s) => !isTube(s.tube, 1, 5)) },
    ['circuit-no-return']));
  out.push(invalid('invalid-crossing-bends.json', 'Crossing bends',
    'Two opposite-end bends cross (row 2 tube 1 to row 1 tube 2, and row 2 tube 2 to row 1 tube 1) without being marked as crossovers.',
    {
      ...good,
      bends: good.bends.map((b) =>
        isTube(b.a, 2, 1) ? { ...b, b: { row: 1, tube: 2 } } : isTube(b.a, 2, 2) ? { ...b, b: { row: 1, tube: 1 } } : b),
    },
    ['bends-cross']));
  out.push(invalid('invalid-tube-twice.json', 'Tube used twice',
    'The bend from row 2 tube 4 runs to row 1 tube 3, which circuit 3 already uses; row 1 tube 4 is left with only its return stub.',
    { ...good, bends: good.bends.map((b) => (isTube(b.a, 2, 4) ? { ...b, b: { row: 1, tube: 3 } } : b)) },
    ['circuit-no-supply', 'tube-end-conflict', 'tube-in-two-circuits']));
  out.push(invalid('invalid-unused-tube.json', 'Unused tubes',
    'Tube position 8 of both rows has no bend and no stub.',
    {
      bends: good.bends.filter((b) => b.a.tube !== 8),
      supply: good.supply.filter((s) => s.tube.tube !== 8),
      return: good.return.filter((s) => s.tube.tube !== 8),
    },
    ['tube-unused']));
  out.push(invalid('invalid-supply-both-faces.json', 'Headers on both faces',
    'Circuit 6 is fed from the opposite end (supply and bend faces swapped), so supply and return stubs sit on both end faces.',
    {
      bends: good.bends.map((b) => (b.a.tube === 6 ? { ...b, end: 'connection' as const } : b)),
      supply: good.supply.map((s) => (s.tube.tube === 6 ? { ...s, end: 'opposite' as const } : s)),
      return: good.return.map((s) => (s.tube.tube === 6 ? { ...s, end: 'opposite' as const } : s)),
    },
    ['return-faces-mixed', 'supply-faces-mixed']));
  return out;
}

export const EXAMPLES_DIR = path.join(__dirname, '..', 'assets', 'examples');

function main(): void {
  const examples = buildExamples();
  mkdirSync(EXAMPLES_DIR, { recursive: true });
  for (const { entry, doc } of examples) writeFileSync(path.join(EXAMPLES_DIR, entry.file), `${JSON.stringify(doc, null, 2)}\n`);
  writeFileSync(path.join(EXAMPLES_DIR, 'index.json'), `${JSON.stringify(examples.map((e) => e.entry), null, 2)}\n`);
  console.log(`wrote ${examples.length} examples to ${EXAMPLES_DIR}`);
}

main();
