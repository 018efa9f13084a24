/**
 * CSRF defence: every state-changing request must come from our own origin. The Origin header (or, failing
 * that, the Referer's origin) must equal PUBLIC_ORIGIN or the origin the request was addressed to (Host).
 */
import type { Request, RequestHandler } from 'express';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

function requestOrigin(req: Request): string | undefined {
  const origin = req.get('origin');
  if (origin && origin !== 'null') return origin;
  const referer = req.get('referer');
  if (!referer) return undefined;
  try {
    return new URL(referer).origin;
  } catch {
    return undefined;
  }
}

export function originCheck(publicOrigin: string | undefined): RequestHandler {
  return (req, res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = requestOrigin(req);
    const own = `${req.protocol}://${req.get('host') ?? ''}`;
    if (origin && (origin === own || origin === publicOrigin)) return next();
    res.status(403).json({
      error: { code: 'bad_origin', message: 'This request did not come from the Tubeloom page, so it was refused.' },
    });
  };
}
