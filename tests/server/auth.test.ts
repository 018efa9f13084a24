import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORIGIN, startTestServer, type TestServer } from './helpers';

const PASSWORD = 'correct-horse-battery';

describe('accounts', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(async () => {
    await server.close();
  });

  it('signs up, creates the own team as owner, and keeps the session in an HttpOnly SameSite=Lax cookie', async () => {
    const agent = server.client();
    const res = await agent.post('/api/auth/sign-up').send({ email: ' Mira.Lund@Tubeloom.test ', password: PASSWORD, name: 'Mira Lund' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: 'mira.lund@tubeloom.test', name: 'Mira Lund', unitSystem: 'si' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/^sid=/);
    expect(cookie).toContain('HttpOnly');
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toContain('Secure'); // not in production
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.teams).toEqual([{ id: expect.any(String), name: "Mira Lund's team", role: 'owner' }]);
  });

  it('refuses a second account with the same e-mail (409 naming the field)', async () => {
    const res = await server.client().post('/api/auth/sign-up').send({ email: 'mira.lund@tubeloom.test', password: PASSWORD, name: 'Again' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('email_taken');
    expect(res.body.error.fields.email).toBeDefined();
  });

  it('refuses a weak password and a malformed e-mail with 400 naming the fields', async () => {
    const res = await server.client().post('/api/auth/sign-up').send({ email: 'not-an-email', password: 'short', name: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
  });

  it('signs in with the right password and answers 401 to a wrong one or an unknown e-mail', async () => {
    const ok = await server.client().post('/api/auth/sign-in').send({ email: 'MIRA.LUND@tubeloom.test', password: PASSWORD });
    expect(ok.status).toBe(200);
    expect(ok.body.user.email).toBe('mira.lund@tubeloom.test');
    const wrong = await server.client().post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: 'wrong-password-1' });
    expect(wrong.status).toBe(401);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    const unknown = await server.client().post('/api/auth/sign-in').send({ email: 'nobody@tubeloom.test', password: PASSWORD });
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
  });

  it('signs out: the session stops working and the cookie is cleared', async () => {
    const agent = server.client();
    await agent.post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: PASSWORD }).expect(200);
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(String(out.headers['set-cookie'])).toMatch(/sid=;/);
    expect((await agent.get('/api/me')).status).toBe(401);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(401);
  });

  it('answers 401 not_signed_in to signed-out calls', async () => {
    const res = await request(server.app).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('not_signed_in');
  });

  it('updates the name and unit system; rejects an unknown unit system by field', async () => {
    const agent = server.client();
    await agent.post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: PASSWORD }).expect(200);
    const res = await agent.patch('/api/me').send({ unitSystem: 'ip', name: 'Mira L.' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ unitSystem: 'ip', name: 'Mira L.' });
    const bad = await agent.patch('/api/me').send({ unitSystem: 'imperial' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.unitSystem).toBeDefined();
  });

  it('resets a forgotten password through the mailed single-use link', async () => {
    const agent = server.client();
    const unknown = await agent.post('/api/auth/forgot-password').send({ email: 'nobody@tubeloom.test' });
    expect(unknown.status).toBe(202);
    const res = await agent.post('/api/auth/forgot-password').send({ email: 'mira.lund@tubeloom.test' });
    expect(res.status).toBe(202);

    const mails = (await server.outbox()).filter((m) => m.to === 'mira.lund@tubeloom.test');
    expect(mails).toHaveLength(1); // nothing was sent for the unknown address
    expect(mails[0].subject).toContain('Reset');
    const link = /(http\S+\/reset-password\?token=([\w-]+))/.exec(mails[0].text);
    expect(link?.[1].startsWith(`${ORIGIN}/reset-password?token=`)).toBe(true);
    expect(mails[0].html).toContain(link![1]);
    const token = link![2];

    const signedIn = server.client();
    await signedIn.post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: PASSWORD }).expect(200);

    const weak = await agent.post('/api/auth/reset-password').send({ token, password: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields.password).toBeDefined();

    const reset = await agent.post('/api/auth/reset-password').send({ token, password: 'new-password-2026' });
    expect(reset.status).toBe(204);
    // Old sessions end with the reset; the old password no longer works; the new one does.
    expect((await signedIn.get('/api/me')).status).toBe(401);
    expect((await server.client().post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: PASSWORD })).status).toBe(401);
    expect(
      (await server.client().post('/api/auth/sign-in').send({ email: 'mira.lund@tubeloom.test', password: 'new-password-2026' })).status,
    ).toBe(200);

    const again = await agent.post('/api/auth/reset-password').send({ token, password: 'another-password-1' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
    expect(again.body.error.fields.token).toBeDefined();
  });

  it('refuses an expired reset link', async () => {
    const later = await startTestServer({ reset: false, now: () => new Date(Date.now() - 2 * 60 * 60 * 1000) });
    try {
      await later.client().post('/api/auth/forgot-password').send({ email: 'mira.lund@tubeloom.test' }).expect(202);
      const mail = (await later.outbox()).find((m) => m.to === 'mira.lund@tubeloom.test' && m.text.includes('token='));
      const token = /token=([\w-]+)/.exec(mail!.text)![1];
      // The link was issued "two hours ago" (injected clock) and is checked now by the normal server.
      const res = await server.client().post('/api/auth/reset-password').send({ token, password: 'late-password-2026' });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('invalid_token');
    } finally {
      await later.close();
    }
  });
});

describe('auth rate limit', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startTestServer({ env: { RATE_LIMIT_AUTH_MAX: '3' }, reset: false });
  });
  afterAll(async () => {
    await server.close();
  });

  it('answers 429 rate_limited after RATE_LIMIT_AUTH_MAX auth requests in 15 minutes', async () => {
    const body = { email: 'nobody@tubeloom.test', password: 'wrong-password-1' };
    for (let i = 0; i < 3; i++) expect((await server.client().post('/api/auth/sign-in').send(body)).status).toBe(401);
    const res = await server.client().post('/api/auth/sign-in').send(body);
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(typeof res.body.error.message).toBe('string');
    // Other API routes are not limited.
    expect((await request(server.app).get('/api/health')).status).toBe(200);
  });
});
