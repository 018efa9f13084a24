import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import type { Response } from 'supertest';
import { exportPath } from '@/lib/api/exports';
import { solveCoil } from '@/lib/engine/solve-coil';
import type { CoilDocument } from '@/lib/engine/types';
import { formatQuantity } from '@/lib/units';
import { safeFileStem } from '@/server/services/exports';
import { startTestServer, type Agent, type TestServer } from './helpers';
import { documentOf, newCoil, newVersion, reviewTeam, type ReviewTeam } from './review-fixtures';

/** supertest buffers only text and JSON by itself; reports are read as raw bytes. */
function binary(res: Response, done: (err: Error | null, body: Buffer) => void): void {
  // In Node the parser is handed the raw response stream, which the superagent types call Response.
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}

const download = (agent: Agent, path: string) => agent.get(path).buffer(true).parse(binary);

async function pdfPages(bytes: Buffer): Promise<{ texts: string[]; width: number; height: number }> {
  const pdf = await getDocument({ data: new Uint8Array(bytes), verbosity: 0 }).promise;
  const texts: string[] = [];
  let width = 0;
  let height = 0;
  for (let n = 1; n <= pdf.numPages; n++) {
    const page = await pdf.getPage(n);
    if (n === 1) [, , width, height] = page.view;
    const content = await page.getTextContent();
    texts.push(content.items.map((i) => ('str' in i ? i.str : '')).join(' '));
  }
  await pdf.destroy();
  return { texts, width, height };
}

function attachmentName(res: Response): string {
  const header = String(res.headers['content-disposition'] ?? '');
  expect(header).toMatch(/^attachment; filename="[A-Za-z0-9._-]+"$/);
  return /filename="([^"]+)"/.exec(header)![1];
}

const countCoils = async (team: ReviewTeam) =>
  (await team.agents.owner.get(`/api/projects/${team.projectId}/coils`).expect(200)).body.coils.length as number;

describe('report and export downloads, coil import', () => {
  let server: TestServer;
  let team: ReviewTeam;
  let coilId: string;
  let versionId: string;
  const coilName = 'Kühler "AHU/3" <east>';

  beforeAll(async () => {
    server = await startTestServer();
    team = await reviewTeam(server);
    coilId = (await newCoil(team, coilName)).id;
    versionId = await newVersion(team, coilId, 'Issued for tender');
    await team.agents.reviewer.post(`/api/versions/${versionId}/decisions`).send({ status: 'approved', note: 'Fine as drawn.' }).expect(201);
  });
  afterAll(async () => {
    await server.close();
  });

  it('gives a viewer the version data sheet as a PDF that opens, names the coil, the version and the decision', async () => {
    const res = await download(team.agents.viewer, `/api/versions/${versionId}/datasheet.pdf?units=si&paper=A4`).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(attachmentName(res)).toBe('Kuhler-AHU-3-east-v1-datasheet-si-A4.pdf');
    const { texts, width, height } = await pdfPages(res.body as Buffer);
    const first = texts[0];
    expect(first).toContain(coilName);
    expect(first).toContain('Version 1');
    expect(first).toContain('Issued for tender');
    expect(first).toContain('Review: approved');
    expect(first).toContain('Harbour Hall');
    // Condensate in kg/h (1 kg/h = 1/3600 kg/s, the hour being 3600 s; NIST SP 811), from the engine's own solve.
    const condensate = solveCoil(documentOf(coilName)).totals.condensate_kg_s!;
    expect(condensate).toBeGreaterThan(0); // the starting point is a cooling coil with wet surface
    expect(texts.join(' ')).toMatch(new RegExp(`Condensate\\s+${formatQuantity('condensateFlow', condensate, 'si').text.replace('.', '\\.')}\\s+kg/h`));
    // ISO 216 A4 is 210 x 297 mm = 595.28 x 841.89 pt (1 pt = 1/72 in; common practice).
    expect(Math.round(width)).toBe(595);
    expect(Math.round(height)).toBe(842);
  });

  it('prints the working draft on Letter in IP units and marks it as not a saved version', async () => {
    const res = await download(team.agents.viewer, `/api/coils/${coilId}/datasheet.pdf?units=ip&paper=Letter`).expect(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(attachmentName(res)).toBe('Kuhler-AHU-3-east-draft-datasheet-ip-Letter.pdf');
    const { texts, width, height } = await pdfPages(res.body as Buffer);
    expect(texts[0]).toContain(coilName);
    expect(texts[0]).toContain('Working draft (not a saved version)');
    expect(texts[0]).not.toContain('Review: approved');
    expect(texts.join(' ')).toContain('IP units');
    // US Letter is 8.5 x 11 in = 612 x 792 pt (common practice).
    expect([Math.round(width), Math.round(height)]).toEqual([612, 792]);
  });

  it('draws both end faces as SVG with one hole per tube', async () => {
    for (const face of ['connection', 'opposite'] as const) {
      const res = await download(team.agents.viewer, `/api/versions/${versionId}/end-face.svg?face=${face}`).expect(200);
      expect(res.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
      expect(attachmentName(res)).toBe(`Kuhler-AHU-3-east-v1-end-face-${face}.svg`);
      const svg = (res.body as Buffer).toString('utf8');
      expect(svg).toMatch(/<svg[\s>]/);
      // The test coil is 2 rows x 8 tubes high (review-fixtures documentOf).
      expect(svg.match(/<circle[^>]*class="tube"/g)?.length).toBe(16);
    }
    const draft = await download(team.agents.viewer, `/api/coils/${coilId}/end-face.svg`).expect(200);
    expect(attachmentName(draft)).toBe('Kuhler-AHU-3-east-draft-end-face-connection.svg');
  });

  it('gives the tube sheet as a DXF file', async () => {
    const res = await download(team.agents.viewer, `/api/coils/${coilId}/tube-sheet.dxf`).expect(200);
    expect(res.headers['content-type']).toBe('image/vnd.dxf; charset=utf-8');
    expect(attachmentName(res)).toBe('Kuhler-AHU-3-east-draft-tube-sheet.dxf');
    const dxf = (res.body as Buffer).toString('utf8');
    // DXF group code 0 opens sections and ends the file with EOF (Autodesk DXF reference; from memory).
    expect(dxf).toMatch(/^\s*0\r?\nSECTION/);
    expect(dxf.trim().endsWith('EOF')).toBe(true);
  });

  it('gives the circuit, tube and material tables as CSV in the asked units', async () => {
    const circuits = await team.agents.viewer.get(`/api/versions/${versionId}/circuits.csv?units=ip`).expect(200);
    expect(circuits.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(attachmentName(circuits)).toBe('Kuhler-AHU-3-east-v1-circuits-ip.csv');
    const circuitLines = circuits.text.trim().split(/\r?\n/);
    expect(circuitLines[0]).toContain('pressure drop (ft of water)');
    expect(circuitLines.length).toBe(1 + 8); // header + one line per circuit: the serpentine start has 8 circuits

    const si = await team.agents.viewer.get(`/api/versions/${versionId}/circuits.csv`).expect(200);
    expect(si.text.split(/\r?\n/)[0]).toContain('pressure drop (kPa)'); // SI when ?units= is left out

    const tubes = await team.agents.viewer.get(`/api/coils/${coilId}/tubes.csv?units=si`).expect(200);
    expect(tubes.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(tubes.text.trim().split(/\r?\n/).length).toBe(1 + 16);

    const bom = await team.agents.viewer.get(`/api/coils/${coilId}/bill-of-materials.csv?units=si`).expect(200);
    expect(attachmentName(bom)).toBe('Kuhler-AHU-3-east-draft-bill-of-materials-si.csv');
    expect(bom.text.split(/\r?\n/)).toContain('tubes,16,pcs');

    // The total straight tube length is a long length: metres in SI, feet in IP (1 ft = 0.3048 m exactly, NIST SP 811).
    const straight = solveCoil(documentOf(coilName)).billOfMaterials!.straightTubeLength_m;
    const bomIp = await team.agents.viewer.get(`/api/coils/${coilId}/bill-of-materials.csv?units=ip`).expect(200);
    expect(bomIp.text.split(/\r?\n/)).toContain(`"straight tube length, total",${Number((straight / 0.3048).toPrecision(6))},ft`);
    expect(bom.text.split(/\r?\n/)).toContain(`"straight tube length, total",${Number(straight.toPrecision(6))},m`);
  });

  it('gives the coil document as JSON, for the draft and for a version', async () => {
    for (const path of [`/api/coils/${coilId}/document.json`, `/api/versions/${versionId}/document.json`]) {
      const res = await download(team.agents.viewer, path).expect(200);
      expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
      expect(attachmentName(res)).toMatch(/^Kuhler-AHU-3-east-(draft|v1)-coil\.json$/);
      expect(JSON.parse((res.body as Buffer).toString('utf8'))).toEqual(documentOf(coilName));
    }
  });

  it('answers 404 for another team, and for its own ids to the other team', async () => {
    const files = ['datasheet.pdf', 'end-face.svg', 'tube-sheet.dxf', 'circuits.csv', 'tubes.csv', 'bill-of-materials.csv', 'document.json'];
    for (const file of files) {
      for (const base of [`/api/coils/${coilId}`, `/api/versions/${versionId}`]) {
        const res = await team.agents.outsider.get(`${base}/${file}`);
        expect(res.status, `${base}/${file}`).toBe(404);
      }
      const own = await team.agents.owner.get(`/api/versions/${team.outsiderVersionId}/${file}`);
      expect(own.status, file).toBe(404);
    }
    expect((await team.agents.owner.get(`/api/coils/not-a-uuid/circuits.csv`)).status).toBe(404);
    expect((await server.client().get(`/api/coils/${coilId}/circuits.csv`)).status).toBe(401);
  });

  it('answers 400 naming the field for a bad query parameter', async () => {
    const cases: [string, string][] = [
      [`/api/coils/${coilId}/datasheet.pdf?units=metric`, 'units'],
      [`/api/versions/${versionId}/datasheet.pdf?paper=A3`, 'paper'],
      [`/api/coils/${coilId}/end-face.svg?face=left`, 'face'],
      [`/api/versions/${versionId}/tubes.csv?units=SI`, 'units'],
    ];
    for (const [path, field] of cases) {
      const res = await team.agents.viewer.get(path);
      expect(res.status, path).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
    }
  });

  it('refuses a malformed document, naming every bad field, and creates nothing', async () => {
    const before = await countCoils(team);
    const bad = structuredClone(documentOf('Broken import')) as unknown as Record<string, unknown> & CoilDocument;
    (bad as { schemaVersion: unknown }).schemaVersion = 2;
    (bad.geometry as { rows: unknown }).rows = 0;
    (bad.geometry.fin as { type: unknown }).type = 'spiky';
    (bad.conditions.fluid as { massFlow_kg_s: unknown }).massFlow_kg_s = 'lots';
    bad.circuiting.bends[0].a.row = -1;
    const res = await team.agents.designer.post(`/api/projects/${team.projectId}/coils/import`).send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_document');
    expect(res.body.error.message).toContain('Nothing was created');
    const fields = res.body.error.fields as Record<string, string>;
    for (const path of [
      'document.schemaVersion',
      'document.geometry.rows',
      'document.geometry.fin.type',
      'document.conditions.fluid.massFlow_kg_s',
      'document.circuiting.bends.0.a.row',
    ]) {
      expect(fields[path], path).toEqual(expect.any(String));
    }
    expect(fields['document.geometry.rows']).toContain('at least 1 row');
    expect(Object.keys(res.body.error.fields).length).toBeGreaterThanOrEqual(5);

    const notACoil = await team.agents.designer.post(`/api/projects/${team.projectId}/coils/import`).send({ hello: 'world' });
    expect(notACoil.status).toBe(400);
    expect(Object.keys(notACoil.body.error.fields)).toEqual(
      expect.arrayContaining(['document.schemaVersion', 'document.name', 'document.geometry', 'document.circuiting', 'document.conditions']),
    );
    const notJson = await team.agents.designer
      .post(`/api/projects/${team.projectId}/coils/import`)
      .set('Content-Type', 'application/json')
      .send('{"schemaVersion": 1,');
    expect(notJson.status).toBe(400);
    expect(await countCoils(team)).toBe(before);
  });

  it('imports an exported document as a new coil, as it is or wrapped with a name', async () => {
    const exported = await download(team.agents.designer, `/api/versions/${versionId}/document.json`).expect(200);
    const document = JSON.parse((exported.body as Buffer).toString('utf8')) as CoilDocument;
    const before = await countCoils(team);

    const plain = await team.agents.designer.post(`/api/projects/${team.projectId}/coils/import`).send(document);
    expect(plain.status).toBe(201);
    expect(plain.body.coil).toMatchObject({ projectId: team.projectId, name: coilName, revision: 1, document });

    const named = await team.agents.owner.post(`/api/projects/${team.projectId}/coils/import`).send({ name: 'Imported copy', document });
    expect(named.status).toBe(201);
    expect(named.body.coil.name).toBe('Imported copy');
    const stored = await team.agents.viewer.get(`/api/coils/${named.body.coil.id}`).expect(200);
    expect(stored.body.coil.document).toEqual(document);
    expect(stored.body.coil.summary.circuitCount).toBe(8);
    expect(await countCoils(team)).toBe(before + 2);
  });

  it('lets only owners and designers import (403 viewer and reviewer, 404 another team, 403 without our Origin)', async () => {
    const before = await countCoils(team);
    const document = documentOf('Role check');
    for (const who of ['viewer', 'reviewer'] as const) {
      const res = await team.agents[who].post(`/api/projects/${team.projectId}/coils/import`).send(document);
      expect(res.status, who).toBe(403);
    }
    const outsider = await team.agents.outsider.post(`/api/projects/${team.projectId}/coils/import`).send(document);
    expect(outsider.status).toBe(404);
    // A viewer gets 403 even for a malformed body: the role is checked before the file is read.
    expect((await team.agents.viewer.post(`/api/projects/${team.projectId}/coils/import`).send({ hello: 1 })).status).toBe(403);
    const noOrigin = await team.agents.designer.post(`/api/projects/${team.projectId}/coils/import`).set('Origin', 'http://evil.test').send(document);
    expect(noOrigin.status).toBe(403);
    expect(noOrigin.body.error.code).toBe('bad_origin');
    expect(await countCoils(team)).toBe(before);
  });

  it('builds the download links the app uses (lib/api/exports)', () => {
    expect(exportPath({ coilId: 'c 1' }, 'datasheet', { units: 'ip', paper: 'Letter' })).toBe('/api/coils/c%201/datasheet.pdf?units=ip&paper=Letter');
    expect(exportPath({ coilId: 'c', versionId: 'v' }, 'billOfMaterials', { units: 'si' })).toBe('/api/versions/v/bill-of-materials.csv?units=si');
    expect(exportPath({ coilId: 'c' }, 'document')).toBe('/api/coils/c/document.json');
  });

  it('makes download names safe from any coil name', () => {
    expect(safeFileStem('../../etc/passwd')).toBe('etc-passwd');
    expect(safeFileStem('Kühler "A"\r\nSet-Cookie: x')).toBe('Kuhler-A-Set-Cookie-x');
    expect(safeFileStem('冷却')).toBe('coil');
    expect(safeFileStem('x'.repeat(200))).toHaveLength(80);
  });
});
