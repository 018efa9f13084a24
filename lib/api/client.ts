/**
 * The one fetch wrapper the app uses to call the server: same-origin, cookies included, JSON in and out.
 * Replies are parsed with a zod schema from lib/schema; errors become ApiError with the server's code,
 * message and per-field messages (DEVELOPERS.md, HTTP API).
 */
import type { z } from 'zod';

export interface ApiErrorBody { code: string; message: string; fields?: Record<string, string> }

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** Base URL: empty on the web (same origin); tests may set it. */
let baseUrl = '';
export function setApiBaseUrl(url: string): void {
  baseUrl = url.replace(/\/$/, '');
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export async function apiRequest<T>(method: Method, path: string, body?: unknown, schema?: z.ZodType<T>): Promise<T> {
  let res: Response;
  try {
    res = await fetch(`${baseUrl}${path}`, {
      method,
      credentials: 'include',
      headers: body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'offline', 'Cannot reach the Tubeloom server. Check your connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  let json: unknown = undefined;
  if (text) {
    try {
      json = JSON.parse(text);
    } catch {
      throw new ApiError(res.status, 'bad_reply', `The server answered ${res.status} with something that is not JSON.`);
    }
  }
  if (!res.ok) {
    const err = (json as { error?: ApiErrorBody } | undefined)?.error;
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `Request failed (${res.status}).`, err?.fields ?? {});
  }
  return schema ? schema.parse(json) : (json as T);
}

export const api = {
  get: <T>(path: string, schema?: z.ZodType<T>) => apiRequest<T>('GET', path, undefined, schema),
  post: <T>(path: string, body?: unknown, schema?: z.ZodType<T>) => apiRequest<T>('POST', path, body ?? {}, schema),
  put: <T>(path: string, body?: unknown, schema?: z.ZodType<T>) => apiRequest<T>('PUT', path, body ?? {}, schema),
  patch: <T>(path: string, body?: unknown, schema?: z.ZodType<T>) => apiRequest<T>('PATCH', path, body ?? {}, schema),
  delete: <T>(path: string, schema?: z.ZodType<T>) => apiRequest<T>('DELETE', path, undefined, schema),
};
