import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { latestDecisionPerCoil } from '@/db/queries/versions';
import { solveCoil } from '@/lib/engine/solve-coil';
import { compareReplySchema, versionListReplySchema, versionReplySchema } from '@/lib/schema/api-versions';
import { startTestServer, type TestServer } from './helpers';
import { documentOf, newCoil, newVersion, reviewTeam, ROLES, type ReviewTeam } from './review-fixtures';

describe('coil versions', () => {
  let server: TestServer;
  let team: ReviewTeam;

  beforeAll(async () => {
    server = await startTestServer();
    team = await reviewTeam(server);
  });
  afterAll(async () => {
    await server.close();
  });

  it('lets owners and designers save a version (201), refuses reviewers and viewers (403) and hides it from other teams (404)', async () => {
    const coil = await newCoil(team);
    const expected = { owner: 201, designer: 201, reviewer: 403, viewer: 403, outsider: 404 } as const;
    for (const who of Object.keys(expected) as (keyof typeof expected)[]) {
      const res = await team.agents[who].post(`/api/coils/${coil.id}/versions`).send({ message: `By ${who}` });
      expect(res.status, who).toBe(expected[who]);
    }
    const list = versionListReplySchema.parse((await team.agents.viewer.get(`/api/coils/${coil.id}/versions`).expect(200)).body);
    expect(list.versions.map((v) => [v.number, v.message])).toEqual([
      [2, 'By designer'],
      [1, 'By owner'],
    ]);
  });

  it('stores the draft with author, time and the solve summary of that moment', async () => {
    const coil = await newCoil(team, 'Summary coil');
    const res = await team.agents.designer.post(`/api/coils/${coil.id}/versions`).send({ message: '  Issued for review  ' });
    expect(res.status).toBe(201);
    const { version } = res.body;
    expect(version).toMatchObject({ number: 1, message: 'Issued for review', draftRevision: 1, latestDecision: null });
    expect(version.author).toEqual({ id: team.users.designer.id, name: team.users.designer.name });
    expect(Date.now() - Date.parse(version.createdAt)).toBeLessThan(60_000);
    // Reference: the engine's own solve of the same document (lib/engine/solve-coil.ts), taken here directly.
    const solved = solveCoil(documentOf('Summary coil'));
    expect(version.summary).toEqual({
      valid: solved.valid,
      capacity_W: solved.totals.capacity_W,
      waterPressureDrop_Pa: solved.totals.waterPressureDrop_Pa,
      airPressureDrop_Pa: solved.totals.airPressureDrop_Pa,
      circuitCount: solved.totals.circuitCount,
      warningCount: solved.warnings.length,
      errorCount: 0,
    });
    expect(version.summary.circuitCount).toBe(8); // serpentine starting point: one circuit per tube of the 8-high face
  });

  it('lists versions newest first for every member and 404 for another team', async () => {
    const coil = await newCoil(team, 'Listed');
    await newVersion(team, coil.id, 'one');
    await newVersion(team, coil.id, 'two');
    for (const role of ROLES) {
      const res = await team.agents[role].get(`/api/coils/${coil.id}/versions`);
      expect(res.status, role).toBe(200);
      expect(res.body.versions.map((v: { number: number }) => v.number)).toEqual([2, 1]);
      expect(res.body.versions[0]).not.toHaveProperty('document');
    }
    expect((await team.agents.outsider.get(`/api/coils/${coil.id}/versions`)).status).toBe(404);
    expect((await team.agents.owner.get(`/api/coils/${team.outsiderCoilId}/versions`)).status).toBe(404);
    expect((await team.agents.owner.get(`/api/versions/${team.outsiderVersionId}`)).status).toBe(404);
    expect((await team.agents.owner.get('/api/versions/not-a-uuid')).status).toBe(404);
  });

  it('keeps a version immutable when the draft changes afterwards, and has no delete route', async () => {
    const coil = await newCoil(team, 'Immutable');
    const versionId = await newVersion(team, coil.id);
    const edited = { ...documentOf('Immutable'), name: 'Edited later' };
    await team.agents.designer.put(`/api/coils/${coil.id}/draft`).send({ document: edited, revision: 1 }).expect(200);
    for (const role of ROLES) {
      const res = await team.agents[role].get(`/api/versions/${versionId}`);
      expect(res.status, role).toBe(200);
      const { version } = versionReplySchema.parse(res.body);
      expect(version.document).toEqual(documentOf('Immutable'));
      expect(version.draftRevision).toBe(1);
    }
    expect((await team.agents.owner.delete(`/api/versions/${versionId}`)).status).toBe(404);
    expect((await team.agents.owner.get(`/api/versions/${versionId}`)).status).toBe(200);
  });

  it('restores a version as a new draft revision for owners and designers only, overwriting no version', async () => {
    const coil = await newCoil(team, 'Restorable');
    const v1 = await newVersion(team, coil.id, 'original');
    const edited = { ...documentOf('Restorable'), name: 'Changed' };
    await team.agents.designer.put(`/api/coils/${coil.id}/draft`).send({ document: edited, revision: 1 }).expect(200);
    await newVersion(team, coil.id, 'changed');
    expect((await team.agents.reviewer.post(`/api/versions/${v1}/restore`)).status).toBe(403);
    expect((await team.agents.viewer.post(`/api/versions/${v1}/restore`)).status).toBe(403);
    expect((await team.agents.outsider.post(`/api/versions/${v1}/restore`)).status).toBe(404);

    const restored = await team.agents.owner.post(`/api/versions/${v1}/restore`);
    expect(restored.status).toBe(200);
    expect(restored.body).toEqual({ revision: 3, updatedAt: expect.any(String) });
    const again = await team.agents.designer.post(`/api/versions/${v1}/restore`);
    expect(again.body.revision).toBe(4);
    const draft = await team.agents.viewer.get(`/api/coils/${coil.id}`).expect(200);
    expect(draft.body.coil).toMatchObject({ revision: 4, document: documentOf('Restorable') });
    expect(draft.body.coil.summary.circuitCount).toBe(8);
    // An editor still holding revision 2 must reload rather than overwrite the restored draft.
    const stale = await team.agents.designer.put(`/api/coils/${coil.id}/draft`).send({ document: edited, revision: 2 });
    expect(stale.status).toBe(409);
    const list = await team.agents.viewer.get(`/api/coils/${coil.id}/versions`);
    expect(list.body.versions.map((v: { message: string }) => v.message)).toEqual(['changed', 'original']);
  });

  it('numbers versions 1..10 without gaps or repeats under 10 concurrent saves', async () => {
    const coil = await newCoil(team, 'Contested');
    const replies = await Promise.all(
      Array.from({ length: 10 }, (_, i) => team.agents[i % 2 ? 'owner' : 'designer'].post(`/api/coils/${coil.id}/versions`).send({ message: `Save ${i}` })),
    );
    expect(replies.map((r) => r.status)).toEqual(Array(10).fill(201));
    const numbers = replies.map((r) => r.body.version.number as number).sort((a, b) => a - b);
    expect(numbers).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    const list = await team.agents.viewer.get(`/api/coils/${coil.id}/versions`);
    expect(list.body.versions.map((v: { number: number }) => v.number)).toEqual([10, 9, 8, 7, 6, 5, 4, 3, 2, 1]);
  });

  it('rejects malformed bodies with 400 naming the field, and writes without our Origin with 403', async () => {
    const coil = await newCoil(team, 'Strict');
    for (const body of [{}, { message: '' }, { message: '   ' }, { message: 42 }, { message: 'x'.repeat(501) }]) {
      const res = await team.agents.designer.post(`/api/coils/${coil.id}/versions`).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields.message).toBeDefined();
    }
    const foreign = await team.agents.designer.post(`/api/coils/${coil.id}/versions`).set('Origin', 'http://evil.test').send({ message: 'x' });
    expect(foreign.status).toBe(403);
    expect(foreign.body.error.code).toBe('bad_origin');
    expect((await team.agents.viewer.get(`/api/coils/${coil.id}/versions`)).body.versions).toEqual([]);
    const anonymous = await server.client().post(`/api/coils/${coil.id}/versions`).send({ message: 'x' });
    expect(anonymous.status).toBe(401);
  });

  it('stores a given document as the version and leaves the draft and its revision untouched', async () => {
    const coil = await newCoil(team, 'Kept drawing');
    const theirs = { ...documentOf('Kept drawing'), name: 'Their edit' };
    await team.agents.owner.put(`/api/coils/${coil.id}/draft`).send({ document: theirs, revision: 1 }).expect(200);
    const mine = structuredClone(documentOf('Kept drawing'));
    mine.name = 'My edit';
    mine.circuiting.bends = mine.circuiting.bends.slice(1);
    const res = await team.agents.designer
      .post(`/api/coils/${coil.id}/versions`)
      .send({ message: 'Kept from a conflicting edit (draft revision 1)', document: mine });
    expect(res.status).toBe(201);
    expect(res.body.version).toMatchObject({ number: 1, message: 'Kept from a conflicting edit (draft revision 1)', draftRevision: 2 });
    // Reference: the engine's own solve of the kept document (lib/engine/solve-coil.ts), not of the draft.
    const solved = solveCoil(mine);
    expect(res.body.version.summary).toMatchObject({ valid: solved.valid, circuitCount: solved.totals.circuitCount, errorCount: solved.errors.length });
    const stored = versionReplySchema.parse((await team.agents.viewer.get(`/api/versions/${res.body.version.id}`).expect(200)).body);
    expect(stored.version.document).toEqual(mine);
    const draft = (await team.agents.viewer.get(`/api/coils/${coil.id}`).expect(200)).body.coil;
    expect(draft).toMatchObject({ revision: 2, document: theirs });
    // Without a document the draft (theirs) is what is stored.
    const plain = await team.agents.designer.post(`/api/coils/${coil.id}/versions`).send({ message: 'Draft at the time of a conflicting edit' }).expect(201);
    const drafted = versionReplySchema.parse((await team.agents.viewer.get(`/api/versions/${plain.body.version.id}`).expect(200)).body);
    expect(drafted.version.document).toEqual(theirs);
    expect((await team.agents.viewer.get(`/api/coils/${coil.id}`)).body.coil.revision).toBe(2);
  });

  it('rejects a malformed kept document with 400 naming the field, and viewers and reviewers with 403', async () => {
    const coil = await newCoil(team, 'Kept strictly');
    for (const document of ['not a coil', { name: 'half a coil' }, { ...documentOf('Kept strictly'), geometry: null }]) {
      const res = await team.agents.designer.post(`/api/coils/${coil.id}/versions`).send({ message: 'Kept', document });
      expect(res.status, JSON.stringify(document)).toBe(400);
      expect(Object.keys(res.body.error.fields).some((f) => f === 'document' || f.startsWith('document.')), JSON.stringify(res.body.error.fields)).toBe(true);
    }
    for (const who of ['viewer', 'reviewer'] as const) {
      const res = await team.agents[who].post(`/api/coils/${coil.id}/versions`).send({ message: 'Kept', document: documentOf('Kept strictly') });
      expect(res.status, who).toBe(403);
    }
    expect((await team.agents.viewer.get(`/api/coils/${coil.id}/versions`)).body.versions).toEqual([]);
    expect((await team.agents.viewer.get(`/api/coils/${coil.id}`)).body.coil.revision).toBe(1);
  });

  describe('compare', () => {
    it('reports added, removed and changed bends and stubs and the key results of both with differences', async () => {
      const coil = await newCoil(team, 'Compared');
      const a = await newVersion(team, coil.id, 'serpentine');
      const before = documentOf('Compared');
      const [first, second, ...rest] = before.circuiting.bends;
      const after = structuredClone(before);
      // Drop one bend, flag another as a crossover (and draw it b->a, which is the same bend), add a new one.
      after.circuiting.bends = [
        { ...second, a: second.b, b: second.a, crossover: true },
        ...rest,
        { end: 'connection', a: { row: 1, tube: 1 }, b: { row: 1, tube: 2 } },
      ];
      const movedReturn = { ...after.circuiting.return[0], end: after.circuiting.return[0].end === 'connection' ? ('opposite' as const) : ('connection' as const) };
      after.circuiting.return = [movedReturn, ...after.circuiting.return.slice(1)];
      after.conditions.fluid.massFlow_kg_s = before.conditions.fluid.massFlow_kg_s * 1.5;
      await team.agents.designer.put(`/api/coils/${coil.id}/draft`).send({ document: after, revision: 1 }).expect(200);
      const b = await newVersion(team, coil.id, 'rework');

      const res = await team.agents.viewer.get(`/api/versions/${a}/compare/${b}`);
      expect(res.status).toBe(200);
      const reply = compareReplySchema.parse(res.body);
      expect(reply.a.number).toBe(1);
      expect(reply.b.number).toBe(2);
      expect(reply.bends.removed).toEqual([first]);
      expect(reply.bends.added).toEqual([{ end: 'connection', a: { row: 1, tube: 1 }, b: { row: 1, tube: 2 } }]);
      expect(reply.bends.changed).toEqual([{ before: second, after: { ...second, a: second.b, b: second.a, crossover: true } }]);
      expect(reply.stubs.added).toEqual([]);
      expect(reply.stubs.removed).toEqual([]);
      expect(reply.stubs.changed).toEqual([{ before: { kind: 'return', stub: before.circuiting.return[0] }, after: { kind: 'return', stub: movedReturn } }]);
      expect(reply.settings).toEqual([
        { path: 'conditions.fluid.massFlow_kg_s', a: before.conditions.fluid.massFlow_kg_s, b: after.conditions.fluid.massFlow_kg_s },
      ]);
      // Reference values: the engine's own solve of each document (lib/engine/solve-coil.ts); difference = b - a.
      const ra = solveCoil(before);
      const rb = solveCoil(after);
      const errors = reply.results.find((r) => r.key === 'errorCount')!;
      expect(errors).toEqual({ key: 'errorCount', a: ra.errors.length, b: rb.errors.length, difference: rb.errors.length - ra.errors.length });
      const capacity = reply.results.find((r) => r.key === 'capacity_W')!;
      expect(capacity.a).toBeCloseTo(ra.totals.capacity_W!, 6);
      expect(capacity.b).toBe(rb.valid ? (rb.totals.capacity_W ?? null) : null);
      expect(capacity.difference).toBe(capacity.a !== null && capacity.b !== null ? capacity.b - capacity.a : null);
      expect(reply.results.map((r) => r.key)).toContain('airPressureDrop_Pa');
    });

    it('compares equal documents as no change with zero differences', async () => {
      const coil = await newCoil(team, 'Same');
      const a = await newVersion(team, coil.id, 'a');
      const b = await newVersion(team, coil.id, 'b');
      const reply = compareReplySchema.parse((await team.agents.reviewer.get(`/api/versions/${a}/compare/${b}`).expect(200)).body);
      expect(reply.bends).toEqual({ added: [], removed: [], changed: [] });
      expect(reply.stubs).toEqual({ added: [], removed: [], changed: [] });
      expect(reply.settings).toEqual([]);
      for (const r of reply.results) expect(r.difference, r.key).toBe(r.a === null ? null : 0);
    });

    it('answers 404 when the two versions belong to different teams, even for a member of both', async () => {
      const coil = await newCoil(team, 'Cross');
      const mine = await newVersion(team, coil.id);
      expect((await team.agents.owner.get(`/api/versions/${mine}/compare/${team.outsiderVersionId}`)).status).toBe(404);
      expect((await team.agents.outsider.get(`/api/versions/${mine}/compare/${team.outsiderVersionId}`)).status).toBe(404);
      // Let the owner into the outsider's team: reading both is now allowed, comparing across teams still is not.
      const outsiderTeam = (await team.agents.outsider.get('/api/me')).body.teams[0].id as string;
      await team.agents.outsider.post(`/api/teams/${outsiderTeam}/invites`).send({ email: team.users.owner.email, role: 'viewer' }).expect(201);
      const mail = (await server.outbox()).find((m) => m.to === team.users.owner.email && /\/invite\//.test(m.text))!;
      await team.agents.owner.post(`/api/invites/${/\/invite\/([\w-]+)/.exec(mail.text)![1]}/accept`).expect(200);
      expect((await team.agents.owner.get(`/api/versions/${team.outsiderVersionId}`)).status).toBe(200);
      expect((await team.agents.owner.get(`/api/versions/${mine}/compare/${team.outsiderVersionId}`)).status).toBe(404);
    });
  });

  describe('decisions', () => {
    it('lets reviewers and owners decide (201), refuses designers and viewers (403), 404 for another team', async () => {
      const coil = await newCoil(team, 'Decided');
      const versionId = await newVersion(team, coil.id);
      const expected = { reviewer: 201, owner: 201, designer: 403, viewer: 403, outsider: 404 } as const;
      for (const who of Object.keys(expected) as (keyof typeof expected)[]) {
        const res = await team.agents[who].post(`/api/versions/${versionId}/decisions`).send({ status: 'approved' });
        expect(res.status, who).toBe(expected[who]);
      }
      expect((await team.agents.reviewer.post(`/api/versions/${team.outsiderVersionId}/decisions`).send({ status: 'approved' })).status).toBe(404);
    });

    it('shows the newest decision as latestDecision in the version list and on the version', async () => {
      const coil = await newCoil(team, 'Latest');
      const v1 = await newVersion(team, coil.id, 'one');
      const v2 = await newVersion(team, coil.id, 'two');
      await team.agents.reviewer.post(`/api/versions/${v1}/decisions`).send({ status: 'approved' }).expect(201);
      const second = await team.agents.owner.post(`/api/versions/${v1}/decisions`).send({ status: 'changes-requested', note: ' Check the feeds ' });
      expect(second.status).toBe(201);
      expect(second.body.decision).toMatchObject({ status: 'changes-requested', note: 'Check the feeds', decidedBy: { id: team.users.owner.id } });
      const list = versionListReplySchema.parse((await team.agents.viewer.get(`/api/coils/${coil.id}/versions`)).body);
      const byId = new Map(list.versions.map((v) => [v.id, v]));
      expect(byId.get(v1)!.latestDecision).toMatchObject({ id: second.body.decision.id, status: 'changes-requested' });
      expect(byId.get(v2)!.latestDecision).toBeNull();
      const one = versionReplySchema.parse((await team.agents.viewer.get(`/api/versions/${v1}`)).body);
      expect(one.version.latestDecision?.status).toBe('changes-requested');
    });

    it('gives the coil list query the newest decision of each coil with its version number', async () => {
      const decided = await newCoil(team, 'Coil list A');
      const undecided = await newCoil(team, 'Coil list B');
      const v1 = await newVersion(team, decided.id, 'one');
      const v2 = await newVersion(team, decided.id, 'two');
      await newVersion(team, undecided.id, 'never decided');
      await team.agents.reviewer.post(`/api/versions/${v2}/decisions`).send({ status: 'changes-requested' }).expect(201);
      await team.agents.reviewer.post(`/api/versions/${v1}/decisions`).send({ status: 'approved' }).expect(201);
      const rows = await latestDecisionPerCoil(server.database.db, [decided.id, undecided.id]);
      expect(rows).toEqual([{ coilId: decided.id, versionId: v1, versionNumber: 1, status: 'approved', createdAt: expect.any(Date) }]);
      expect(await latestDecisionPerCoil(server.database.db, [])).toEqual([]);
    });

    it('shows each coil\'s newest decision in the project\'s coil list', async () => {
      const decided = await newCoil(team, 'Listed decided');
      const v1 = await newVersion(team, decided.id, 'one');
      await team.agents.reviewer.post(`/api/versions/${v1}/decisions`).send({ status: 'approved' }).expect(201);
      const coil = (await team.agents.viewer.get(`/api/coils/${decided.id}`).expect(200)).body.coil;
      const list = (await team.agents.viewer.get(`/api/projects/${coil.projectId}/coils`).expect(200)).body.coils as {
        id: string;
        latestDecision: { status: string; versionNumber: number } | null;
      }[];
      expect(list.find((c) => c.id === decided.id)!.latestDecision).toMatchObject({ status: 'approved', versionNumber: 1 });
      expect(list.filter((c) => c.id !== decided.id).every((c) => c.latestDecision === null || typeof c.latestDecision.status === 'string')).toBe(true);
    });

    it('rejects a malformed decision with 400 naming the field', async () => {
      const coil = await newCoil(team, 'Bad decision');
      const versionId = await newVersion(team, coil.id);
      for (const [body, field] of [
        [{}, 'status'],
        [{ status: 'maybe' }, 'status'],
        [{ status: 'approved', note: 7 }, 'note'],
      ] as const) {
        const res = await team.agents.reviewer.post(`/api/versions/${versionId}/decisions`).send(body);
        expect(res.status).toBe(400);
        expect(res.body.error.fields[field], JSON.stringify(body)).toBeDefined();
      }
    });
  });
});
