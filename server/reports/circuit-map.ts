/**
 * Which circuit each tube belongs to and which way the water runs through each bend, read from a solve result.
 * Shared by the end-face drawing, the DXF and the CSV exports.
 */
import type { Bend, CoilDocument, SolveResult, TubeRef } from '@/lib/engine/types';

export const tubeKey = (t: TubeRef): string => `${t.row}:${t.tube}`;

export interface TubePlace {
  /** Position of the circuit in result.circuits (0-based), which picks its colour. */
  ordinal: number;
  /** The circuit's own index as the result reports it. */
  circuitIndex: number;
  /** Position of the tube along the circuit in water order (0 = first tube after the supply). */
  step: number;
}

export interface CircuitMap {
  placeOf(tube: TubeRef): TubePlace | undefined;
  /**
   * The bend's ends in water order (upstream first) when both tubes are consecutive in one circuit; undefined when
   * the bend belongs to no solved circuit (invalid circuiting) or its ends are not consecutive.
   */
  waterOrder(bend: Bend): { from: TubeRef; to: TubeRef; ordinal: number } | undefined;
}

export function buildCircuitMap(result: SolveResult): CircuitMap {
  const places = new Map<string, TubePlace>();
  result.circuits.forEach((c, ordinal) => {
    c.tubes.forEach((t, step) => places.set(tubeKey(t), { ordinal, circuitIndex: c.index, step }));
  });
  return {
    placeOf: (tube) => places.get(tubeKey(tube)),
    waterOrder(bend) {
      const pa = places.get(tubeKey(bend.a));
      const pb = places.get(tubeKey(bend.b));
      if (!pa || !pb || pa.ordinal !== pb.ordinal || Math.abs(pa.step - pb.step) !== 1) return undefined;
      return pa.step < pb.step
        ? { from: bend.a, to: bend.b, ordinal: pa.ordinal }
        : { from: bend.b, to: bend.a, ordinal: pa.ordinal };
    },
  };
}

/** Every tube of the sheet, row by row, tube 1 (top) first. */
export function allTubes(doc: CoilDocument): TubeRef[] {
  const tubes: TubeRef[] = [];
  for (let row = 1; row <= doc.geometry.rows; row++) {
    for (let tube = 1; tube <= doc.geometry.tubesPerRow; tube++) tubes.push({ row, tube });
  }
  return tubes;
}
