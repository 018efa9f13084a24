/** Members' comments on versions, and their e-mail notification switches (DEVELOPERS.md, HTTP API). */
import { Router } from 'express';
import { createCommentBodySchema, notificationSettingsSchema, updateCommentBodySchema } from '@/lib/schema/api-versions';
import type { Config } from '@/server/config';
import { signedIn } from '@/server/middleware/session';
import { appOrigin, param } from '@/server/routes/helpers';
import type { ReviewServices } from '@/server/services/review-services';

export function commentRoutes(services: ReviewServices, config: Config): Router {
  const r = Router();
  r.get('/versions/:versionId/comments', async (req, res) => {
    res.json({ comments: await services.comments.list(signedIn(req).userId, param(req, 'versionId')) });
  });
  r.post('/versions/:versionId/comments', async (req, res) => {
    const body = createCommentBodySchema.parse(req.body);
    const comment = await services.comments.create(signedIn(req).userId, param(req, 'versionId'), body, appOrigin(req, config));
    res.status(201).json({ comment });
  });
  r.patch('/comments/:commentId', async (req, res) => {
    const { resolved } = updateCommentBodySchema.parse(req.body);
    res.json({ comment: await services.comments.setResolved(signedIn(req).userId, param(req, 'commentId'), resolved) });
  });
  r.get('/me/notifications', async (req, res) => {
    res.json({ settings: await services.notifications.settings(signedIn(req).userId) });
  });
  r.put('/me/notifications', async (req, res) => {
    const settings = notificationSettingsSchema.parse(req.body);
    res.json({ settings: await services.notifications.saveSettings(signedIn(req).userId, settings) });
  });
  return r;
}
