/**
 * Display names for uploaded files. The name is only ever shown and offered as the download name (the object key
 * is a random id), but it still must not carry folders, control characters or direction overrides that disguise
 * the extension ("photo\u202Egpj.exe").
 */

const MAX_NAME_LENGTH = 120;
const FALLBACK_STEM = 'attachment';

function splitExtension(name: string): { stem: string; ext: string } {
  const dot = name.lastIndexOf('.');
  if (dot <= 0 || dot === name.length - 1) return { stem: name, ext: '' };
  return { stem: name.slice(0, dot), ext: name.slice(dot + 1) };
}

/** The last path component, without control, format or Windows-reserved characters; never empty, never hidden. */
export function sanitizeFileName(raw: string): string {
  const lastComponent = raw.normalize('NFC').split(/[\\/]/).pop() ?? '';
  const cleaned = lastComponent
    // eslint-disable-next-line no-control-regex -- control characters are exactly what is removed here
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, '')
    .replace(/[\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g, '')
    .replace(/[<>:"|?*]/g, '_')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.\s]+/, '')
    .replace(/[.\s]+$/, '');
  const { stem, ext } = splitExtension(cleaned);
  const safeExt = ext.slice(0, 10);
  const room = MAX_NAME_LENGTH - (safeExt ? safeExt.length + 1 : 0);
  const safeStem = Array.from(stem).slice(0, room).join('').trim() || FALLBACK_STEM;
  return safeExt ? `${safeStem}.${safeExt}` : safeStem;
}

/** Keeps the name when its extension fits the detected type, else appends the right one ("scan" -> "scan.pdf"). */
export function withExtensionFor(name: string, allowed: readonly string[]): string {
  const { ext } = splitExtension(name);
  if (allowed.includes(ext.toLowerCase())) return name;
  return `${name}.${allowed[0]}`;
}

export function extensionOf(name: string): string {
  return splitExtension(name).ext.toLowerCase();
}
