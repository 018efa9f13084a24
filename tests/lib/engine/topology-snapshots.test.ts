// Pins traceCircuits' full output (errors with codes, messages, tubes and order; warnings; circuits; tubeCircuit)
// for the example documents, serpentines, the 12 x 60 bench coil and seeded random drawings, against JSON captured
// once from the tracer by fixtures/capture-topology-fixtures.ts. Guards the tracer's speed-ups against silent changes.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { TOPOLOGY_ERROR_CODES, traceCircuits, type Topology } from '@/lib/engine/topology';
import type { CoilDocument } from '@/lib/engine/types';

interface Snapshot { name: string; doc: CoilDocument; topology: Topology }

const snapshots: Snapshot[] = JSON.parse(readFileSync(path.join(__dirname, 'fixtures', 'topology-snapshots.json'), 'utf8'));

describe('traceCircuits output matches the captured snapshots', () => {
  it('the snapshots cover every error code and many drawings', () => {
    expect(snapshots.length).toBeGreaterThan(150);
    const seen = new Set(snapshots.flatMap((s) => s.topology.errors.map((e) => e.code)));
    expect([...seen].sort()).toEqual([...TOPOLOGY_ERROR_CODES].sort());
  });

  for (const s of snapshots) {
    it(s.name, () => {
      // Round-trip through JSON so the comparison sees exactly what the fixture could store.
      const now: unknown = JSON.parse(JSON.stringify(traceCircuits(s.doc)));
      expect(now).toStrictEqual(s.topology);
    });
  }
});
