import { Router } from 'express';
import type { Config } from '@/server/config';
import { signedIn } from '@/server/middleware/session';
import { createTeamBody, inviteBody, projectBody, projectListQuery, roleBody } from '@/server/routes/bodies';
import { appOrigin, param } from '@/server/routes/helpers';
import type { Services } from '@/server/services';

export function teamRoutes(services: Services, config: Config): Router {
  const r = Router();
  r.post('/', async (req, res) => {
    const team = await services.teams.create(signedIn(req).userId, createTeamBody.parse(req.body).name);
    res.status(201).json({ team });
  });
  r.get('/:teamId/members', async (req, res) => {
    res.json(await services.teams.members(signedIn(req).userId, param(req, 'teamId')));
  });
  r.post('/:teamId/invites', async (req, res) => {
    const { email, role } = inviteBody.parse(req.body);
    const invite = await services.teams.invite(signedIn(req).userId, param(req, 'teamId'), email, role, appOrigin(req, config));
    res.status(201).json({ invite });
  });
  r.patch('/:teamId/members/:userId', async (req, res) => {
    const { role } = roleBody.parse(req.body);
    const member = await services.teams.changeRole(signedIn(req).userId, param(req, 'teamId'), param(req, 'userId'), role);
    res.json({ member });
  });
  r.delete('/:teamId/members/:userId', async (req, res) => {
    await services.teams.removeMember(signedIn(req).userId, param(req, 'teamId'), param(req, 'userId'));
    res.status(204).end();
  });
  r.get('/:teamId/projects', async (req, res) => {
    const query = projectListQuery.parse(req.query);
    const sort = query.sort ?? 'updatedAt';
    const dir = query.dir ?? (sort === 'updatedAt' ? 'desc' : 'asc');
    const projects = await services.projects.list(signedIn(req).userId, param(req, 'teamId'), { q: query.q, sort, dir });
    res.json({ projects });
  });
  r.post('/:teamId/projects', async (req, res) => {
    const project = await services.projects.create(signedIn(req).userId, param(req, 'teamId'), projectBody.parse(req.body));
    res.status(201).json({ project });
  });
  return r;
}
