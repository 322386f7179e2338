import pino from 'pino';
import request from 'supertest';

import { attachmentRenderer } from '@/server/mail/attachments';
import { createMailWorker, type MailWorkerOptions } from '@/server/mail/mail-worker';
import { enqueueMail } from '@/server/mail/outbox.repository';
import { createMailTransport } from '@/server/mail/transport';
import { type OutgoingMail } from '@/shared/schemas/outbox';

/** Attachment kinds only the tests know: plain text, raw bytes, and whose studio asked. */
export const renderTestAttachment = attachmentRenderer({
  'test-text': async (recipe) => Buffer.from(String(recipe.text), 'utf8'),
  'test-bytes': async (recipe) => Buffer.from(String(recipe.base64), 'base64'),
  'test-studio': async (_recipe, _db, owner) => Buffer.from(`for studio ${owner.studioId}`),
});

export const testMailFrom = 'Saltmarsh Kiln <studio@saltmarsh.test>';

/** A clock the tests move on by hand, so back-off needs no waiting. */
export function testClock(start = '2026-11-02T09:00:00.000Z') {
  let now = new Date(start);
  return {
    now: () => new Date(now),
    advance: (ms: number) => {
      now = new Date(now.getTime() + ms);
    },
  };
}

type Db = MailWorkerOptions['db'];

/** A worker sending to `smtpUrl`, silent, with the test kinds of attachment. */
export function testWorker(
  db: Db,
  smtpUrl: string,
  options: Partial<Omit<MailWorkerOptions, 'db' | 'transport'>> = {},
) {
  const transport = createMailTransport(smtpUrl);
  const worker = createMailWorker({
    db,
    transport,
    from: testMailFrom,
    renderAttachment: renderTestAttachment,
    logger: pino({ level: 'silent' }),
    ...options,
  });
  return Object.assign(worker, { close: () => transport.close() });
}

export function aMail(
  studioId: number | null,
  overrides: Partial<OutgoingMail> = {},
): OutgoingMail {
  return {
    studioId,
    to: 'lanthorn@example.test',
    subject: 'Twelve pieces on their way',
    text: 'The consignment left the studio this morning.',
    html: '<p>The consignment left the studio this morning.</p>',
    kind: 'consignment-dispatch',
    ...overrides,
  };
}

export const queue = (db: Db, mail: OutgoingMail, at?: Date) => enqueueMail(db, mail, at);

/** A response body as bytes, whatever its type. */
export async function getBytes(app: Parameters<typeof request>[0], path: string, cookie: string) {
  return request(app)
    .get(path)
    .set('Cookie', cookie)
    .buffer(true)
    .parse((res, callback) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => callback(null, Buffer.concat(chunks)));
    });
}
