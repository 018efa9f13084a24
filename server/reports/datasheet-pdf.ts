/**
 * The coil data sheet as a PDF: identification, version and review decision, key figures, geometry, operating
 * conditions, performance, circuits, part-load points, warnings, the circuiting drawing of both end faces (vector,
 * from end-face-svg), the bill of materials, the methods with their published sources and the cautions.
 * IBM Plex fonts embedded; SI or IP units; A4 or US Letter.
 */
import SVGtoPDF from 'svg-to-pdfkit';
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import { deriveGeometry } from '@/lib/engine/geometry';
import { fluidProperties } from '@/lib/engine/properties/fluid';
import { formatNumber, type UnitSystem } from '@/lib/units';
import { renderEndFaceSvg } from '@/server/reports/end-face-svg';
import { REPORT_FONTS } from '@/server/reports/fonts';
import { methodsFor } from '@/server/reports/methods';
import { circuitStyle, INK_MUTED } from '@/server/reports/palette';
import {
  COLOURS,
  TYPE,
  cellText,
  columnTable,
  createReportDocument,
  ensureSpace,
  frameOf,
  paragraph,
  sectionHeading,
  stampPages,
  toBuffer,
  valueTable,
  type ValueRow,
} from '@/server/reports/pdf-layout';
import { isoDate, type DatasheetInput, type ReportMetadata } from '@/server/reports/report-input';
import {
  NOT_RATED,
  altitude,
  cell,
  coilSize,
  countRow,
  finsPerInch,
  fluidName,
  numberCell,
  passRange,
  percent,
  row,
  sentence,
  show,
  textRow,
  tubeText,
  type Shown,
} from '@/server/reports/report-values';

export type { DatasheetInput } from '@/server/reports/report-input';

export const CAUTIONS: readonly string[] = [
  'Ratings are estimates computed from published correlations; air-side correlations carry a scatter of roughly 10 to 15 %. They are not certified ratings.',
  'Design and test pressure, maximum temperature, materials and freeze protection follow the local codes and the judgement of a licensed engineer, who remains responsible for the selection.',
  'The water pressure drop is header to header; nozzle, header and valve losses are not included.',
];

export async function renderDatasheetPdf(input: DatasheetInput): Promise<Buffer> {
  const { document: coil, result, metadata, options } = input;
  const units = options.units;
  const doc = createReportDocument(options.paper, {
    title: `${metadata.coilName}: coil data sheet`,
    author: metadata.preparedBy,
    subject: `${metadata.projectName}${metadata.client ? `, ${metadata.client}` : ''}`,
  });

  titleBlock(doc, metadata);
  keyFigures(doc, result, units);
  errorsBlock(doc, result);
  geometryAndConditions(doc, coil, result, units);
  performance(doc, coil, result, units);
  circuitsTable(doc, result, units);
  turndownTable(doc, result, units);
  warningsBlock(doc, result);
  cautions(doc);
  drawingPage(doc, coil, result, units);
  billOfMaterials(doc, result, units);
  methodsTable(doc, result);

  const version = metadata.versionNumber !== undefined ? `version ${metadata.versionNumber}` : 'draft';
  stampPages(
    doc,
    { left: 'Tubeloom coil data sheet', right: `${metadata.projectName} · ${metadata.coilName} · ${version}` },
    { left: `Prepared by ${metadata.preparedBy} on ${isoDate(metadata.date)} · ${units === 'si' ? 'SI units' : 'IP units'}` },
  );
  return toBuffer(doc);
}

// ---- page 1: identification and key figures ----

function titleBlock(doc: PDFKit.PDFDocument, m: ReportMetadata): void {
  const f = frameOf(doc);
  const boxW = 190;
  const leftW = f.width - boxW - 16;
  const y0 = f.top;
  doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.small).fillColor(COLOURS.accent);
  doc.text('COIL DATA SHEET', f.left, y0, { width: leftW, characterSpacing: 1.2 });
  doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.title).fillColor(COLOURS.ink);
  doc.text(m.coilName, f.left, y0 + 12, { width: leftW });
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body + 1).fillColor(COLOURS.muted);
  doc.text(`Project: ${m.projectName}`, f.left, doc.y + 2, { width: leftW });
  if (m.client) doc.text(`Client: ${m.client}`, f.left, doc.y + 1, { width: leftW });
  const leftBottom = doc.y;

  // Version and decision box on the right.
  const bx = f.right - boxW;
  const lines: { text: string; font: string; colour: string }[] = [];
  if (m.versionNumber !== undefined) {
    lines.push({ text: `Version ${m.versionNumber}`, font: REPORT_FONTS.semibold.name, colour: COLOURS.ink });
    if (m.versionMessage) lines.push({ text: m.versionMessage, font: REPORT_FONTS.italic.name, colour: COLOURS.muted });
  } else {
    lines.push({ text: 'Working draft (not a saved version)', font: REPORT_FONTS.semibold.name, colour: COLOURS.ink });
  }
  if (m.decision) {
    lines.push({ text: `Review: ${m.decision.status}`, font: REPORT_FONTS.semibold.name, colour: COLOURS.accent });
    lines.push({ text: `by ${m.decision.by}, ${isoDate(m.decision.at)}`, font: REPORT_FONTS.regular.name, colour: COLOURS.muted });
    if (m.decision.note) lines.push({ text: m.decision.note, font: REPORT_FONTS.italic.name, colour: COLOURS.muted });
  } else {
    lines.push({ text: 'Review: no decision recorded', font: REPORT_FONTS.regular.name, colour: COLOURS.muted });
  }
  let by = y0 + 8;
  const textW = boxW - 16;
  const heights = lines.map((l) => {
    doc.font(l.font).fontSize(TYPE.body);
    return doc.heightOfString(l.text, { width: textW }) + 2;
  });
  const boxH = heights.reduce((s, h) => s + h, 0) + 14;
  doc.roundedRect(bx, y0, boxW, boxH, 3).lineWidth(0.6).strokeColor(COLOURS.rule).stroke();
  lines.forEach((l, i) => {
    doc.font(l.font).fontSize(TYPE.body).fillColor(l.colour);
    doc.text(l.text, bx + 8, by, { width: textW });
    by += heights[i];
  });
  doc.y = Math.max(leftBottom, y0 + boxH) + 14;
  doc.fillColor(COLOURS.ink);
}

function keyFigures(doc: PDFKit.PDFDocument, result: SolveResult, units: UnitSystem): void {
  const t = result.totals;
  const modeWord = t.mode === 'heating' ? 'Heating capacity' : t.mode === 'cooling' ? 'Cooling capacity' : 'Capacity';
  const figures: { label: string; shown?: Shown; sub?: string }[] = [
    { label: modeWord, shown: show('power', t.capacity_W, units) },
    { label: 'Water pressure drop', shown: show('waterPressureDrop', t.waterPressureDrop_Pa, units), sub: 'header to header' },
    { label: 'Leaving air dry bulb', shown: show('temperature', t.leavingAirDryBulb_C, units) },
    { label: 'Leaving water', shown: show('temperature', t.leavingWaterTemperature_C, units) },
  ];
  const f = frameOf(doc);
  const gap = 8;
  const w = (f.width - gap * (figures.length - 1)) / figures.length;
  const h = 50;
  const y = doc.y;
  figures.forEach((fig, i) => {
    const x = f.left + i * (w + gap);
    doc.rect(x, y, w, h).fill(COLOURS.band);
    doc.rect(x, y, 2.5, h).fill(COLOURS.accent);
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.small).fillColor(COLOURS.muted);
    cellText(doc, fig.label, x + 10, y + 7, w - 16);
    if (fig.shown) {
      doc.font(REPORT_FONTS.semibold.name).fontSize(17).fillColor(COLOURS.ink);
      const vw = doc.widthOfString(fig.shown.value, { features: ['tnum'] });
      doc.text(fig.shown.value, x + 10, y + 19, { lineBreak: false, features: ['tnum'] });
      doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.muted);
      doc.text(fig.shown.unit, x + 10 + vw + 4, y + 26, { lineBreak: false });
    } else {
      doc.font(REPORT_FONTS.italic.name).fontSize(11).fillColor(COLOURS.muted);
      doc.text(NOT_RATED, x + 10, y + 22, { lineBreak: false });
    }
    if (fig.sub) {
      doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.tiny).fillColor(COLOURS.muted);
      cellText(doc, fig.sub, x + 10, y + h - 11, w - 16);
    }
  });
  doc.y = y + h + 6;
  doc.fillColor(COLOURS.ink);
}

function errorsBlock(doc: PDFKit.PDFDocument, result: SolveResult): void {
  if (result.valid && result.errors.length === 0) return;
  sectionHeading(doc, 'Circuiting errors');
  paragraph(doc, 'The circuiting is not complete, so the coil was not rated. Correct these first:', { colour: COLOURS.critical });
  doc.y += 3;
  for (const e of result.errors) paragraph(doc, `•  ${sentence(e.message)}`, { indent: 6 });
}

// ---- geometry, conditions, performance ----

function twoColumns(doc: PDFKit.PDFDocument, left: { title: string; rows: ValueRow[] }, right: { title: string; rows: ValueRow[] }): void {
  const f = frameOf(doc);
  const gap = 18;
  const w = (f.width - gap) / 2;
  const height = Math.max(left.rows.length, right.rows.length) * 13 + 30;
  ensureSpace(doc, height);
  const y = doc.y + 6;
  const sub = (title: string, x: number) => {
    doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.heading).fillColor(COLOURS.accent);
    doc.text(title, x, y, { width: w, lineBreak: false });
    doc.moveTo(x, y + 15).lineTo(x + w, y + 15).lineWidth(0.6).strokeColor(COLOURS.accent).stroke();
  };
  sub(left.title, f.left);
  sub(right.title, f.left + w + gap);
  const yl = valueTable(doc, f.left, y + 20, w, left.rows);
  const yr = valueTable(doc, f.left + w + gap, y + 20, w, right.rows);
  doc.y = Math.max(yl, yr) + 6;
  doc.x = f.left;
}

function geometryAndConditions(doc: PDFKit.PDFDocument, coil: CoilDocument, result: SolveResult, units: UnitSystem): void {
  const g = coil.geometry;
  let derived: ReturnType<typeof deriveGeometry> | undefined;
  try {
    derived = deriveGeometry(g);
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
  }
  const geometry: ValueRow[] = [
    textRow('Size', coilSize(coil)),
    countRow('Tubes', g.rows * g.tubesPerRow),
    textRow('Layout', 'staggered'),
    row('Tube outside diameter', show('smallLength', g.tubeOuterDiameter_m, units)),
    row('Tube wall', show('smallLength', g.tubeWall_m, units)),
    row('Tube pitch (face)', show('smallLength', g.transversePitch_m, units)),
    row('Row pitch (air direction)', show('smallLength', g.rowPitch_m, units)),
    row('Finned length', show('length', g.finnedLength_m, units)),
    row('Fin height', show('length', derived?.finHeight_m, units)),
    row('Coil depth', show('length', derived?.depth_m, units)),
    row('Face area', show('area', derived?.faceArea_m2, units)),
    textRow('Fins', g.fin.type === 'wavy' ? 'wavy (herringbone)' : 'plain'),
    row('Fin spacing', finsPerInch(g.fin.pitch_m)),
    row('Fin thickness', show('smallLength', g.fin.thickness_m, units)),
    countRow('Circuits (feeds)', result.circuits.length),
    textRow('Passes per circuit', passRange(result.circuits.map((c) => c.passes))),
  ];

  const c = coil.conditions;
  const conditions: ValueRow[] = [
    row('Face velocity', show('faceVelocity', c.air.faceVelocity_m_s, units)),
    row('Entering air dry bulb', show('temperature', c.air.inletDryBulb_C, units)),
    c.air.inletWetBulb_C !== undefined
      ? row('Entering air wet bulb', show('temperature', c.air.inletWetBulb_C, units))
      : countRow('Entering air relative humidity', (c.air.inletRelativeHumidity ?? Number.NaN) * 100, 0, '%'),
    row('Site altitude', altitude(c.air.altitude_m, units)),
    textRow('Fluid', fluidName(c.fluid)),
    row('Entering water', show('temperature', c.fluid.inletTemperature_C, units)),
    row('Water flow (mass)', show('massFlow', c.fluid.massFlow_kg_s, units)),
    row('Water flow (volume)', show('volumeFlow', volumeFlow_m3_s(coil), units), 'not available'),
    textRow('Minimum flow checked', percent(c.minimumFlowFraction)),
    c.minimumAirTemperature_C === null
      ? textRow('Lowest entering air', 'not freezing')
      : row('Lowest entering air', show('temperature', c.minimumAirTemperature_C, units)),
  ];
  twoColumns(doc, { title: 'Geometry', rows: geometry }, { title: 'Operating conditions', rows: conditions });
}

/** Volume flow at the entering water temperature; undefined when the properties are out of range. */
function volumeFlow_m3_s(coil: CoilDocument): number | undefined {
  const fluid = coil.conditions.fluid;
  try {
    return fluid.massFlow_kg_s / fluidProperties(fluid, fluid.inletTemperature_C).density_kg_m3;
  } catch (e) {
    if (e instanceof RangeError) return undefined;
    throw e;
  }
}

function performance(doc: PDFKit.PDFDocument, coil: CoilDocument, result: SolveResult, units: UnitSystem): void {
  const t = result.totals;
  const mode = t.mode ? (t.mode === 'heating' ? 'heating' : 'cooling') : '';
  const sensibleRatio = t.capacity_W && t.sensibleCapacity_W !== undefined ? t.sensibleCapacity_W / t.capacity_W : undefined;
  let faceArea: number | undefined;
  try {
    faceArea = deriveGeometry(coil.geometry).faceArea_m2;
  } catch {
    faceArea = undefined;
  }
  const faceVelocity = t.faceVelocity_m_s ?? coil.conditions.air.faceVelocity_m_s;
  const airSide: ValueRow[] = [
    row('Total capacity', show('power', t.capacity_W, units)),
    row('Sensible capacity', show('power', t.sensibleCapacity_W, units)),
    row('Latent capacity', show('power', t.latentCapacity_W, units)),
    countRow('Sensible heat ratio', sensibleRatio, 2),
    row('Leaving air dry bulb', show('temperature', t.leavingAirDryBulb_C, units)),
    row('Leaving air wet bulb', show('temperature', t.leavingAirWetBulb_C, units)),
    row('Leaving air humidity ratio', show('humidityRatio', t.leavingAirHumidityRatio, units)),
    row('Face velocity', show('faceVelocity', faceVelocity, units)),
    row('Airflow, entering air', show('airflow', faceArea === undefined ? undefined : faceVelocity * faceArea, units)),
    row(t.airPressureDropIsWetEstimate ? 'Air pressure drop, wet (est.)' : 'Air pressure drop', show('airPressureDrop', t.airPressureDrop_Pa, units)),
    row('Condensate', show('condensateFlow', t.condensate_kg_s, units), t.mode === 'heating' ? 'none' : NOT_RATED),
  ];
  const waterDelta =
    t.leavingWaterTemperature_C !== undefined ? Math.abs(t.leavingWaterTemperature_C - coil.conditions.fluid.inletTemperature_C) : undefined;
  const waterSide: ValueRow[] = [
    mode ? textRow('Mode', mode) : { label: 'Mode', value: '', note: NOT_RATED },
    row('Entering water', show('temperature', coil.conditions.fluid.inletTemperature_C, units)),
    row('Leaving water', show('temperature', t.leavingWaterTemperature_C, units)),
    row('Water temperature change', show('temperatureDifference', waterDelta, units)),
    row('Water pressure drop', show('waterPressureDrop', t.waterPressureDrop_Pa, units)),
    countRow('Circuits', t.circuitCount),
    countRow('Largest / mean circuit flow', t.maldistribution, 3),
    countRow('Energy balance error', t.energyBalanceError === undefined ? undefined : Math.abs(t.energyBalanceError) * 100, 3, '%'),
  ];
  twoColumns(doc, { title: 'Performance: air side', rows: airSide }, { title: 'Performance: water side', rows: waterSide });
}

// ---- circuits, part load, warnings ----

function circuitsTable(doc: PDFKit.PDFDocument, result: SolveResult, units: UnitSystem): void {
  if (result.circuits.length === 0) return;
  sectionHeading(doc, 'Circuits');
  const u = (kind: Parameters<typeof show>[0]) => show(kind, 0, units)?.unit ?? '';
  const rows = result.circuits.map((c) => [
    `C${c.index}`,
    String(c.passes),
    tubeText(c.supply.tube),
    `${tubeText(c.return.tube)}${c.return.end === c.supply.end ? '' : '*'}`,
    c.arrangement,
    cell('massFlow', c.massFlow_kg_s, units),
    cell('velocity', c.velocity_m_s, units),
    numberCell(c.reynolds),
    numberCell(c.reynoldsMin),
    c.regime ?? '–',
    cell('waterPressureDrop', c.pressureDrop_Pa, units, 2),
    cell('temperature', c.leavingTemperature_C, units),
    cell('power', c.capacity_W, units, 2),
  ]);
  columnTable(
    doc,
    [
      { header: 'Circuit', weight: 0.95 },
      { header: 'Passes', weight: 0.85, numeric: true },
      { header: 'Supply', weight: 0.9 },
      { header: 'Return', weight: 0.95 },
      { header: 'Flow\narrangement', weight: 1.3 },
      { header: 'Water\nflow', unit: u('massFlow'), weight: 0.9, numeric: true },
      { header: 'Velocity', unit: u('velocity'), weight: 0.9, numeric: true },
      { header: 'Re\nmean', weight: 0.8, numeric: true },
      { header: 'Re\nmin', weight: 0.8, numeric: true },
      { header: 'Regime', weight: 1.05 },
      { header: 'Pressure\ndrop', unit: u('waterPressureDrop'), weight: 1.05, numeric: true },
      { header: 'Leaving\nwater', unit: u('temperature'), weight: 0.95, numeric: true },
      { header: 'Capacity', unit: u('power'), weight: 0.95, numeric: true },
    ],
    rows,
    { rowColour: (i) => circuitStyle(i).colour, fontSize: TYPE.small },
  );
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.tiny).fillColor(COLOURS.muted);
  doc.text(
    'R = row (row 1 meets the entering air), T = tube counted from the top. Velocity and Re at the circuit mean water temperature; regime from the lowest Re along the circuit. * Return stub on the opposite end.',
    frameOf(doc).left,
    doc.y + 3,
    { width: frameOf(doc).width },
  );
  doc.fillColor(COLOURS.ink);
}

/** Part-load points across the page (one column per flow fraction), which keeps the table short. */
function turndownTable(doc: PDFKit.PDFDocument, result: SolveResult, units: UnitSystem): void {
  const points = result.turndown ?? [];
  if (points.length === 0) return;
  sectionHeading(doc, 'Part load (reduced water flow)');
  const u = (kind: Parameters<typeof show>[0]) => show(kind, 0, units)?.unit ?? '';
  const rated = points.some((p) => p.capacity_W !== undefined);
  const rows = [
    [`Capacity, ${u('power')}`, ...points.map((p) => (p.capacity_W === undefined ? '–' : cell('power', p.capacity_W, units)))],
    ['Lowest Reynolds number', ...points.map((p) => numberCell(p.minReynolds))],
    [`Water pressure drop, ${u('waterPressureDrop')}`, ...points.map((p) => cell('waterPressureDrop', p.waterPressureDrop_Pa, units, 2))],
  ];
  columnTable(
    doc,
    [{ header: 'Water flow, % of design', weight: 3.4 }, ...points.map((p) => ({ header: formatNumber(p.flowFraction * 100, 0), weight: 1, numeric: true }))],
    rated ? rows : rows.slice(1),
  );
}

const SEVERITY_COLOUR = { info: COLOURS.info, warning: COLOURS.warning, critical: COLOURS.critical } as const;

function warningsBlock(doc: PDFKit.PDFDocument, result: SolveResult): void {
  sectionHeading(doc, 'Warnings and notes');
  if (result.warnings.length === 0) {
    paragraph(doc, 'None.', { colour: COLOURS.muted });
    return;
  }
  const order = { critical: 0, warning: 1, info: 2 } as const;
  const sorted = [...result.warnings].sort((a, b) => order[a.severity] - order[b.severity]);
  const f = frameOf(doc);
  const tagW = 52;
  for (const w of sorted) {
    const text = sentence(w.message);
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body);
    const h = doc.heightOfString(text, { width: f.width - tagW }) + 4;
    ensureSpace(doc, h);
    const y = doc.y;
    doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.small).fillColor(SEVERITY_COLOUR[w.severity]);
    doc.text(w.severity.toUpperCase(), f.left, y + 1, { width: tagW - 6, lineBreak: false });
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.ink);
    doc.text(text, f.left + tagW, y, { width: f.width - tagW });
    doc.y = Math.max(doc.y, y + h);
  }
}

// ---- drawing ----

/** 1.2 pt per mm, about 1:2.4 on paper: the largest the end faces are drawn. */
const MAX_DRAWING_SCALE_PT_PER_MM = 1.2;

function svgSizeMm(svg: string): { width: number; height: number } {
  const width = Number(svg.match(/\swidth="([\d.]+)mm"/)?.[1]);
  const height = Number(svg.match(/\sheight="([\d.]+)mm"/)?.[1]);
  if (!(width > 0 && height > 0)) throw new Error('end-face SVG without a size in mm');
  return { width, height };
}

function drawingPage(doc: PDFKit.PDFDocument, coil: CoilDocument, result: SolveResult, _units: UnitSystem): void {
  doc.addPage();
  sectionHeading(doc, 'Circuiting drawing');
  const f = frameOf(doc);
  paragraph(
    doc,
    'Both end faces as seen from the connection end, to scale; row 1 meets the entering air. Colours and line patterns tell the circuits apart; ' +
      'S marks a supply stub and R a return stub, C1, C2 … the circuit, arrows the water direction through each bend, numbers the tube counted from the top.',
    { colour: COLOURS.muted, size: TYPE.small },
  );
  const top = doc.y + 10;
  const gap = 24;
  const w = (f.width - gap) / 2;
  const h = f.bottom - top - 18;
  const fontCallback = (_family: string, bold: boolean) => (bold ? REPORT_FONTS.semibold.name : REPORT_FONTS.regular.name);
  (['connection', 'opposite'] as const).forEach((face, i) => {
    const x = f.left + i * (w + gap);
    doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.body + 1).fillColor(COLOURS.ink);
    doc.text(face === 'connection' ? 'Connection end' : 'Opposite end', x, top, { width: w, align: 'center', lineBreak: false });
    doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.small).fillColor(INK_MUTED);
    doc.text(face === 'connection' ? 'return bends and headers' : 'hairpins', x, top + 12, { width: w, align: 'center', lineBreak: false });
    const svg = renderEndFaceSvg(coil, result, face, { caption: false, fontFamily: 'PlexSans' });
    // Fit the column, but never above MAX_DRAWING_SCALE, so a small coil does not get poster-sized labels.
    const size = svgSizeMm(svg);
    const scale = Math.min(w / size.width, (h - 28) / size.height, MAX_DRAWING_SCALE_PT_PER_MM);
    const dw = size.width * scale;
    SVGtoPDF(doc, svg, x + (w - dw) / 2, top + 28, { width: dw, height: size.height * scale, preserveAspectRatio: 'xMidYMin meet', fontCallback });
  });
  doc.y = f.bottom;
  doc.addPage();
}

// ---- bill of materials, methods, cautions ----

function billOfMaterials(doc: PDFKit.PDFDocument, result: SolveResult, units: UnitSystem): void {
  const b = result.billOfMaterials;
  sectionHeading(doc, 'Bill of materials');
  if (!b) {
    paragraph(doc, 'Not available: the circuiting is not complete.', { colour: COLOURS.muted });
    return;
  }
  const left: ValueRow[] = [
    countRow('Tubes', b.tubes),
    row('Straight tube length, total', show('longLength', b.straightTubeLength_m, units)),
    countRow('Hairpins', b.hairpinCount),
    ...b.hairpins.map((h) => countRow(`   hairpins, ${h.span}`, h.count)),
    countRow('Return bends', b.returnBends),
    countRow('Crossovers', b.crossovers),
    countRow('Header stubs', b.headerStubs),
    countRow('Braze joints', b.brazeJoints),
  ];
  const right: ValueRow[] = [
    row('Internal volume', show('volume', b.internalVolume_m3, units)),
    countRow('Fins', b.finCount),
    row('Fin area', show('area', b.finArea_m2, units)),
    row('Fin mass', show('mass', b.finMass_kg, units)),
    row('Copper mass', show('mass', b.copperMass_kg, units)),
    row('Water in the coil', show('mass', b.operatingWaterMass_kg, units)),
  ];
  const f = frameOf(doc);
  const gap = 18;
  const w = (f.width - gap) / 2;
  ensureSpace(doc, Math.max(left.length, right.length) * 13 + 8);
  const y = doc.y + 2;
  const yl = valueTable(doc, f.left, y, w, left);
  const yr = valueTable(doc, f.left + w + gap, y, w, right);
  doc.y = Math.max(yl, yr) + 4;
  doc.x = f.left;
}

function methodsTable(doc: PDFKit.PDFDocument, result: SolveResult): void {
  sectionHeading(doc, 'Methods and sources');
  const methods = methodsFor(result);
  columnTable(
    doc,
    [
      { header: 'Topic', weight: 1.1, wrap: true },
      { header: 'Method', weight: 2.6, wrap: true },
      { header: 'Published source', weight: 1.9, wrap: true },
    ],
    methods.map((m) => [sentence(m.topic), sentence(m.method), m.source]),
    { fontSize: TYPE.small },
  );
}

function cautions(doc: PDFKit.PDFDocument): void {
  const f = frameOf(doc);
  const inner = f.width - 32;
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body);
  const heights = CAUTIONS.map((c) => doc.heightOfString(c, { width: inner }) + 3);
  const height = heights.reduce((s, h) => s + h, 0) + 32;
  ensureSpace(doc, height + 14);
  const y = doc.y + 14;
  doc.rect(f.left, y, f.width, height).lineWidth(0.8).strokeColor(COLOURS.warning).stroke();
  doc.font(REPORT_FONTS.semibold.name).fontSize(TYPE.heading - 1).fillColor(COLOURS.warning);
  doc.text('Cautions', f.left + 10, y + 8, { width: inner, lineBreak: false });
  let ty = y + 25;
  doc.font(REPORT_FONTS.regular.name).fontSize(TYPE.body).fillColor(COLOURS.ink);
  CAUTIONS.forEach((c, i) => {
    doc.text('•', f.left + 12, ty, { lineBreak: false });
    doc.text(c, f.left + 22, ty, { width: inner });
    ty += heights[i];
  });
  doc.y = y + height;
  doc.x = f.left;
}
