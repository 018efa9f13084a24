/**
 * Uploads picked files one after another, with each file's progress and its own error, and refreshes the coil's
 * attachment list after every success. Failed items stay in the list until dismissed.
 */
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState } from 'react';
import { attachmentKeys, uploadAttachment, type UploadSource } from '@/lib/api/attachments';
import { messageOf } from '@/components/ui/form-errors';

export interface UploadItem {
  key: string;
  name: string;
  /** 0..1 of the bytes sent. */
  progress: number;
  state: 'waiting' | 'sending' | 'failed';
  error?: string;
}

let nextKey = 0;

export function useAttachmentUploads(coilId: string) {
  const queryClient = useQueryClient();
  const [items, setItems] = useState<UploadItem[]>([]);
  const aborts = useRef(new Set<AbortController>());

  useEffect(() => {
    const pending = aborts.current;
    return () => pending.forEach((a) => a.abort());
  }, []);

  const update = useCallback((key: string, patch: Partial<UploadItem>) => {
    setItems((list) => list.map((it) => (it.key === key ? { ...it, ...patch } : it)));
  }, []);

  const start = useCallback(
    async (sources: UploadSource[]) => {
      const queued = sources.map((s) => ({ source: s, key: `upload-${(nextKey += 1)}` }));
      setItems((list) => [...list, ...queued.map(({ source, key }) => ({ key, name: source.name, progress: 0, state: 'waiting' as const }))]);
      for (const { source, key } of queued) {
        const abort = new AbortController();
        aborts.current.add(abort);
        update(key, { state: 'sending' });
        try {
          await uploadAttachment(coilId, source, { onProgress: (progress) => update(key, { progress }), signal: abort.signal });
          setItems((list) => list.filter((it) => it.key !== key));
          await queryClient.invalidateQueries({ queryKey: attachmentKeys.list(coilId) });
        } catch (err) {
          if (abort.signal.aborted) return;
          update(key, { state: 'failed', error: messageOf(err) });
        } finally {
          aborts.current.delete(abort);
        }
      }
    },
    [coilId, queryClient, update],
  );

  const dismiss = useCallback((key: string) => setItems((list) => list.filter((it) => it.key !== key)), []);

  return { items, start, dismiss, busy: items.some((it) => it.state !== 'failed') };
}
