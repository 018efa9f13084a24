/**
 * Report and export downloads of a coil's working draft or of a saved version, and the import of a coil document
 * file (DEVELOPERS.md, HTTP API). Downloads are fetched as bytes (same origin, session cookie) so a refusal arrives
 * as an ApiError the panel can show, not as an error page in a new tab.
 */
import { ApiError, api, type ApiErrorBody } from '@/lib/api/client';
import { coilSchema, type Coil } from '@/lib/api/coils';
import { EXPORT_FILES, type ExportFile } from '@/lib/schema/api-exports';
import { z } from 'zod';

/** The working draft of a coil, or one of its saved versions when `versionId` is given. */
export interface ExportTarget {
  coilId: string;
  versionId?: string;
}

const id = encodeURIComponent;

/** The URL of one export, e.g. /api/versions/<id>/datasheet.pdf?units=ip&paper=Letter. */
export function exportPath(target: ExportTarget, file: ExportFile, query: Record<string, string> = {}): string {
  const { coilId, versionId } = target;
  const base = versionId ? `/api/versions/${id(versionId)}` : `/api/coils/${id(coilId)}`;
  const search = new URLSearchParams(query).toString();
  return `${base}/${EXPORT_FILES[file]}${search ? `?${search}` : ''}`;
}

export interface DownloadedFile {
  blob: Blob;
  fileName: string;
}

/** The name from `Content-Disposition: attachment; filename="..."`, or the URL's last segment. */
function fileNameOf(res: Response, path: string): string {
  const header = res.headers.get('Content-Disposition') ?? '';
  const quoted = /filename="([^"]+)"/.exec(header)?.[1];
  return quoted ?? path.split('?')[0].split('/').pop() ?? 'download';
}

export async function downloadExport(path: string): Promise<DownloadedFile> {
  let res: Response;
  try {
    res = await fetch(path, { credentials: 'include' });
  } catch {
    throw new ApiError(0, 'offline', 'Cannot reach the Tubeloom server. Check your connection and try again.');
  }
  if (!res.ok) {
    let err: ApiErrorBody | undefined;
    try {
      err = ((await res.json()) as { error?: ApiErrorBody }).error;
    } catch {
      err = undefined;
    }
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `The download failed (${res.status}).`, err?.fields ?? {});
  }
  return { blob: await res.blob(), fileName: fileNameOf(res, path) };
}

const coilReply = z.object({ coil: coilSchema });

/**
 * Sends a parsed coil document file as it is; the server validates it and answers 400 `invalid_document` with every
 * problem in `fields` (nothing created), or 201 with the new coil.
 */
export async function importCoilDocument(projectId: string, json: unknown): Promise<Coil> {
  return (await api.post(`/api/projects/${id(projectId)}/coils/import`, json, coilReply)).coil;
}
