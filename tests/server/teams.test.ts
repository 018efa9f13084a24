import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signUp, startTestServer, type TestServer } from './helpers';

describe('teams, invitations and roles', () => {
  let server: TestServer;
  let owner: Awaited<ReturnType<typeof signUp>>;
  let invitee: Awaited<ReturnType<typeof signUp>>;
  let outsider: Awaited<ReturnType<typeof signUp>>;

  beforeAll(async () => {
    server = await startTestServer();
    owner = await signUp(server, 'Olga Owner');
    invitee = await signUp(server, 'Ivan Invitee');
    outsider = await signUp(server, 'Oscar Outsider');
  });
  afterAll(async () => {
    await server.close();
  });

  async function inviteToken(email: string, role: string): Promise<string> {
    const res = await owner.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email, role });
    expect(res.status).toBe(201);
    expect(res.body.invite).toMatchObject({ email: email.toLowerCase(), role });
    const mail = (await server.outbox()).find((m) => m.to === email.toLowerCase() && m.text.includes('/invite/'));
    expect(mail?.subject).toContain('Olga Owner');
    return /\/invite\/([\w-]+)/.exec(mail!.text)![1];
  }

  it('creates another team with the caller as owner', async () => {
    const res = await owner.agent.post('/api/teams').send({ name: 'Second shop' });
    expect(res.status).toBe(201);
    expect(res.body.team).toMatchObject({ name: 'Second shop', role: 'owner' });
    const bad = await owner.agent.post('/api/teams').send({ name: '  ' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.name).toBeDefined();
  });

  it('invites by mail; the invitee sees the invitation, accepts once and joins with the role', async () => {
    const token = await inviteToken(invitee.email, 'designer');
    const members = await owner.agent.get(`/api/teams/${owner.teamId}/members`);
    expect(members.body.invites).toEqual([{ id: expect.any(String), email: invitee.email, role: 'designer', expiresAt: expect.any(String) }]);

    const details = await request(server.app).get(`/api/invites/${token}`);
    expect(details.status).toBe(200);
    expect(details.body).toEqual({ teamName: "Olga Owner's team", email: invitee.email, role: 'designer' });

    expect((await server.client().post(`/api/invites/${token}/accept`)).status).toBe(401);
    const accept = await invitee.agent.post(`/api/invites/${token}/accept`);
    expect(accept.status).toBe(200);
    expect(accept.body.team).toEqual({ id: owner.teamId, name: "Olga Owner's team", role: 'designer' });

    const me = await invitee.agent.get('/api/me');
    expect(me.body.teams).toContainEqual({ id: owner.teamId, name: "Olga Owner's team", role: 'designer' });
    const after = await owner.agent.get(`/api/teams/${owner.teamId}/members`);
    expect(after.body.members).toContainEqual({ userId: invitee.user.id, email: invitee.email, name: 'Ivan Invitee', role: 'designer' });
    expect(after.body.invites).toEqual([]);

    // Single use: the link is gone for everyone.
    expect((await request(server.app).get(`/api/invites/${token}`)).status).toBe(404);
    expect((await outsider.agent.post(`/api/invites/${token}/accept`)).status).toBe(404);
  });

  it('lets only owners invite (designer 403, outsider 404) and validates the body', async () => {
    const byDesigner = await invitee.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: 'x@tubeloom.test', role: 'viewer' });
    expect(byDesigner.status).toBe(403);
    const byOutsider = await outsider.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: 'x@tubeloom.test', role: 'viewer' });
    expect(byOutsider.status).toBe(404);
    const bad = await owner.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: 'nope', role: 'admin' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['email', 'role']);
    const member = await owner.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: invitee.email, role: 'viewer' });
    expect(member.status).toBe(409);
  });

  it('answers 404 to unknown, malformed and expired invitations', async () => {
    expect((await request(server.app).get('/api/invites/not-a-real-token')).status).toBe(404);
    const past = await startTestServer({ reset: false, now: () => new Date(Date.now() - 8 * 24 * 60 * 60 * 1000) });
    try {
      const agent = past.client();
      await agent.post('/api/auth/sign-in').send({ email: owner.email, password: 'correct-horse-battery' }).expect(200);
      await agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: 'late@tubeloom.test', role: 'viewer' }).expect(201);
      const mail = (await past.outbox()).find((m) => m.to === 'late@tubeloom.test');
      const token = /\/invite\/([\w-]+)/.exec(mail!.text)![1];
      expect((await request(server.app).get(`/api/invites/${token}`)).status).toBe(404);
      expect((await outsider.agent.post(`/api/invites/${token}/accept`)).status).toBe(404);
    } finally {
      await past.close();
    }
  });

  it('lets members read the member list but not outsiders', async () => {
    expect((await invitee.agent.get(`/api/teams/${owner.teamId}/members`)).status).toBe(200);
    expect((await outsider.agent.get(`/api/teams/${owner.teamId}/members`)).status).toBe(404);
    expect((await outsider.agent.get('/api/teams/not-a-uuid/members')).status).toBe(404);
  });

  it('changes roles (owners only) and never leaves a team without an owner (409)', async () => {
    const res = await owner.agent.patch(`/api/teams/${owner.teamId}/members/${invitee.user.id}`).send({ role: 'reviewer' });
    expect(res.status).toBe(200);
    expect(res.body.member).toMatchObject({ userId: invitee.user.id, role: 'reviewer' });
    expect((await invitee.agent.patch(`/api/teams/${owner.teamId}/members/${owner.user.id}`).send({ role: 'viewer' })).status).toBe(403);
    const bad = await owner.agent.patch(`/api/teams/${owner.teamId}/members/${invitee.user.id}`).send({ role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toBeDefined();

    const demote = await owner.agent.patch(`/api/teams/${owner.teamId}/members/${owner.user.id}`).send({ role: 'designer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_owner');
    const remove = await owner.agent.delete(`/api/teams/${owner.teamId}/members/${owner.user.id}`);
    expect(remove.status).toBe(409);
    expect(remove.body.error.code).toBe('last_owner');

    // With a second owner, the first may step down.
    await owner.agent.patch(`/api/teams/${owner.teamId}/members/${invitee.user.id}`).send({ role: 'owner' }).expect(200);
    await owner.agent.patch(`/api/teams/${owner.teamId}/members/${owner.user.id}`).send({ role: 'designer' }).expect(200);
    expect((await invitee.agent.patch(`/api/teams/${owner.teamId}/members/${invitee.user.id}`).send({ role: 'viewer' })).status).toBe(409);
    await invitee.agent.patch(`/api/teams/${owner.teamId}/members/${owner.user.id}`).send({ role: 'owner' }).expect(200);
    expect((await owner.agent.patch(`/api/teams/${owner.teamId}/members/${outsider.user.id}`).send({ role: 'viewer' })).status).toBe(404);
  });

  it('removes members (owners only); the removed member loses access', async () => {
    expect((await outsider.agent.delete(`/api/teams/${owner.teamId}/members/${invitee.user.id}`)).status).toBe(404);
    await owner.agent.patch(`/api/teams/${owner.teamId}/members/${invitee.user.id}`).send({ role: 'designer' }).expect(200);
    expect((await invitee.agent.delete(`/api/teams/${owner.teamId}/members/${owner.user.id}`)).status).toBe(403);
    const res = await owner.agent.delete(`/api/teams/${owner.teamId}/members/${invitee.user.id}`);
    expect(res.status).toBe(204);
    expect((await invitee.agent.get(`/api/teams/${owner.teamId}/members`)).status).toBe(404);
    expect((await owner.agent.delete(`/api/teams/${owner.teamId}/members/${invitee.user.id}`)).status).toBe(404);
  });

  it('keeps exactly one owner when two owners demote each other at the same time', async () => {
    const token = await inviteToken(outsider.email, 'owner');
    await outsider.agent.post(`/api/invites/${token}/accept`).expect(200);
    const [a, b] = await Promise.all([
      owner.agent.patch(`/api/teams/${owner.teamId}/members/${outsider.user.id}`).send({ role: 'viewer' }),
      outsider.agent.patch(`/api/teams/${owner.teamId}/members/${owner.user.id}`).send({ role: 'viewer' }),
    ]);
    // The first change wins; the loser has just become a viewer, so it may no longer manage (re-checked under lock).
    expect([a.status, b.status].sort()).toEqual([200, 403]);
    const members = await owner.agent.get(`/api/teams/${owner.teamId}/members`);
    const list = members.status === 200 ? members.body.members : (await outsider.agent.get(`/api/teams/${owner.teamId}/members`)).body.members;
    expect(list.filter((m: { role: string }) => m.role === 'owner')).toHaveLength(1);
  });

  it('shows captured mail to owners (outbox)', async () => {
    const res = await owner.agent.get('/api/dev/outbox');
    expect(res.status).toBe(200);
    expect(res.body.messages.length).toBeGreaterThan(0);
    expect(res.body.messages[0]).toMatchObject({ id: expect.any(String), to: expect.any(String), subject: expect.any(String), sentAt: expect.any(String) });
    expect((await request(server.app).get('/api/dev/outbox')).status).toBe(401);
  });
});
