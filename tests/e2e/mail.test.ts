import fs from 'node:fs';
import path from 'node:path';

import { type Page } from 'playwright-core';

import { openDatabase } from '@/server/db/database';
import { demoSignIns } from '@/server/demo/demo-studio';
import { enqueueMail } from '@/server/mail/outbox.repository';
import { mailLayout } from '@/server/mail/templates/layout';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { openSection, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();
const [maker, assistant] = demoSignIns.people;

/**
 * Two messages the mail server refused, written straight into the server's database file as a
 * change elsewhere in the product would write them: failed, so that the server's worker leaves
 * them until someone presses "Send again".
 */
async function writeFailedMessages(dbFile: string) {
  const db = openDatabase(dbFile);
  try {
    const studio = await db
      .selectFrom('studios')
      .select('id')
      .orderBy('id')
      .executeTakeFirstOrThrow();
    return await db.transaction().execute(async (trx) => {
      const dispatch = mailLayout({
        heading: 'Twelve pieces are on their way to you',
        paragraphs: [
          'Saltmarsh Kiln has sent twelve pieces for “Winter Salt”, insured at £4,210.00 in transit.',
          'Please check each piece against the consignment sheet when they arrive.',
        ],
        action: { label: 'See the pieces', url: 'http://localhost:8080/venue' },
        footer: 'You get this because The Lanthorn Gallery takes work from Saltmarsh Kiln.',
      });
      const invitation = mailLayout({
        heading: 'Sign in to record sales',
        paragraphs: ['Saltmarsh Kiln invites you to record sales of its work at The Lanthorn.'],
        footer: 'Sent by Saggar for Saltmarsh Kiln.',
      });
      const ids = [
        await enqueueMail(trx, {
          studioId: studio.id,
          kind: 'consignment-dispatch',
          to: 'priya@lanthorn.example',
          subject: 'Winter Salt: twelve pieces on their way',
          ...dispatch,
        }),
        await enqueueMail(trx, {
          studioId: studio.id,
          kind: 'invitation',
          to: 'priya@lanthorn.example',
          subject: 'Sign in to Saggar for Saltmarsh Kiln',
          ...invitation,
        }),
      ];
      await trx
        .updateTable('outbox')
        .set({ state: 'failed', attempts: 12, last_error: 'connect ECONNREFUSED 127.0.0.1:2525' })
        .where('id', 'in', ids)
        .execute();
      return { dispatch: ids[0]!, invitation: ids[1]! };
    });
  } finally {
    await db.destroy();
  }
}

/** The sandboxed frame of the message as sent: scripts cannot run there, axe's neither. */
const outsideTheMessage = { exclude: ['[data-testid="message-body-html"]'] };

async function openMail(page: Page) {
  await openSection(page, 'mail');
  await page.getByTestId('mail-screen').waitFor();
}

const emlFiles = () => {
  const dir = path.join(env.server.dataDir, 'mail');
  return fs.existsSync(dir)
    ? fs.readdirSync(dir).map((f) => fs.readFileSync(path.join(dir, f), 'utf8'))
    : [];
};

describe('Sent mail', () => {
  let ids: { dispatch: number; invitation: number };

  it('starts empty, then shows what could not be sent, and sends it again (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await openMail(page);
    await expect(page.getByTestId('mail-screen').innerText()).resolves.toContain('No e-mail yet');
    await screenshot(page, 'mail-empty-phone');
    await expectAccessible(page);

    ids = await writeFailedMessages(env.server.dbFile);
    await page.reload();
    await page.getByTestId(`mail-card-${ids.invitation}`).waitFor();
    await expect(page.getByTestId(`mail-card-${ids.dispatch}`).innerText()).resolves.toMatch(
      /Not sent[\s\S]*Winter Salt[\s\S]*ECONNREFUSED/,
    );
    await screenshot(page, 'mail-list-phone');
    await expectAccessible(page);

    await page.getByTestId(`mail-card-${ids.dispatch}`).click();
    await page.getByTestId('message-screen').waitFor();
    await expect(page.getByTestId('message-error').innerText()).resolves.toContain('ECONNREFUSED');
    await expect(page.getByTestId('message-from').innerText()).resolves.toBe(
      'Saggar <no-reply@saggar.localhost>',
    );
    await screenshot(page, 'mail-failed-phone');
    await expectAccessible(page, outsideTheMessage);

    await page.getByTestId('message-retry').click();
    // The server's worker is nudged, sends it to the local stand-in, and the page follows.
    await page.getByTestId('message-state').getByText('Sent', { exact: true }).waitFor();
    await expect(page.getByTestId('message-sent-at').innerText()).resolves.not.toBe('—');
    expect(await page.getByTestId('message-retry').count()).toBe(0);
    const received = emlFiles();
    expect(received).toHaveLength(1);
    expect(received[0]).toContain('Subject: Winter Salt: twelve pieces on their way');
    expect(received[0]).toContain('To: priya@lanthorn.example');
    await screenshot(page, 'mail-sent-phone');
    await expectAccessible(page, outsideTheMessage);
    expect(problemsOf(page)).toEqual([]);
  });

  it('lists the messages as a table and shows one as sent, in a sandboxed frame (wide)', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url, maker.email);
    await openMail(page);
    await page.getByTestId(`mail-row-${ids.dispatch}`).waitFor();
    await expect(page.getByTestId(`mail-state-${ids.dispatch}`).innerText()).resolves.toBe('Sent');
    await expect(page.getByTestId(`mail-state-${ids.invitation}`).innerText()).resolves.toBe(
      'Not sent',
    );
    await expect(page.getByTestId('mail-pager-summary').innerText()).resolves.toMatch(
      /^2 messages/,
    );
    await screenshot(page, 'mail-list-wide');
    await expectAccessible(page);

    await page.getByTestId(`mail-link-${ids.dispatch}`).click();
    await page.getByTestId('message-screen').waitFor();
    const frame = page.frameLocator('[data-testid="message-body-html"]');
    await expect(frame.locator('h1').innerText()).resolves.toBe(
      'Twelve pieces are on their way to you',
    );
    const sandbox = await page.getByTestId('message-body-html').getAttribute('sandbox');
    expect(sandbox).not.toContain('allow-scripts');
    expect(sandbox).not.toContain('allow-same-origin');
    await screenshot(page, 'mail-message-wide');
    await expectAccessible(page, outsideTheMessage);
    await page.getByTestId('message-body-html').scrollIntoViewIfNeeded();
    await screenshot(page, 'mail-message-frame-wide');

    await page.getByTestId('message-body-view-text').click();
    await expect(page.getByTestId('message-body').innerText()).resolves.toContain(
      'See the pieces:\nhttp://localhost:8080/venue',
    );
    expect(problemsOf(page)).toEqual([]);
  });

  it('is not in the assistant’s navigation', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url, assistant.email);
    await page.getByTestId('nav-works').waitFor();
    expect(await page.getByTestId('nav-mail').count()).toBe(0);
    expect(problemsOf(page)).toEqual([]);
  });
});
