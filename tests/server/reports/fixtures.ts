// Coil documents for the report tests: the shipped examples when present, otherwise documents built from the
// engine's starting points. Every fixture is solved with the real engine.
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import { solveCoil } from '@/lib/engine/solve-coil';
import { startingPointDocument } from '@/lib/engine/starting-points';
import { serpentineCircuiting } from '@/lib/engine/generators';
import { coilDocumentSchema } from '@/lib/schema/coil-document';

export interface Fixture { name: string; doc: CoilDocument; result: SolveResult }

const EXAMPLES = path.resolve(process.cwd(), 'assets/examples'); // vitest and the scripts run from the project root

/** The example coil documents (index.json is their catalogue, not a coil), optionally only the named files. */
export function exampleFixtures(only?: readonly string[]): Fixture[] {
  if (!existsSync(EXAMPLES)) return [];
  return readdirSync(EXAMPLES)
    .filter((f) => f.endsWith('.json') && f !== 'index.json' && (!only || only.includes(f)))
    .sort()
    .map((f) => {
      const doc = coilDocumentSchema.parse(JSON.parse(readFileSync(path.join(EXAMPLES, f), 'utf8'))) as CoilDocument;
      return { name: f, doc, result: solveCoil(doc) };
    });
}

/** A small 4-row x 8-tube cooling coil with 4 circuits of 8 passes (two tubes high each). */
export function smallCoolingCoil(): Fixture {
  const base = startingPointDocument('half-inch', { rows: 4, tubesPerRow: 8, name: 'Test coil 4x8', mode: 'cooling' });
  const doc: CoilDocument = { ...base, circuiting: serpentineCircuiting(base.geometry, 4) };
  doc.conditions = { ...doc.conditions, fluid: { ...doc.conditions.fluid, massFlow_kg_s: 0.5 } };
  return { name: 'small-cooling', doc, result: solveCoil(doc) };
}

/** The 1/2 in starting point at its defaults (4 rows x 24 tubes, full serpentine, cooling). */
export function defaultCoolingCoil(): Fixture {
  const doc = startingPointDocument('half-inch', { name: 'Test coil 4x24' });
  return { name: 'default-cooling', doc, result: solveCoil(doc) };
}

/** A drawing whose circuiting is invalid (one bend removed): no hydraulics, no thermal results. */
export function brokenCoil(): Fixture {
  const good = smallCoolingCoil().doc;
  const doc: CoilDocument = { ...good, circuiting: { ...good.circuiting, bends: good.circuiting.bends.slice(1) } };
  return { name: 'broken', doc, result: solveCoil(doc) };
}
