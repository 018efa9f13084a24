/**
 * Autosave of the working draft: every change is sent to the server (debounced PUT with the revision it started
 * from), so closing the tab loses nothing. States: saved, pending (a change waits), saving, offline (retrying),
 * conflict (409 stale_revision: someone else saved; the user loads their draft, keeps this drawing as a new version,
 * or keeps both as versions and compares them: nothing is ever written over the other person's draft),
 * invalid (the document fails validation; nothing is sent until it is fixed), error.
 */
import { useCallback, useEffect, useRef, useState } from 'react';
import { Platform } from 'react-native';
import { useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'expo-router';
import { ApiError } from '@/lib/api/client';
import { getCoil, saveDraft } from '@/lib/api/coils';
import { saveVersion, versionKeys } from '@/lib/api/versions';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import type { CoilDocument } from '@/lib/engine/types';
import type { EditorStore } from '@/canvas/store';

export type SaveState = 'saved' | 'pending' | 'saving' | 'offline' | 'conflict' | 'invalid' | 'error';

/** Quiet time after the last change before the draft is sent, ms. */
export const AUTOSAVE_DELAY_MS = 600;
const RETRY_MS = 4000;

export interface Autosave {
  state: SaveState;
  message: string | null;
  revision: number;
  /** Throw away local changes and load the server's draft. */
  reloadServerDraft: () => Promise<void>;
  /** Keep the local drawing as a new version, then load their draft. */
  keepMineAsVersion: () => Promise<void>;
  /** Keep the local drawing and their draft as two versions, load their draft and open the comparison. */
  compareWithTheirs: () => Promise<void>;
  /** True while a conflict action talks to the server. */
  resolving: boolean;
  /** The version the local drawing was kept as, shown until dismissed. */
  kept: { versionId: string; number: number } | null;
  dismissKept: () => void;
  /** Send now (e.g. before leaving). */
  flush: () => void;
}

export function useAutosave(coilId: string, store: EditorStore, initialRevision: number): Autosave {
  const [state, setState] = useState<SaveState>('saved');
  const [message, setMessage] = useState<string | null>(null);
  const [revision, setRevision] = useState(initialRevision);
  const [resolving, setResolving] = useState(false);
  const [kept, setKept] = useState<Autosave['kept']>(null);
  const queryClient = useQueryClient();
  const router = useRouter();
  const revisionRef = useRef(initialRevision);
  const savedDoc = useRef<CoilDocument>(store.getState().document);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const blocked = useRef(false); // true while a conflict waits for the user
  const stateRef = useRef<SaveState>('saved');
  const mounted = useRef(true);

  const update = useCallback((next: SaveState, msg: string | null = null) => {
    stateRef.current = next;
    if (!mounted.current) return;
    setState(next);
    setMessage(msg);
  }, []);

  const save = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    if (inFlight.current || blocked.current) return;
    const doc = store.getState().document;
    if (doc === savedDoc.current) {
      update('saved');
      return;
    }
    const parsed = coilDocumentSchema.safeParse(doc);
    if (!parsed.success) {
      update('invalid', parsed.error.issues[0]?.message ?? 'the coil has an invalid value');
      return;
    }
    inFlight.current = true;
    update('saving');
    try {
      const reply = await saveDraft(coilId, doc, revisionRef.current);
      revisionRef.current = reply.revision;
      if (mounted.current) setRevision(reply.revision);
      savedDoc.current = doc;
      inFlight.current = false;
      if (store.getState().document !== doc) {
        update('pending');
        timer.current = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
      } else update('saved');
    } catch (e) {
      inFlight.current = false;
      if (e instanceof ApiError && e.status === 409) {
        blocked.current = true;
        update('conflict', 'This coil was saved elsewhere since you opened it.');
      } else if (e instanceof ApiError && e.status === 0) {
        update('offline', e.message);
        timer.current = setTimeout(() => void save(), RETRY_MS);
      } else {
        update('error', e instanceof Error ? e.message : 'Saving failed.');
        timer.current = setTimeout(() => void save(), RETRY_MS * 2);
      }
    }
  }, [coilId, store, update]);

  useEffect(() => {
    mounted.current = true;
    const unsubscribe = store.subscribe((s, prev) => {
      if (s.document === prev.document || blocked.current) return;
      if (s.document === savedDoc.current) {
        if (!inFlight.current) update('saved');
        return;
      }
      if (stateRef.current !== 'offline') update('pending');
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
    });
    return () => {
      mounted.current = false;
      unsubscribe();
      if (timer.current) clearTimeout(timer.current);
      // Leaving the screen (not the tab): send what is pending.
      if (!blocked.current && store.getState().document !== savedDoc.current) {
        const doc = store.getState().document;
        if (coilDocumentSchema.safeParse(doc).success) void saveDraft(coilId, doc, revisionRef.current).catch(() => undefined);
      }
    };
  }, [coilId, store, save, update]);

  // Closing the tab with a change not yet on the server: ask first (the browser shows its own wording).
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => {
      if (store.getState().document !== savedDoc.current) {
        e.preventDefault();
        void save();
      }
    };
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [store, save]);

  const reloadServerDraft = useCallback(async () => {
    const coil = await getCoil(coilId);
    blocked.current = false;
    revisionRef.current = coil.revision;
    setRevision(coil.revision);
    savedDoc.current = coil.document;
    store.getState().load(coil.document);
    update('saved');
  }, [coilId, store, update]);

  /** Saves the drawing the conflict left unsent as a version of its own (the server draft is not touched). */
  const keepLocalAsVersion = useCallback(async () => {
    // revisionRef still holds the revision this drawing was based on: the one the server refused as stale.
    const message = `Kept from a conflicting edit (draft revision ${revisionRef.current})`;
    return saveVersion(coilId, message, store.getState().document);
  }, [coilId, store]);

  /** Runs a conflict action; on failure the conflict stays open with the reason, so nothing is lost. */
  const resolve = useCallback(
    async (action: () => Promise<void>) => {
      if (resolving) return;
      setResolving(true);
      try {
        await action();
        void queryClient.invalidateQueries({ queryKey: versionKeys.list(coilId) });
      } catch (e) {
        update('conflict', `${e instanceof Error ? e.message : 'That did not work.'} Your drawing is still here; try again.`);
      } finally {
        if (mounted.current) setResolving(false);
      }
    },
    [coilId, queryClient, resolving, update],
  );

  const keepMineAsVersion = useCallback(
    () =>
      resolve(async () => {
        const mine = await keepLocalAsVersion();
        await reloadServerDraft();
        setKept({ versionId: mine.id, number: mine.number });
      }),
    [resolve, keepLocalAsVersion, reloadServerDraft],
  );

  const compareWithTheirs = useCallback(
    () =>
      resolve(async () => {
        const mine = await keepLocalAsVersion();
        const theirs = await saveVersion(coilId, 'Draft at the time of a conflicting edit');
        await reloadServerDraft();
        setKept({ versionId: mine.id, number: mine.number });
        router.push(`/compare/${encodeURIComponent(mine.id)}/${encodeURIComponent(theirs.id)}`);
      }),
    [coilId, resolve, keepLocalAsVersion, reloadServerDraft, router],
  );

  const dismissKept = useCallback(() => setKept(null), []);

  const flush = useCallback(() => void save(), [save]);

  return { state, message, revision, reloadServerDraft, keepMineAsVersion, compareWithTheirs, resolving, kept, dismissKept, flush };
}
