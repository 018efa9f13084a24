/**
 * What an uploaded file really is, from its bytes (file-type's magic numbers), never from its name or the type
 * the client claimed. Tubeloom keeps photos (JPEG, PNG, WebP, HEIC/HEIF), PDF documents and plain UTF-8 text or
 * CSV; everything else is refused with a message that says what the file looked like.
 */
import { extensionOf } from '@/server/storage/file-name';

export interface AcceptedType {
  contentType: string;
  /** Extensions that fit the type; the first is added to names that lack one of them. */
  extensions: readonly string[];
  kind: 'image' | 'document';
  /** Whether a preview image is made for it (sharp reads it). */
  thumbnail: boolean;
}

export type Detection = { ok: true; type: AcceptedType } | { ok: false; description: string };

const BY_MIME: Record<string, AcceptedType> = {
  'image/jpeg': { contentType: 'image/jpeg', extensions: ['jpg', 'jpeg'], kind: 'image', thumbnail: true },
  'image/png': { contentType: 'image/png', extensions: ['png'], kind: 'image', thumbnail: true },
  'image/webp': { contentType: 'image/webp', extensions: ['webp'], kind: 'image', thumbnail: true },
  // sharp's prebuilt libvips may lack the HEVC decoder: the preview is tried and skipped when it fails.
  'image/heic': { contentType: 'image/heic', extensions: ['heic', 'heif'], kind: 'image', thumbnail: true },
  'image/heif': { contentType: 'image/heif', extensions: ['heif', 'heic'], kind: 'image', thumbnail: true },
  'application/pdf': { contentType: 'application/pdf', extensions: ['pdf'], kind: 'document', thumbnail: false },
};

const PLAIN_TEXT: AcceptedType = { contentType: 'text/plain; charset=utf-8', extensions: ['txt', 'log', 'md'], kind: 'document', thumbnail: false };
const CSV: AcceptedType = { contentType: 'text/csv; charset=utf-8', extensions: ['csv'], kind: 'document', thumbnail: false };

const PROGRAMS = new Set(['elf', 'exe', 'macho', 'mach-o', 'class', 'dex', 'wasm', 'msi', 'apk', 'deb', 'rpm', 'dmg']);

export const ACCEPTED_DESCRIPTION = 'JPEG, PNG, WebP or HEIC photos, PDF documents, or plain text and CSV files';

/**
 * Plain text only when every byte is valid UTF-8 with no control characters beyond tab, line breaks and form feed,
 * and it does not open like markup (HTML/SVG/XML) or a script (#!), which a browser or shell might act on.
 */
export function looksLikePlainText(bytes: Buffer): boolean {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return false;
  }
  const body = text.replace(/^\ufeff/, '');
  // eslint-disable-next-line no-control-regex -- control characters are exactly what is refused here
  if (/[\u0000-\u0008\u000b\u000e-\u001f\u007f]/.test(body)) return false;
  const start = body.trimStart();
  return !start.startsWith('<') && !start.startsWith('#!');
}

function describe(ext: string): string {
  if (PROGRAMS.has(ext)) return `a program (${ext.toUpperCase()})`;
  return `a ${ext.toUpperCase()} file`;
}

export async function detectFileType(bytes: Buffer, fileName: string): Promise<Detection> {
  // file-type is ESM-only: a dynamic import keeps it loadable from the CommonJS server (tsx) and from vitest.
  const { fileTypeFromBuffer } = await import('file-type');
  const found = await fileTypeFromBuffer(bytes);
  if (found) {
    const accepted = BY_MIME[found.mime];
    return accepted ? { ok: true, type: accepted } : { ok: false, description: describe(found.ext) };
  }
  if (looksLikePlainText(bytes)) return { ok: true, type: extensionOf(fileName) === 'csv' ? CSV : PLAIN_TEXT };
  return { ok: false, description: 'not a recognised photo, PDF or plain text' };
}
