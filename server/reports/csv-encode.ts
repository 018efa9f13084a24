/**
 * CSV text per RFC 4180 (Shafranovich, Y. (2005), RFC 4180 "Common Format and MIME Type for Comma-Separated
 * Values (CSV) Files", section 2): CRLF after every record, fields holding a comma, double quote, CR or LF are
 * enclosed in double quotes and inner double quotes are doubled.
 */

export type CsvCell = string | number | boolean | null | undefined;

const NEEDS_QUOTES = /[",\r\n]/;
const FORMULA_START = /^[=+\-@\t\r]/;

/** One field: numbers as given (shortest round-trip form), empty for null, undefined and non-finite numbers. */
export function csvField(value: CsvCell): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = String(value);
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * Free text typed by a user (names, messages), guarded against spreadsheet formula injection: a leading
 * = + - @ tab or CR gets an apostrophe in front (OWASP, "CSV Injection"). Numbers never pass through here.
 */
export function userText(value: string | null | undefined): string {
  if (value === null || value === undefined) return '';
  return FORMULA_START.test(value) ? `'${value}` : value;
}

/** A whole CSV document: header record then rows, each record ended by CRLF (RFC 4180 section 2 items 1-3). */
export function csvDocument(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  const records = [header.map(csvField).join(',')];
  for (const row of rows) {
    if (row.length !== header.length) {
      throw new RangeError(`CSV row has ${row.length} fields, the header has ${header.length}`);
    }
    records.push(row.map(csvField).join(','));
  }
  return records.map((r) => `${r}\r\n`).join('');
}
