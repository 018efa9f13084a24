/**
 * SVG drawing of one end face of the tube sheet, to scale in millimetres: tube holes, the bends on that face
 * coloured per circuit, water-direction arrows, supply and return stubs, row and tube numbers and the air
 * direction. Both faces are drawn as seen from the connection end (row 1, the air-entering row, on the left), so
 * the two drawings line up tube for tube; the caption says so.
 *
 * Styling is by attributes only (svg-to-pdfkit ignores CSS). Every tube is one <circle class="tube">, every bend
 * one <path class="bend">, so the drawing can be checked by counting.
 */
import type { Bend, CoilDocument, EndFace, SolveResult, Stub, TubeRef } from '@/lib/engine/types';
import { areNeighbours, tubeCentre } from '@/lib/engine/geometry';
import { allTubes, buildCircuitMap, tubeKey } from '@/server/reports/circuit-map';
import { INK, INK_MUTED, SHEET_FILL, UNASSIGNED_COLOUR, circuitStyle } from '@/server/reports/palette';

export interface EndFaceSvgOptions {
  /** Title and viewing note above the drawing (default true). A report that prints its own heading turns it off. */
  caption?: boolean;
  /** Tube numbers inside the holes (default true). */
  tubeNumbers?: boolean;
  /** Font family written into the SVG text elements. */
  fontFamily?: string;
}

interface Point { x: number; y: number }

const FACE_TITLE: Record<EndFace, string> = { connection: 'Connection end', opposite: 'Opposite end' };
const FACE_NOTE: Record<EndFace, string> = {
  connection: 'seen from the connection end',
  opposite: 'seen through the coil from the connection end',
};

const n = (v: number): string => (Math.round(v * 100) / 100).toString();
const esc = (s: string): string =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const dashAttr = (dash: readonly number[], width: number): string =>
  dash.length ? ` stroke-dasharray="${dash.map((d) => n(d * width)).join(' ')}"` : '';

/** A filled triangle with its tip at `tip`, pointing along the unit vector (ux, uy). */
function arrowHead(tip: Point, ux: number, uy: number, size: number): string {
  const bx = tip.x - ux * size;
  const by = tip.y - uy * size;
  const px = -uy * size * 0.55;
  const py = ux * size * 0.55;
  return `M${n(tip.x)} ${n(tip.y)} L${n(bx + px)} ${n(by + py)} L${n(bx - px)} ${n(by - py)} Z`;
}

export function renderEndFaceSvg(
  doc: CoilDocument,
  result: SolveResult,
  face: EndFace,
  options: EndFaceSvgOptions = {},
): string {
  const g = doc.geometry;
  const caption = options.caption ?? true;
  const showNumbers = options.tubeNumbers ?? true;
  const font = esc(options.fontFamily ?? 'IBM Plex Sans, sans-serif');
  const map = buildCircuitMap(result);

  const mm = (ref: TubeRef): Point => {
    const c = tubeCentre(g, ref);
    return { x: c.x_m * 1000, y: c.y_m * 1000 };
  };
  const Pt = g.transversePitch_m * 1000;
  const Pl = g.rowPitch_m * 1000;
  const Do = g.tubeOuterDiameter_m * 1000;
  const holeR = Do / 2;
  const unit = Math.min(Pt, Pl); // drawing scale for text and strokes
  const labelSize = unit * 0.34;
  const titleSize = unit * 0.5;
  const bendWidth = Do * 0.32;

  // The sheet: fin height N_T P_t, depth N_R P_l, centred on the staggered tube field.
  const sheet = { x0: -Pl / 2, y0: -Pt / 4, x1: (g.rows - 0.5) * Pl, y1: (g.tubesPerRow - 0.25) * Pt };
  const side = unit * 1.5; // room for circuit labels beside the sheet
  const top = (caption ? titleSize * 2.6 : 0) + labelSize * 2.2;
  const bottom = unit * 1.6;
  // Wide enough for the caption note on a narrow sheet (0.55 em per character is generous for IBM Plex Sans).
  const captionWidth = caption ? FACE_NOTE[face].length * labelSize * 0.85 * 0.55 : 0;
  const width = Math.max(sheet.x1 - sheet.x0 + 2 * side, captionWidth);
  const vb = { x: (sheet.x0 + sheet.x1) / 2 - width / 2, y: sheet.y0 - top, w: width, h: sheet.y1 - sheet.y0 + top + bottom };

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${n(vb.w)}mm" height="${n(vb.h)}mm" ` +
      `viewBox="${n(vb.x)} ${n(vb.y)} ${n(vb.w)} ${n(vb.h)}" data-face="${face}" font-family="${font}">`,
  );
  out.push(`<title>${esc(`${doc.name}: ${FACE_TITLE[face]}`)}</title>`);

  if (caption) {
    const y = sheet.y0 - top + titleSize * 1.1;
    out.push(`<text class="caption" x="${n(vb.x)}" y="${n(y)}" font-size="${n(titleSize)}" font-weight="bold" fill="${INK}">${FACE_TITLE[face]}</text>`);
    out.push(`<text class="caption-note" x="${n(vb.x)}" y="${n(y + titleSize * 1.1)}" font-size="${n(labelSize * 0.85)}" fill="${INK_MUTED}">${FACE_NOTE[face]}</text>`);
  }

  out.push(`<rect class="sheet" x="${n(sheet.x0)}" y="${n(sheet.y0)}" width="${n(sheet.x1 - sheet.x0)}" height="${n(sheet.y1 - sheet.y0)}" fill="${SHEET_FILL}" stroke="${INK_MUTED}" stroke-width="${n(unit * 0.03)}"/>`);

  // Row numbers above the columns, the word "row" in the margin before them.
  const rowLabelY = sheet.y0 - labelSize * 0.6;
  out.push(`<g class="row-labels" font-size="${n(labelSize)}" fill="${INK_MUTED}" text-anchor="middle">`);
  out.push(`<text x="${n(sheet.x0 - side * 0.5)}" y="${n(rowLabelY)}">row</text>`);
  for (let row = 1; row <= g.rows; row++) {
    const x = mm({ row, tube: 1 }).x;
    out.push(`<text class="row-label" x="${n(x)}" y="${n(rowLabelY)}">${row}</text>`);
  }
  out.push('</g>');

  // Bends first, so the holes drawn on top hide their ends.
  const bends = doc.circuiting.bends.filter((b) => b.end === face);
  out.push('<g class="bends" fill="none" stroke-linecap="round">');
  bends.forEach((bend, i) => out.push(bendPath(bend, i)));
  out.push('</g>');

  const stubs = new Map<string, { stub: Stub; kind: 'supply' | 'return' }>();
  for (const s of doc.circuiting.supply) if (s.end === face) stubs.set(tubeKey(s.tube), { stub: s, kind: 'supply' });
  for (const s of doc.circuiting.return) if (s.end === face) stubs.set(tubeKey(s.tube), { stub: s, kind: 'return' });

  // Circuit labels beside the sheet, led to their stub under the holes (so a leader never crosses a hole).
  const labelSide = (stub: Stub) => (stub.tube.row <= g.rows / 2 ? 'left' : 'right');
  out.push(`<g class="circuit-labels" font-size="${n(labelSize)}" font-weight="bold">`);
  for (const { stub } of stubs.values()) {
    const place = map.placeOf(stub.tube);
    if (!place) continue;
    const p = mm(stub.tube);
    const colour = circuitStyle(place.ordinal).colour;
    const left = labelSide(stub) === 'left';
    const lx = left ? sheet.x0 - side * 0.5 : sheet.x1 + side * 0.5;
    out.push(`<line x1="${n(p.x)}" y1="${n(p.y)}" x2="${n(left ? lx + labelSize : lx - labelSize)}" y2="${n(p.y)}" stroke="${colour}" stroke-width="${n(unit * 0.03)}"/>`);
    out.push(`<text class="circuit-label" x="${n(lx)}" y="${n(p.y + labelSize * 0.35)}" fill="${colour}" text-anchor="middle">C${place.circuitIndex}</text>`);
  }
  out.push('</g>');

  out.push(`<g class="tubes" stroke-width="${n(Do * 0.1)}">`);
  for (const ref of allTubes(doc)) {
    const p = mm(ref);
    const place = map.placeOf(ref);
    const colour = place ? circuitStyle(place.ordinal).colour : UNASSIGNED_COLOUR;
    const circuitAttr = place ? ` data-circuit="${place.circuitIndex}"` : '';
    out.push(`<circle class="tube" id="tube-${face}-r${ref.row}-t${ref.tube}" data-row="${ref.row}" data-tube="${ref.tube}"${circuitAttr} cx="${n(p.x)}" cy="${n(p.y)}" r="${n(holeR)}" fill="#FFFFFF" stroke="${colour}"/>`);
  }
  out.push('</g>');

  // Water direction: one arrow head at the middle of every bend whose flow direction is known.
  out.push('<g class="flow-arrows">');
  bends.forEach((bend) => {
    const order = map.waterOrder(bend);
    if (!order) return;
    const a = mm(order.from);
    const b = mm(order.to);
    const mid = bendMidpoint(bend, a, b);
    const len = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    const size = Do * 0.5;
    const tip = { x: mid.x + ((b.x - a.x) / len) * size * 0.5, y: mid.y + ((b.y - a.y) / len) * size * 0.5 };
    out.push(`<path class="flow-arrow" d="${arrowHead(tip, (b.x - a.x) / len, (b.y - a.y) / len, size)}" fill="${INK}"/>`);
  });
  out.push('</g>');

  // Supply and return stubs: a filled disc (supply) or a ring (return) with S or R, and the circuit number outside.
  out.push(`<g class="stubs" font-size="${n(Do * 0.55)}" font-weight="bold" text-anchor="middle">`);
  for (const { stub, kind } of stubs.values()) {
    const p = mm(stub.tube);
    const place = map.placeOf(stub.tube);
    const colour = place ? circuitStyle(place.ordinal).colour : UNASSIGNED_COLOUR;
    const fill = kind === 'supply' ? colour : '#FFFFFF';
    const ink = kind === 'supply' ? '#FFFFFF' : colour;
    out.push(`<g class="stub ${kind}" data-row="${stub.tube.row}" data-tube="${stub.tube.tube}">`);
    out.push(`<circle cx="${n(p.x)}" cy="${n(p.y)}" r="${n(holeR * 1.05)}" fill="${fill}" stroke="${colour}" stroke-width="${n(Do * 0.16)}"/>`);
    out.push(`<text x="${n(p.x)}" y="${n(p.y + Do * 0.2)}" fill="${ink}">${kind === 'supply' ? 'S' : 'R'}</text>`);
    out.push('</g>');
  }
  out.push('</g>');

  if (showNumbers) {
    out.push(`<g class="tube-labels" font-size="${n(Do * 0.42)}" fill="${INK_MUTED}" text-anchor="middle">`);
    for (const ref of allTubes(doc)) {
      if (stubs.has(tubeKey(ref))) continue;
      const p = mm(ref);
      out.push(`<text class="tube-label" x="${n(p.x)}" y="${n(p.y + Do * 0.15)}">${ref.tube}</text>`);
    }
    out.push('</g>');
  }

  // Air direction below the sheet: from row 1 towards the last row.
  const ay = sheet.y1 + unit * 0.8;
  const ax0 = sheet.x0 + (sheet.x1 - sheet.x0) * 0.15;
  const ax1 = sheet.x1 - (sheet.x1 - sheet.x0) * 0.15;
  out.push(`<g class="air-direction">`);
  out.push(`<line x1="${n(ax0)}" y1="${n(ay)}" x2="${n(ax1 - unit * 0.3)}" y2="${n(ay)}" stroke="${INK}" stroke-width="${n(unit * 0.05)}"/>`);
  out.push(`<path d="${arrowHead({ x: ax1, y: ay }, 1, 0, unit * 0.35)}" fill="${INK}"/>`);
  out.push(`<text x="${n((ax0 + ax1) / 2)}" y="${n(ay + labelSize * 1.3)}" font-size="${n(labelSize)}" fill="${INK}" text-anchor="middle">air</text>`);
  out.push('</g>');

  out.push('</svg>');
  return out.join('\n');

  function bendMidpoint(bend: Bend, a: Point, b: Point): Point {
    const c = bendControl(bend, a, b);
    // Midpoint of the quadratic curve (t = 0.5), or of the straight line.
    return c ? { x: 0.25 * a.x + 0.5 * c.x + 0.25 * b.x, y: 0.25 * a.y + 0.5 * c.y + 0.25 * b.y } : { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  }

  /** Neighbour bends are straight; crossovers and long jumps bow sideways so they do not run over other holes. */
  function bendControl(bend: Bend, a: Point, b: Point): Point | undefined {
    if (areNeighbours(bend.a, bend.b) && !bend.crossover) return undefined;
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const len = Math.hypot(dx, dy) || 1;
    const bow = Math.max(len * 0.22, unit * 0.45);
    return { x: (a.x + b.x) / 2 - (dy / len) * bow, y: (a.y + b.y) / 2 + (dx / len) * bow };
  }

  function bendPath(bend: Bend, i: number): string {
    const a = mm(bend.a);
    const b = mm(bend.b);
    const order = map.waterOrder(bend);
    const style = order ? circuitStyle(order.ordinal) : { colour: UNASSIGNED_COLOUR, dash: [] as number[] };
    const c = bendControl(bend, a, b);
    const d = c
      ? `M${n(a.x)} ${n(a.y)} Q${n(c.x)} ${n(c.y)} ${n(b.x)} ${n(b.y)}`
      : `M${n(a.x)} ${n(a.y)} L${n(b.x)} ${n(b.y)}`;
    const kind = c ? 'crossover' : face === 'opposite' ? 'hairpin' : 'return-bend';
    const circuitAttr = order ? ` data-circuit="${map.placeOf(order.from)?.circuitIndex}"` : '';
    return (
      `<path class="bend ${kind}" id="bend-${face}-${i + 1}"${circuitAttr} d="${d}" ` +
      `stroke="${style.colour}" stroke-width="${n(bendWidth)}"${dashAttr(style.dash, bendWidth)}/>`
    );
  }
}
