import request from 'supertest';

import { outboxListSchema, outboxMessageSchema } from '@/shared/schemas/outbox';

import {
  aMail,
  getBytes,
  queue,
  renderTestAttachment,
  testMailFrom,
  testWorker,
} from '../helpers/mail';
import { startTestSmtp } from '../helpers/smtp';
import { type Fixture, studioFixture } from '../helpers/studio-fixture';

const as = async (f: Fixture, who: Parameters<Fixture['cookie']>[0] = 'owner') => ({
  Cookie: await f.cookie(who),
});

const forbidden = {
  error: { code: 'forbidden', message: 'Your role in this studio does not allow this.' },
};
const messageNotFound = { error: { code: 'not_found', message: 'That message was not found.' } };

async function fixture() {
  const f = await studioFixture({ renderAttachment: renderTestAttachment, mailFrom: testMailFrom });
  const sheet = {
    filename: 'Consignment sheet C-0007.txt',
    contentType: 'text/plain',
    recipe: { kind: 'test-text', text: 'Moon jar, celadon' },
  };
  const first = await queue(f.db, aMail(f.studioA, { subject: 'First', kind: 'invitation' }));
  const second = await queue(
    f.db,
    aMail(f.studioA, {
      subject: 'Second',
      attachments: [
        sheet,
        { filename: 'whose.txt', contentType: 'text/plain', recipe: { kind: 'test-studio' } },
      ],
    }),
  );
  const failed = await queue(f.db, aMail(f.studioA, { subject: 'Third', kind: 'sale' }));
  await f.db
    .updateTable('outbox')
    .set({ state: 'failed', attempts: 12, last_error: 'connect ECONNREFUSED 127.0.0.1:2525' })
    .where('id', '=', failed)
    .execute();
  const otherStudios = await queue(f.db, aMail(f.studioB, { subject: 'Studio B’s own' }));
  return { ...f, first, second, failed, otherStudios };
}

describe('GET /api/outbox', () => {
  it('lists the studio’s messages newest first, with their attachments’ names', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get('/api/outbox')
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(outboxListSchema.parse(res.body)).toEqual(res.body);
    expect(res.body.total).toBe(3);
    expect(res.body.items.map((m: { subject: string }) => m.subject)).toEqual([
      'Third',
      'Second',
      'First',
    ]);
    expect(res.body.items[1]).toEqual({
      id: f.second,
      kind: 'consignment-dispatch',
      to: 'lanthorn@example.test',
      subject: 'Second',
      state: 'queued',
      attempts: 0,
      lastError: null,
      createdAt: expect.any(String),
      nextAttemptAt: expect.any(String),
      sentAt: null,
      attachments: [
        { index: 0, filename: 'Consignment sheet C-0007.txt', contentType: 'text/plain' },
        { index: 1, filename: 'whose.txt', contentType: 'text/plain' },
      ],
    });
    expect(res.body.items[0]).toMatchObject({
      state: 'failed',
      attempts: 12,
      lastError: 'connect ECONNREFUSED 127.0.0.1:2525',
      nextAttemptAt: null,
    });
  });

  it('pages and filters by state', async () => {
    const f = await fixture();
    const page2 = await request(f.app)
      .get('/api/outbox?page=2&pageSize=2')
      .set(await as(f));
    expect(page2.body.total).toBe(3);
    expect(page2.body.items.map((m: { id: number }) => m.id)).toEqual([f.first]);
    const failed = await request(f.app)
      .get('/api/outbox?state=failed')
      .set(await as(f));
    expect(failed.body).toMatchObject({ total: 1, items: [{ id: f.failed }] });
  });

  it('answers 400 with the issues for a query it cannot read', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get('/api/outbox?pageSize=500&state=lost')
      .set(await as(f));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [
          { path: ['state'], message: 'Choose waiting, sent or not sent.' },
          { path: ['pageSize'], message: 'Ask for at most 100 messages a page.' },
        ],
      },
    });
  });

  it('answers 403 to the assistant and to the venue’s staff', async () => {
    const f = await fixture();
    for (const who of ['assistant', 'gallery'] as const) {
      const res = await request(f.app)
        .get('/api/outbox')
        .set(await as(f, who));
      expect(res.status).toBe(403);
      expect(res.body).toEqual(forbidden);
    }
  });
});

describe('GET /api/outbox/:id', () => {
  it('shows the message with its bodies and the From it will go out with', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get(`/api/outbox/${f.second}`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(outboxMessageSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toMatchObject({
      id: f.second,
      from: testMailFrom,
      to: 'lanthorn@example.test',
      subject: 'Second',
      text: 'The consignment left the studio this morning.',
      html: '<p>The consignment left the studio this morning.</p>',
      messageId: null,
    });
  });

  it('answers 404 for another studio’s message', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get(`/api/outbox/${f.otherStudios}`)
      .set(await as(f));
    expect(res.status).toBe(404);
    expect(res.body).toEqual(messageNotFound);
  });

  it('answers 400 for an id that is not a number', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get('/api/outbox/first')
      .set(await as(f));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['id'], message: 'The message id must be a number.' }],
      },
    });
  });

  it('answers 403 to the assistant and to the venue’s staff', async () => {
    const f = await fixture();
    for (const who of ['assistant', 'gallery'] as const) {
      const res = await request(f.app)
        .get(`/api/outbox/${f.first}`)
        .set(await as(f, who));
      expect(res.status).toBe(403);
      expect(res.body).toEqual(forbidden);
    }
  });
});

describe('GET /api/outbox/:id/attachments/:index', () => {
  it('renders the attachment from its recipe, for the message’s studio, as a download', async () => {
    const f = await fixture();
    const { Cookie } = await as(f);
    const sheet = await getBytes(f.app, `/api/outbox/${f.second}/attachments/0`, Cookie);
    expect(sheet.status).toBe(200);
    expect(sheet.headers['content-type']).toBe('text/plain');
    expect(sheet.headers['content-disposition']).toBe(
      'attachment; filename="Consignment sheet C-0007.txt"',
    );
    expect((sheet.body as Buffer).toString('utf8')).toBe('Moon jar, celadon');
    const whose = await getBytes(f.app, `/api/outbox/${f.second}/attachments/1`, Cookie);
    expect((whose.body as Buffer).toString('utf8')).toBe(`for studio ${f.studioA}`);
  });

  it('answers 404 past the last attachment, and for another studio’s message', async () => {
    const f = await fixture();
    const missing = await request(f.app)
      .get(`/api/outbox/${f.second}/attachments/2`)
      .set(await as(f));
    expect(missing.status).toBe(404);
    expect(missing.body).toEqual({
      error: { code: 'not_found', message: 'That attachment was not found.' },
    });
    const other = await request(f.app)
      .get(`/api/outbox/${f.otherStudios}/attachments/0`)
      .set(await as(f));
    expect(other.status).toBe(404);
    expect(other.body).toEqual(messageNotFound);
  });

  it('answers 400 for an attachment number below 0', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .get(`/api/outbox/${f.second}/attachments/-1`)
      .set(await as(f));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['index'], message: 'Attachments are numbered from 0.' }],
      },
    });
  });

  it('answers 403 to the assistant and to the venue’s staff', async () => {
    const f = await fixture();
    for (const who of ['assistant', 'gallery'] as const) {
      const res = await request(f.app)
        .get(`/api/outbox/${f.second}/attachments/0`)
        .set(await as(f, who));
      expect(res.status).toBe(403);
      expect(res.body).toEqual(forbidden);
    }
  });
});

describe('POST /api/outbox/:id/retry', () => {
  it('queues a failed message again, due now, with a fresh count of attempts', async () => {
    const f = await fixture();
    const before = Date.now();
    const res = await request(f.app)
      .post(`/api/outbox/${f.failed}/retry`)
      .set(await as(f));
    expect(res.status).toBe(200);
    expect(outboxMessageSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toMatchObject({
      id: f.failed,
      state: 'queued',
      attempts: 0,
      // The last error stays in view until the next attempt says otherwise.
      lastError: 'connect ECONNREFUSED 127.0.0.1:2525',
    });
    expect(Date.parse(res.body.nextAttemptAt)).toBeGreaterThanOrEqual(before - 1000);
    expect(Date.parse(res.body.nextAttemptAt)).toBeLessThanOrEqual(Date.now());
  });

  it('has the running worker send it at once', async () => {
    const f = await fixture();
    const smtp = await startTestSmtp();
    const worker = testWorker(f.db, smtp.url, { intervalMs: 60 * 60 * 1000 });
    // What is due goes when the worker starts (every studio's); the failed one waits.
    worker.start();
    await smtp.waitForCount(3);
    try {
      const res = await request(f.app)
        .post(`/api/outbox/${f.failed}/retry`)
        .set(await as(f));
      expect(res.status).toBe(200);
      const received = await smtp.waitForCount(4, 5000);
      expect(received.map((m) => m.parsed.subject)).toEqual([
        'First',
        'Second',
        'Studio B’s own',
        'Third',
      ]);
    } finally {
      await worker.stop();
      worker.close();
      await smtp.stop();
    }
  });

  it('answers 409 for a message already sent', async () => {
    const f = await fixture();
    await f.db
      .updateTable('outbox')
      .set({ state: 'sent', sent_at: new Date().toISOString() })
      .where('id', '=', f.first)
      .execute();
    const res = await request(f.app)
      .post(`/api/outbox/${f.first}/retry`)
      .set(await as(f));
    expect(res.status).toBe(409);
    expect(res.body).toEqual({
      error: { code: 'conflict', message: 'That message has already been sent.' },
    });
  });

  it('answers 404 for another studio’s message and leaves it alone', async () => {
    const f = await fixture();
    await f.db
      .updateTable('outbox')
      .set({ state: 'failed', attempts: 12 })
      .where('id', '=', f.otherStudios)
      .execute();
    const res = await request(f.app)
      .post(`/api/outbox/${f.otherStudios}/retry`)
      .set(await as(f));
    expect(res.status).toBe(404);
    expect(res.body).toEqual(messageNotFound);
    const row = await f.db
      .selectFrom('outbox')
      .select(['state', 'attempts'])
      .where('id', '=', f.otherStudios)
      .executeTakeFirstOrThrow();
    expect(row).toEqual({ state: 'failed', attempts: 12 });
  });

  it('answers 400 for an id that is not a number', async () => {
    const f = await fixture();
    const res = await request(f.app)
      .post('/api/outbox/0/retry')
      .set(await as(f));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'invalid_request',
        message: 'Some fields need attention.',
        issues: [{ path: ['id'], message: 'The message id must be a number above 0.' }],
      },
    });
  });

  it('answers 403 to the assistant and to the venue’s staff', async () => {
    const f = await fixture();
    for (const who of ['assistant', 'gallery'] as const) {
      const res = await request(f.app)
        .post(`/api/outbox/${f.failed}/retry`)
        .set(await as(f, who));
      expect(res.status).toBe(403);
      expect(res.body).toEqual(forbidden);
    }
  });
});
