import { simpleParser } from 'mailparser';
import sharp from 'sharp';

import { saleNoticeHoldMs } from '@/server/sales/sale-notice';

import { as } from '../helpers/consignment-fixture';
import { testMailFrom, testWorker } from '../helpers/mail';
import {
  auditOf,
  lineRow,
  oneLine,
  saleMails,
  saleOf,
  type SalesFixture,
  salesFixture,
  sell,
  undo,
  uploadWorkPhoto,
} from '../helpers/sales-fixture';
import { startTestSmtp, type TestSmtp } from '../helpers/smtp';
import { addTestTrigger, dropTestTrigger } from '../helpers/test-triggers';

let smtp: TestSmtp;
beforeEach(async () => {
  smtp = await startTestSmtp();
});
afterEach(async () => {
  await smtp.stop().catch(() => undefined);
});

/**
 * The fixture without the venue's dispatch e-mail (tests/server/consignments/dispatch-mail.test.ts
 * covers it), so the outbox holds only what sales write.
 */
async function fixture() {
  const f = await salesFixture({ mailFrom: testMailFrom });
  await f.db.deleteFrom('outbox').where('kind', '=', 'consignment-dispatch').execute();
  return f;
}

/** A worker with the app's own renderers, its clock `aheadMs` ahead of the real one. */
const workerFor = (f: SalesFixture, aheadMs: number) =>
  testWorker(f.db, smtp.url, {
    renderAttachment: f.context.renderAttachment,
    composeMail: f.context.composeMail,
    now: () => new Date(Date.now() + aheadMs),
  });

const held = (f: SalesFixture) =>
  f.db.selectFrom('outbox').select('id').where('kind', '=', 'sale').execute();

describe('the maker’s sale e-mail', () => {
  it('is queued to the studio’s owner with the sale, held two minutes for more', async () => {
    const f = await fixture();
    const before = Date.now();
    const res = await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    expect(res.status).toBe(201);
    const [mail, ...more] = await saleMails(f);
    expect(more).toEqual([]);
    expect(mail).toMatchObject({
      studio_id: f.studioA,
      to_address: 'owner-a@example.test',
      subject: 'Sold at Gallery of A: A-2 Tall bottle, £240.00',
      state: 'queued',
      attempts: 0,
    });
    // Due when the hold (saleNoticeHoldMs, two minutes) is over, counted from the sale.
    const due = Date.parse(mail!.next_attempt_at);
    expect(due - Date.parse(mail!.created_at)).toBe(saleNoticeHoldMs);
    expect(due).toBeGreaterThanOrEqual(before + saleNoticeHoldMs);
    expect(due).toBeLessThanOrEqual(Date.now() + saleNoticeHoldMs);
    expect((await lineRow(f, f.lines.tallBottle)).sale_mail_id).toBe(mail!.id);
    // Not yet due: a worker running now sends nothing.
    const worker = workerFor(f, 0);
    expect(await worker.runOnce()).toBe(0);
    worker.close();
  });

  it('is written in the sale’s transaction: a sale refused, or failing after it, queues nothing', async () => {
    const f = await fixture();
    expect((await sell(f, 'gallery', f.lines.moonJar, 10_001)).status).toBe(400);
    expect(await saleMails(f)).toEqual([]);

    // The database refuses the very last write of the sale, after the e-mail was written.
    await addTestTrigger(f.db, {
      name: 'refuse_sale_mail',
      table: 'consignment_lines',
      event: 'update of sale_mail_id',
      when: 'new.sale_mail_id is not null',
      then: { refuse: 'refused by the test' },
    });
    const failed = await sell(f, 'gallery', f.lines.moonJar, 10_000);
    expect(failed.status).toBe(500);
    expect(failed.body).toEqual({
      error: { code: 'internal', message: 'Something went wrong on our side. Try again.' },
    });
    expect(await saleMails(f)).toEqual([]);
    expect((await lineRow(f, f.lines.moonJar)).state).toBe('consigned');
    expect(await auditOf(f, f.lines.moonJar)).toEqual([]);
    await dropTestTrigger(f.db, 'refuse_sale_mail', 'consignment_lines');
    expect((await sell(f, 'gallery', f.lines.moonJar, 10_000)).status).toBe(201);
    expect(await saleMails(f)).toHaveLength(1);
  });

  it('gathers the sales made while it is held into one message, whoever records them', async () => {
    const f = await fixture();
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    const [first] = await saleMails(f);
    await sell(f, 'owner', f.lines.moonJar, 10_000);
    const receipt = await as(f, 'gallery').post(`/api/consignments/${f.sent.id}/sales`, {
      sales: [{ lineId: f.lines.teaBowl, ...saleOf(f, 45_000, { discountReason: 'Trade' }) }],
    });
    expect(receipt.status).toBe(201);
    const mails = await saleMails(f);
    expect(mails).toHaveLength(1);
    // The same message, rewritten, still due when the first sale's hold ends.
    expect(mails[0]).toMatchObject({ id: first!.id, next_attempt_at: first!.next_attempt_at });
    // £240 + £100 + £450 = £790; shares £124.80 + £52.00 + £234.00 = £410.80 (venue A's 40%
    // + 20% VAT, worked in sale.test.ts).
    expect(mails[0]!.subject).toBe('3 pieces sold at Gallery of A: £790.00');
    expect(oneLine(mails[0]!.text_body)).toContain(
      'Gallery of A recorded these sales: £790.00 in all, of which your share is £410.80',
    );
    for (const lineId of Object.values(f.lines)) {
      expect((await lineRow(f, lineId)).sale_mail_id).toBe(first!.id);
    }
  });

  it('starts a new message once the held one is due, and once it has gone', async () => {
    const f = await fixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    // Two minutes later, before the worker has taken it: due, so no longer held.
    await f.db
      .updateTable('outbox')
      .set({ next_attempt_at: new Date(Date.now() - 1000).toISOString() })
      .execute();
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    const [due, fresh] = await saleMails(f);
    expect(due!.subject).toBe('Sold at Gallery of A: A-1 Moon jar, £100.00');
    expect(fresh!.subject).toBe('Sold at Gallery of A: A-2 Tall bottle, £240.00');
    expect(Date.parse(fresh!.next_attempt_at)).toBeGreaterThan(Date.now() + saleNoticeHoldMs / 2);

    // The worker, its clock past the second hold, sends both; a later sale starts a third.
    const worker = workerFor(f, saleNoticeHoldMs + 1000);
    expect(await worker.runOnce()).toBe(2);
    worker.close();
    await smtp.waitForCount(2);
    await sell(f, 'owner', f.lines.teaBowl, 48_000);
    const mails = await saleMails(f);
    expect(mails.map((m) => m.state)).toEqual(['sent', 'sent', 'queued']);
    expect(mails[2]!.subject).toBe('Sold at Gallery of A: A-3 Tea bowl, £480.00');
    expect((await lineRow(f, f.lines.teaBowl)).sale_mail_id).toBe(mails[2]!.id);
  });

  it('is rewritten without a sale undone while it is held, and dropped with its last sale', async () => {
    const f = await fixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    const [mail] = await saleMails(f);
    expect(mail!.subject).toBe('2 pieces sold at Gallery of A: £340.00');

    expect((await undo(f, 'gallery', f.lines.moonJar)).status).toBe(200);
    const [rewritten, ...others] = await saleMails(f);
    expect(others).toEqual([]);
    expect(rewritten).toMatchObject({
      id: mail!.id,
      subject: 'Sold at Gallery of A: A-2 Tall bottle, £240.00',
      next_attempt_at: mail!.next_attempt_at,
    });
    expect(rewritten!.text_body).not.toContain('Moon jar');

    expect((await undo(f, 'owner', f.lines.tallBottle)).status).toBe(200);
    // Nothing left to say: the worker drops the message when it falls due, and sends nothing.
    expect(await saleMails(f)).toEqual([]);
    const worker = workerFor(f, saleNoticeHoldMs + 1000);
    await worker.runOnce();
    await worker.close();
    expect(await held(f)).toEqual([]);
    expect(smtp.messages.filter((m) => m.parsed.subject?.includes('Sold'))).toEqual([]);
    // Sold again: a new message, held from now.
    await sell(f, 'gallery', f.lines.tallBottle, 23_000, { discountReason: 'Second thoughts' });
    const [again] = await saleMails(f);
    expect(again!.id).not.toBe(mail!.id);
    expect(again!.subject).toBe('Sold at Gallery of A: A-2 Tall bottle, £230.00');
  });

  it('stays as it went when a sale is undone after the message was sent', async () => {
    const f = await fixture();
    await sell(f, 'gallery', f.lines.moonJar, 10_000);
    const worker = workerFor(f, saleNoticeHoldMs + 1000);
    expect(await worker.runOnce()).toBe(1);
    worker.close();
    await smtp.waitForCount(1);
    const [sent] = await saleMails(f);
    expect((await undo(f, 'gallery', f.lines.moonJar)).status).toBe(200);
    // The statement is what counts from here: the sent message is kept as it was, no other.
    expect(await saleMails(f)).toEqual([sent]);
  });

  it('reaches the maker saying what sold, for how much, the split, and each piece’s photo inline', async () => {
    const f = await fixture();
    await uploadWorkPhoto(f, f.works[1]!, '#9db8a5');
    await sell(f, 'gallery', f.lines.tallBottle, 24_000);
    await sell(f, 'assistant', f.lines.moonJar, 9_998, { discountReason: 'Mark on the rim' });

    const worker = workerFor(f, saleNoticeHoldMs + 1000);
    expect(await worker.runOnce()).toBe(1);
    worker.close();
    const [mail] = await smtp.waitForCount(1);
    expect(mail!.envelope).toEqual({
      from: 'studio@saltmarsh.test',
      to: ['owner-a@example.test'],
    });
    // £240 + £99.98 = £339.98; the maker's shares £124.80 + £51.99 = £176.79 (venue A's 40%
    // commission + 20% VAT on it, HMRC VAT rates; rounding to the penny, HMRC VATREC12030).
    expect(mail!.parsed.subject).toBe('2 pieces sold at Gallery of A: £339.98');
    const text = oneLine(mail!.parsed.text ?? '');
    expect(text).toContain(
      'Gallery of A recorded these sales: £339.98 in all, of which your share is £176.79',
    );
    const day = new Intl.DateTimeFormat('en-GB', {
      day: 'numeric',
      month: 'short',
      year: 'numeric',
      timeZone: 'UTC',
    }).format(new Date(`${f.today}T00:00:00Z`));
    expect(text).toContain(
      [
        'A-2 Tall bottle',
        `Sold at Gallery of A on ${day} for £240.00.`,
        'Commission £96.00, VAT on commission £19.20; your share £124.80.',
        `${f.sent.reference}, recorded by gallery-a at Gallery of A.`,
      ].join(' '),
    );
    expect(text).toContain(
      [
        'A-1 Moon jar',
        `Sold at Gallery of A on ${day} for £99.98 (list price £100.00; Mark on the rim).`,
        'Commission £39.99, VAT on commission £8.00; your share £51.99.',
        `${f.sent.reference}, recorded by the studio (assistant-a).`,
      ].join(' '),
    );

    // One picture, the tall bottle's, shown inside the message where the HTML points at it.
    const cid = `sale-${f.lines.tallBottle}@saggar`;
    expect(
      mail!.parsed.attachments.map((a) => [a.cid, a.contentType, a.contentDisposition]),
    ).toEqual([[cid, 'image/jpeg', 'inline']]);
    // Read as sent: mailparser otherwise swaps the cid: links for the pictures' data.
    const { html } = await simpleParser(mail!.raw, { keepCidLinks: true });
    expect(html).toContain(`<img src="cid:${cid}" width="96" height="96" alt="A-2 Tall bottle"`);
    expect(html).not.toContain(`cid:sale-${f.lines.moonJar}@`);
    // The bytes are a JPEG (every mail program shows one) of the photo uploaded: sharp reads
    // its format, size and colour.
    const picture = sharp(mail!.parsed.attachments[0]!.content);
    expect(await picture.metadata()).toMatchObject({ format: 'jpeg', width: 240, height: 240 });
    const { channels } = await picture.stats();
    const [r, g, b] = [0x9d, 0xb8, 0xa5];
    expect(Math.abs(channels[0]!.mean - r)).toBeLessThan(4);
    expect(Math.abs(channels[1]!.mean - g)).toBeLessThan(4);
    expect(Math.abs(channels[2]!.mean - b)).toBeLessThan(4);
    expect((await saleMails(f))[0]).toMatchObject({ state: 'sent', attempts: 1 });
  });
});
