/**
 * A team with one member per role (designer creates the coil, so the designer is its creator) and an outsider with a
 * coil and a version of their own, for the version, review-link and comment tests.
 */
import { expect } from 'vitest';
import { startingPointDocument } from '@/lib/engine/starting-points';
import type { CoilDocument } from '@/lib/engine/types';
import { signUp, type Agent, type TestServer } from './helpers';

export const ROLES = ['owner', 'designer', 'reviewer', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
export type Who = Role | 'outsider';

export const documentOf = (name: string): CoilDocument => startingPointDocument('half-inch', { name, rows: 2, tubesPerRow: 8 });

export interface ReviewTeam {
  teamId: string;
  projectId: string;
  agents: Record<Who, Agent>;
  users: Record<Who, { id: string; email: string; name: string }>;
  outsiderCoilId: string;
  outsiderVersionId: string;
}

/** The token in the link of the newest captured mail to `to` whose text matches `pattern`. */
export async function linkIn(server: TestServer, to: string, pattern: RegExp): Promise<string | undefined> {
  const mail = (await server.outbox()).find((m) => m.to === to && pattern.test(m.text));
  return mail ? pattern.exec(mail.text)?.[1] : undefined;
}

export async function reviewTeam(server: TestServer): Promise<ReviewTeam> {
  const owner = await signUp(server, 'Orla Owner');
  const agents = { owner: owner.agent } as Record<Who, Agent>;
  const users = { owner: { ...owner.user, email: owner.email } } as ReviewTeam['users'];
  for (const role of ['designer', 'reviewer', 'viewer'] as const) {
    const member = await signUp(server, `Dana ${role}`);
    await owner.agent.post(`/api/teams/${owner.teamId}/invites`).send({ email: member.email, role }).expect(201);
    const token = await linkIn(server, member.email, /\/invite\/([\w-]+)/);
    await member.agent.post(`/api/invites/${token}/accept`).expect(200);
    agents[role] = member.agent;
    users[role] = { ...member.user, email: member.email };
  }
  const outsider = await signUp(server, 'Otto Outsider');
  agents.outsider = outsider.agent;
  users.outsider = { ...outsider.user, email: outsider.email };

  const project = await agents.owner.post(`/api/teams/${owner.teamId}/projects`).send({ name: 'Harbour Hall' }).expect(201);
  const outsiderProject = await outsider.agent.post(`/api/teams/${outsider.teamId}/projects`).send({ name: 'Elsewhere' }).expect(201);
  const outsiderCoil = await outsider.agent
    .post(`/api/projects/${outsiderProject.body.project.id}/coils`)
    .send({ name: 'Their coil', document: documentOf('Their coil') })
    .expect(201);
  const outsiderVersion = await outsider.agent
    .post(`/api/coils/${outsiderCoil.body.coil.id}/versions`)
    .send({ message: 'Theirs' })
    .expect(201);
  return {
    teamId: owner.teamId,
    projectId: project.body.project.id,
    agents,
    users,
    outsiderCoilId: outsiderCoil.body.coil.id,
    outsiderVersionId: outsiderVersion.body.version.id,
  };
}

/** A coil made by the designer in the team's project. */
export async function newCoil(team: ReviewTeam, name = 'AHU-7 cooling'): Promise<{ id: string; revision: number }> {
  const res = await team.agents.designer.post(`/api/projects/${team.projectId}/coils`).send({ name, document: documentOf(name) });
  expect(res.status).toBe(201);
  return res.body.coil;
}

export async function newVersion(team: ReviewTeam, coilId: string, message = 'First issue', who: Who = 'designer'): Promise<string> {
  const res = await team.agents[who].post(`/api/coils/${coilId}/versions`).send({ message });
  expect(res.status).toBe(201);
  return res.body.version.id;
}
