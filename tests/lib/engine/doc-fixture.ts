/** Test helper: a schema-valid coil document of any size with the given circuiting. */
import { startingPointDocument } from '@/lib/engine/starting-points';
import type { Bend, Circuiting, CoilDocument, EndFace, Stub, TubeRef } from '@/lib/engine/types';

export function docWith(rows: number, tubesPerRow: number, circuiting: Circuiting): CoilDocument {
  const doc = startingPointDocument('half-inch', { rows: Math.min(rows, 8), tubesPerRow });
  return { ...doc, geometry: { ...doc.geometry, rows }, circuiting };
}

export const t = (row: number, tube: number): TubeRef => ({ row, tube });
export const bend = (end: EndFace, a: TubeRef, b: TubeRef, crossover?: boolean): Bend =>
  crossover === undefined ? { end, a, b } : { end, a, b, crossover };
export const stub = (end: EndFace, tube: TubeRef): Stub => ({ end, tube });
