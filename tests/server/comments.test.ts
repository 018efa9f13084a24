import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { commentListReplySchema, commentReplySchema } from '@/lib/schema/api-versions';
import { startTestServer, type TestServer } from './helpers';
import { newCoil, newVersion, reviewTeam, ROLES, type ReviewTeam } from './review-fixtures';

describe('comments and notifications', () => {
  let server: TestServer;
  let team: ReviewTeam;

  beforeAll(async () => {
    server = await startTestServer();
    team = await reviewTeam(server);
  });
  afterAll(async () => {
    await server.close();
  });

  const mailsTo = async (email: string, subject: RegExp) => (await server.outbox()).filter((m) => m.to === email && subject.test(m.subject));

  it('lets owners, designers and reviewers comment (201); viewers read only (403); other teams get 404', async () => {
    const coil = await newCoil(team, 'Commented');
    const versionId = await newVersion(team, coil.id);
    const expected = { owner: 201, designer: 201, reviewer: 201, viewer: 403, outsider: 404 } as const;
    for (const who of Object.keys(expected) as (keyof typeof expected)[]) {
      const res = await team.agents[who].post(`/api/versions/${versionId}/comments`).send({ body: `From ${who}` });
      expect(res.status, who).toBe(expected[who]);
    }
    for (const role of ROLES) {
      const res = await team.agents[role].get(`/api/versions/${versionId}/comments`);
      expect(res.status, role).toBe(200);
      const { comments } = commentListReplySchema.parse(res.body);
      expect(comments.map((c) => c.body)).toEqual(['From owner', 'From designer', 'From reviewer']);
    }
    expect((await team.agents.outsider.get(`/api/versions/${versionId}/comments`)).status).toBe(404);
    expect((await team.agents.owner.get(`/api/versions/${team.outsiderVersionId}/comments`)).status).toBe(404);
    expect((await team.agents.owner.post(`/api/versions/${team.outsiderVersionId}/comments`).send({ body: 'x' })).status).toBe(404);
    const comment = commentListReplySchema.parse((await team.agents.viewer.get(`/api/versions/${versionId}/comments`)).body).comments[2];
    expect(comment.author).toEqual({ kind: 'member', id: team.users.reviewer.id, name: team.users.reviewer.name });
    expect(comment).toMatchObject({ parentId: null, pin: null, resolved: false, resolvedAt: null });
  });

  it('pins comments to a tube, a bend, a circuit or nothing, and refuses pins off this coil', async () => {
    const coil = await newCoil(team, 'Pinned');
    const versionId = await newVersion(team, coil.id);
    const pins = [
      { kind: 'tube', row: 2, tube: 8 },
      { kind: 'bend', end: 'opposite', a: { row: 1, tube: 1 }, b: { row: 2, tube: 1 } },
      { kind: 'circuit', index: 8 },
    ];
    for (const pin of pins) {
      const res = await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'Look here', pin });
      expect(res.status, pin.kind).toBe(201);
      expect(commentReplySchema.parse(res.body).comment.pin).toEqual(pin);
    }
    // 2 rows x 8 tubes and 8 circuits (the serpentine starting point): anything beyond is refused, naming the field.
    for (const [pin, field] of [
      [{ kind: 'tube', row: 3, tube: 1 }, 'pin.row'],
      [{ kind: 'tube', row: 1, tube: 9 }, 'pin.tube'],
      [{ kind: 'bend', end: 'opposite', a: { row: 1, tube: 1 }, b: { row: 1, tube: 99 } }, 'pin.b.tube'],
      [{ kind: 'circuit', index: 9 }, 'pin.index'],
      [{ kind: 'circuit', index: 0 }, 'pin.index'],
      [{ kind: 'tube', row: 0, tube: 1 }, 'pin.row'],
      [{ kind: 'bend', end: 'sideways', a: { row: 1, tube: 1 }, b: { row: 2, tube: 1 } }, 'pin.end'],
      [{ kind: 'pipe' }, 'pin.kind'],
    ] as const) {
      const res = await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'Off the sheet', pin });
      expect(res.status, JSON.stringify(pin)).toBe(400);
      expect(res.body.error.fields[field], JSON.stringify(res.body.error.fields)).toBeDefined();
    }
  });

  it('rejects malformed comment bodies with 400 naming the field', async () => {
    const coil = await newCoil(team, 'Malformed');
    const versionId = await newVersion(team, coil.id);
    for (const [body, field] of [
      [{}, 'body'],
      [{ body: '   ' }, 'body'],
      [{ body: 'x'.repeat(5001) }, 'body'],
      [{ body: 'ok', parentId: 'nope' }, 'parentId'],
    ] as const) {
      const res = await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields[field]).toBeDefined();
    }
  });

  it('threads replies under the first comment and refuses a parent from another version', async () => {
    const coil = await newCoil(team, 'Threads');
    const v1 = await newVersion(team, coil.id, 'one');
    const v2 = await newVersion(team, coil.id, 'two');
    const root = (await team.agents.reviewer.post(`/api/versions/${v1}/comments`).send({ body: 'Why 8 feeds?' }).expect(201)).body.comment;
    const reply = (await team.agents.designer.post(`/api/versions/${v1}/comments`).send({ body: 'Pressure drop.', parentId: root.id }).expect(201)).body.comment;
    expect(reply.parentId).toBe(root.id);
    const nested = await team.agents.owner.post(`/api/versions/${v1}/comments`).send({ body: 'Agreed.', parentId: reply.id });
    expect(nested.status).toBe(201);
    expect(nested.body.comment.parentId).toBe(root.id);
    const elsewhere = await team.agents.owner.post(`/api/versions/${v2}/comments`).send({ body: 'x', parentId: root.id });
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body.error.fields.parentId).toBeDefined();
  });

  it('resolves and reopens a thread (not a reply); viewers 403, other teams 404', async () => {
    const coil = await newCoil(team, 'Resolved');
    const versionId = await newVersion(team, coil.id);
    const root = (await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'Swap feeds 3 and 4' }).expect(201)).body.comment;
    const reply = (await team.agents.designer.post(`/api/versions/${versionId}/comments`).send({ body: 'Done', parentId: root.id }).expect(201)).body.comment;

    expect((await team.agents.viewer.patch(`/api/comments/${root.id}`).send({ resolved: true })).status).toBe(403);
    expect((await team.agents.outsider.patch(`/api/comments/${root.id}`).send({ resolved: true })).status).toBe(404);
    expect((await team.agents.owner.patch('/api/comments/not-a-uuid').send({ resolved: true })).status).toBe(404);
    const bad = await team.agents.designer.patch(`/api/comments/${root.id}`).send({ resolved: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.resolved).toBeDefined();
    const onReply = await team.agents.designer.patch(`/api/comments/${reply.id}`).send({ resolved: true });
    expect(onReply.status).toBe(400);

    const resolved = await team.agents.designer.patch(`/api/comments/${root.id}`).send({ resolved: true });
    expect(resolved.status).toBe(200);
    expect(resolved.body.comment).toMatchObject({ id: root.id, resolved: true, resolvedAt: expect.any(String) });
    const reopened = await team.agents.reviewer.patch(`/api/comments/${root.id}`).send({ resolved: false });
    expect(reopened.body.comment).toMatchObject({ resolved: false, resolvedAt: null });
    const list = commentListReplySchema.parse((await team.agents.viewer.get(`/api/versions/${versionId}/comments`)).body);
    expect(list.comments.find((c) => c.id === root.id)?.resolved).toBe(false);
  });

  describe('notification settings', () => {
    it('starts with every kind on, saves switches per user and validates the body', async () => {
      const { agents } = team;
      expect((await agents.viewer.get('/api/me/notifications')).body).toEqual({ settings: { reviewRequested: true, newComment: true, decision: true } });
      const off = { reviewRequested: false, newComment: true, decision: false };
      expect((await agents.viewer.put('/api/me/notifications').send(off)).body).toEqual({ settings: off });
      expect((await agents.viewer.get('/api/me/notifications')).body.settings).toEqual(off);
      expect((await agents.owner.get('/api/me/notifications')).body.settings.reviewRequested).toBe(true);
      const partial = await agents.viewer.put('/api/me/notifications').send({ reviewRequested: true });
      expect(partial.status).toBe(400);
      expect(Object.keys(partial.body.error.fields).sort()).toEqual(['decision', 'newComment']);
      expect((await server.client().get('/api/me/notifications')).status).toBe(401);
      await agents.viewer.put('/api/me/notifications').send({ reviewRequested: true, newComment: true, decision: true }).expect(200);
    });

    it('mails the coil creator and last editor about a new comment, not the commenter, and respects the switch', async () => {
      const coil = await newCoil(team, 'Mailed coil'); // created by the designer
      await team.agents.owner.put(`/api/coils/${coil.id}/draft`).send({ document: (await team.agents.owner.get(`/api/coils/${coil.id}`)).body.coil.document, revision: 1 }).expect(200);
      const versionId = await newVersion(team, coil.id);
      await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'Check circuit 3 velocity' }).expect(201);
      const subject = /^New comment on Mailed coil, version 1$/;
      const toDesigner = await mailsTo(team.users.designer.email, subject);
      const toOwner = await mailsTo(team.users.owner.email, subject);
      expect(toDesigner).toHaveLength(1);
      expect(toOwner).toHaveLength(1); // the last editor
      expect(toDesigner[0].text).toContain('Check circuit 3 velocity');
      expect(toDesigner[0].text).toContain(`/projects/${team.projectId}/coils/${coil.id}`);
      expect(await mailsTo(team.users.reviewer.email, subject)).toHaveLength(0);

      // The designer comments: the designer gets nothing, the owner (last editor) does.
      await team.agents.designer.post(`/api/versions/${versionId}/comments`).send({ body: 'Will do' }).expect(201);
      expect(await mailsTo(team.users.designer.email, subject)).toHaveLength(1);
      expect(await mailsTo(team.users.owner.email, subject)).toHaveLength(2);

      await team.agents.owner.put('/api/me/notifications').send({ reviewRequested: true, newComment: false, decision: true }).expect(200);
      await team.agents.reviewer.post(`/api/versions/${versionId}/comments`).send({ body: 'One more' }).expect(201);
      expect(await mailsTo(team.users.owner.email, subject)).toHaveLength(2);
      expect(await mailsTo(team.users.designer.email, subject)).toHaveLength(2);
      await team.agents.owner.put('/api/me/notifications').send({ reviewRequested: true, newComment: true, decision: true }).expect(200);
    });

    it('mails the version author about a decision, and respects the switch', async () => {
      const coil = await newCoil(team, 'Decision mail');
      const versionId = await newVersion(team, coil.id, 'For approval', 'designer');
      await team.agents.reviewer.post(`/api/versions/${versionId}/decisions`).send({ status: 'changes-requested', note: 'Add a feed' }).expect(201);
      const mails = await mailsTo(team.users.designer.email, /Decision mail, version 1$/);
      expect(mails).toHaveLength(1);
      expect(mails[0].subject).toBe('Changes requested: Decision mail, version 1');
      expect(mails[0].text).toContain('Add a feed');
      expect(mails[0].text).toContain(team.users.reviewer.name);

      await team.agents.designer.put('/api/me/notifications').send({ reviewRequested: true, newComment: true, decision: false }).expect(200);
      await team.agents.owner.post(`/api/versions/${versionId}/decisions`).send({ status: 'approved' }).expect(201);
      expect(await mailsTo(team.users.designer.email, /Decision mail, version 1$/)).toHaveLength(1);
      await team.agents.designer.put('/api/me/notifications').send({ reviewRequested: true, newComment: true, decision: true }).expect(200);

      // An owner deciding on their own version is not mailed about it.
      const own = await newVersion(team, coil.id, 'Mine', 'owner');
      await team.agents.owner.post(`/api/versions/${own}/decisions`).send({ status: 'approved' }).expect(201);
      expect(await mailsTo(team.users.owner.email, /Decision mail, version 2$/)).toHaveLength(0);
    });
  });
});
