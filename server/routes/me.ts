import { Router } from 'express';
import { updateMeBodySchema } from '@/lib/schema/api-auth';
import { signedIn } from '@/server/middleware/session';
import type { Services } from '@/server/services';

export function meRoutes(services: Services): Router {
  const r = Router();
  r.get('/', async (req, res) => {
    res.json(await services.accounts.me(signedIn(req).userId));
  });
  r.patch('/', async (req, res) => {
    const user = await services.accounts.updateMe(signedIn(req).userId, updateMeBodySchema.parse(req.body));
    res.json({ user });
  });
  return r;
}
