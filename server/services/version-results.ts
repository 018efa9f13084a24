/** The solve of a version's document, and the headline numbers kept with the version and compared between two. */
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import type { ResultDifference, VersionSummary } from '@/lib/schema/api-versions';
import type { Logger } from '@/server/logger';
import type { SolveFn } from '@/server/services/context';

function failedResult(code: string, message: string): SolveResult {
  return { valid: false, errors: [{ code, message }], warnings: [], circuits: [], totals: { circuitCount: 0 }, tubes: [] };
}

/** Never throws: a missing solver or a solver failure becomes an invalid result that says so (and is logged). */
export function solveVersion(document: CoilDocument, solve: SolveFn | undefined, logger: Logger): SolveResult {
  if (!solve) return failedResult('solver_unavailable', 'The solver is not available on this server, so no results were computed.');
  try {
    return solve(document);
  } catch (err) {
    logger.error({ err }, 'solve of a version failed');
    return failedResult('solve_failed', 'The solver could not compute this design. The drawing and settings were kept as they are.');
  }
}

export function versionSummary(result: SolveResult): VersionSummary {
  const t = result.totals;
  return {
    valid: result.valid,
    capacity_W: result.valid ? (t.capacity_W ?? null) : null,
    waterPressureDrop_Pa: result.valid ? (t.waterPressureDrop_Pa ?? null) : null,
    airPressureDrop_Pa: result.valid ? (t.airPressureDrop_Pa ?? null) : null,
    circuitCount: t.circuitCount,
    warningCount: result.warnings.length,
    errorCount: result.errors.length,
  };
}

/** The results set side by side when two versions are compared, in display order. */
const KEY_RESULTS: { key: string; pick: (r: SolveResult) => number | undefined }[] = [
  { key: 'capacity_W', pick: (r) => r.totals.capacity_W },
  { key: 'sensibleCapacity_W', pick: (r) => r.totals.sensibleCapacity_W },
  { key: 'latentCapacity_W', pick: (r) => r.totals.latentCapacity_W },
  { key: 'waterPressureDrop_Pa', pick: (r) => r.totals.waterPressureDrop_Pa },
  { key: 'airPressureDrop_Pa', pick: (r) => r.totals.airPressureDrop_Pa },
  { key: 'leavingAirDryBulb_C', pick: (r) => r.totals.leavingAirDryBulb_C },
  { key: 'leavingWaterTemperature_C', pick: (r) => r.totals.leavingWaterTemperature_C },
  { key: 'circuitCount', pick: (r) => r.totals.circuitCount },
  { key: 'warningCount', pick: (r) => r.warnings.length },
  { key: 'errorCount', pick: (r) => r.errors.length },
];

/** Thermal and hydraulic figures only count for a valid circuiting; counts always do. */
const COUNTS = new Set(['circuitCount', 'warningCount', 'errorCount']);

export function compareResults(a: SolveResult, b: SolveResult): ResultDifference[] {
  return KEY_RESULTS.map(({ key, pick }) => {
    const value = (r: SolveResult) => {
      const v = COUNTS.has(key) || r.valid ? pick(r) : undefined;
      return typeof v === 'number' && Number.isFinite(v) ? v : null;
    };
    const va = value(a);
    const vb = value(b);
    return { key, a: va, b: vb, difference: va === null || vb === null ? null : vb - va };
  });
}
