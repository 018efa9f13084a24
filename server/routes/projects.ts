import { Router } from 'express';
import { signedIn } from '@/server/middleware/session';
import { createCoilBody, projectPatchBody } from '@/server/routes/bodies';
import { param } from '@/server/routes/helpers';
import type { Services } from '@/server/services';

export function projectRoutes(services: Services): Router {
  const r = Router();
  r.get('/:projectId', async (req, res) => {
    res.json({ project: await services.projects.get(signedIn(req).userId, param(req, 'projectId')) });
  });
  r.patch('/:projectId', async (req, res) => {
    const project = await services.projects.update(signedIn(req).userId, param(req, 'projectId'), projectPatchBody.parse(req.body));
    res.json({ project });
  });
  r.delete('/:projectId', async (req, res) => {
    await services.projects.remove(signedIn(req).userId, param(req, 'projectId'));
    res.status(204).end();
  });
  r.get('/:projectId/coils', async (req, res) => {
    res.json({ coils: await services.coils.list(signedIn(req).userId, param(req, 'projectId')) });
  });
  r.post('/:projectId/coils', async (req, res) => {
    const coil = await services.coils.create(signedIn(req).userId, param(req, 'projectId'), createCoilBody.parse(req.body));
    res.status(201).json({ coil });
  });
  return r;
}
