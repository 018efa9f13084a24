/**
 * Typed calls for coil attachments (DEVELOPERS.md, HTTP API). Uploads use XMLHttpRequest rather than fetch
 * because only XHR reports upload progress in browsers; every reply is parsed with lib/schema/api-attachments.
 */
import { api, ApiError, type ApiErrorBody } from '@/lib/api/client';
import {
  ATTACHMENT_MAX_BYTES,
  ATTACHMENT_MAX_LABEL,
  attachmentLinkReplySchema,
  attachmentListReplySchema,
  attachmentReplySchema,
  type Attachment,
  type AttachmentLink,
} from '@/lib/schema/api-attachments';

const id = encodeURIComponent;

export const attachmentKeys = {
  list: (coilId: string) => ['coil', coilId, 'attachments'] as const,
};

/** A picked file: the browser's File on the web, or a local file URI on iOS and Android. */
export interface UploadSource {
  name: string;
  mimeType?: string;
  size?: number;
  /** Web: the File the picker returned. */
  file?: Blob;
  /** Native: file:// or content:// URI of the picked file. */
  uri?: string;
}

export interface UploadOptions {
  /** Fraction sent so far, 0..1 (the server's processing after the last byte is not included). */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

export async function listAttachments(coilId: string): Promise<Attachment[]> {
  return (await api.get(`/api/coils/${id(coilId)}/attachments`, attachmentListReplySchema)).attachments;
}

export function attachmentDownloadLink(attachmentId: string): Promise<AttachmentLink> {
  return api.get(`/api/attachments/${id(attachmentId)}/download`, attachmentLinkReplySchema);
}

export function attachmentThumbnailLink(attachmentId: string): Promise<AttachmentLink> {
  return api.get(`/api/attachments/${id(attachmentId)}/thumbnail`, attachmentLinkReplySchema);
}

export function deleteAttachment(attachmentId: string): Promise<void> {
  return api.delete<void>(`/api/attachments/${id(attachmentId)}`);
}

/** Refused before sending (the server checks again): a 20 MB upload over a phone connection is worth sparing. */
export function tooLargeError(source: UploadSource): ApiError | null {
  if (source.size === undefined || source.size <= ATTACHMENT_MAX_BYTES) return null;
  return new ApiError(413, 'file_too_large', `"${source.name}" is larger than ${ATTACHMENT_MAX_LABEL}. Attach a smaller file.`);
}

function formBody(source: UploadSource): FormData {
  const form = new FormData();
  if (source.file) {
    form.append('file', source.file, source.name);
  } else if (source.uri) {
    // React Native's FormData takes a { uri, name, type } descriptor in place of a Blob.
    const descriptor = { uri: source.uri, name: source.name, type: source.mimeType ?? 'application/octet-stream' };
    form.append('file', descriptor as unknown as Blob);
  } else {
    throw new ApiError(0, 'no_file', `"${source.name}" could not be read. Choose it again.`);
  }
  return form;
}

function replyError(status: number, text: string): ApiError {
  try {
    const err = (JSON.parse(text) as { error?: ApiErrorBody }).error;
    if (err) return new ApiError(status, err.code, err.message, err.fields ?? {});
  } catch {
    // A proxy's HTML error page: fall through to a plain message.
  }
  if (status === 413) return new ApiError(status, 'file_too_large', `The file is larger than ${ATTACHMENT_MAX_LABEL}.`);
  return new ApiError(status, 'http_error', `The upload failed (${status}).`);
}

export function uploadAttachment(coilId: string, source: UploadSource, options: UploadOptions = {}): Promise<Attachment> {
  const early = tooLargeError(source);
  if (early) return Promise.reject(early);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api/coils/${id(coilId)}/attachments`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) options.onProgress?.(Math.min(1, e.loaded / e.total));
    };
    xhr.onload = () => {
      if (xhr.status < 200 || xhr.status >= 300) {
        reject(replyError(xhr.status, xhr.responseText));
        return;
      }
      try {
        resolve(attachmentReplySchema.parse(JSON.parse(xhr.responseText)).attachment);
      } catch {
        reject(new ApiError(xhr.status, 'bad_reply', 'The server accepted the file but its answer could not be read. Reload to see it.'));
      }
    };
    xhr.onerror = () => reject(new ApiError(0, 'offline', 'Cannot reach the Tubeloom server. Check your connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'aborted', 'Upload cancelled.'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    try {
      xhr.send(formBody(source));
    } catch (err) {
      reject(err instanceof ApiError ? err : new ApiError(0, 'no_file', `"${source.name}" could not be read. Choose it again.`));
    }
  });
}
