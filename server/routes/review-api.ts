/** Everything about versions and their review, mounted on /api next to the core routes (server/routes/index.ts). */
import { Router } from 'express';
import { commentRoutes } from '@/server/routes/comments';
import { reviewRoutes } from '@/server/routes/review';
import { versionRoutes } from '@/server/routes/versions';
import type { ServiceDeps } from '@/server/services/context';
import { createReviewServices } from '@/server/services/review-services';

export function reviewApiRouter(deps: ServiceDeps): Router {
  const services = createReviewServices(deps);
  const r = Router();
  r.use(versionRoutes(services, deps.config));
  r.use(commentRoutes(services, deps.config));
  r.use(reviewRoutes(services, deps.config));
  return r;
}

