/** Versions of a coil, compare, restore and decisions (DEVELOPERS.md, HTTP API). */
import { Router } from 'express';
import { createDecisionBodySchema, createVersionBodySchema } from '@/lib/schema/api-versions';
import type { Config } from '@/server/config';
import { signedIn } from '@/server/middleware/session';
import { appOrigin, param } from '@/server/routes/helpers';
import type { ReviewServices } from '@/server/services/review-services';

export function versionRoutes(services: ReviewServices, config: Config): Router {
  const r = Router();
  r.post('/coils/:coilId/versions', async (req, res) => {
    const { message, document } = createVersionBodySchema.parse(req.body);
    res.status(201).json({ version: await services.versions.create(signedIn(req).userId, param(req, 'coilId'), message, document) });
  });
  r.get('/coils/:coilId/versions', async (req, res) => {
    res.json({ versions: await services.versions.list(signedIn(req).userId, param(req, 'coilId')) });
  });
  r.get('/versions/:versionId', async (req, res) => {
    res.json({ version: await services.versions.get(signedIn(req).userId, param(req, 'versionId')) });
  });
  r.post('/versions/:versionId/restore', async (req, res) => {
    res.json(await services.versions.restore(signedIn(req).userId, param(req, 'versionId')));
  });
  r.get('/versions/:a/compare/:b', async (req, res) => {
    res.json(await services.versions.compare(signedIn(req).userId, param(req, 'a'), param(req, 'b')));
  });
  r.post('/versions/:versionId/decisions', async (req, res) => {
    const body = createDecisionBodySchema.parse(req.body);
    const decision = await services.versions.decide(signedIn(req).userId, param(req, 'versionId'), body, appOrigin(req, config));
    res.status(201).json({ decision });
  });
  return r;
}
