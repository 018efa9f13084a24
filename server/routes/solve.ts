import { Router } from 'express';
import { signedIn } from '@/server/middleware/session';
import { solveBody } from '@/server/routes/bodies';
import type { Services } from '@/server/services';

export function solveRoutes(services: Services): Router {
  const r = Router();
  // An invalid circuiting is data (valid: false, 200); only a malformed document is a 400.
  r.post('/', (req, res) => {
    signedIn(req);
    const body = solveBody.parse(req.body);
    res.json(services.solve(body.document, { turndown: body.turndown ?? true }));
  });
  return r;
}
