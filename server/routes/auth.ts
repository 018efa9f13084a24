import { Router } from 'express';
import { forgotPasswordBodySchema, resetPasswordBodySchema, signInBodySchema, signUpBodySchema } from '@/lib/schema/api-auth';
import type { Config } from '@/server/config';
import { signedIn } from '@/server/middleware/session';
import { appOrigin } from '@/server/routes/helpers';
import type { Services } from '@/server/services';

export function authRoutes(services: Services, config: Config): Router {
  const r = Router();
  r.post('/sign-up', async (req, res) => {
    const { user, cookie } = await services.accounts.signUp(signUpBodySchema.parse(req.body));
    res.status(201).append('Set-Cookie', cookie).json({ user });
  });
  r.post('/sign-in', async (req, res) => {
    const { user, cookie } = await services.accounts.signIn(signInBodySchema.parse(req.body));
    res.append('Set-Cookie', cookie).json({ user });
  });
  r.post('/sign-out', async (req, res) => {
    const cookie = await services.accounts.signOut(signedIn(req).sessionId);
    res.status(204).append('Set-Cookie', cookie).end();
  });
  r.post('/forgot-password', async (req, res) => {
    await services.accounts.forgotPassword(forgotPasswordBodySchema.parse(req.body).email, appOrigin(req, config));
    res.status(202).json({ ok: true });
  });
  r.post('/reset-password', async (req, res) => {
    const body = resetPasswordBodySchema.parse(req.body);
    await services.accounts.resetPassword(body.token, body.password);
    res.status(204).end();
  });
  return r;
}
