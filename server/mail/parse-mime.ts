/**
 * A small reader for the messages nodemailer writes (enough for the outbox, not a general MIME parser):
 * unfolded headers, RFC 2047 encoded words, multipart/* bodies, 7bit / quoted-printable / base64 parts.
 */

export interface ParsedMail {
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
}

interface Part {
  headers: Map<string, string>;
  body: string;
}

function splitHeaders(raw: string): Part {
  const normal = raw.replace(/\r\n/g, '\n');
  const cut = normal.indexOf('\n\n');
  const head = cut === -1 ? normal : normal.slice(0, cut);
  const body = cut === -1 ? '' : normal.slice(cut + 2);
  const headers = new Map<string, string>();
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

function decodeQuotedPrintable(text: string, underscoresAreSpaces = false): Buffer {
  const src = (underscoresAreSpaces ? text.replace(/_/g, ' ') : text).replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < src.length; i++) {
    const hex = src.slice(i + 1, i + 3);
    if (src[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(src[i], 'utf8'));
    }
  }
  return Buffer.from(bytes);
}

/** `=?UTF-8?Q?...?=` and `=?UTF-8?B?...?=` words, as nodemailer writes non-ASCII headers. */
export function decodeEncodedWords(value: string): string {
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(/=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g, (_m, _charset: string, enc: string, data: string) =>
      (enc.toUpperCase() === 'B' ? Buffer.from(data, 'base64') : decodeQuotedPrintable(data, true)).toString('utf8'),
    );
}

function decodeBody(part: Part): string {
  const encoding = (part.headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  if (encoding === 'base64') return Buffer.from(part.body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (encoding === 'quoted-printable') return decodeQuotedPrintable(part.body).toString('utf8');
  return part.body;
}

function leaves(part: Part): Part[] {
  const type = part.headers.get('content-type') ?? 'text/plain';
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (!/^multipart\//i.test(type) || !boundary) return [part];
  const chunks = part.body.split(`--${boundary}`).slice(1);
  const inner = chunks.filter((c) => !c.startsWith('--')).map((c) => splitHeaders(c.replace(/^\n/, '').replace(/\n$/, '')));
  return inner.flatMap(leaves);
}

export function parseMail(raw: string): ParsedMail {
  const root = splitHeaders(raw);
  let text = '';
  let html: string | null = null;
  for (const leaf of leaves(root)) {
    const type = (leaf.headers.get('content-type') ?? 'text/plain').toLowerCase();
    if (type.startsWith('text/html') && html === null) html = decodeBody(leaf);
    else if (type.startsWith('text/plain') && !text) text = decodeBody(leaf);
  }
  const header = (name: string) => decodeEncodedWords(root.headers.get(name) ?? '');
  return { from: header('from'), to: header('to'), subject: header('subject'), text: text.replace(/\n$/, ''), html };
}
