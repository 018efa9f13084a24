/**
 * The one error middleware: zod errors -> 400 with per-field messages, AppError -> its status and code,
 * body-parser errors -> 400/413, anything else -> 500 with a generic message (logged, never echoed).
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { AppError } from '@/server/errors';
import type { Logger } from '@/server/logger';

/** Dotted path -> first message for that path (`geometry.fin.pitch_m`, `circuiting.bends.3.a.row`). */
export function zodFieldMessages(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join('.') || '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

interface HttpishError { status?: unknown; type?: unknown; expose?: unknown }

export function createErrorHandler(logger: Logger): ErrorRequestHandler {
  return (err: unknown, req, res, next) => {
    if (res.headersSent) return next(err);
    if (err instanceof ZodError) {
      const fields = zodFieldMessages(err);
      const first = Object.entries(fields)[0];
      const message = first ? `Check ${first[0] === '_' ? 'the request' : first[0]}: ${first[1]}` : 'The request is not valid.';
      res.status(400).json({ error: { code: 'invalid_input', message, fields } });
      return;
    }
    if (err instanceof AppError) {
      res.status(err.status).json({ error: { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } });
      return;
    }
    const h = (typeof err === 'object' && err !== null ? err : {}) as HttpishError;
    if (h.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'bad_json', message: 'The request body is not valid JSON.' } });
      return;
    }
    if (h.type === 'entity.too.large') {
      res.status(413).json({ error: { code: 'too_large', message: 'The request body is too large.' } });
      return;
    }
    if (typeof h.status === 'number' && h.status >= 400 && h.status < 500 && h.expose === true) {
      res.status(h.status).json({ error: { code: 'bad_request', message: 'The request could not be read.' } });
      return;
    }
    logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server. Try again in a moment.' } });
  };
}

/** Unknown routes under /api answer JSON, not the web app. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({ error: { code: 'not_found', message: `No API route ${req.method} ${req.originalUrl}.` } });
};
