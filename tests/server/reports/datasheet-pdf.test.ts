import { describe, expect, it } from 'vitest';
import { getDocument, OPS } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { SolveResult } from '@/lib/engine/types';
import { formatQuantity } from '@/lib/units';
import { renderDatasheetPdf, type DatasheetInput } from '@/server/reports/datasheet-pdf';
import { brokenCoil, defaultCoolingCoil, exampleFixtures, smallCoolingCoil, type Fixture } from './fixtures';

const metadata: DatasheetInput['metadata'] = {
  projectName: 'Harbourview Offices',
  client: 'Northgate Property Trust',
  coilName: 'AHU-2 chilled-water coil',
  versionNumber: 3,
  versionMessage: 'Six circuits moved to the top band',
  decision: { status: 'approved', by: 'Mira Okafor', at: '2026-11-30T10:00:00Z', note: 'Check the drain pan height.' },
  preparedBy: 'Tomas Lindqvist',
  date: '2026-12-01',
};

interface OpenedPdf { pages: string[]; drawingOps: number[]; raw: string }

async function open(buffer: Buffer): Promise<OpenedPdf> {
  expect(buffer.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  const pdf = await getDocument({ data: new Uint8Array(buffer), verbosity: 0 }).promise;
  const pages: string[] = [];
  const drawingOps: number[] = [];
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    const content = await page.getTextContent();
    pages.push(content.items.map((i) => ('str' in i ? i.str : '')).join(' '));
    const ops = await page.getOperatorList();
    drawingOps.push(ops.fnArray.filter((f) => f === OPS.constructPath).length);
  }
  await pdf.destroy();
  return { pages, drawingOps, raw: buffer.toString('latin1') };
}

const render = (fx: Fixture, units: 'si' | 'ip', paper: 'A4' | 'Letter', result: SolveResult = fx.result) =>
  renderDatasheetPdf({ document: fx.doc, result, metadata, options: { units, paper } });

describe('renderDatasheetPdf', () => {
  const coil = defaultCoolingCoil();

  for (const [units, paper] of [['si', 'A4'], ['ip', 'Letter']] as const) {
    it(`opens with pdfjs, numbers every page and prints capacity and water pressure drop (${units}, ${paper})`, async () => {
      const { pages } = await open(await render(coil, units, paper));
      // Layout of the 4 x 24 coil: identification and performance, circuits and warnings, drawing, materials and methods.
      expect(pages.length).toBe(4);
      pages.forEach((text, i) => expect(text).toContain(`Page ${i + 1} of ${pages.length}`));
      const first = pages[0];
      expect(first.replace(/\s+/g, '')).toContain('COILDATASHEET'); // letter-spaced, so pdfjs splits it
      expect(first).toContain('AHU-2 chilled-water coil');
      expect(first).toContain('Version 3');
      expect(first).toContain('Review: approved');
      const t = coil.result.totals;
      expect(t.capacity_W).toBeGreaterThan(0);
      const capacity = formatQuantity('power', t.capacity_W!, units);
      const dp = formatQuantity('waterPressureDrop', t.waterPressureDrop_Pa!, units);
      expect(first).toContain(capacity.text);
      expect(first).toContain(capacity.unit);
      expect(first).toContain(dp.text);
      expect(first).toContain(dp.unit);
      const all = pages.join('\n');
      for (const heading of ['Geometry', 'Operating conditions', 'Circuits', 'Warnings and notes', 'Cautions', 'Circuiting drawing', 'Bill of materials', 'Methods and sources']) {
        expect(all).toContain(heading);
      }
    });
  }

  it('sizes the pages A4 (595 x 842 pt) or US Letter (612 x 792 pt)', async () => {
    for (const [paper, w, h] of [['A4', 595.28, 841.89], ['Letter', 612, 792]] as const) {
      const buffer = await render(smallCoolingCoil(), 'si', paper);
      const pdf = await getDocument({ data: new Uint8Array(buffer), verbosity: 0 }).promise;
      const [, , pw, ph] = (await pdf.getPage(1)).view;
      expect(pw).toBeCloseTo(w, 1);
      expect(ph).toBeCloseTo(h, 1);
      await pdf.destroy();
    }
  });

  it('embeds the IBM Plex fonts and draws the end faces as vector paths', async () => {
    const fx = smallCoolingCoil();
    const { pages, drawingOps, raw } = await open(await render(fx, 'si', 'A4'));
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+IBMPlexSans/);
    expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+IBMPlexMono|IBMPlexSans-SemiBold/);
    expect(raw).toContain('/FontFile2');
    const drawing = pages.findIndex((p) => p.includes('Circuiting drawing'));
    expect(drawing).toBeGreaterThan(0);
    // Both faces: at least one path per tube hole on each face plus the bends.
    const tubes = fx.doc.geometry.rows * fx.doc.geometry.tubesPerRow;
    expect(drawingOps[drawing]).toBeGreaterThan(2 * tubes + fx.doc.circuiting.bends.length);
  });

  it('prints "not rated" where thermal results are missing, and still the water pressure drop', async () => {
    const fx = smallCoolingCoil();
    const t = fx.result.totals;
    const hydraulicOnly: SolveResult = {
      ...fx.result,
      totals: { circuitCount: t.circuitCount, waterPressureDrop_Pa: t.waterPressureDrop_Pa, maldistribution: t.maldistribution },
      circuits: fx.result.circuits.map(({ capacity_W: _c, leavingTemperature_C: _l, ...c }) => c),
    };
    const { pages } = await open(await render(fx, 'si', 'A4', hydraulicOnly));
    expect(pages[0]).toContain('not rated');
    expect(pages[0]).toContain(formatQuantity('waterPressureDrop', t.waterPressureDrop_Pa!, 'si').text);
    expect(pages[0]).not.toContain('Cooling capacity');
  });

  it('lists the circuiting errors of an invalid drawing instead of ratings', async () => {
    const fx = brokenCoil();
    const { pages } = await open(await render(fx, 'ip', 'Letter'));
    const all = pages.join('\n');
    expect(all).toContain('Circuiting errors');
    expect(all).toContain('not rated');
    pages.forEach((text, i) => expect(text).toContain(`Page ${i + 1} of ${pages.length}`));
  });

  const examples = exampleFixtures([
    'hot-water-heating-2-row.json',
    'hot-water-3-row-odd-passes.json',
    'chilled-water-12-row.json',
    'propylene-glycol-40-preheat.json',
    'invalid-tube-twice.json',
  ]);
  for (const fx of examples) {
    it(`renders the example ${fx.name}`, async () => {
      const { pages } = await open(await render(fx, 'si', 'A4'));
      expect(pages.length).toBeGreaterThanOrEqual(3);
      if (fx.result.totals.waterPressureDrop_Pa !== undefined) {
        expect(pages[0]).toContain(formatQuantity('waterPressureDrop', fx.result.totals.waterPressureDrop_Pa, 'si').text);
      }
    });
  }
});
