import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { shareLinks } from '@/db/schema';
import { createdShareLinkReplySchema, reviewReplySchema, shareLinkListReplySchema } from '@/lib/schema/api-versions';
import { ORIGIN, startTestServer, type TestServer } from './helpers';
import { documentOf, newCoil, newVersion, reviewTeam, ROLES, type ReviewTeam } from './review-fixtures';

const HOUR = 60 * 60 * 1000;

describe('review links', () => {
  let server: TestServer;
  let team: ReviewTeam;
  let clockOffset = 0; // moves the services' clock forward to test expiry

  beforeAll(async () => {
    server = await startTestServer({ now: () => new Date(Date.now() + clockOffset) });
    team = await reviewTeam(server);
  });
  afterAll(async () => {
    await server.close();
  });

  /** No session cookie: what anyone holding only the link can do. */
  const guest = () => server.client();

  async function share(versionId: string, body: object = { allowComments: true }) {
    const res = await team.agents.designer.post(`/api/versions/${versionId}/share-links`).send(body);
    expect(res.status).toBe(201);
    return createdShareLinkReplySchema.parse(res.body);
  }

  it('lets owners and designers make a link (201), not reviewers or viewers (403), 404 for another team', async () => {
    const coil = await newCoil(team, 'Shared');
    const versionId = await newVersion(team, coil.id);
    const expected = { owner: 201, designer: 201, reviewer: 403, viewer: 403, outsider: 404 } as const;
    for (const who of Object.keys(expected) as (keyof typeof expected)[]) {
      const res = await team.agents[who].post(`/api/versions/${versionId}/share-links`).send({ allowComments: false });
      expect(res.status, who).toBe(expected[who]);
    }
    expect((await team.agents.owner.post(`/api/versions/${team.outsiderVersionId}/share-links`).send({ allowComments: false })).status).toBe(404);
    for (const role of ROLES) {
      const res = await team.agents[role].get(`/api/coils/${coil.id}/share-links`);
      expect(res.status, role).toBe(200);
      expect(shareLinkListReplySchema.parse(res.body).shareLinks).toHaveLength(2);
    }
    expect((await team.agents.outsider.get(`/api/coils/${coil.id}/share-links`)).status).toBe(404);
  });

  it('gives an unguessable token once and stores only its SHA-256', async () => {
    const coil = await newCoil(team, 'Hashed');
    const versionId = await newVersion(team, coil.id);
    const created = await share(versionId);
    expect(created.token).toMatch(/^[A-Za-z0-9_-]{43}$/); // 32 random bytes, base64url
    expect(created.url).toBe(`${ORIGIN}/review/${created.token}`);
    expect(created.shareLink).toMatchObject({ versionId, versionNumber: 1, allowComments: true, expiresAt: null, state: 'active', openCount: 0 });
    const [row] = await server.database.db.select().from(shareLinks).where(eq(shareLinks.id, created.shareLink.id));
    expect(row.tokenHash).toBe(createHash('sha256').update(created.token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(created.token);
    const listed = await team.agents.owner.get(`/api/coils/${coil.id}/share-links`);
    expect(JSON.stringify(listed.body)).not.toContain(created.token);
    expect(created.token).not.toBe((await share(versionId)).token);
  });

  it('rejects malformed link bodies with 400 naming the field', async () => {
    const coil = await newCoil(team, 'Bad link');
    const versionId = await newVersion(team, coil.id);
    for (const [body, field] of [
      [{}, 'allowComments'],
      [{ allowComments: 'yes' }, 'allowComments'],
      [{ allowComments: true, expiresAt: 'soon' }, 'expiresAt'],
      [{ allowComments: true, expiresAt: new Date(Date.now() - HOUR).toISOString() }, 'expiresAt'],
    ] as const) {
      const res = await team.agents.designer.post(`/api/versions/${versionId}/share-links`).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields[field]).toBeDefined();
    }
  });

  it('mails the team reviewers the link when one is made, and respects their switch', async () => {
    const coil = await newCoil(team, 'Review me');
    const versionId = await newVersion(team, coil.id, 'Ready for a look');
    const created = await share(versionId);
    const mails = (await server.outbox()).filter((m) => m.subject === 'Review requested: Review me, version 1');
    expect(mails.map((m) => m.to)).toEqual([team.users.reviewer.email]);
    expect(mails[0].text).toContain(created.url);
    expect(mails[0].text).toContain('Ready for a look');

    await team.agents.reviewer.put('/api/me/notifications').send({ reviewRequested: false, newComment: true, decision: true }).expect(200);
    await share(versionId);
    expect((await server.outbox()).filter((m) => m.subject === 'Review requested: Review me, version 1')).toHaveLength(1);
    await team.agents.reviewer.put('/api/me/notifications').send({ reviewRequested: true, newComment: true, decision: true }).expect(200);
  });

  it('opens the version without sign-in, with its solve result, and records first/last opening and the count', async () => {
    const coil = await newCoil(team, 'Opened');
    const versionId = await newVersion(team, coil.id, 'Issue A');
    const { token, shareLink } = await share(versionId);
    const first = await guest().get(`/api/review/${token}`);
    expect(first.status).toBe(200);
    const reply = reviewReplySchema.parse(first.body);
    expect(reply.version).toMatchObject({ number: 1, message: 'Issue A', coilName: 'Opened', author: team.users.designer.name });
    expect(reply.version.document).toEqual(documentOf('Opened'));
    expect(reply.result.valid).toBe(true);
    expect(reply.result.totals.circuitCount).toBe(reply.version.summary.circuitCount);
    expect(reply.allowComments).toBe(true);
    expect(reply.comments).toEqual([]);
    expect(first.body).not.toHaveProperty('version.id');
    expect(first.body).not.toHaveProperty('version.coilId');

    await guest().get(`/api/review/${token}`).expect(200);
    const links = shareLinkListReplySchema.parse((await team.agents.viewer.get(`/api/coils/${coil.id}/share-links`)).body).shareLinks;
    const link = links.find((l) => l.id === shareLink.id)!;
    expect(link.openCount).toBe(2);
    expect(link.firstOpenedAt).not.toBeNull();
    expect(Date.parse(link.lastOpenedAt!)).toBeGreaterThanOrEqual(Date.parse(link.firstOpenedAt!));
  });

  it('grants nothing but its own version and guest comments', async () => {
    const coil = await newCoil(team, 'Fenced');
    const v1 = await newVersion(team, coil.id, 'Shared one');
    const v2 = await newVersion(team, coil.id, 'Private two');
    const { token } = await share(v1);
    const reply = reviewReplySchema.parse((await guest().get(`/api/review/${token}`)).body);
    expect(reply.version.message).toBe('Shared one');

    const g = guest();
    await g.get(`/api/review/${token}`).expect(200);
    // The same client, having used the token, is still nobody to the member API.
    for (const path of [`/api/versions/${v2}`, `/api/versions/${v1}`, `/api/coils/${coil.id}`, `/api/coils/${coil.id}/versions`, `/api/versions/${v1}/comments`, `/api/projects/${team.projectId}`]) {
      expect((await g.get(path)).status, path).toBe(401);
    }
    expect((await g.get(`/api/review/${token}/versions/${v2}`)).status).toBe(404);
    expect((await g.post(`/api/versions/${v1}/comments`).send({ body: 'x' })).status).toBe(401);
    expect((await g.post(`/api/versions/${v1}/decisions`).send({ status: 'approved' })).status).toBe(401);
    expect((await g.post(`/api/versions/${v1}/share-links`).send({ allowComments: true })).status).toBe(401);
    expect((await g.post(`/api/versions/${v1}/restore`)).status).toBe(401);
    expect((await g.post(`/api/review/${token}/decisions`).send({ status: 'approved' })).status).toBe(404);
    expect((await g.put(`/api/review/${token}`).send({})).status).toBe(404);

    const comment = await g.post(`/api/review/${token}/comments`).send({ guestName: 'Gil Guest', body: 'Looks fine', pin: { kind: 'tube', row: 1, tube: 1 } });
    expect(comment.status).toBe(201);
    expect(comment.body.comment).toMatchObject({ versionId: v1, author: { kind: 'guest', name: 'Gil Guest' }, body: 'Looks fine' });
    expect((await g.patch(`/api/comments/${comment.body.comment.id}`).send({ resolved: true })).status).toBe(401);
    // A guest cannot hang a reply on a comment of another version.
    const other = (await team.agents.reviewer.post(`/api/versions/${v2}/comments`).send({ body: 'Internal' }).expect(201)).body.comment;
    const sneaky = await g.post(`/api/review/${token}/comments`).send({ guestName: 'Gil Guest', body: 'x', parentId: other.id });
    expect(sneaky.status).toBe(400);
    // Members see the guest's comment on the version; the guest sees only this version's comments.
    const members = await team.agents.viewer.get(`/api/versions/${v1}/comments`);
    expect(members.body.comments.map((c: { body: string }) => c.body)).toEqual(['Looks fine']);
    const seen = reviewReplySchema.parse((await g.get(`/api/review/${token}`)).body).comments!;
    expect(seen.map((c) => c.body)).toEqual(['Looks fine']);
  });

  it('mails the coil creator about a guest comment', async () => {
    const coil = await newCoil(team, 'Guest mail');
    const versionId = await newVersion(team, coil.id);
    const { token } = await share(versionId);
    await guest().post(`/api/review/${token}/comments`).send({ guestName: 'Pat Client', body: 'Is 2 rows enough?' }).expect(201);
    const mails = (await server.outbox()).filter((m) => m.to === team.users.designer.email && m.subject === 'New comment on Guest mail, version 1');
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain('Pat Client (guest reviewer)');
  });

  it('refuses guest comments (403) and hides comments when the link does not allow them', async () => {
    const coil = await newCoil(team, 'Read only');
    const versionId = await newVersion(team, coil.id);
    await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'Internal note' }).expect(201);
    const { token } = await share(versionId, { allowComments: false });
    const reply = reviewReplySchema.parse((await guest().get(`/api/review/${token}`)).body);
    expect(reply.allowComments).toBe(false);
    expect(reply.comments).toBeUndefined();
    const res = await guest().post(`/api/review/${token}/comments`).send({ guestName: 'Gil', body: 'Hello' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('comments_disabled');
    expect((await team.agents.viewer.get(`/api/versions/${versionId}/comments`)).body.comments).toHaveLength(1);
  });

  it('rejects malformed guest comments with 400 naming the field, and needs our Origin', async () => {
    const coil = await newCoil(team, 'Guest checks');
    const versionId = await newVersion(team, coil.id);
    const { token } = await share(versionId);
    for (const [body, field] of [
      [{ body: 'Hi' }, 'guestName'],
      [{ guestName: '  ', body: 'Hi' }, 'guestName'],
      [{ guestName: 'Gil' }, 'body'],
      [{ guestName: 'Gil', body: 'Hi', pin: { kind: 'tube', row: 'one', tube: 1 } }, 'pin.row'],
    ] as const) {
      const res = await guest().post(`/api/review/${token}/comments`).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields[field]).toBeDefined();
    }
    const foreign = await guest().post(`/api/review/${token}/comments`).set('Origin', 'http://evil.test').send({ guestName: 'Gil', body: 'Hi' });
    expect(foreign.status).toBe(403);
  });

  it('answers 404 for unknown, malformed, revoked and expired tokens, for reading and commenting', async () => {
    const coil = await newCoil(team, 'Dead links');
    const versionId = await newVersion(team, coil.id);
    const revoked = await share(versionId);
    const expiring = await share(versionId, { allowComments: true, expiresAt: new Date(Date.now() + HOUR).toISOString() });
    const unknown = 'A'.repeat(43);

    expect((await team.agents.reviewer.delete(`/api/share-links/${revoked.shareLink.id}`)).status).toBe(403);
    expect((await team.agents.viewer.delete(`/api/share-links/${revoked.shareLink.id}`)).status).toBe(403);
    expect((await team.agents.outsider.delete(`/api/share-links/${revoked.shareLink.id}`)).status).toBe(404);
    await guest().get(`/api/review/${revoked.token}`).expect(200);
    expect((await team.agents.owner.delete(`/api/share-links/${revoked.shareLink.id}`)).status).toBe(204);

    await guest().get(`/api/review/${expiring.token}`).expect(200);
    clockOffset = 2 * HOUR;
    try {
      for (const token of [revoked.token, expiring.token, unknown, 'short', `${revoked.token}x`]) {
        expect((await guest().get(`/api/review/${token}`)).status, token).toBe(404);
        expect((await guest().post(`/api/review/${token}/comments`).send({ guestName: 'Gil', body: 'Hi' })).status, token).toBe(404);
      }
      const links = shareLinkListReplySchema.parse((await team.agents.owner.get(`/api/coils/${coil.id}/share-links`)).body).shareLinks;
      const state = Object.fromEntries(links.map((l) => [l.id, l.state]));
      expect(state[revoked.shareLink.id]).toBe('revoked');
      expect(state[expiring.shareLink.id]).toBe('expired');
      // Dead links are not opened: the count stays where it was.
      expect(links.find((l) => l.id === revoked.shareLink.id)!.openCount).toBe(1);
    } finally {
      clockOffset = 0;
    }
    await guest().get(`/api/review/${expiring.token}`).expect(200);
    expect((await team.agents.owner.delete('/api/share-links/not-a-uuid')).status).toBe(404);
  });
});
