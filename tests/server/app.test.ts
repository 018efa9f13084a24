import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sql } from 'drizzle-orm';
import { z } from 'zod';
import { AppError } from '@/server/errors';
import { createLogger } from '@/server/logger';
import { createErrorHandler } from '@/server/middleware/error-handler';
import { ORIGIN, startTestServer, type TestServer } from './helpers';

describe('app skeleton', () => {
  let server: TestServer;
  let dist: string;

  beforeAll(async () => {
    dist = fs.mkdtempSync(path.join(os.tmpdir(), 'tubeloom-dist-'));
    fs.mkdirSync(path.join(dist, '_expo', 'static', 'js', 'web'), { recursive: true });
    fs.writeFileSync(path.join(dist, 'index.html'), '<!doctype html><title>Tubeloom</title><div id="root"></div>');
    fs.writeFileSync(path.join(dist, '_expo', 'static', 'js', 'web', 'entry-0123456789abcdef0123.js'), 'console.log(1)');
    fs.writeFileSync(path.join(dist, 'favicon.ico'), 'icon');
    fs.mkdirSync(path.join(dist, 'assets'), { recursive: true });
    fs.writeFileSync(path.join(dist, 'assets', 'close-icon.808e1b1b9b53114ec2838071a7e6daa7@2x.png'), 'png');
    server = await startTestServer({ env: { DIST_DIR: dist } });
  });
  afterAll(async () => {
    await server.close();
    fs.rmSync(dist, { recursive: true, force: true });
  });

  it('answers the health check', async () => {
    const res = await request(server.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });

  it('answers unknown API routes with a JSON 404, never the web app', async () => {
    const res = await request(server.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
    const post = await request(server.app).post('/api/nothing/here').set('Origin', ORIGIN).send({});
    expect(post.status).toBe(404);
  });

  it('serves index.html for deep links and / with no-cache', async () => {
    for (const url of ['/', '/projects/abc/coils/def', '/sign-in']) {
      const res = await request(server.app).get(url);
      expect(res.status).toBe(200);
      expect(res.text).toContain('<div id="root">');
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('serves hashed bundles as immutable and other files revalidated', async () => {
    const js = await request(server.app).get('/_expo/static/js/web/entry-0123456789abcdef0123.js');
    expect(js.status).toBe(200);
    expect(js.headers['cache-control']).toContain('immutable');
    const retina = await request(server.app).get('/assets/close-icon.808e1b1b9b53114ec2838071a7e6daa7@2x.png');
    expect(retina.headers['cache-control']).toContain('immutable');
    const icon = await request(server.app).get('/favicon.ico');
    expect(icon.headers['cache-control']).toBe('no-cache');
  });

  it('sends security headers without HSTS or upgrade-insecure-requests outside production https', async () => {
    const res = await request(server.app).get('/');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toBeDefined();
    expect(res.headers['content-security-policy']).not.toContain('upgrade-insecure-requests');
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(res.headers['content-security-policy']).toContain("img-src 'self' data: blob:");
  });

  it('refuses state-changing requests without our Origin (403 bad_origin)', async () => {
    const body = { email: 'x@tubeloom.test', password: 'whatever-long' };
    const none = await request(server.app).post('/api/auth/sign-in').send(body);
    expect(none.status).toBe(403);
    expect(none.body.error.code).toBe('bad_origin');
    const foreign = await request(server.app).post('/api/auth/sign-in').set('Origin', 'https://evil.example').send(body);
    expect(foreign.status).toBe(403);
    const badReferer = await request(server.app).post('/api/auth/sign-in').set('Referer', 'https://evil.example/page').send(body);
    expect(badReferer.status).toBe(403);
    // The origin the request was addressed to (Host) is accepted, as is a same-origin Referer.
    const hostBased = await request(server.app)
      .post('/api/auth/sign-in')
      .set('Host', 'coils.internal:8080')
      .set('Origin', 'http://coils.internal:8080')
      .send(body);
    expect(hostBased.status).toBe(401);
    const referer = await request(server.app).post('/api/auth/sign-in').set('Referer', `${ORIGIN}/sign-in`).send(body);
    expect(referer.status).toBe(401);
  });

  it('answers malformed JSON with 400 bad_json and oversized bodies with 413', async () => {
    const bad = await request(server.app)
      .post('/api/auth/sign-in')
      .set('Origin', ORIGIN)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('bad_json');
    const big = await request(server.app)
      .post('/api/solve')
      .set('Origin', ORIGIN)
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ document: 'x'.repeat(2.5 * 1024 * 1024) }));
    expect(big.status).toBe(413);
  });
});

describe('error middleware', () => {
  const app = express();
  app.get('/zod', () => {
    z.object({ a: z.object({ b: z.number({ error: 'b must be a number' }) }) }).parse({ a: { b: 'x' } });
  });
  app.get('/app-error', () => {
    throw new AppError(409, 'stale_revision', 'Reload.', { revision: '3' });
  });
  app.get('/boom', async () => {
    throw new Error('secret internals at /srv/db password=hunter2');
  });
  app.use(createErrorHandler(createLogger('silent')));

  it('turns zod errors into 400 with dotted field paths', async () => {
    const res = await request(app).get('/zod');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields).toEqual({ 'a.b': 'b must be a number' });
  });

  it('passes AppError status, code, message and fields through', async () => {
    const res = await request(app).get('/app-error');
    expect(res.status).toBe(409);
    expect(res.body).toEqual({ error: { code: 'stale_revision', message: 'Reload.', fields: { revision: '3' } } });
  });

  it('hides unknown errors (async too) behind a generic 500', async () => {
    const res = await request(app).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    expect(JSON.stringify(res.body)).not.toContain('hunter2');
    expect(JSON.stringify(res.body)).not.toContain('at ');
  });
});

describe('production over https', () => {
  const HTTPS_ORIGIN = 'https://coils.example';
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer({ env: { NODE_ENV: 'production', PUBLIC_ORIGIN: HTTPS_ORIGIN }, reset: false });
  });
  afterAll(async () => {
    await server.close();
  });

  it('sends HSTS and upgrade-insecure-requests, and marks the session cookie Secure', async () => {
    const page = await request(server.app).get('/api/health');
    expect(page.headers['strict-transport-security']).toBeDefined();
    expect(page.headers['content-security-policy']).toContain('upgrade-insecure-requests');
    const res = await request(server.app)
      .post('/api/auth/sign-up')
      .set('Origin', HTTPS_ORIGIN)
      .send({ email: `secure${Date.now()}@tubeloom.test`, password: 'correct-horse-battery', name: 'Sec Ure' });
    expect(res.status).toBe(201);
    expect(String(res.headers['set-cookie'])).toMatch(/;\s*Secure/);
  });

  it('shows captured mail only to owners of some team', async () => {
    const agent = request.agent(server.app).set('Origin', HTTPS_ORIGIN);
    const email = `plain${Date.now()}@tubeloom.test`;
    const signUpRes = await agent.post('/api/auth/sign-up').send({ email, password: 'correct-horse-battery', name: 'Plain Member' });
    // Supertest talks plain HTTP, so the Secure cookie is sent back by hand.
    const cookie = String(signUpRes.headers['set-cookie']).split(';')[0];
    expect((await agent.get('/api/dev/outbox').set('Cookie', cookie)).status).toBe(200);
    await server.database.db.execute(sql`update memberships set role = 'viewer' where user_id = ${signUpRes.body.user.id}`);
    const res = await agent.get('/api/dev/outbox').set('Cookie', cookie);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });
});
