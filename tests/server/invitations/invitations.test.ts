import request from 'supertest';

import { inviteVenueStaff } from '@/server/invitations/invitations.service';

import { type Fixture, studioFixture } from '../helpers/studio-fixture';
import { addPerson, password } from '../helpers/test-app';

async function invite(f: Fixture, email: string, now = new Date()) {
  const owner = await f.db
    .selectFrom('users')
    .select('id')
    .where('email', '=', 'owner-a@example.test')
    .executeTakeFirstOrThrow();
  const scope = { studioId: f.studioA, venueId: null, userId: owner.id, role: 'owner' as const };
  const made = await inviteVenueStaff(f.db, scope, { id: f.venueA, email }, now);
  if (!made) throw new Error('no invitation');
  return made.token;
}

const accept = (f: Fixture, body: object) =>
  request(f.app).post('/api/invitations/accept').send(body);

describe('GET /api/invitations/lookup', () => {
  it('says whose invitation it is, and whether the e-mail has an account', async () => {
    const f = await studioFixture();
    const token = await invite(f, 'new.person@gallery-a.example');
    const res = await request(f.app).get(`/api/invitations/lookup?token=${token}`);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      state: 'open',
      email: 'new.person@gallery-a.example',
      studioName: 'Studio A',
      venueName: 'Gallery of A',
      expiresAt: expect.any(String),
      existingAccount: false,
    });
    const unknown = await request(f.app).get(`/api/invitations/lookup?token=${'x'.repeat(43)}`);
    expect(unknown.status).toBe(404);
    const malformed = await request(f.app).get('/api/invitations/lookup?token=short');
    expect(malformed.status).toBe(400);
  });
});

describe('POST /api/invitations/accept', () => {
  it('makes an account for the venue’s staff, signs it in, and works once', async () => {
    const f = await studioFixture();
    const token = await invite(f, 'new.person@gallery-a.example');
    const res = await accept(f, { token, name: 'Ned Person', password: 'a long enough password' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      user: { id: expect.any(String), name: 'Ned Person', email: 'new.person@gallery-a.example' },
    });
    const cookie = ([] as string[])
      .concat(res.headers['set-cookie'] ?? [])
      .map((c) => c.split(';')[0])
      .join('; ');
    const me = await request(f.app).get('/api/me').set('Cookie', cookie);
    expect(me.body.memberships).toEqual([
      expect.objectContaining({ studioId: f.studioA, role: 'gallery', venueId: f.venueA }),
    ]);
    const again = await accept(f, {
      token,
      name: 'Ned Person',
      password: 'a long enough password',
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe(
      'This invitation has been used already. Sign in with your e-mail address and password.',
    );
  });

  it('says plainly when the link has expired', async () => {
    const f = await studioFixture();
    const fifteenDaysAgo = new Date(Date.now() - 15 * 86_400_000);
    const token = await invite(f, 'late@gallery-a.example', fifteenDaysAgo);
    const res = await accept(f, { token, name: 'Late', password: 'a long enough password' });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(
      /^This invitation expired on \d{4}-\d{2}-\d{2}\. Ask the studio to send a new one\.$/,
    );
  });

  it('adds the venue to an existing account once its own password is given', async () => {
    const f = await studioFixture();
    await addPerson(f.db, 'maker.friend@example.test', [
      { studioId: f.studioB, role: 'gallery', venueId: f.venueB },
    ]);
    const token = await invite(f, 'maker.friend@example.test');
    const wrong = await accept(f, { token, name: 'Friend', password: 'not the password at all' });
    expect(wrong.status).toBe(401);
    expect(wrong.body.error.issues).toEqual([
      {
        path: ['password'],
        message: 'maker.friend@example.test already has an account: enter its password.',
      },
    ]);
    const right = await accept(f, { token, password });
    expect(right.status).toBe(200);
    const memberships = await f.db
      .selectFrom('memberships')
      .innerJoin('users', 'users.id', 'memberships.user_id')
      .select(['memberships.studio_id', 'memberships.role'])
      .where('users.email', '=', 'maker.friend@example.test')
      .orderBy('memberships.studio_id')
      .execute();
    expect(memberships).toEqual([
      { studio_id: f.studioA, role: 'gallery' },
      { studio_id: f.studioB, role: 'gallery' },
    ]);
  });

  it('answers 400 for a short password and a missing name, writing nothing', async () => {
    const f = await studioFixture();
    const token = await invite(f, 'someone@gallery-a.example');
    const res = await accept(f, { token, password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.issues).toEqual([
      { path: ['password'], message: 'Use at least 10 characters for the password.' },
    ]);
    const nameless = await accept(f, { token, password: 'a long enough password' });
    expect(nameless.status).toBe(400);
    expect(nameless.body.error.issues).toEqual([{ path: ['name'], message: 'Enter your name.' }]);
    const users = await f.db
      .selectFrom('users')
      .select('email')
      .where('email', '=', 'someone@gallery-a.example')
      .execute();
    expect(users).toEqual([]);
  });
});
