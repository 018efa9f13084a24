import { Router } from 'express';
import { signedIn } from '@/server/middleware/session';
import { draftBody, renameCoilBody } from '@/server/routes/bodies';
import { param } from '@/server/routes/helpers';
import type { Services } from '@/server/services';

export function coilRoutes(services: Services): Router {
  const r = Router();
  r.get('/:coilId', async (req, res) => {
    res.json({ coil: await services.coils.get(signedIn(req).userId, param(req, 'coilId')) });
  });
  r.put('/:coilId/draft', async (req, res) => {
    res.json(await services.coils.saveDraft(signedIn(req).userId, param(req, 'coilId'), draftBody.parse(req.body)));
  });
  r.patch('/:coilId', async (req, res) => {
    const coil = await services.coils.rename(signedIn(req).userId, param(req, 'coilId'), renameCoilBody.parse(req.body).name);
    res.json({ coil });
  });
  r.post('/:coilId/duplicate', async (req, res) => {
    res.status(201).json({ coil: await services.coils.duplicate(signedIn(req).userId, param(req, 'coilId')) });
  });
  r.delete('/:coilId', async (req, res) => {
    await services.coils.remove(signedIn(req).userId, param(req, 'coilId'));
    res.status(204).end();
  });
  return r;
}
