import request from 'supertest';

import { resetAnswerFloorMs } from '@/server/auth/password-reset.service';
import { resetRequestLimit } from '@/server/auth/reset-requests';
import { enqueueMail } from '@/server/mail/outbox.repository';

import { testWorker } from '../helpers/mail';
import { startTestSmtp } from '../helpers/smtp';
import { addPerson, addStudio, createTestApp, password, signIn } from '../helpers/test-app';

const appUrl = 'https://saggar.example';
const newPassword = 'a kiln of one’s own';

async function withOwner(options: Parameters<typeof createTestApp>[0] = {}) {
  const ctx = await createTestApp({ appUrl, ...options });
  const studioId = await addStudio(ctx.db, 'Saltmarsh Kiln');
  await addPerson(ctx.db, 'owner@example.test', [{ studioId, role: 'owner' }]);
  return ctx;
}
type Ctx = Awaited<ReturnType<typeof withOwner>>;

const ask = (ctx: Ctx, email: string) =>
  request(ctx.app).post('/api/auth/request-password-reset').send({ email });

const lookup = (ctx: Ctx, token: string) =>
  request(ctx.app).get(`/api/auth/reset-password/lookup?token=${token}`);

const reset = (ctx: Ctx, token: string, pass = newPassword) =>
  request(ctx.app).post('/api/auth/reset-password').send({ token, password: pass });

const signInWith = (ctx: Ctx, pass: string) =>
  request(ctx.app)
    .post('/api/auth/sign-in/email')
    .send({ email: 'owner@example.test', password: pass });

const resetMails = (ctx: Ctx) =>
  ctx.db.selectFrom('outbox').selectAll().where('kind', '=', 'password-reset').execute();

/** The token in the newest link to choose a new password, as the e-mail's text gives it. */
async function linkToken(ctx: Ctx): Promise<string> {
  const mails = await resetMails(ctx);
  const text = mails.at(-1)!.text_body;
  return new RegExp(`${appUrl}/reset-password/([A-Za-z0-9_-]+)`).exec(text)![1]!;
}

async function timed(run: () => Promise<unknown>): Promise<number> {
  const started = performance.now();
  await run();
  return performance.now() - started;
}
const median = (values: number[]) => [...values].sort((a, b) => a - b)[values.length >> 1]!;

describe('POST /api/auth/request-password-reset', () => {
  it('answers a known and an unknown address alike, and writes a message for the known one only', async () => {
    const ctx = await withOwner();
    const known = await ask(ctx, 'owner@example.test');
    const unknown = await ask(ctx, 'nobody@example.test');
    expect(known.status).toBe(202);
    expect(known.body).toEqual({ linkLifetimeMinutes: 60 });
    expect([unknown.status, unknown.body]).toEqual([known.status, known.body]);
    expect(unknown.headers['content-type']).toBe(known.headers['content-type']);
    expect((await resetMails(ctx)).map((m) => m.to_address)).toEqual(['owner@example.test']);
  });

  // Nine requests of half a second or more, one after another: longer than jest's 5 s.
  it('takes as long to answer an unknown address as a known one', async () => {
    const ctx = await withOwner();
    await addPerson(ctx.db, 'assistant@example.test', []);
    // The first request of a process pays for starting better-auth; it is not what is compared.
    await ask(ctx, 'warm-up@example.test');
    const known: number[] = [];
    const unknown: number[] = [];
    for (const email of ['owner@example.test', 'assistant@example.test']) {
      for (let i = 0; i < 2; i++) {
        known.push(await timed(() => ask(ctx, email)));
        unknown.push(await timed(() => ask(ctx, `nobody${i}@${email.split('@')[0]}.test`)));
      }
    }
    expect(await resetMails(ctx)).toHaveLength(4);
    for (const ms of [...known, ...unknown])
      expect(ms).toBeGreaterThanOrEqual(resetAnswerFloorMs - 5);
    expect(Math.abs(median(known) - median(unknown))).toBeLessThan(100);
  }, 20_000);

  it('sends the link through the outbox, under no studio, and it arrives at the address', async () => {
    const ctx = await withOwner();
    const smtp = await startTestSmtp();
    try {
      expect((await ask(ctx, 'Owner@Example.test')).status).toBe(202);
      const [row] = await resetMails(ctx);
      expect(row).toMatchObject({
        studio_id: null,
        state: 'queued',
        to_address: 'owner@example.test',
      });

      const worker = testWorker(ctx.db, smtp.url);
      expect(await worker.runOnce()).toBe(1);
      worker.close();
      const [mail] = await smtp.waitForCount(1);
      const token = await linkToken(ctx);
      const link = `${appUrl}/reset-password/${token}`;
      expect(mail!.envelope.to).toEqual(['owner@example.test']);
      expect(mail!.parsed.subject).toBe('Choose a new password for Saggar');
      expect(mail!.parsed.text).toContain('Hello owner,');
      expect(mail!.parsed.text).toContain(`Choose a new password:\n${link}\n`);
      expect(mail!.parsed.text).toContain('The link works once, for 60 minutes.');
      expect(mail!.parsed.text).toContain(
        'If you did not ask for this, you can ignore this e-mail',
      );
      expect(mail!.parsed.html).toContain(`href="${link}"`);
    } finally {
      await smtp.stop();
    }
  });

  it('keeps the message out of the studio owner’s Sent mail', async () => {
    const ctx = await withOwner();
    await addPerson(ctx.db, 'assistant@example.test', []);
    await ask(ctx, 'assistant@example.test');
    const [row] = await resetMails(ctx);
    const cookie = await signIn(ctx.app, 'owner@example.test');
    const list = await request(ctx.app).get('/api/outbox').set('Cookie', cookie);
    expect(list.body).toEqual({ items: [], total: 0 });
    const one = await request(ctx.app).get(`/api/outbox/${row!.id}`).set('Cookie', cookie);
    expect([one.status, one.body]).toEqual([
      404,
      { error: { code: 'not_found', message: 'That message was not found.' } },
    ]);
    const retry = await request(ctx.app).post(`/api/outbox/${row!.id}/retry`).set('Cookie', cookie);
    expect(retry.status).toBe(404);
  });

  it.each(['owner@example.test', 'nobody@example.test'])(
    'refuses a fourth request for %s within the hour, the same way for any address',
    async (email) => {
      const ctx = await withOwner();
      for (let i = 0; i < resetRequestLimit.perAccount; i++) {
        expect((await ask(ctx, email)).status).toBe(202);
      }
      const refused = await ask(ctx, email);
      expect(refused.status).toBe(429);
      expect(refused.body).toEqual({
        error: {
          code: 'too_many_requests',
          message:
            'Links for this address have been asked for 3 times in the last hour. Use the newest e-mail, or wait 60 minutes and ask again.',
        },
      });
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(3500);
      expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(3600);
    },
  );

  it('limits one client asking for many addresses, counting in the database', async () => {
    const ctx = await withOwner();
    const answers = await Promise.all(
      Array.from({ length: resetRequestLimit.perAddress + 2 }, (_, i) =>
        ask(ctx, `person${i}@example.test`),
      ),
    );
    expect(answers.filter((r) => r.status === 202)).toHaveLength(resetRequestLimit.perAddress);
    const refused = answers.filter((r) => r.status === 429);
    expect(refused).toHaveLength(2);
    expect(refused[0]!.body.error.message).toBe(
      'Too many links have been asked for from here. Wait 60 minutes and try again.',
    );
    const counted = await ctx.db
      .selectFrom('sign_in_limits')
      .select('hits')
      .where('key', 'like', 'reset-address:%')
      .executeTakeFirstOrThrow();
    expect(counted.hits).toBe(resetRequestLimit.perAddress + 2);
  });

  it('answers 400 with the field error for an address that is not one', async () => {
    const ctx = await withOwner();
    const res = await ask(ctx, 'owner.example.test');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['email'], message: 'Enter an e-mail address such as name@example.com.' }],
      },
    });
  });

  it('refuses a request posted from another site', async () => {
    const ctx = await withOwner();
    const res = await request(ctx.app)
      .post('/api/auth/request-password-reset')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: 'owner@example.test' });
    expect(res.status).toBe(403);
    expect(res.body).toEqual({
      error: { code: 'forbidden', message: 'Requests from another site are not accepted.' },
    });
    expect(await resetMails(ctx)).toHaveLength(0);
  });
});

describe('a password reset message', () => {
  it('is refused under a studio, whose owner would read it under Sent mail', async () => {
    const ctx = await withOwner();
    const studio = await ctx.db.selectFrom('studios').select('id').executeTakeFirstOrThrow();
    await expect(
      enqueueMail(ctx.db, {
        studioId: studio.id,
        kind: 'password-reset',
        to: 'owner@example.test',
        subject: 'Choose a new password for Saggar',
        text: 'A link.',
      }),
    ).rejects.toThrow('A password reset message belongs to no studio.');
    expect(await resetMails(ctx)).toHaveLength(0);
  });
});

describe('GET /api/auth/reset-password/lookup', () => {
  it('shows whose password a working link sets', async () => {
    const ctx = await withOwner();
    await ask(ctx, 'owner@example.test');
    const res = await lookup(ctx, await linkToken(ctx));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ state: 'open', email: 'owner@example.test' });
  });

  it('answers 404 for a link nobody sent', async () => {
    const ctx = await withOwner();
    const res = await lookup(ctx, 'A'.repeat(24));
    expect(res.status).toBe(404);
    expect(res.body).toEqual({
      error: {
        code: 'not_found',
        message:
          'This link is not one Saggar knows. Check that it was copied whole, or ask for a new one.',
      },
    });
  });

  it('answers 400 for a link cut short', async () => {
    const ctx = await withOwner();
    const res = await lookup(ctx, 'abc');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['token'], message: 'The link is incomplete: open it again from the e-mail.' },
        ],
      },
    });
  });
});

describe('POST /api/auth/reset-password', () => {
  it('sets the new password: it signs in, the old one does not, and every session ends', async () => {
    const ctx = await withOwner();
    const before = await signIn(ctx.app, 'owner@example.test');
    await ask(ctx, 'owner@example.test');
    const res = await reset(ctx, await linkToken(ctx));
    expect(res.status).toBe(204);
    expect((await request(ctx.app).get('/api/me').set('Cookie', before)).status).toBe(401);
    expect((await signInWith(ctx, password)).status).toBe(401);
    expect((await signInWith(ctx, newPassword)).status).toBe(200);
  });

  it('works once: the link used again says so, and the password stays the new one', async () => {
    const ctx = await withOwner();
    await ask(ctx, 'owner@example.test');
    const token = await linkToken(ctx);
    expect((await reset(ctx, token)).status).toBe(204);
    const again = await reset(ctx, token, 'yet another password');
    expect(again.status).toBe(409);
    expect(again.body).toEqual({
      error: {
        code: 'conflict',
        message:
          'This link has been used already: the password was changed with it. Sign in, or ask for a new link.',
      },
    });
    expect((await lookup(ctx, token)).body).toEqual({ state: 'used' });
    expect((await signInWith(ctx, 'yet another password')).status).toBe(401);
    expect((await signInWith(ctx, newPassword)).status).toBe(200);
  });

  it('lets only one of two racing requests use the link', async () => {
    const ctx = await withOwner();
    await ask(ctx, 'owner@example.test');
    const token = await linkToken(ctx);
    const answers = await Promise.all([
      reset(ctx, token, 'first racing password'),
      reset(ctx, token, 'second racing password'),
    ]);
    expect(answers.map((r) => r.status).sort()).toEqual([204, 409]);
    const winner = answers[0]!.status === 204 ? 'first' : 'second';
    expect((await signInWith(ctx, `${winner} racing password`)).status).toBe(200);
  });

  describe('an hour after it was sent', () => {
    const sentAt = new Date('2026-11-02T09:00:00.000Z');
    beforeEach(() => {
      // Only the clock is faked: the server's sockets and timers run as usual.
      jest.useFakeTimers({
        now: sentAt,
        doNotFake: [
          'hrtime',
          'nextTick',
          'performance',
          'queueMicrotask',
          'setImmediate',
          'clearImmediate',
          'setInterval',
          'clearInterval',
          'setTimeout',
          'clearTimeout',
        ],
      });
    });
    afterEach(() => jest.useRealTimers());

    it('still works a minute before, and has expired a minute after', async () => {
      const ctx = await withOwner();
      await ask(ctx, 'owner@example.test');
      const token = await linkToken(ctx);
      jest.setSystemTime(new Date(sentAt.getTime() + 59 * 60_000));
      expect((await lookup(ctx, token)).body).toEqual({
        state: 'open',
        email: 'owner@example.test',
      });
      jest.setSystemTime(new Date(sentAt.getTime() + 61 * 60_000));
      expect((await lookup(ctx, token)).body).toEqual({ state: 'expired' });
      const late = await reset(ctx, token);
      expect(late.status).toBe(409);
      expect(late.body).toEqual({
        error: {
          code: 'conflict',
          message: 'This link has expired: a link works for 60 minutes. Ask for a new one.',
        },
      });
      expect((await signInWith(ctx, password)).status).toBe(200);
    });
  });

  it('holds the new password to the same rules as a password chosen on an invitation', async () => {
    const ctx = await withOwner();
    await ask(ctx, 'owner@example.test');
    const token = await linkToken(ctx);
    const res = await reset(ctx, token, 'too short');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['password'], message: 'Use at least 10 characters for the password.' }],
      },
    });
    expect((await lookup(ctx, token)).body.state).toBe('open');
  });

  it('answers 404 for a link nobody sent', async () => {
    const ctx = await withOwner();
    const res = await reset(ctx, 'B'.repeat(24));
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('opens an account locked by failed sign-ins to its new password', async () => {
    const ctx = await withOwner({
      signInLimit: { perAccount: 2, perAddress: 50, windowMs: 60_000 },
    });
    for (let i = 0; i < 3; i++) await signInWith(ctx, 'not the password');
    expect((await signInWith(ctx, password)).status).toBe(429);
    await ask(ctx, 'owner@example.test');
    expect((await reset(ctx, await linkToken(ctx))).status).toBe(204);
    expect((await signInWith(ctx, newPassword)).status).toBe(200);
  });
});
