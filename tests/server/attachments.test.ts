/**
 * Coil attachments end to end: the real API on the test database, objects in the in-process S3 fake (s3rver),
 * downloads fetched from the presigned links. The limits and the accepted types are product rules (the issue
 * "Reports, exports and attachments"); magic numbers are the published signatures file-type checks.
 */
import path from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachmentListReplySchema, attachmentReplySchema, attachmentLinkReplySchema } from '@/lib/schema/api-attachments';
import { extensionLabel, formatFileSize } from '@/components/attachments/format-size';
import { MAX_ATTACHMENT_BYTES } from '@/server/services/attachments';
import { startFakeS3, type FakeS3 } from '@/server/storage/fake-s3';
import { storageOrigin } from '@/server/storage/object-store';
import { detectFileType, looksLikePlainText } from '@/server/storage/file-kind';
import { sanitizeFileName, withExtensionFor } from '@/server/storage/file-name';
import { signUp, startTestServer, type Agent, type TestServer } from './helpers';
import { documentOf, newCoil, newVersion, reviewTeam, ROLES, type ReviewTeam } from './review-fixtures';

const BUCKET = 'tubeloom-attachments-test';

/** A photo-like PNG (a gradient, so it is not trivially compressible) of the given size. */
async function pngOf(width: number, height: number): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < raw.length; i += 3) {
    const p = i / 3;
    raw[i] = p % 251;
    raw[i + 1] = (p * 7) % 253;
    raw[i + 2] = Math.floor(p / width) % 256;
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}

// ELF (Linux executable) and PE/MZ (Windows executable) headers: the published file signatures.
const ELF = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(120, 0)]);
const PE = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(58, 0), Buffer.from([0x80, 0, 0, 0]), Buffer.alloc(64, 0), Buffer.from('PE\0\0'), Buffer.alloc(64, 0)]);
const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1');

function upload(agent: Agent, coilId: string, bytes: Buffer, fileName: string) {
  return agent.post(`/api/coils/${coilId}/attachments`).attach('file', bytes, { filename: fileName, contentType: 'application/octet-stream' });
}

async function fetchBytes(url: string): Promise<{ status: number; bytes: Buffer; headers: Headers }> {
  const res = await fetch(url);
  return { status: res.status, bytes: Buffer.from(await res.arrayBuffer()), headers: res.headers };
}

describe('coil attachments', () => {
  let s3: FakeS3;
  let server: TestServer;
  let team: ReviewTeam;
  let coilId: string;
  let photo: Buffer;

  beforeAll(async () => {
    s3 = await startFakeS3(
      { endpoint: undefined, bucket: BUCKET, accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', region: 'us-east-1' },
      { directory: path.resolve('.tmp', `fake-s3-test-${process.pid}`), removeOnClose: true },
    );
    server = await startTestServer({
      env: {
        S3_ENDPOINT: s3.settings.endpoint ?? '',
        S3_BUCKET: BUCKET,
        S3_ACCESS_KEY_ID: s3.settings.accessKeyId,
        S3_SECRET_ACCESS_KEY: s3.settings.secretAccessKey,
      },
    });
    team = await reviewTeam(server);
    coilId = (await newCoil(team, 'Attachment coil')).id;
    photo = await pngOf(800, 600);
  });
  afterAll(async () => {
    await server?.close();
    await s3?.close();
  });

  it('stores an upload byte for byte and gives it back through a 5-minute presigned link', async () => {
    const res = await upload(team.agents.designer, coilId, photo, 'Site survey – coil face.png');
    expect(res.status).toBe(201);
    const { attachment } = attachmentReplySchema.parse(res.body);
    expect(attachment).toMatchObject({
      coilId,
      fileName: 'Site survey – coil face.png',
      contentType: 'image/png',
      kind: 'image',
      sizeBytes: photo.length,
      hasThumbnail: true,
      uploadedBy: { id: team.users.designer.id, name: team.users.designer.name },
    });
    expect(res.body.attachment).not.toHaveProperty('objectKey');

    const link = attachmentLinkReplySchema.parse((await team.agents.viewer.get(`/api/attachments/${attachment.id}/download`).expect(200)).body);
    expect(new URL(link.url).searchParams.get('X-Amz-Expires')).toBe('300');
    expect(Date.parse(link.expiresAt) - Date.now()).toBeGreaterThan(290_000);
    expect(new URL(link.url).origin).toBe(storageOrigin(server.config.s3));
    const got = await fetchBytes(link.url);
    expect(got.status).toBe(200);
    expect(got.bytes.equals(photo)).toBe(true);
    expect(got.headers.get('content-type')).toBe('image/png');
    expect(got.headers.get('content-disposition')).toContain("filename*=UTF-8''Site%20survey%20%E2%80%93%20coil%20face.png");
  });

  it('makes a preview of about 320 px for images, stored as a second object, and none for PDFs', async () => {
    const { body } = await upload(team.agents.owner, coilId, photo, 'preview.png').expect(201);
    const link = attachmentLinkReplySchema.parse((await team.agents.reviewer.get(`/api/attachments/${body.attachment.id}/thumbnail`).expect(200)).body);
    const original = attachmentLinkReplySchema.parse((await team.agents.reviewer.get(`/api/attachments/${body.attachment.id}/download`).expect(200)).body);
    expect(new URL(link.url).pathname).not.toBe(new URL(original.url).pathname);
    const thumb = await fetchBytes(link.url);
    expect(thumb.status).toBe(200);
    const meta = await sharp(thumb.bytes).metadata();
    expect(meta.format).toBe('webp');
    expect([meta.width, meta.height]).toEqual([320, 240]); // 800 x 600 fitted inside 320 px, aspect kept

    const pdf = await upload(team.agents.designer, coilId, PDF, 'Submittal.pdf').expect(201);
    expect(pdf.body.attachment).toMatchObject({ contentType: 'application/pdf', kind: 'document', hasThumbnail: false, thumbnailUrl: null });
    const none = await team.agents.owner.get(`/api/attachments/${pdf.body.attachment.id}/thumbnail`);
    expect(none.status).toBe(404);
    expect(none.body.error.code).toBe('no_thumbnail');

    const list = attachmentListReplySchema.parse((await team.agents.viewer.get(`/api/coils/${coilId}/attachments`).expect(200)).body);
    const listed = list.attachments.find((a) => a.id === body.attachment.id);
    expect(listed?.thumbnailUrl).toBeTruthy();
    expect((await fetchBytes(listed?.thumbnailUrl ?? '')).status).toBe(200);
  });

  it('refuses a file just over 20 MB with 413 and a clear message, and stores nothing', async () => {
    const before = (await team.agents.owner.get(`/api/coils/${coilId}/attachments`)).body.attachments.length;
    const big = Buffer.concat([photo, Buffer.alloc(MAX_ATTACHMENT_BYTES + 1 - photo.length, 7)]);
    expect(big.length).toBe(20 * 1024 * 1024 + 1);
    const res = await upload(team.agents.designer, coilId, big, 'huge.png');
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
    expect(res.body.error.message).toMatch(/larger than 20 MB/);
    expect((await team.agents.owner.get(`/api/coils/${coilId}/attachments`)).body.attachments.length).toBe(before);
  });

  it('refuses renamed executables (ELF and PE named photo.jpg) by their content, with 415', async () => {
    for (const [bytes, kind] of [
      [ELF, 'ELF'],
      [PE, 'EXE'],
    ] as const) {
      const res = await upload(team.agents.designer, coilId, bytes, 'photo.jpg');
      expect(res.status, kind).toBe(415);
      expect(res.body.error.code).toBe('unsupported_type');
      expect(res.body.error.message).toContain(`"photo.jpg" is a program (${kind})`);
      expect(res.body.error.message).toMatch(/Attach JPEG, PNG, WebP or HEIC photos, PDF documents/);
    }
  });

  it('keeps only a safe display name for a path-traversal file name; the storage key is a random id', async () => {
    const res = await upload(team.agents.designer, coilId, photo, '../../etc/passwd.png').expect(201);
    expect(res.body.attachment.fileName).toBe('passwd.png');
    const { url } = (await team.agents.designer.get(`/api/attachments/${res.body.attachment.id}/download`).expect(200)).body;
    const key = new URL(url).pathname;
    expect(key).toMatch(new RegExp(`^/${BUCKET}/attachments/[0-9a-f-]{36}$`));
    expect(key).not.toContain(res.body.attachment.id);
    const got = await fetchBytes(url);
    expect(got.bytes.equals(photo)).toBe(true);
    expect(got.headers.get('content-disposition')).toContain('filename="passwd.png"');
  });

  it('accepts careful plain text and CSV, and refuses markup, binary junk and empty files', async () => {
    const csv = await upload(team.agents.designer, coilId, Buffer.from('tube,row\n1,2\n'), 'readings.csv').expect(201);
    expect(csv.body.attachment).toMatchObject({ fileName: 'readings.csv', contentType: 'text/csv; charset=utf-8', kind: 'document' });
    const txt = await upload(team.agents.designer, coilId, Buffer.from('Header leaks at the return bends.\n'), 'notes').expect(201);
    expect(txt.body.attachment).toMatchObject({ fileName: 'notes.txt', contentType: 'text/plain; charset=utf-8' });
    const html = await upload(team.agents.designer, coilId, Buffer.from('<script>alert(1)</script>'), 'notes.txt');
    expect(html.status).toBe(415);
    const junk = await upload(team.agents.designer, coilId, Buffer.from([0x00, 0x9f, 0xff, 0x01, 0x02, 0x03, 0x04, 0x05]), 'data.csv');
    expect(junk.status).toBe(415);
    expect(junk.body.error.message).toContain('not a recognised photo, PDF or plain text');
    const empty = await upload(team.agents.designer, coilId, Buffer.alloc(0), 'empty.png');
    expect(empty.status).toBe(400);
    const none = await team.agents.designer.post(`/api/coils/${coilId}/attachments`).field('note', 'no file');
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('file_missing');
  });

  it('lets owners and designers upload (201) and refuses reviewers and viewers (403) and other teams (404)', async () => {
    const expected = { owner: 201, designer: 201, reviewer: 403, viewer: 403, outsider: 404 } as const;
    for (const who of Object.keys(expected) as (keyof typeof expected)[]) {
      const res = await upload(team.agents[who], coilId, photo, `by-${who}.png`);
      expect(res.status, who).toBe(expected[who]);
      if (res.status === 403) expect(res.body.error.message).toBe('Only owners and designers can add or delete attachments.');
    }
    const signedOut = await request(server.app).post(`/api/coils/${coilId}/attachments`).set('Origin', 'http://tubeloom.test').attach('file', photo, 'x.png');
    expect(signedOut.status).toBe(401);
  });

  it('lists for every member with name, size, uploader and date, and hides everything from another team (404)', async () => {
    for (const role of ROLES) {
      const res = await team.agents[role].get(`/api/coils/${coilId}/attachments`);
      expect(res.status, role).toBe(200);
      const { attachments } = attachmentListReplySchema.parse(res.body);
      expect(attachments.length).toBeGreaterThan(0);
      expect(attachments.every((a) => a.uploadedBy?.name && a.sizeBytes > 0 && !Number.isNaN(Date.parse(a.createdAt)))).toBe(true);
    }
    const [first] = (await team.agents.owner.get(`/api/coils/${coilId}/attachments`)).body.attachments;
    const outsider = team.agents.outsider;
    expect((await outsider.get(`/api/coils/${coilId}/attachments`)).status).toBe(404);
    expect((await outsider.get(`/api/attachments/${first.id}/download`)).status).toBe(404);
    expect((await outsider.get(`/api/attachments/${first.id}/thumbnail`)).status).toBe(404);
    expect((await outsider.delete(`/api/attachments/${first.id}`)).status).toBe(404);
    expect((await team.agents.owner.get('/api/attachments/not-a-uuid/download')).status).toBe(404);
    expect((await team.agents.owner.get(`/api/coils/${team.outsiderCoilId}/attachments`)).status).toBe(404);
  });

  it('deletes for owners and designers only, removing the stored objects', async () => {
    const { body } = await upload(team.agents.designer, coilId, photo, 'to-delete.png').expect(201);
    const id = body.attachment.id as string;
    const file = (await team.agents.owner.get(`/api/attachments/${id}/download`)).body.url as string;
    const preview = (await team.agents.owner.get(`/api/attachments/${id}/thumbnail`)).body.url as string;
    for (const role of ['reviewer', 'viewer'] as const) {
      expect((await team.agents[role].delete(`/api/attachments/${id}`)).status, role).toBe(403);
    }
    await team.agents.owner.delete(`/api/attachments/${id}`).expect(204);
    expect((await team.agents.owner.get(`/api/attachments/${id}/download`)).status).toBe(404);
    expect((await fetchBytes(file)).status).toBe(404);
    expect((await fetchBytes(preview)).status).toBe(404);
    expect((await team.agents.designer.delete(`/api/attachments/${id}`)).status).toBe(404);
  });

  it('never exposes attachments through a review link', async () => {
    const { body } = await upload(team.agents.designer, coilId, photo, 'private-site-photo.png').expect(201);
    const versionId = await newVersion(team, coilId, 'For review');
    const link = await team.agents.designer.post(`/api/versions/${versionId}/share-links`).send({ allowComments: false }).expect(201);
    const guest = request(server.app);
    const review = await guest.get(`/api/review/${link.body.token}`).expect(200);
    expect(JSON.stringify(review.body)).not.toContain('private-site-photo');
    expect(JSON.stringify(review.body)).not.toContain(body.attachment.id);
    expect((await guest.get(`/api/review/${link.body.token}/attachments`)).status).toBe(404);
    expect((await guest.get(`/api/attachments/${body.attachment.id}/download`)).status).toBe(401);
  });
});

describe('attachments when the store is down', () => {
  it('answers 503 with a clear message and stores no row', async () => {
    // Port 9 (discard) on loopback: nothing listens there, so every S3 call is refused.
    const down = await startTestServer({ reset: false, env: { S3_ENDPOINT: 'http://127.0.0.1:9', S3_BUCKET: BUCKET } });
    try {
      const owner = await signUp(down, 'Sana Store');
      const project = await owner.agent.post(`/api/teams/${owner.teamId}/projects`).send({ name: 'Offline store' }).expect(201);
      const coil = await owner.agent
        .post(`/api/projects/${project.body.project.id}/coils`)
        .send({ name: 'C', document: documentOf('C') })
        .expect(201);
      const res = await upload(owner.agent, coil.body.coil.id, await pngOf(40, 30), 'photo.png');
      expect(res.status).toBe(503);
      expect(res.body.error).toMatchObject({ code: 'storage_unavailable' });
      expect(res.body.error.message).toMatch(/nothing was attached/);
      expect((await owner.agent.get(`/api/coils/${coil.body.coil.id}/attachments`)).body.attachments).toEqual([]);
    } finally {
      await down.close();
    }
  });
});

describe('attachment file checks', () => {
  it('strips folders, control and direction characters, and never returns an empty or hidden name', () => {
    expect(sanitizeFileName('../../etc/passwd.png')).toBe('passwd.png');
    expect(sanitizeFileName('C:\\Users\\ana\\Desktop\\coil.jpg')).toBe('coil.jpg');
    expect(sanitizeFileName('bad\u0000name\r\n.pdf')).toBe('badname.pdf');
    expect(sanitizeFileName('photo\u202egpj.exe')).toBe('photogpj.exe');
    expect(sanitizeFileName('..')).toBe('attachment');
    expect(sanitizeFileName('.hidden.png')).toBe('hidden.png');
    expect(sanitizeFileName('a<b>:c?.png')).toBe('a_b__c_.png');
    expect(sanitizeFileName(`${'x'.repeat(300)}.jpeg`)).toHaveLength(120);
    expect(withExtensionFor('scan', ['pdf'])).toBe('scan.pdf');
    expect(withExtensionFor('Photo.JPG', ['jpg', 'jpeg'])).toBe('Photo.JPG');
  });

  it('names the store origin thumbnails come from, for the page CSP', () => {
    const base = { bucket: 'coil-files', accessKeyId: 'k', secretAccessKey: 's', region: 'eu-west-2' };
    expect(storageOrigin({ ...base, endpoint: 'http://127.0.0.1:4569' })).toBe('http://127.0.0.1:4569');
    expect(storageOrigin({ ...base, endpoint: undefined })).toBe('https://coil-files.s3.eu-west-2.amazonaws.com'); // seen from the SDK presigner
  });

  it('detects types from magic numbers, not names', async () => {
    expect(await detectFileType(ELF, 'photo.jpg')).toEqual({ ok: false, description: 'a program (ELF)' });
    const png = await detectFileType(await pngOf(4, 4), 'report.pdf');
    expect(png.ok && png.type.contentType).toBe('image/png');
    const pdf = await detectFileType(PDF, 'photo.png');
    expect(pdf.ok && pdf.type.contentType).toBe('application/pdf');
    expect(looksLikePlainText(Buffer.from('\ufeffa;b\r\n1;2\n'))).toBe(true);
    expect(looksLikePlainText(Buffer.from('#!/bin/sh\nrm -rf /\n'))).toBe(false);
    expect(looksLikePlainText(Buffer.from([0xc3, 0x28]))).toBe(false); // invalid UTF-8 sequence
  });
});

describe('attachment sizes as the panel shows them', () => {
  it('gives every size a unit, counting 1 KB = 1024 bytes like the 20 MB limit (common practice)', () => {
    expect(formatFileSize(840)).toBe('840 B');
    expect(formatFileSize(12_700)).toBe('12 KB');
    expect(formatFileSize(1536)).toBe('1.5 KB');
    expect(formatFileSize(3.25 * 1024 * 1024)).toBe('3.3 MB');
    expect(formatFileSize(MAX_ATTACHMENT_BYTES)).toBe('20 MB');
    expect(extensionLabel('Submittal rev B.pdf')).toBe('PDF');
    expect(extensionLabel('notes')).toBe('FILE');
  });
});
