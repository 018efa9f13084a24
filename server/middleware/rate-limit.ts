/** Brakes password guessing and mail flooding: at most `max` requests to /api/auth/* per 15 minutes per client. */
import { rateLimit } from 'express-rate-limit';

export function authRateLimit(max: number) {
  return rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) => {
      res.status(429).json({
        error: { code: 'rate_limited', message: 'Too many sign-in attempts from here. Wait a few minutes and try again.' },
      });
    },
  });
}
