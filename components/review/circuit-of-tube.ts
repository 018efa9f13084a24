/** The circuit (1-based) a tube belongs to in a document's circuiting, or null when it is in none. */
import type { CoilDocument, TubeRef } from '@/lib/engine/types';
import { traceCircuits, tubeIndex } from '@/lib/engine/topology';

export function circuitLookup(document: CoilDocument): (tube: TubeRef) => number | null {
  const topology = traceCircuits(document);
  return (tube) => {
    const c = topology.tubeCircuit[tubeIndex(document.geometry, tube)];
    return c && c > 0 ? c : null;
  };
}
