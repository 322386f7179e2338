import request from 'supertest';

import { addPerson, addStudio, createTestApp, signIn } from './helpers/test-app';

describe('GET /api/health', () => {
  it('answers ok without a session', async () => {
    const { app } = await createTestApp();
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok' });
  });

  it("sends helmet's security headers", async () => {
    const { app } = await createTestApp();
    const res = await request(app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('asks browsers for HTTPS only when the public address is https://', async () => {
    const plain = await request((await createTestApp()).app).get('/api/health');
    expect(plain.headers['strict-transport-security']).toBeUndefined();
    expect(plain.headers['content-security-policy']).not.toContain('upgrade-insecure-requests');

    const secured = await request(
      (await createTestApp({ publicUrl: 'https://saggar.example' })).app,
    ).get('/api/health');
    expect(secured.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(secured.headers['content-security-policy']).toContain('upgrade-insecure-requests');
  });
});

describe('unknown /api paths', () => {
  it('answer 404 in the error shape, signed in or not', async () => {
    const { app, db } = await createTestApp();
    const studioId = await addStudio(db, 'Studio');
    await addPerson(db, 'owner@example.test', [{ studioId, role: 'owner' }]);
    const cookie = await signIn(app, 'owner@example.test');
    for (const res of [
      await request(app).get('/api/nothing-here'),
      await request(app).get('/api/nothing-here').set('Cookie', cookie),
      await request(app).get('/api/auth/list-sessions').set('Cookie', cookie),
    ]) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual({
        error: { code: 'not_found', message: expect.stringContaining('There is no API at') },
      });
    }
  });
});

describe('request bodies', () => {
  async function owner() {
    const { app, db } = await createTestApp();
    const studioId = await addStudio(db, 'Studio');
    await addPerson(db, 'owner@example.test', [{ studioId, role: 'owner' }]);
    return { app, cookie: await signIn(app, 'owner@example.test') };
  }

  it('answers 400 for malformed JSON, without a stack trace', async () => {
    const { app, cookie } = await owner();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Content-Type', 'application/json')
      .send('{"membershipId": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: { code: 'invalid_request', message: 'The request body is not valid JSON.' },
    });
    expect(res.text).not.toMatch(/at .*\.ts:\d+/);
  });

  it('answers 400 with field issues for a body that fails its schema', async () => {
    const { app, cookie } = await owner();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .send({ membershipId: 'one', extra: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_request');
    expect(res.body.error.message).toBe('Some fields need attention.');
    expect(res.body.error.issues).toEqual(
      expect.arrayContaining([
        { path: ['membershipId'], message: expect.any(String) },
        { path: [], message: expect.stringContaining('extra') },
      ]),
    );
  });

  it('answers 413 for a body over the limit', async () => {
    const { app, cookie } = await owner();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .send({ membershipId: 1, padding: 'x'.repeat(200_000) });
    expect(res.status).toBe(413);
    expect(res.body).toEqual({
      error: { code: 'payload_too_large', message: 'The request body is too large.' },
    });
  });

  it('answers 415 for a JSON body in a charset the server does not read', async () => {
    const { app, cookie } = await owner();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Content-Type', 'application/json; charset=ebcdic-cp-us')
      .send('{"membershipId": 1}');
    expect(res.status).toBe(415);
    expect(res.body).toEqual({
      error: { code: 'unsupported_media_type', message: 'Send the request body as UTF-8 JSON.' },
    });
  });

  it('answers 415 for a Content-Encoding the server does not read', async () => {
    const { app, cookie } = await owner();
    const res = await request(app)
      .put('/api/me/active-membership')
      .set('Cookie', cookie)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'compress')
      .send('{"membershipId": 1}');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
  });

  it('answers 400 for a body whose Content-Encoding does not decode', async () => {
    const { app, cookie } = await owner();
    for (const encoding of ['gzip', 'deflate', 'br']) {
      const res = await request(app)
        .put('/api/me/active-membership')
        .set('Cookie', cookie)
        .set('Content-Type', 'application/json')
        .set('Content-Encoding', encoding)
        .send(Buffer.from('this is not compressed at all'));
      expect(res.status).toBe(400);
      expect(res.body).toEqual({
        error: { code: 'invalid_request', message: 'The request body could not be read.' },
      });
    }
  });

  it('answers 500 with a generic message when something unexpected fails', async () => {
    const { app, db } = await createTestApp();
    const studioId = await addStudio(db, 'Studio');
    await addPerson(db, 'owner@example.test', [{ studioId, role: 'owner' }]);
    const cookie = await signIn(app, 'owner@example.test');
    // Renamed rather than dropped: PostgreSQL drops no table that others refer to.
    await db.schema.alterTable('venues').renameTo('venues_gone').execute();
    const res = await request(app).get('/api/overview').set('Cookie', cookie);
    expect(res.status).toBe(500);
    expect(res.body).toEqual({
      error: { code: 'internal', message: 'Something went wrong on our side. Try again.' },
    });
  });
});
