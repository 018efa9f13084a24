import type { Request } from 'express';
import type { Config } from '@/server/config';

/** Where links in mails point: PUBLIC_ORIGIN, or the origin this request was addressed to. */
export function appOrigin(req: Request, config: Config): string {
  return config.publicOrigin ?? `${req.protocol}://${req.get('host') ?? `${config.host}:${config.port}`}`;
}

/** A path parameter as one string (Express 5 types allow arrays for wildcards). */
export function param(req: Request, name: string): string {
  const value = req.params[name];
  return Array.isArray(value) ? value.join('/') : String(value ?? '');
}
