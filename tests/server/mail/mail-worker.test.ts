import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { backoffMs } from '@/server/mail/mail-worker';
import { claimDueMail } from '@/server/mail/outbox.repository';

import {
  aMail,
  getBytes,
  queue,
  renderTestAttachment,
  testClock,
  testMailFrom,
  testWorker,
} from '../helpers/mail';
import { startTestSmtp, type TestSmtp } from '../helpers/smtp';
import { studioFixture } from '../helpers/studio-fixture';
import { addStudio, createTestApp } from '../helpers/test-app';

const second = 1000;

let smtp: TestSmtp;
beforeEach(async () => {
  smtp = await startTestSmtp({ refuse: (address) => address.startsWith('nobody@') });
});
afterEach(async () => {
  await smtp.stop().catch(() => undefined);
});

const rowOf = (db: Awaited<ReturnType<typeof createTestApp>>['db'], id: number) =>
  db.selectFrom('outbox').selectAll().where('id', '=', id).executeTakeFirstOrThrow();

describe('enqueueMail', () => {
  it('writes nothing when the transaction it was written in rolls back', async () => {
    const { db } = await createTestApp();
    const studio = await addStudio(db, 'Saltmarsh Kiln');
    await expect(
      db.transaction().execute(async (trx) => {
        await trx
          .updateTable('studios')
          .set({ name: 'Renamed' })
          .where('id', '=', studio)
          .execute();
        await queue(trx, aMail(studio));
        throw new Error('the change was refused');
      }),
    ).rejects.toThrow('the change was refused');
    const outbox = await db.selectFrom('outbox').select('id').execute();
    const { name } = await db
      .selectFrom('studios')
      .select('name')
      .where('id', '=', studio)
      .executeTakeFirstOrThrow();
    expect({ outbox, name }).toEqual({ outbox: [], name: 'Saltmarsh Kiln' });
  });

  it('writes the message with the change when the transaction commits, due at once', async () => {
    const { db } = await createTestApp();
    const studio = await addStudio(db, 'Saltmarsh Kiln');
    const at = new Date('2026-11-02T09:00:00.000Z');
    const id = await db.transaction().execute((trx) =>
      queue(
        trx,
        aMail(studio, {
          attachments: [
            {
              filename: 'sheet.txt',
              contentType: 'text/plain',
              recipe: { kind: 'test-text', text: 'x' },
            },
          ],
        }),
        at,
      ),
    );
    expect(await rowOf(db, id)).toMatchObject({
      studio_id: studio,
      state: 'queued',
      kind: 'consignment-dispatch',
      attempts: 0,
      created_at: at.toISOString(),
      next_attempt_at: at.toISOString(),
      claimed_until: null,
      attachments: JSON.stringify([
        {
          filename: 'sheet.txt',
          contentType: 'text/plain',
          recipe: { kind: 'test-text', text: 'x' },
        },
      ]),
    });
  });

  it('refuses a message without a recipient address, or an attachment named with a folder', async () => {
    const { db } = await createTestApp();
    await expect(queue(db, aMail(null, { to: 'not an address' }))).rejects.toThrow(
      'A message needs one e-mail address to go to.',
    );
    await expect(
      queue(
        db,
        aMail(null, {
          attachments: [
            { filename: '../x.pdf', contentType: 'application/pdf', recipe: { kind: 'x' } },
          ],
        }),
      ),
    ).rejects.toThrow('A file name has no slashes.');
  });
});

describe('the mail worker', () => {
  it('delivers to the SMTP stand-in with its attachments, byte for byte what the page serves', async () => {
    const f = await studioFixture({
      renderAttachment: renderTestAttachment,
      mailFrom: testMailFrom,
    });
    const clock = testClock();
    const worker = testWorker(f.db, smtp.url, { now: clock.now });
    // Every byte value, to show nothing is re-encoded on the way.
    const bytes = Buffer.from(Array.from({ length: 256 }, (_, i) => i));
    const id = await queue(
      f.db,
      aMail(f.studioA, {
        subject: 'Twelve pieces on their way — Lanthorn',
        text: 'Twelve pieces left the studio.\nThe sheet is attached.',
        html: '<p>Twelve pieces left the studio.</p>',
        attachments: [
          {
            filename: 'Consignment sheet – C-0007.txt',
            contentType: 'text/plain',
            recipe: { kind: 'test-text', text: 'Moon jar, celadon — £1,250.00' },
          },
          {
            filename: 'labels.bin',
            contentType: 'application/octet-stream',
            recipe: { kind: 'test-bytes', base64: bytes.toString('base64') },
          },
        ],
      }),
      clock.now(),
    );

    expect(await worker.runOnce()).toBe(1);
    worker.close();
    const [mail] = await smtp.waitForCount(1);
    expect(mail!.envelope).toEqual({
      from: 'studio@saltmarsh.test',
      to: ['lanthorn@example.test'],
    });
    expect(mail!.parsed.subject).toBe('Twelve pieces on their way — Lanthorn');
    expect(mail!.parsed.from?.value).toEqual([
      { name: 'Saltmarsh Kiln', address: 'studio@saltmarsh.test' },
    ]);
    expect(mail!.parsed.text?.trim()).toBe(
      'Twelve pieces left the studio.\nThe sheet is attached.',
    );
    expect(mail!.parsed.html).toBe('<p>Twelve pieces left the studio.</p>');
    expect(mail!.parsed.attachments.map((a) => [a.filename, a.contentType])).toEqual([
      ['Consignment sheet – C-0007.txt', 'text/plain'],
      ['labels.bin', 'application/octet-stream'],
    ]);

    const row = await rowOf(f.db, id);
    expect(row).toMatchObject({
      state: 'sent',
      attempts: 1,
      last_error: null,
      sent_at: clock.now().toISOString(),
      message_id: mail!.parsed.messageId,
      from_address: testMailFrom,
      claimed_until: null,
      claim_token: null,
    });
    expect(row.message_id).toMatch(/^<saggar\.\d+\.\d+@saltmarsh\.test>$/);

    const cookie = await f.cookie('owner');
    for (const [index, received] of mail!.parsed.attachments.entries()) {
      const served = await getBytes(f.app, `/api/outbox/${id}/attachments/${index}`, cookie);
      expect(served.status).toBe(200);
      expect(Buffer.compare(served.body as Buffer, received.content)).toBe(0);
    }
    expect(mail!.parsed.attachments[1]!.content.equals(bytes)).toBe(true);
  });

  it('keeps the message queued with its error while the mail server is down, then delivers it', async () => {
    const { db } = await createTestApp();
    const clock = testClock();
    const worker = testWorker(db, smtp.url, { now: clock.now });
    await smtp.stop();
    const id = await queue(db, aMail(null), clock.now());

    expect(await worker.runOnce()).toBe(1);
    let row = await rowOf(db, id);
    expect(row).toMatchObject({ state: 'queued', attempts: 1, claimed_until: null });
    expect(row.last_error).toMatch(/ECONNREFUSED/);
    expect(row.next_attempt_at).toBe(new Date(clock.now().getTime() + 15 * second).toISOString());

    // Not due again until the back-off has passed.
    clock.advance(14 * second);
    expect(await worker.runOnce()).toBe(0);
    clock.advance(1 * second);
    expect(await worker.runOnce()).toBe(1);
    row = await rowOf(db, id);
    expect(row).toMatchObject({ state: 'queued', attempts: 2 });
    expect(row.next_attempt_at).toBe(new Date(clock.now().getTime() + 30 * second).toISOString());

    await smtp.restart();
    clock.advance(30 * second);
    expect(await worker.runOnce()).toBe(1);
    worker.close();
    await smtp.waitForCount(1);
    expect(smtp.messages).toHaveLength(1);
    expect(await rowOf(db, id)).toMatchObject({ state: 'sent', attempts: 3, last_error: null });
  });

  it('backs off 15 s, doubling, never more than an hour', () => {
    expect([1, 2, 3, 4, 8, 9, 12].map((n) => backoffMs(n) / second)).toEqual([
      15, 30, 60, 120, 1920, 3600, 3600,
    ]);
  });

  it('gives a message up as failed after the last attempt, and at once when the server refuses it for good', async () => {
    const { db } = await createTestApp();
    const clock = testClock();
    const worker = testWorker(db, smtp.url, { now: clock.now, maxAttempts: 2 });
    const refused = await queue(db, aMail(null, { to: 'nobody@example.test' }), clock.now());
    expect(await worker.runOnce()).toBe(1);
    const refusedRow = await rowOf(db, refused);
    expect(refusedRow).toMatchObject({ state: 'failed', attempts: 1 });
    expect(refusedRow.last_error).toMatch(/550/);

    await smtp.stop();
    const unreachable = await queue(db, aMail(null), clock.now());
    await worker.runOnce();
    clock.advance(backoffMs(1));
    await worker.runOnce();
    worker.close();
    expect(await rowOf(db, unreachable)).toMatchObject({ state: 'failed', attempts: 2 });
    expect(smtp.messages).toHaveLength(0);
  });

  it('records an attachment kind nobody registered as the error, and keeps the message', async () => {
    const { db } = await createTestApp();
    const clock = testClock();
    const worker = testWorker(db, smtp.url, { now: clock.now });
    const id = await queue(
      db,
      aMail(null, {
        attachments: [
          { filename: 'x.pdf', contentType: 'application/pdf', recipe: { kind: 'statement-pdf' } },
        ],
      }),
      clock.now(),
    );
    await worker.runOnce();
    worker.close();
    expect(await rowOf(db, id)).toMatchObject({
      state: 'queued',
      attempts: 1,
      last_error: 'No renderer is registered for attachments of kind "statement-pdf".',
    });
    expect(smtp.messages).toHaveLength(0);
  });

  it('sends at once when nudged by a message written in a committed transaction', async () => {
    const { db } = await createTestApp();
    const worker = testWorker(db, smtp.url, { intervalMs: 60 * 60 * second });
    worker.start();
    try {
      await smtp.waitForCount(0);
      await db.transaction().execute((trx) => queue(trx, aMail(null, { subject: 'Nudged' })));
      const [mail] = await smtp.waitForCount(1, 5 * second);
      expect(mail!.parsed.subject).toBe('Nudged');
    } finally {
      await worker.stop();
      worker.close();
    }
  });

  it('stops after the message in hand, leaving the rest queued and unclaimed', async () => {
    const { db } = await createTestApp();
    const worker = testWorker(db, smtp.url);
    const first = await queue(db, aMail(null, { subject: 'First' }));
    const second = await queue(db, aMail(null, { subject: 'Second' }));
    const run = worker.runOnce();
    await worker.stop();
    expect(await run).toBe(1);
    worker.close();
    expect((await rowOf(db, first)).state).toBe('sent');
    expect(await rowOf(db, second)).toMatchObject({
      state: 'queued',
      attempts: 0,
      claimed_until: null,
    });
  });
});

describe('several workers over one database', () => {
  let dir: string;
  beforeEach(() => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-mail-race-'));
  });
  afterEach(() => fs.rmSync(dir, { recursive: true, force: true }));

  it('never send a message twice, however they race', async () => {
    const dbFile = path.join(dir, 'saggar.db');
    const one = await createTestApp({ dbFile });
    const two = await createTestApp({ dbFile });
    const subjects = Array.from({ length: 40 }, (_, i) => `Message ${i + 1}`);
    for (const subject of subjects) await queue(one.db, aMail(null, { subject }));

    const workers = [testWorker(one.db, smtp.url), testWorker(two.db, smtp.url)];
    const handled = await Promise.all(workers.map((w) => w.runOnce()));
    workers.forEach((w) => w.close());

    // Both took part, so their claims really did meet.
    expect(handled[0]! + handled[1]!).toBe(40);
    expect(Math.min(...handled)).toBeGreaterThan(0);
    await smtp.waitForCount(40);
    const received = smtp.messages.map((m) => m.parsed.subject).sort();
    expect(received).toEqual([...subjects].sort());
    const states = await two.db.selectFrom('outbox').select(['state', 'attempts']).execute();
    expect(states.every((s) => s.state === 'sent' && s.attempts === 1)).toBe(true);
    await Promise.all([one.db.destroy(), two.db.destroy()]);
  });

  it('let only one of two claims on the same message succeed, until the claim lapses', async () => {
    const dbFile = path.join(dir, 'saggar.db');
    const one = await createTestApp({ dbFile });
    const two = await createTestApp({ dbFile });
    const at = new Date('2026-11-02T09:00:00.000Z');
    const id = await queue(one.db, aMail(null), at);

    const claims = await Promise.all([
      claimDueMail(one.db, at, 60 * second),
      claimDueMail(two.db, at, 60 * second),
    ]);
    expect(claims.filter(Boolean).map((c) => c!.row.id)).toEqual([id]);

    // A worker that died holding it: another takes it over once the claim has lapsed.
    expect(await claimDueMail(two.db, new Date(at.getTime() + 59 * second), 60 * second)).toBe(
      undefined,
    );
    const takenOver = await claimDueMail(two.db, new Date(at.getTime() + 61 * second), 60 * second);
    expect(takenOver?.row.id).toBe(id);
    await Promise.all([one.db.destroy(), two.db.destroy()]);
  });
});
