/**
 * Live results: the drawing is traced on the client at once (topology errors show instantly) and solved by the
 * server (POST /api/solve through react-query): a single edit is sent at once, a burst of edits at most once per
 * 150 ms with the latest drawing (leading and trailing edge). A result is "fresh" only when it belongs
 * to the document version on screen; otherwise it is kept but marked stale. Invalid drawings are not sent: their
 * errors are the answer, never old numbers. While drawing, the server skips the part-load solves (`turndown:
 * false`, about five times faster); once the drawing rests for TURNDOWN_SOLVE_DELAY_MS the full solve follows and,
 * when it belongs to the same drawing, replaces the quick answer (turndown chart and part-load warnings).
 */
import { useEffect, useMemo, useRef, useState } from 'react';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { solve } from '@/lib/api/solve';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { traceOf } from '@/canvas/trace-cache';
import type { Topology } from '@/lib/engine/topology';
import type { Circuiting, CoilDocument, SolveResult, TubeRef } from '@/lib/engine/types';

export const LIVE_SOLVE_DELAY_MS = 150;
/** Quiet time after the last edit before the part-load (turndown) solve is asked for, ms. */
export const TURNDOWN_SOLVE_DELAY_MS = 700;

/** Tube references off the grid, worded as the schema words them (lib/schema/coil-document.ts). */
export function tubeReferenceIssues(c: Circuiting, rows: number, tubesPerRow: number): LiveSolve['documentIssues'] {
  const out: LiveSolve['documentIssues'] = [];
  const check = (t: TubeRef, path: string) => {
    if (!Number.isInteger(t.row) || t.row < 1 || t.row > rows) out.push({ path: `${path}.row`, message: `row ${t.row} is outside the coil (it has ${rows} rows)` });
    if (!Number.isInteger(t.tube) || t.tube < 1 || t.tube > tubesPerRow) out.push({ path: `${path}.tube`, message: `tube ${t.tube} is outside the coil (it has ${tubesPerRow} tubes per row)` });
  };
  c.bends.forEach((b, i) => {
    check(b.a, `circuiting.bends.${i}.a`);
    check(b.b, `circuiting.bends.${i}.b`);
  });
  c.supply.forEach((x, i) => check(x.tube, `circuiting.supply.${i}.tube`));
  c.return.forEach((x, i) => check(x.tube, `circuiting.return.${i}.tube`));
  return out.length === 0 ? NO_ISSUES : out;
}

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
  const topology = traceOf(document); // shared with the editor, which traced this document first
  // The schema check of the whole document walks every bend; an edit of the drawing re-checks only what it can
  // break (tube references on the grid: the commands build well-formed bends and stubs), the rest when it changes.
  const { schemaVersion, name, geometry, conditions, options, circuiting } = document;
  const shellIssues = useMemo(() => {
    const shell = { schemaVersion, name, geometry, conditions, options, circuiting: { bends: [], supply: [], return: [] } };
    const parsed = coilDocumentSchema.safeParse(shell);
    return parsed.success ? NO_ISSUES : parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
  }, [schemaVersion, name, geometry, conditions, options]);
  const drawingIssues = useMemo(() => tubeReferenceIssues(circuiting, geometry.rows, geometry.tubesPerRow), [circuiting, geometry.rows, geometry.tubesPerRow]);
  const issues = useMemo(
    () => (shellIssues.length === 0 && drawingIssues.length === 0 ? NO_ISSUES : [...shellIssues, ...drawingIssues]),
    [shellIssues, drawingIssues],
  );
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
    queryFn: async () => ({ version: request.version, result: await solve(request.document, { turndown: false }) }),
    enabled: request.solvable,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 30_000,
    retry: 1,
  });

  const [resting, setResting] = useState({ document, version, solvable });
  useEffect(() => {
    const t = setTimeout(() => setResting({ document, version, solvable }), TURNDOWN_SOLVE_DELAY_MS);
    return () => clearTimeout(t);
  }, [document, version, solvable]);
  const full = useQuery({
    queryKey: ['solve-full', coilId, resting.version],
    queryFn: async () => ({ version: resting.version, result: await solve(resting.document) }),
    enabled: resting.solvable,
    staleTime: Infinity,
    gcTime: 30_000,
    retry: 1,
  });

  const quick = query.data;
  const complete = full.data !== undefined && quick !== undefined && full.data.version === quick.version ? full.data : undefined;
  const data = complete ?? quick;
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
