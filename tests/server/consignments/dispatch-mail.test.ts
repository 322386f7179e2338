import request from 'supertest';

import { backoffMs } from '@/server/mail/mail-worker';
import { formatMoney } from '@/shared/money/format';
import { consignmentSchema } from '@/shared/schemas/consignment';

import { pdfPages, requirePoppler, squash } from '../../documents/helpers/pdf';
import { as, soundCheck } from '../helpers/consignment-fixture';
import {
  type DocumentFixture,
  documentFixture,
  readyToSend,
  testAppUrl,
} from '../helpers/document-fixture';
import { getBytes, testClock, testMailFrom, testWorker } from '../helpers/mail';
import { startTestSmtp, type TestSmtp } from '../helpers/smtp';

let smtp: TestSmtp;
beforeAll(requirePoppler);
beforeEach(async () => {
  smtp = await startTestSmtp();
});
afterEach(async () => {
  await smtp.stop().catch(() => undefined);
});

/** A worker with the app's own attachment renderers: the consignment PDFs, not the test kinds. */
const workerFor = (f: DocumentFixture, options: Parameters<typeof testWorker>[2] = {}) =>
  testWorker(f.db, smtp.url, { renderAttachment: f.context.renderAttachment, ...options });

const dispatch = (f: DocumentFixture) =>
  as(f, 'owner').post(`/api/consignments/${f.draft.id}/dispatch`);

const outbox = (f: DocumentFixture) => f.db.selectFrom('outbox').selectAll().execute();
const invitations = (f: DocumentFixture) => f.db.selectFrom('invitations').selectAll().execute();

async function consignmentOf(f: DocumentFixture) {
  const res = await as(f, 'owner').get(`/api/consignments/${f.draft.id}`);
  return consignmentSchema.parse(res.body);
}

/** The routes serving what each attachment is, in the order the mail attaches them. */
const routes = ['sheet.pdf', 'condition-report.pdf', 'labels.pdf'] as const;

const attachmentNames = (reference: string) => [
  `${reference} consignment sheet.pdf`,
  `${reference} condition report.pdf`,
  `${reference} labels.pdf`,
];

const inviteLink = new RegExp(
  `${testAppUrl.replaceAll('.', '\\.')}/invite/([A-Za-z0-9_-]+)(?=[\\s"<]|$)`,
);

describe('POST /api/consignments/:id/dispatch, the e-mail to the venue', () => {
  it('queues one message with the three documents as recipes, in the dispatch’s transaction', async () => {
    const f = await documentFixture();
    await readyToSend(f);
    expect(await outbox(f)).toEqual([]);
    const res = await dispatch(f);
    expect(res.status).toBe(200);
    const rows = await outbox(f);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({
      studio_id: f.studioA,
      kind: 'consignment-dispatch',
      to_address: 'desk@gallery-a.example',
      state: 'queued',
      attempts: 0,
    });
    const names = attachmentNames(f.draft.reference);
    expect(JSON.parse(rows[0]!.attachments!)).toEqual([
      {
        filename: names[0],
        contentType: 'application/pdf',
        recipe: { kind: 'consignment-sheet', consignmentId: f.draft.id },
      },
      {
        filename: names[1],
        contentType: 'application/pdf',
        recipe: { kind: 'condition-report', consignmentId: f.draft.id, stages: 'dispatch' },
      },
      {
        filename: names[2],
        contentType: 'application/pdf',
        recipe: { kind: 'labels', consignmentId: f.draft.id },
      },
    ]);
  });

  it('reaches the venue with the PDFs byte for byte as the routes serve them, and an invitation that works', async () => {
    const f = await documentFixture({ mailFrom: testMailFrom });
    await readyToSend(f);
    expect((await dispatch(f)).status).toBe(200);
    const consignment = await consignmentOf(f);

    const worker = workerFor(f);
    expect(await worker.runOnce()).toBe(1);
    worker.close();
    const [mail] = await smtp.waitForCount(1);
    expect(smtp.messages).toHaveLength(1);
    expect(mail!.envelope).toEqual({
      from: 'studio@saltmarsh.test',
      to: ['desk@gallery-a.example'],
    });
    expect(mail!.parsed.subject).toBe(
      `Studio A has sent 4 pieces: Winter show (${consignment.reference})`,
    );
    const attached = mail!.parsed.attachments;
    expect(attached.map((a) => [a.filename, a.contentType])).toEqual(
      attachmentNames(consignment.reference).map((name) => [name, 'application/pdf']),
    );

    // What arrived is what the owner downloads right after: the same data gives the same file
    // (docs/documents.md). Before any arrival check the dispatch-stage condition report is the
    // latest one, which is what the route serves.
    const owner = await f.cookie('owner');
    for (const [i, route] of routes.entries()) {
      const served = await getBytes(f.app, `/api/consignments/${f.draft.id}/${route}`, owner);
      expect(served.status).toBe(200);
      const bytes = attached[i]!.content;
      expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      expect(Buffer.compare(bytes, served.body as Buffer)).toBe(0);
    }
    // pdftotext (poppler-utils): the attached sheet is this consignment's.
    expect(squash(pdfPages(attached[0]!.content).join(' '))).toContain(
      `Total, 4 pieces ${formatMoney(consignment.totals!.listPrice, 'en-GB')}`,
    );

    const text = mail!.parsed.text ?? '';
    expect(text).toContain(
      `Together they are listed at ${formatMoney(consignment.totals!.listPrice, 'en-GB')}.`,
    );
    // The urn is over the 16 kg guideline weight (docs/cautions.md).
    expect(squash(text)).toContain('One piece weighs more than 16 kg');
    const link = inviteLink.exec(text);
    expect(link).not.toBeNull();
    expect(mail!.parsed.html).toContain(`href="${link![0]}"`);
    expect(text).not.toContain('/venue/consignments/');

    const accepted = await request(f.app)
      .post('/api/invitations/accept')
      .send({ token: link![1], name: 'Dora Finch', password: 'a long enough password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body.user).toMatchObject({
      name: 'Dora Finch',
      email: 'desk@gallery-a.example',
    });
    const cookie = ([] as string[])
      .concat(accepted.headers['set-cookie'] ?? [])
      .map((c) => c.split(';')[0])
      .join('; ');
    const seen = await request(f.app).get(`/api/consignments/${f.draft.id}`).set('Cookie', cookie);
    expect(seen.status).toBe(200);
    expect(seen.body).toMatchObject({ id: f.draft.id, state: 'dispatched' });
    const sheet = await getBytes(f.app, `/api/consignments/${f.draft.id}/sheet.pdf`, cookie);
    expect(Buffer.compare(sheet.body as Buffer, attached[0]!.content)).toBe(0);
  });

  it('keeps the condition report as it went out once the venue has added its arrival checks', async () => {
    const f = await documentFixture({ mailFrom: testMailFrom });
    await readyToSend(f);
    expect((await dispatch(f)).status).toBe(200);
    const worker = workerFor(f);
    await worker.runOnce();
    worker.close();
    const [mail] = await smtp.waitForCount(1);
    const sent = mail!.parsed.attachments[1]!.content;

    const ack = await as(f, 'gallery').post(`/api/consignments/${f.draft.id}/acknowledge`, {
      reports: f.draft.lines.map((line, i) => ({
        lineId: line.id,
        examinerName: 'Priya',
        examinedOn: '2026-11-22',
        findings: i === 0 ? [{ kind: 'crazing', grade: 'slight', location: 'inside' }] : [],
      })),
    });
    expect(ack.status).toBe(200);

    const owner = await f.cookie('owner');
    const [row] = await outbox(f);
    const resent = await getBytes(f.app, `/api/outbox/${row!.id}/attachments/1`, owner);
    expect(resent.status).toBe(200);
    expect(Buffer.compare(resent.body as Buffer, sent)).toBe(0);
    // pdftotext (poppler-utils): the mailed report has no arrival checks; the route's has them.
    expect(squash(pdfPages(sent).join(' ')).split('Not checked yet.')).toHaveLength(5);
    const latest = await getBytes(
      f.app,
      `/api/consignments/${f.draft.id}/condition-report.pdf`,
      owner,
    );
    const latestText = squash(pdfPages(latest.body as Buffer).join(' '));
    expect(latestText).toContain('Examined by Priya on 22 Nov 2026');
    expect(latestText).toContain('New since dispatch: Crazing, slight, inside');
    expect(latestText).not.toContain('Not checked yet.');
  });

  it('links to the consignment’s page when the contact is already the venue’s staff', async () => {
    const f = await documentFixture({ venueEmail: 'gallery-a@example.test' });
    await readyToSend(f);
    expect((await dispatch(f)).status).toBe(200);
    const [row] = await outbox(f);
    expect(row!.to_address).toBe('gallery-a@example.test');
    expect(row!.text_body).toContain(`${testAppUrl}/venue/consignments/${f.draft.id}`);
    expect(row!.text_body).not.toContain('/invite/');
    expect(row!.html_body).toContain(`href="${testAppUrl}/venue/consignments/${f.draft.id}"`);
    expect(await invitations(f)).toEqual([]);
  });

  it('still sends the consignment while the mail server is down, and the mail once it is back', async () => {
    const f = await documentFixture({ mailFrom: testMailFrom });
    await readyToSend(f);
    await smtp.stop();
    const res = await dispatch(f);
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('dispatched');
    expect((await consignmentOf(f)).state).toBe('dispatched');

    const clock = testClock(new Date().toISOString());
    const worker = workerFor(f, { now: clock.now });
    expect(await worker.runOnce()).toBe(1);
    const [row] = await outbox(f);
    expect(row).toMatchObject({ state: 'queued', attempts: 1, sent_at: null });
    expect(row!.last_error).toMatch(/ECONNREFUSED/);
    // The owner's Sent mail says the same.
    const shown = await as(f, 'owner').get(`/api/outbox/${row!.id}`);
    expect(shown.body).toMatchObject({
      kind: 'consignment-dispatch',
      state: 'queued',
      attempts: 1,
      lastError: row!.last_error,
    });

    await smtp.restart();
    clock.advance(backoffMs(1));
    expect(await worker.runOnce()).toBe(1);
    worker.close();
    const [mail] = await smtp.waitForCount(1);
    expect(mail!.envelope.to).toEqual(['desk@gallery-a.example']);
    expect(mail!.parsed.attachments.map((a) => a.filename)).toEqual(
      attachmentNames(f.draft.reference),
    );
    expect((await outbox(f))[0]).toMatchObject({ state: 'sent', attempts: 2, last_error: null });
  });

  it('sends a consignment to a venue without an e-mail address, writing no message', async () => {
    const f = await documentFixture({ venueEmail: null });
    await readyToSend(f);
    const res = await dispatch(f);
    expect(res.status).toBe(200);
    expect(res.body.state).toBe('dispatched');
    expect(await outbox(f)).toEqual([]);
    expect(await invitations(f)).toEqual([]);
    const audit = await f.db
      .selectFrom('audit_log')
      .select('after')
      .where('action', '=', 'consignment.dispatched')
      .executeTakeFirstOrThrow();
    expect(JSON.parse(audit.after!)).toMatchObject({
      mailedTo: null,
      mailId: null,
      invited: false,
    });
  });

  it('writes no message when the dispatch is refused', async () => {
    const f = await documentFixture();
    const owner = as(f, 'owner');
    expect((await owner.post(`/api/consignments/${f.draft.id}/agree`)).status).toBe(200);
    for (const line of f.draft.lines.slice(0, 3)) {
      await owner.post(`/api/consignment-lines/${line.id}/condition-reports`, {
        stage: 'dispatch',
        ...soundCheck,
      });
    }
    const res = await dispatch(f);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(
      `Check the condition of every piece before sending ${f.draft.reference}. Not yet checked: A-4 Garden urn.`,
    );
    expect(await outbox(f)).toEqual([]);
    expect(await invitations(f)).toEqual([]);
    expect((await consignmentOf(f)).state).toBe('agreed');
  });
});
