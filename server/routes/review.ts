/**
 * Review links: made, listed and revoked by members; opened and commented on by anyone holding the token
 * (no sign-in). Guest comments are rate limited per client.
 */
import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { createGuestCommentBodySchema, createShareLinkBodySchema } from '@/lib/schema/api-versions';
import type { Config } from '@/server/config';
import { signedIn } from '@/server/middleware/session';
import { appOrigin, param } from '@/server/routes/helpers';
import type { ReviewServices } from '@/server/services/review-services';

const guestCommentLimit = () =>
  rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 60,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many comments from here. Wait a few minutes and try again.' } });
    },
  });

export function reviewRoutes(services: ReviewServices, config: Config): Router {
  const r = Router();
  r.post('/versions/:versionId/share-links', async (req, res) => {
    const body = createShareLinkBodySchema.parse(req.body);
    res.status(201).json(await services.review.create(signedIn(req).userId, param(req, 'versionId'), body, appOrigin(req, config)));
  });
  r.get('/coils/:coilId/share-links', async (req, res) => {
    res.json({ shareLinks: await services.review.list(signedIn(req).userId, param(req, 'coilId')) });
  });
  r.delete('/share-links/:linkId', async (req, res) => {
    await services.review.revoke(signedIn(req).userId, param(req, 'linkId'));
    res.status(204).end();
  });
  r.get('/review/:token', async (req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    res.json(await services.review.open(param(req, 'token')));
  });
  r.post('/review/:token/comments', guestCommentLimit(), async (req, res) => {
    const body = createGuestCommentBodySchema.parse(req.body);
    res.status(201).json({ comment: await services.review.comment(param(req, 'token'), body, appOrigin(req, config)) });
  });
  return r;
}
