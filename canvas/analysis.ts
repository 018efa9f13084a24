/**
 * Turns the client-side trace (instant) and the server's solve result (when it matches the drawing) into what the
 * sheet marks: circuits in water order, tubes named by errors, tubes named by warnings.
 */
import type { SolveResult, TubeRef } from '@/lib/engine/types';
import type { Topology } from '@/lib/engine/topology';
import type { SheetAnalysis, TubeTemperature } from './render-model';
import { tubeKey } from './render-model';

export function sheetAnalysis(topology: Topology, result: SolveResult | null): SheetAnalysis {
  const warningTubes: TubeRef[] = [];
  for (const w of topology.warnings) if (w.tubes) warningTubes.push(...w.tubes);
  if (result) {
    for (const w of result.warnings) {
      if (w.tubes) warningTubes.push(...w.tubes);
      // A warning about whole circuits marks their supply tube, so it is visible on the sheet.
      else if (w.circuits) {
        for (const index of w.circuits) {
          const c = topology.circuits.find((x) => x.index === index);
          if (c && c.tubes[0]) warningTubes.push(c.tubes[0]);
        }
      }
    }
  }
  const errorTubes: TubeRef[] = [];
  for (const e of topology.errors) if (e.tubes) errorTubes.push(...e.tubes);
  return {
    circuits: topology.circuits.map((c) => ({ index: c.index, tubes: c.tubes })),
    errorTubes,
    warningTubes,
  };
}

/** Water temperatures per tube key, from a solve result. */
export function tubeTemperatures(result: SolveResult | null): Map<string, TubeTemperature> | null {
  if (!result || !result.valid || result.tubes.length === 0) return null;
  const map = new Map<string, TubeTemperature>();
  for (const t of result.tubes) map.set(tubeKey(t), { waterIn_C: t.waterIn_C, waterOut_C: t.waterOut_C });
  return map;
}
