/**
 * The client-side trace of a drawing, cached per document object: the editor and the live solve both need the
 * trace of the same document (the store makes a new document object for every edit), so each edit traces once.
 */
import { traceCircuits, type Topology } from '@/lib/engine/topology';
import type { CoilDocument } from '@/lib/engine/types';

const traces = new WeakMap<CoilDocument, Topology>();

export function traceOf(document: CoilDocument): Topology {
  let topology = traces.get(document);
  if (!topology) {
    topology = traceCircuits(document);
    traces.set(document, topology);
  }
  return topology;
}
