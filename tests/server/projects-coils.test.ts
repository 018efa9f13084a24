import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startingPointDocument } from '@/lib/engine/starting-points';
import type { CoilDocument } from '@/lib/engine/types';
import { signUp, startTestServer, type Agent, type TestServer } from './helpers';

const ROLES = ['owner', 'designer', 'reviewer', 'viewer'] as const;
type Role = (typeof ROLES)[number];
const EDITORS: Role[] = ['owner', 'designer'];

const documentOf = (name: string): CoilDocument => startingPointDocument('half-inch', { name, rows: 2, tubesPerRow: 8 });

describe('projects and coils by role', () => {
  let server: TestServer;
  let teamId: string;
  const agents = {} as Record<Role | 'outsider', Agent>;
  let outsiderTeamId: string;

  beforeAll(async () => {
    server = await startTestServer();
    const owner = await signUp(server, 'Owen Owner');
    teamId = owner.teamId;
    agents.owner = owner.agent;
    for (const role of ['designer', 'reviewer', 'viewer'] as const) {
      const member = await signUp(server, `Member ${role}`);
      await owner.agent.post(`/api/teams/${teamId}/invites`).send({ email: member.email, role }).expect(201);
      const mail = (await server.outbox()).find((m) => m.to === member.email)!;
      await member.agent.post(`/api/invites/${/\/invite\/([\w-]+)/.exec(mail.text)![1]}/accept`).expect(200);
      agents[role] = member.agent;
    }
    const outsider = await signUp(server, 'Olive Outsider');
    agents.outsider = outsider.agent;
    outsiderTeamId = outsider.teamId;
  });
  afterAll(async () => {
    await server.close();
  });

  async function newProject(name = 'Project'): Promise<string> {
    const res = await agents.owner.post(`/api/teams/${teamId}/projects`).send({ name, client: 'Client Ltd' });
    expect(res.status).toBe(201);
    return res.body.project.id;
  }
  async function newCoil(projectId: string, name = 'Coil'): Promise<{ id: string; revision: number }> {
    const res = await agents.owner.post(`/api/projects/${projectId}/coils`).send({ name, document: documentOf(name) });
    expect(res.status).toBe(201);
    return res.body.coil;
  }

  it('creates a project with its fields and lists, searches and sorts them', async () => {
    const created = await agents.designer
      .post(`/api/teams/${teamId}/projects`)
      .send({ name: 'Alder Lane school', client: 'Zeta Estates', site: 'Alder Lane', notes: 'Two AHUs' });
    expect(created.status).toBe(201);
    expect(created.body.project).toMatchObject({
      teamId,
      name: 'Alder Lane school',
      client: 'Zeta Estates',
      site: 'Alder Lane',
      notes: 'Two AHUs',
      coilCount: 0,
      createdByName: 'Member designer',
      updatedByName: 'Member designer',
    });
    await agents.owner.post(`/api/teams/${teamId}/projects`).send({ name: 'Birch Court', client: 'Alpha Homes' }).expect(201);

    const byName = await agents.viewer.get(`/api/teams/${teamId}/projects?sort=name&dir=asc`);
    expect(byName.status).toBe(200);
    const names = byName.body.projects.map((p: { name: string }) => p.name);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    const byClient = await agents.viewer.get(`/api/teams/${teamId}/projects?sort=client&dir=desc`);
    expect(byClient.body.projects[0].client).toBe('Zeta Estates');
    const recent = await agents.viewer.get(`/api/teams/${teamId}/projects`);
    expect(recent.body.projects[0].name).toBe('Birch Court'); // default: most recently updated first
    const search = await agents.reviewer.get(`/api/teams/${teamId}/projects?q=alder`);
    expect(search.body.projects.map((p: { name: string }) => p.name)).toEqual(['Alder Lane school']);
    const wildcard = await agents.reviewer.get(`/api/teams/${teamId}/projects?q=%25`);
    expect(wildcard.body.projects).toEqual([]);
    const badSort = await agents.reviewer.get(`/api/teams/${teamId}/projects?sort=size`);
    expect(badSort.status).toBe(400);
    expect(badSort.body.error.fields.sort).toBeDefined();
  });

  it('rejects malformed project and coil bodies with 400 naming the fields', async () => {
    const project = await agents.owner.post(`/api/teams/${teamId}/projects`).send({ name: '', client: 42 });
    expect(project.status).toBe(400);
    expect(Object.keys(project.body.error.fields).sort()).toEqual(['client', 'name']);
    const projectId = await newProject();
    const broken = documentOf('Broken');
    const badDoc = { ...broken, geometry: { ...broken.geometry, rows: 0 } };
    const coil = await agents.owner.post(`/api/projects/${projectId}/coils`).send({ name: 'X', document: badDoc });
    expect(coil.status).toBe(400);
    expect(coil.body.error.fields['document.geometry.rows']).toBeDefined();
    const empty = await agents.owner.patch(`/api/projects/${projectId}`).send({});
    expect(empty.status).toBe(400);
  });

  for (const role of ROLES) {
    const mayEdit = EDITORS.includes(role);
    it(`${role}: reads everything; ${mayEdit ? 'may' : 'may not (403)'} create, edit and delete projects, coils and drafts`, async () => {
      const agent = agents[role];
      const projectId = await newProject(`For ${role}`);
      const coil = await newCoil(projectId, `Coil for ${role}`);

      expect((await agent.get(`/api/teams/${teamId}/projects`)).status).toBe(200);
      expect((await agent.get(`/api/projects/${projectId}`)).status).toBe(200);
      const list = await agent.get(`/api/projects/${projectId}/coils`);
      expect(list.status).toBe(200);
      expect(list.body.coils[0]).toMatchObject({ id: coil.id, rows: 2, tubesPerRow: 8, revision: 1 });
      const got = await agent.get(`/api/coils/${coil.id}`);
      expect(got.status).toBe(200);
      expect(got.body.coil.document.geometry.rows).toBe(2);

      const expectWrite = (status: number, okStatus: number) => expect(status).toBe(mayEdit ? okStatus : 403);
      expectWrite((await agent.post(`/api/teams/${teamId}/projects`).send({ name: 'New' })).status, 201);
      expectWrite((await agent.patch(`/api/projects/${projectId}`).send({ notes: 'changed' })).status, 200);
      expectWrite((await agent.post(`/api/projects/${projectId}/coils`).send({ name: 'New coil', document: documentOf('New coil') })).status, 201);
      expectWrite((await agent.put(`/api/coils/${coil.id}/draft`).send({ document: documentOf('Edited'), revision: 1 })).status, 200);
      expectWrite((await agent.patch(`/api/coils/${coil.id}`).send({ name: 'Renamed' })).status, 200);
      expectWrite((await agent.post(`/api/coils/${coil.id}/duplicate`)).status, 201);
      expectWrite((await agent.delete(`/api/coils/${coil.id}`)).status, 204);
      expectWrite((await agent.delete(`/api/projects/${projectId}`)).status, 204);
    });
  }

  it("outsider: another team's projects and coils are 404 on every route", async () => {
    const agent = agents.outsider;
    const projectId = await newProject('Private');
    const coil = await newCoil(projectId, 'Private coil');
    const statuses = [
      (await agent.get(`/api/teams/${teamId}/projects`)).status,
      (await agent.post(`/api/teams/${teamId}/projects`).send({ name: 'Intruder' })).status,
      (await agent.get(`/api/projects/${projectId}`)).status,
      (await agent.patch(`/api/projects/${projectId}`).send({ name: 'x' })).status,
      (await agent.delete(`/api/projects/${projectId}`)).status,
      (await agent.get(`/api/projects/${projectId}/coils`)).status,
      (await agent.post(`/api/projects/${projectId}/coils`).send({ name: 'x', document: documentOf('x') })).status,
      (await agent.get(`/api/coils/${coil.id}`)).status,
      (await agent.put(`/api/coils/${coil.id}/draft`).send({ document: documentOf('x'), revision: 1 })).status,
      (await agent.patch(`/api/coils/${coil.id}`).send({ name: 'x' })).status,
      (await agent.post(`/api/coils/${coil.id}/duplicate`)).status,
      (await agent.delete(`/api/coils/${coil.id}`)).status,
    ];
    expect(statuses).toEqual(Array(statuses.length).fill(404));
    // The outsider's own team works, and unknown or malformed ids are 404 too.
    expect((await agent.get(`/api/teams/${outsiderTeamId}/projects`)).status).toBe(200);
    expect((await agent.get('/api/projects/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    expect((await agent.get('/api/coils/not-an-id')).status).toBe(404);
    // Signed out: 401.
    expect((await request(server.app).get(`/api/projects/${projectId}`)).status).toBe(401);
  });

  it('stores the solver summary with the coil and lists it', async () => {
    const projectId = await newProject('Summary');
    const coil = await newCoil(projectId, 'Summarised');
    const got = await agents.viewer.get(`/api/coils/${coil.id}`);
    expect(got.body.coil.summary).toMatchObject({ rows: 2, tubesPerRow: 8, circuitCount: 8, valid: true, warningCount: expect.any(Number) });
    const list = await agents.viewer.get(`/api/projects/${projectId}/coils`);
    expect(list.body.coils[0]).toMatchObject({ circuitCount: 8, revision: 1 });
    const project = await agents.viewer.get(`/api/projects/${projectId}`);
    expect(project.body.project.coilCount).toBe(1);
  });

  it('duplicates a coil as a new coil at revision 1 with the same document', async () => {
    const projectId = await newProject('Duplicate');
    const coil = await newCoil(projectId, 'Original');
    const res = await agents.designer.post(`/api/coils/${coil.id}/duplicate`);
    expect(res.status).toBe(201);
    expect(res.body.coil).toMatchObject({ projectId, name: 'Original (copy)', revision: 1 });
    expect(res.body.coil.id).not.toBe(coil.id);
    expect(res.body.coil.document).toEqual(documentOf('Original'));
  });

  it('saves drafts race-free: of 20 parallel saves from one revision exactly one wins, the rest get 409 stale_revision', async () => {
    const projectId = await newProject('Race');
    const coil = await newCoil(projectId, 'Contested');
    const saves = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        agents.designer.put(`/api/coils/${coil.id}/draft`).send({ document: { ...documentOf('Contested'), name: `Edit ${i}` }, revision: 1 }),
      ),
    );
    const ok = saves.filter((r) => r.status === 200);
    const stale = saves.filter((r) => r.status === 409);
    expect(ok).toHaveLength(1);
    expect(stale).toHaveLength(19);
    expect(ok[0].body).toEqual({ revision: 2, updatedAt: expect.any(String) });
    for (const r of stale) {
      expect(r.body.error.code).toBe('stale_revision');
      expect(r.body.error.fields.revision).toBe('2');
    }
    // The stored document is the winner's.
    const winner = saves.indexOf(ok[0]);
    const stored = await agents.viewer.get(`/api/coils/${coil.id}`);
    expect(stored.body.coil.document.name).toBe(`Edit ${winner}`);
    expect(stored.body.coil.revision).toBe(2);

    // Sequential saves: revisions are contiguous.
    let revision = 2;
    for (let i = 0; i < 5; i++) {
      const res = await agents.owner.put(`/api/coils/${coil.id}/draft`).send({ document: documentOf(`Step ${i}`), revision });
      expect(res.status).toBe(200);
      expect(res.body.revision).toBe(revision + 1);
      revision = res.body.revision;
    }
    const old = await agents.owner.put(`/api/coils/${coil.id}/draft`).send({ document: documentOf('Old'), revision: 3 });
    expect(old.status).toBe(409);
    expect(old.body.error.message).toContain('revision 7');
    const bad = await agents.owner.put(`/api/coils/${coil.id}/draft`).send({ document: documentOf('x') });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.revision).toBeDefined();
  });
});

describe('POST /api/solve', () => {
  let server: TestServer;
  let agent: Agent;
  beforeAll(async () => {
    server = await startTestServer({ reset: false });
    agent = (await signUp(server, 'Sol Ver')).agent;
  });
  afterAll(async () => {
    await server.close();
  });

  it('needs a signed-in user (401)', async () => {
    const res = await server.client().post('/api/solve').send({ document: documentOf('x') });
    expect(res.status).toBe(401);
  });

  it('answers 400 naming the fields of a malformed document', async () => {
    const doc = documentOf('Bad');
    const res = await agent.post('/api/solve').send({
      document: { ...doc, geometry: { ...doc.geometry, tubesPerRow: 2.5 }, conditions: { ...doc.conditions, minimumFlowFraction: 'x' } },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['document.geometry.tubesPerRow']);
    expect(res.body.error.fields).toHaveProperty(['document.conditions.minimumFlowFraction']);
    expect((await agent.post('/api/solve').send({})).body.error.fields).toHaveProperty(['document']);
  });

  it('solves a valid document (200) and reports an invalid circuiting as data (200, valid: false)', async () => {
    const doc = documentOf('Good');
    const res = await agent.post('/api/solve').send({ document: doc });
    expect(res.status).toBe(200);
    expect(res.body.valid).toBe(true);
    expect(res.body.totals.circuitCount).toBe(8);
    expect(res.body.circuits).toHaveLength(8);

    const open = await agent.post('/api/solve').send({ document: { ...doc, circuiting: { ...doc.circuiting, supply: [] } } });
    expect(open.status).toBe(200);
    expect(open.body.valid).toBe(false);
    expect(open.body.errors.length).toBeGreaterThan(0);
  });
});
