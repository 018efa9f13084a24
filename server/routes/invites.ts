import { Router } from 'express';
import { signedIn } from '@/server/middleware/session';
import { param } from '@/server/routes/helpers';
import type { Services } from '@/server/services';

export function inviteRoutes(services: Services): Router {
  const r = Router();
  r.get('/:token', async (req, res) => {
    res.json(await services.teams.inviteDetails(param(req, 'token')));
  });
  r.post('/:token/accept', async (req, res) => {
    const team = await services.teams.acceptInvite(signedIn(req).userId, param(req, 'token'));
    res.json({ team });
  });
  return r;
}
