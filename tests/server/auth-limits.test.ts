import request from 'supertest';

import { addPerson, addStudio, createTestApp, password } from './helpers/test-app';

const limit = { perAccount: 3, perAddress: 6, windowMs: 60_000 };

async function gallery(options: Parameters<typeof createTestApp>[0] = {}) {
  const ctx = await createTestApp({ signInLimit: limit, ...options });
  const studioId = await addStudio(ctx.db, 'Studio');
  for (const who of ['ann', 'ben', 'cat']) {
    await addPerson(ctx.db, `${who}@gallery.test`, [{ studioId, role: 'owner' }]);
  }
  return ctx;
}

type App = Awaited<ReturnType<typeof gallery>>['app'];
const attempt = (app: App, email: string, pass: string, forwardedFor?: string) => {
  const req = request(app).post('/api/auth/sign-in/email');
  if (forwardedFor) req.set('X-Forwarded-For', forwardedFor);
  return req.send({ email, password: pass });
};

describe('POST /api/auth/sign-in/email limits', () => {
  it('locks an account after its failures, wherever they come from, with Retry-After', async () => {
    const { app } = await gallery();
    for (let i = 0; i < 3; i++)
      expect((await attempt(app, 'ann@gallery.test', 'wrong')).status).toBe(401);
    const refused = await attempt(app, 'ann@gallery.test', password);
    expect(refused.status).toBe(429);
    expect(refused.body).toEqual({
      error: {
        code: 'too_many_requests',
        message: 'Too many failed sign-ins for this account. Wait 1 minute and try again.',
      },
    });
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(60);
  });

  it('does not lock out other staff at the same address for one person’s mistakes', async () => {
    const { app } = await gallery();
    for (let i = 0; i < 4; i++) await attempt(app, 'ann@gallery.test', 'wrong');
    expect((await attempt(app, 'ben@gallery.test', password)).status).toBe(200);
    expect((await attempt(app, 'cat@gallery.test', password)).status).toBe(200);
  });

  it('limits one address trying many accounts', async () => {
    const { app } = await gallery();
    for (const who of ['ann', 'ben', 'cat']) {
      for (let i = 0; i < 2; i++) await attempt(app, `${who}@gallery.test`, 'wrong');
    }
    const refused = await attempt(app, 'ben@gallery.test', password);
    expect(refused.status).toBe(429);
    expect(refused.body.error.message).toMatch(/^Too many failed sign-ins from here\./);
  });

  it('counts neither a successful sign-in nor earlier failures once the person gets in', async () => {
    const { app } = await gallery();
    for (let i = 0; i < 2; i++) await attempt(app, 'ann@gallery.test', 'wrong');
    expect((await attempt(app, 'ann@gallery.test', password)).status).toBe(200);
    for (let i = 0; i < 3; i++)
      expect((await attempt(app, 'ann@gallery.test', 'wrong')).status).toBe(401);
    for (let i = 0; i < 5; i++)
      expect((await attempt(app, 'ben@gallery.test', password)).status).toBe(200);
  });

  it('counts racing attempts all the same', async () => {
    const { app } = await gallery();
    const results = await Promise.all(
      Array.from({ length: 8 }, () => attempt(app, 'ann@gallery.test', 'wrong')),
    );
    expect(results.filter((r) => r.status === 401)).toHaveLength(3);
    expect(results.filter((r) => r.status === 429)).toHaveLength(5);
  });

  it('ignores X-Forwarded-For unless a proxy is trusted', async () => {
    const { app } = await gallery();
    for (let i = 0; i < 7; i++) {
      const who = ['ann', 'ben', 'cat'][i % 3]!;
      await attempt(app, `${who}@gallery.test`, 'wrong', `203.0.113.${i}`);
    }
    expect((await attempt(app, 'cat@gallery.test', password, '198.51.100.9')).status).toBe(429);
  });

  it('counts per forwarded address when SAGGAR_TRUST_PROXY names the proxy', async () => {
    const { app } = await gallery({ trustProxy: 'loopback' });
    for (let i = 0; i < 7; i++) {
      const who = ['ann', 'ben', 'cat'][i % 3]!;
      await attempt(app, `${who}@gallery.test`, 'wrong', '203.0.113.7');
    }
    expect((await attempt(app, 'cat@gallery.test', password, '198.51.100.9')).status).toBe(200);
  });
});

describe('POST /api/auth/sign-in/email with a body it cannot read', () => {
  it.each([
    ['malformed JSON', 'application/json', '{"email":', 400, 'invalid_request'],
    [
      'an unknown charset',
      'application/json; charset=ebcdic-cp-us',
      '{}',
      415,
      'unsupported_media_type',
    ],
  ])('answers %s in the error shape', async (_what, type, body, status, code) => {
    const { app } = await gallery();
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .set('Content-Type', type)
      .send(body);
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
  });
});
