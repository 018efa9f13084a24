/**
 * Page furniture and tables for the PDF reports, on top of pdfkit: the page frame, section headings, label/value
 * tables and column tables that continue on the next page with their header repeated. Numbers are set in IBM Plex
 * Sans with tabular figures and right-aligned, units in their own column so values line up.
 */
import PDFDocument from 'pdfkit';
import { REPORT_FONTS } from '@/server/reports/fonts';

export type Paper = 'A4' | 'Letter';

export const TYPE = {
  body: 8.5,
  small: 7.5,
  tiny: 6.5,
  heading: 11,
  title: 18,
} as const;

export const COLOURS = {
  ink: '#1F2328',
  muted: '#5B6270',
  rule: '#C9CDD3',
  band: '#F1F3F5',
  accent: '#0B5D8A',
  info: '#0072B2',
  warning: '#B25E00',
  critical: '#B23A00',
} as const;

const NUMBER_FEATURES = ['tnum'] as const;

export interface Frame {
  left: number;
  right: number;
  top: number;
  bottom: number;
  width: number;
}

/** A new report document: fonts registered, pages buffered so the footer can print "page n of N". */
export function createReportDocument(paper: Paper, info: { title: string; author: string; subject: string }): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: paper === 'A4' ? 'A4' : 'LETTER',
    margins: { top: 62, bottom: 56, left: 48, right: 48 },
    bufferPages: true,
    autoFirstPage: true,
    info: { Title: info.title, Author: info.author, Subject: info.subject, Creator: 'Tubeloom' },
    lang: 'en',
  });
  for (const f of Object.values(REPORT_FONTS)) doc.registerFont(f.name, f.file());
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.ink);
  return doc;
}

export function frameOf(doc: PDFKit.PDFDocument): Frame {
  const m = doc.page.margins;
  return {
    left: m.left,
    right: doc.page.width - m.right,
    top: m.top,
    bottom: doc.page.height - m.bottom,
    width: doc.page.width - m.left - m.right,
  };
}

/** Starts a new page when fewer than `height` points are left above the bottom margin. */
export function ensureSpace(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y + height > frameOf(doc).bottom) doc.addPage();
}

export function sectionHeading(doc: PDFKit.PDFDocument, text: string, keepWith = 60): void {
  ensureSpace(doc, keepWith + 24);
  const f = frameOf(doc);
  if (doc.y > f.top + 1) doc.y += 8;
  doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.heading).fillColor(COLOURS.accent);
  doc.text(text, f.left, doc.y, { width: f.width, lineBreak: false });
  doc.y += 3;
  doc.moveTo(f.left, doc.y).lineTo(f.right, doc.y).lineWidth(0.6).strokeColor(COLOURS.accent).stroke();
  doc.y += 5;
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.ink);
}

/** One line of text clipped to a width (no wrapping), aligned in a cell. */
export function cellText(
  doc: PDFKit.PDFDocument,
  text: string,
  x: number,
  y: number,
  width: number,
  align: 'left' | 'right' | 'center' = 'left',
  numeric = false,
): void {
  const options: PDFKit.Mixins.TextOptions = { width, align, lineBreak: false, ellipsis: true, height: doc.currentLineHeight() };
  if (numeric) options.features = [...NUMBER_FEATURES];
  doc.text(text, x, y, options);
}

// ---- label / value tables ----

export interface ValueRow {
  label: string;
  value: string;
  unit?: string;
  /** Shown in muted italics after the unit (for example "not rated"). */
  note?: string;
}

/**
 * A label/value table: label left, value right-aligned in its own column, unit left-aligned after it. Returns the
 * y below the table. Rows of a long label wrap within the label column.
 */
export function valueTable(doc: PDFKit.PDFDocument, x: number, y: number, width: number, rows: readonly ValueRow[]): number {
  const rowH = 13;
  const unitW = Math.min(46, width * 0.2);
  const valueW = Math.min(62, width * 0.27);
  const labelW = width - unitW - valueW - 8;
  let cy = y;
  rows.forEach((r, i) => {
    if (i % 2 === 0) doc.rect(x, cy, width, rowH).fill(COLOURS.band);
    const ty = cy + 3;
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.muted);
    const labelUsed = Math.min(doc.widthOfString(r.label), labelW - 4);
    cellText(doc, r.label, x + 4, ty, labelW - 4);
    // Words (and notes) end where the numbers end and may reach left into the unused part of the label column.
    const wordW = x + labelW + valueW - (x + 4 + labelUsed + 10);
    if (r.note && !r.value) {
      doc.font(REPORT_FONTS.italic.name).fillColor(COLOURS.muted);
      cellText(doc, r.note, x + labelW + valueW - wordW, ty, wordW, 'right');
    } else if (r.unit === undefined || r.unit === '') {
      const numeric = /^[\d.,\s%–-]+$/.test(r.value);
      doc.font(REPORT_FONTS.regular.name).fillColor(COLOURS.ink);
      cellText(doc, r.value, x + labelW + valueW - wordW, ty, wordW, 'right', numeric);
    } else {
      doc.font(REPORT_FONTS.regular.name).fillColor(COLOURS.ink);
      cellText(doc, r.value, x + labelW, ty, valueW, 'right', true);
      doc.fillColor(COLOURS.muted);
      cellText(doc, r.unit, x + labelW + valueW + 5, ty, unitW - 1);
    }
    cy += rowH;
  });
  doc.moveTo(x, cy).lineTo(x + width, cy).lineWidth(0.5).strokeColor(COLOURS.rule).stroke();
  doc.fillColor(COLOURS.ink);
  return cy;
}

// ---- column tables ----

export interface Column {
  /** Header text; a newline splits it over two lines. */
  header: string;
  /** Unit printed under the header; values in the column carry no unit of their own. */
  unit?: string;
  /** Relative width. */
  weight: number;
  align?: 'left' | 'right' | 'center';
  numeric?: boolean;
  /** Text wraps within the column and the row grows to fit (otherwise one line, cut with an ellipsis). */
  wrap?: boolean;
}

/**
 * A column table across the frame, continuing on new pages with its header repeated. `rows` hold the already
 * formatted cell texts. `rowColour` may give a swatch colour drawn at the start of a row (circuit colours).
 */
export function columnTable(
  doc: PDFKit.PDFDocument,
  columns: readonly Column[],
  rows: readonly (readonly string[])[],
  options: { rowColour?: (i: number) => string | undefined; fontSize?: number } = {},
): void {
  const f = frameOf(doc);
  const size = options.fontSize ?? TYPE.body;
  const rowH = size + 5;
  const headerLines = Math.max(...columns.map((c) => c.header.split('\n').length + (c.unit ? 1 : 0)));
  const headLine = TYPE.small + 2;
  const headH = headerLines * headLine + 5;
  const total = columns.reduce((s, c) => s + c.weight, 0);
  const widths = columns.map((c) => (c.weight / total) * f.width);
  const xs = widths.map((_, i) => f.left + widths.slice(0, i).reduce((s, w) => s + w, 0));
  const pad = 3.5;

  const header = () => {
    const y = doc.y;
    doc.rect(f.left, y, f.width, headH).fill(COLOURS.band);
    columns.forEach((c, i) => {
      const align = c.align ?? (c.numeric ? 'right' : 'left');
      const lines = c.header.split('\n');
      // Bottom-aligned: the last header line and the unit sit just above the rule.
      let ly = y + 3 + (headerLines - lines.length - (c.unit ? 1 : 0)) * headLine;
      doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.small).fillColor(COLOURS.ink);
      for (const line of lines) {
        cellText(doc, line, xs[i] + pad, ly, widths[i] - 2 * pad, align);
        ly += headLine;
      }
      if (c.unit) {
        doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.small).fillColor(COLOURS.muted);
        cellText(doc, c.unit, xs[i] + pad, ly, widths[i] - 2 * pad, align);
      }
    });
    doc.moveTo(f.left, y + headH).lineTo(f.right, y + headH).lineWidth(0.6).strokeColor(COLOURS.muted).stroke();
    doc.y = y + headH;
  };

  ensureSpace(doc, headH + rowH * Math.min(rows.length, 3));
  header();
  rows.forEach((row, r) => {
    doc.font(REPORT_FONTS.regular.name).fontSize(size);
    const height = columns.reduce(
      (h, c, i) => (c.wrap ? Math.max(h, doc.heightOfString(row[i] ?? '', { width: widths[i] - 2 * pad }) + 5) : h),
      rowH,
    );
    if (doc.y + height > frameOf(doc).bottom) {
      doc.addPage();
      header();
    }
    const y = doc.y;
    if (r % 2 === 1) doc.rect(f.left, y, f.width, height).fill(COLOURS.band);
    const swatch = options.rowColour?.(r);
    if (swatch) doc.rect(f.left, y + 2, 2.5, height - 4).fill(swatch);
    columns.forEach((c, i) => {
      doc.font(REPORT_FONTS.regular.name).fontSize(size).fillColor(COLOURS.ink);
      const align = c.align ?? (c.numeric ? 'right' : 'left');
      if (c.wrap) doc.text(row[i] ?? '', xs[i] + pad, y + 2.5, { width: widths[i] - 2 * pad, align });
      else cellText(doc, row[i] ?? '', xs[i] + pad, y + 2.5, widths[i] - 2 * pad, align, c.numeric);
    });
    doc.y = y + height;
  });
  doc.moveTo(f.left, doc.y).lineTo(f.right, doc.y).lineWidth(0.5).strokeColor(COLOURS.rule).stroke();
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.ink);
}

/** Paragraph text across the frame (wraps), continuing on a new page when needed. */
export function paragraph(doc: PDFKit.PDFDocument, text: string, options: { colour?: string; size?: number; indent?: number; font?: string } = {}): void {
  const f = frameOf(doc);
  doc.font(options.font ?? REPORT_FONTS.regular.name).fontSize(options.size ?? TYPE.body).fillColor(options.colour ?? COLOURS.ink);
  const indent = options.indent ?? 0;
  const height = doc.heightOfString(text, { width: f.width - indent });
  ensureSpace(doc, height);
  doc.text(text, f.left + indent, doc.y, { width: f.width - indent });
  doc.fillColor(COLOURS.ink);
}

/** Header and footer on every buffered page: `left`/`right` texts at the top, prepared-by and "page n of N". */
export function stampPages(
  doc: PDFKit.PDFDocument,
  header: { left: string; right: string },
  footer: { left: string },
): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const f = frameOf(doc);
    const savedBottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing below the margin must not start a new page
    const hy = f.top - 26;
    doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.small).fillColor(COLOURS.accent);
    cellText(doc, header.left, f.left, hy, f.width / 2);
    doc.font(REPORT_FONTS.regular.name).fillColor(COLOURS.muted);
    cellText(doc, header.right, f.left + f.width / 2, hy, f.width / 2, 'right');
    doc.moveTo(f.left, hy + 12).lineTo(f.right, hy + 12).lineWidth(0.5).strokeColor(COLOURS.rule).stroke();

    const fy = f.bottom + 18;
    doc.moveTo(f.left, fy - 6).lineTo(f.right, fy - 6).lineWidth(0.5).strokeColor(COLOURS.rule).stroke();
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.tiny).fillColor(COLOURS.muted);
    cellText(doc, footer.left, f.left, fy, f.width * 0.75);
    cellText(doc, `Page ${i - range.start + 1} of ${range.count}`, f.left + f.width * 0.75, fy, f.width * 0.25, 'right', true);
    doc.page.margins.bottom = savedBottom;
  }
}

/** Collects the document into one Buffer. */
export function toBuffer(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}
