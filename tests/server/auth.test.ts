import request from 'supertest';

import { addPerson, addStudio, createTestApp, password, signIn } from './helpers/test-app';

async function withOwner(options: Parameters<typeof createTestApp>[0] = {}) {
  const ctx = await createTestApp(options);
  const studioId = await addStudio(ctx.db, 'Studio');
  await addPerson(ctx.db, 'owner@example.test', [{ studioId, role: 'owner' }]);
  return ctx;
}

const sessionCount = async (db: Awaited<ReturnType<typeof createTestApp>>['db']) =>
  Number(
    (
      await db
        .selectFrom('sessions')
        .select((e) => e.fn.countAll().as('n'))
        .executeTakeFirstOrThrow()
    ).n,
  );

describe('POST /api/auth/sign-in/email', () => {
  it('signs in with an HttpOnly, SameSite=Lax session cookie and keeps the token out of the body', async () => {
    const { app } = await withOwner();
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .send({ email: 'owner@example.test', password });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      user: { id: expect.any(String), name: 'owner', email: 'owner@example.test' },
    });
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).join('\n');
    expect(cookie).toMatch(/saggar\.session_token=[^;]+;/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
  });

  it('says plainly that a wrong password does not match, and creates no session', async () => {
    const { app, db } = await withOwner();
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .send({ email: 'owner@example.test', password: 'not the password' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_credentials',
        message: 'That e-mail address and password do not match an account.',
      },
    });
    expect(res.headers['set-cookie']).toBeUndefined();
    expect(await sessionCount(db)).toBe(0);
  });

  it('answers an unknown e-mail exactly as a wrong password', async () => {
    const { app } = await withOwner();
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .send({ email: 'nobody@example.test', password });
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('invalid_credentials');
  });

  it('answers 400 with field errors for a malformed e-mail and a missing password', async () => {
    const { app } = await withOwner();
    const res = await request(app).post('/api/auth/sign-in/email').send({ email: 'owner.example' });
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['email'], message: 'Enter an e-mail address such as name@example.com.' },
          { path: ['password'], message: 'Enter your password.' },
        ],
      },
    });
  });

  it('refuses a sign-in posted from another site', async () => {
    const { app, db } = await withOwner();
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: 'owner@example.test', password });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(await sessionCount(db)).toBe(0);
  });
});

describe('the session cookie behind HTTPS', () => {
  it('is marked Secure when the public address is https', async () => {
    const { app } = await withOwner({ publicUrl: 'https://saggar.example' });
    const res = await request(app)
      .post('/api/auth/sign-in/email')
      .set('Host', 'saggar.example')
      .send({ email: 'owner@example.test', password });
    expect(res.status).toBe(200);
    const cookie = ([] as string[]).concat(res.headers['set-cookie'] ?? []).join('\n');
    expect(cookie).toMatch(/session_token=[^;]+;.*Secure/);
  });
});

describe('POST /api/auth/sign-out', () => {
  it('ends the session so the cookie no longer works, at once', async () => {
    const { app } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    expect((await request(app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    const res = await request(app)
      .post('/api/auth/sign-out')
      .set('Cookie', cookie)
      .set('Host', 'saggar.example')
      .set('Origin', 'http://saggar.example')
      .send({});
    expect(res.status).toBe(200);
    const me = await request(app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
  });

  it('refuses a sign-out without an Origin in the API’s error shape, keeping the session', async () => {
    const { app } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    const res = await request(app).post('/api/auth/sign-out').set('Cookie', cookie).send({});
    expect(res.status).toBe(403);
    expect(res.body).toEqual({
      error: { code: 'forbidden', message: 'Requests from another site are not accepted.' },
    });
    expect((await request(app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
  });
});

describe('a session cookie that has been tampered with', () => {
  it('is not a session: a changed token or signature answers 401', async () => {
    const { app } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    const [name, value] = cookie.split('=') as [string, string];
    const [token, signature] = decodeURIComponent(value).split('.') as [string, string];
    const otherToken = `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`;
    for (const forged of [
      `${name}=${encodeURIComponent(`${otherToken}.${signature}`)}`,
      `${name}=${encodeURIComponent(`${token}.${'A'.repeat(43)}=`)}`,
      `${name}=${token}`,
    ]) {
      const res = await request(app).get('/api/me').set('Cookie', forged);
      expect(res.status).toBe(401);
    }
  });

  it('is refused once the session has expired', async () => {
    const { app, db } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    await db
      .updateTable('sessions')
      .set({ expires_at: new Date(Date.now() - 1000).toISOString() })
      .execute();
    expect((await request(app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
  });

  it('is extended, cookie and all, once a day of use has passed', async () => {
    const { app, db } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    const sixDaysLeft = new Date(Date.now() + 6 * 24 * 3600 * 1000 - 60_000).toISOString();
    await db.updateTable('sessions').set({ expires_at: sixDaysLeft }).execute();
    const res = await request(app).get('/api/me').set('Cookie', cookie);
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/saggar\.session_token=.+Max-Age=604800/);
    const session = await db.selectFrom('sessions').select('expires_at').executeTakeFirstOrThrow();
    expect(Date.parse(session.expires_at)).toBeGreaterThan(Date.now() + 6.9 * 24 * 3600 * 1000);
  });
});

describe('state-changing requests from another origin', () => {
  it('are refused with 403, while the same origin is let through', async () => {
    const { app } = await withOwner();
    const cookie = await signIn(app, 'owner@example.test');
    const body = { membershipId: 1 };
    const foreign = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Origin', 'https://evil.example')
      .send(body);
    expect(foreign.status).toBe(403);
    expect(foreign.body).toEqual({
      error: { code: 'forbidden', message: 'Requests from another site are not accepted.' },
    });
    const crossSite = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Sec-Fetch-Site', 'cross-site')
      .send(body);
    expect(crossSite.status).toBe(403);
    const same = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Host', 'saggar.example')
      .set('Origin', 'https://saggar.example')
      .send(body);
    expect(same.status).toBe(200);
  });
});
