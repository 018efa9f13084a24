/** Builds the Express app (no listen): security headers, logs, JSON, origin check, sessions, API, web app. */
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Database } from '@/db/client';
import { solveCoil } from '@/lib/engine/solve-coil';
import { createSessionAuth } from '@/server/auth/sessions';
import type { Config } from '@/server/config';
import type { Logger } from '@/server/logger';
import type { Mailer } from '@/server/mail/mailer';
import { apiNotFound, createErrorHandler } from '@/server/middleware/error-handler';
import { originCheck } from '@/server/middleware/origin-check';
import { authRateLimit } from '@/server/middleware/rate-limit';
import { sessionReader } from '@/server/middleware/session';
import { staticSite } from '@/server/middleware/static-site';
import { apiRouter } from '@/server/routes';
import { attachmentRouter } from '@/server/routes/attachments';
import { exportRouter } from '@/server/routes/exports';
import { reviewApiRouter } from '@/server/routes/review-api';
import { createServices } from '@/server/services';
import { storageOrigin } from '@/server/storage/object-store';
import type { SolveFn } from '@/server/services/context';

export interface AppDeps {
  config: Config;
  db: Database;
  mailer: Mailer;
  logger: Logger;
  /** The authoritative solver (lib/engine); tests may pass another. */
  solve?: SolveFn;
  now?: () => Date;
}

/** The path as the client sent it (req.url is relative to the router that answered). */
const fullUrl = (req: { url?: string; originalUrl?: string }) => req.originalUrl ?? req.url ?? '';

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|localhost|::1)$/;

/** Secure cookies in production, except for a plain-HTTP loopback start (npm start) or an http:// PUBLIC_ORIGIN. */
function secureCookies(config: Config): boolean {
  if (!config.isProduction) return false;
  if (config.publicOrigin) return config.publicOrigin.startsWith('https://');
  return !LOOPBACK.test(config.host);
}

export function createApp(deps: AppDeps): Express {
  const { config, db, logger } = deps;
  const httpsOnly = config.isProduction && (config.publicOrigin?.startsWith('https://') ?? false);
  const auth = createSessionAuth(db, { secureCookie: secureCookies(config) });
  const serviceDeps = { ...deps, solve: deps.solve ?? solveCoil, auth };
  const services = createServices(serviceDeps);

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      strictTransportSecurity: httpsOnly,
      contentSecurityPolicy: {
        directives: {
          // blob: for previews of picked images and generated drawings in the browser; the object store for
          // attachment thumbnails, which are served through short-lived presigned links.
          imgSrc: ["'self'", 'data:', 'blob:', storageOrigin(config.s3)],
          ...(httpsOnly ? {} : { upgradeInsecureRequests: null }),
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
      // One short line per request: no headers (cookies), no stack for plain 5xx replies.
      serializers: {
        req: (req: { method: string; url: string; raw?: { originalUrl?: string } }) => ({ method: req.method, url: req.raw?.originalUrl ?? req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      customErrorMessage: (req, res) => `${req.method} ${fullUrl(req)} ${res.statusCode}`,
      customSuccessMessage: (req, res) => `${req.method} ${fullUrl(req)} ${res.statusCode}`,
      customAttributeKeys: { err: 'error' },
    }),
  );
  app.use('/api', express.json({ limit: '2mb' }));
  app.use('/api', originCheck(config.publicOrigin));
  app.use('/api/auth', authRateLimit(config.rateLimitAuthMax));
  app.use('/api', sessionReader(auth));
  app.use('/api', apiRouter(services, serviceDeps));
  // Versions, review links and comments; attachments (each its own module, sharing the service deps).
  app.use('/api', reviewApiRouter(serviceDeps));
  app.use('/api', attachmentRouter(serviceDeps));
  app.use('/api', exportRouter(serviceDeps));
  app.use('/api', apiNotFound);
  app.use(staticSite(config.distDir));
  app.use(createErrorHandler(logger));
  return app;
}
