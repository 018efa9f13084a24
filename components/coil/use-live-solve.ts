/**
 * Live results: the drawing is traced on the client at once (topology errors show instantly) and solved by the
 * server (POST /api/solve through react-query): a single edit is sent at once, a burst of edits at most once per
 * 150 ms with the latest drawing (leading and trailing edge). A result is "fresh" only when it belongs
 * to the document version on screen; otherwise it is kept but marked stale. Invalid drawings are not sent: their
 * errors are the answer, never old numbers.
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { solve } from '@/lib/api/solve';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { traceCircuits, type Topology } from '@/lib/engine/topology';
import type { CoilDocument, SolveResult } from '@/lib/engine/types';

export const LIVE_SOLVE_DELAY_MS = 150;

/** One shared empty list, so that what depends on the issues does not change when a valid drawing is edited. */
const NO_ISSUES: LiveSolve['documentIssues'] = [];

export interface LiveSolve {
  topology: Topology;
  /** Field messages when the document fails validation (then nothing is solved). */
  documentIssues: { path: string; message: string }[];
  /** The latest server result, possibly for an older drawing. */
  result: SolveResult | null;
  /** True when `result` belongs to the drawing on screen. */
  fresh: boolean;
  /** The document version `result` was solved for (the bench and tests watch it), or null. */
  resultVersion: number | null;
  solving: boolean;
  error: string | null;
}

export function useLiveSolve(coilId: string, document: CoilDocument, version: number): LiveSolve {
  const topology = useMemo(() => traceCircuits(document), [document]);
  const issues = useMemo(() => {
    const parsed = coilDocumentSchema.safeParse(document);
    return parsed.success ? NO_ISSUES : parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
  }, [document]);
  const solvable = topology.valid && issues.length === 0;

  const [request, setRequest] = useState({ document, version, solvable });
  const lastSent = useRef(0);
  useEffect(() => {
    // Only solvable drawings are sent, so only they count against the throttle.
    const wait = solvable ? Math.max(0, lastSent.current + LIVE_SOLVE_DELAY_MS - Date.now()) : 0;
    const t = setTimeout(() => {
      if (solvable) lastSent.current = Date.now();
      setRequest({ document, version, solvable });
    }, wait);
    return () => clearTimeout(t);
  }, [document, version, solvable]);

  const query = useQuery({
    queryKey: ['solve', coilId, request.version],
    queryFn: async () => ({ version: request.version, result: await solve(request.document) }),
    enabled: request.solvable,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 30_000,
    retry: 1,
  });

  const data = query.data;
  const fresh = solvable && data !== undefined && data.version === version && !query.isPlaceholderData;
  const result = data?.result ?? null;
  const resultVersion = data?.version ?? null;
  const solving = solvable && (!fresh || query.isFetching);
  const error = query.error ? query.error.message : null;
  return useMemo(
    () => ({ topology, documentIssues: issues, result, fresh, resultVersion, solving, error }),
    [topology, issues, result, fresh, resultVersion, solving, error],
  );
}
