/** Reads the session cookie on every request and records who is signed in on `req.auth`. */
import type { Request, RequestHandler } from 'express';
import type { SessionAuth } from '@/server/auth/sessions';
import { notSignedIn } from '@/server/errors';

export interface RequestAuth {
  userId: string;
  sessionId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      auth?: RequestAuth;
    }
  }
}

export function sessionReader(auth: SessionAuth): RequestHandler {
  return async (req, res, next) => {
    const found = await auth.check(req.headers.cookie);
    if (found.setCookie) res.append('Set-Cookie', found.setCookie);
    if (found.userId !== null && 'sessionId' in found) req.auth = { userId: found.userId, sessionId: found.sessionId };
    next();
  };
}

/** The signed-in user, or 401. */
export function signedIn(req: Request): RequestAuth {
  if (!req.auth) throw notSignedIn();
  return req.auth;
}
