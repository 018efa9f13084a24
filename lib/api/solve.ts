/**
 * POST /api/solve: the server's authoritative solve of a coil document. An invalid circuiting is an answer
 * (valid: false with its errors), not a failure; a malformed document is a 400 with field messages.
 */
import { api } from '@/lib/api/client';
import type { CoilDocument } from '@/lib/schema/coil-document';
import { solveResultSchema, type SolveResult } from '@/lib/schema/solve-result';

/** `turndown: false` asks only for the design point (about five times faster: no part-load solves). */
export function solve(document: CoilDocument, options: { turndown?: boolean } = {}): Promise<SolveResult> {
  return api.post('/api/solve', options.turndown === false ? { document, turndown: false } : { document }, solveResultSchema);
}
