/** The list numbers of a coil, taken from the authoritative solve of its document. */
import type { CoilSummary } from '@/db/schema';
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import type { Logger } from '@/server/logger';
import type { SolveFn } from '@/server/services/context';

export function summaryFromResult(document: CoilDocument, result: SolveResult): CoilSummary {
  return {
    rows: document.geometry.rows,
    tubesPerRow: document.geometry.tubesPerRow,
    circuitCount: result.totals.circuitCount ?? null,
    capacity_W: result.valid ? (result.totals.capacity_W ?? null) : null,
    waterPressureDrop_Pa: result.valid ? (result.totals.waterPressureDrop_Pa ?? null) : null,
    warningCount: result.warnings.length,
    valid: result.valid,
  };
}

/** Summary of a document; solver figures are null when the solve threw (logged, so a save never fails on it). */
export function summarizeCoil(document: CoilDocument, solve: SolveFn, logger: Logger): CoilSummary {
  const unknown: CoilSummary = {
    rows: document.geometry.rows,
    tubesPerRow: document.geometry.tubesPerRow,
    circuitCount: null,
    capacity_W: null,
    waterPressureDrop_Pa: null,
    warningCount: null,
    valid: null,
  };
  try {
    return summaryFromResult(document, solve(document));
  } catch (err) {
    logger.error({ err }, 'solve for the coil summary failed');
    return unknown;
  }
}
