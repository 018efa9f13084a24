/** All /api routes. Each handler: parse with zod, call one service, reply. */
import { Router } from 'express';
import { signedIn } from '@/server/middleware/session';
import { authRoutes } from '@/server/routes/auth';
import { coilRoutes } from '@/server/routes/coils';
import { inviteRoutes } from '@/server/routes/invites';
import { meRoutes } from '@/server/routes/me';
import { projectRoutes } from '@/server/routes/projects';
import { solveRoutes } from '@/server/routes/solve';
import { teamRoutes } from '@/server/routes/teams';
import type { Services } from '@/server/services';
import type { ServiceDeps } from '@/server/services/context';

export function apiRouter(services: Services, deps: ServiceDeps): Router {
  const { config } = deps;
  const r = Router();
  r.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  r.use('/auth', authRoutes(services, config));
  r.use('/me', meRoutes(services));
  r.use('/teams', teamRoutes(services, config));
  r.use('/invites', inviteRoutes(services));
  r.use('/projects', projectRoutes(services));
  r.use('/coils', coilRoutes(services));
  r.use('/solve', solveRoutes(services));
  r.get('/dev/outbox', async (req, res) => {
    res.json({ messages: await services.outbox.list(signedIn(req).userId) });
  });
  return r;
}
