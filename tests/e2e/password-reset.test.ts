import { type Page } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { receivedMail, waitFor } from './helpers/consignments';
import { withServerAndBrowser } from './helpers/setup';
import { fillSignIn } from './helpers/studio';

const env = withServerAndBrowser();
const [maker, assistant] = demoSignIns.people;

/** Asks for a link from the sign-in page, as a person who forgot would. */
async function askForLink(page: Page, email: string, shots: string) {
  await page.goto(`${env.server.url}/sign-in`);
  await page.getByTestId('sign-in-forgot').click();
  await page.getByTestId('forgot-password-screen').waitFor();
  expect(await page.title()).toBe('Forgot password · Saggar');
  await screenshot(page, `forgot-password-${shots}`);
  await expectAccessible(page);
  await page.getByTestId('forgot-email').fill(email);
  await page.getByTestId('forgot-submit').click();
  await expect(page.getByTestId('forgot-sent').innerText()).resolves.toBe(
    `If ${email} has a Saggar account, a link to choose a new password is on its way to it. The link works once, for 60 minutes.`,
  );
  await screenshot(page, `forgot-password-sent-${shots}`);
  await expectAccessible(page);
}

/** The link in the message the local mail server received for `email`, read as its recipient. */
async function linkMailedTo(email: string): Promise<string> {
  const mail = await waitFor(
    async () =>
      (await receivedMail(env.server.dataDir)).find(
        (m) =>
          m.subject === 'Choose a new password for Saggar' &&
          m.to &&
          'text' in m.to &&
          m.to.text === email,
      ),
    `the new password e-mail to ${email}`,
  );
  expect(mail.text).toContain('The link works once, for 60 minutes.');
  return /http:\/\/localhost:\d+\/reset-password\/[A-Za-z0-9_-]+/.exec(mail.text ?? '')![0];
}

describe('Forgot password', () => {
  let usedLink: string;

  it('from sign-in, a link by e-mail sets a new password that signs in, once (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await askForLink(page, maker.email, 'phone');

    const link = await linkMailedTo(maker.email);
    await page.goto(link);
    await page.getByTestId('reset-password').waitFor();
    await expect(page.getByTestId('choose-password-screen').innerText()).resolves.toContain(
      `For ${maker.email}.`,
    );
    await screenshot(page, 'choose-password-phone');
    await expectAccessible(page);

    // Too short first: the same rule as everywhere a password is chosen.
    await page.getByTestId('reset-password').fill('short');
    await page.getByTestId('reset-submit').click();
    await expect(page.getByTestId('reset-password-error').innerText()).resolves.toBe(
      'Use at least 10 characters for the password.',
    );
    await screenshot(page, 'choose-password-error-phone');

    const newPassword = 'a glaze of my own choosing';
    await page.getByTestId('reset-password').fill(newPassword);
    await page.getByTestId('reset-submit').click();
    await expect(page.getByTestId('sign-in-notice').innerText()).resolves.toBe(
      'Your password has been changed. Sign in with the new one.',
    );
    await screenshot(page, 'sign-in-password-changed-phone');
    await expectAccessible(page);

    await fillSignIn(page, maker.email, demoSignIns.password);
    await expect(page.getByTestId('sign-in-error').innerText()).resolves.toMatch(/do not match/);
    await page.getByTestId('sign-in-password').fill(newPassword);
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('overview-screen').waitFor();
    // The owner's Sent mail never lists the message that carried the link.
    // The link's address (localhost) is where the session is, not the server's 127.0.0.1.
    const outbox = await (
      await page.request.get(`${new URL(page.url()).origin}/api/outbox`)
    ).json();
    expect(outbox.items.map((m: { kind: string }) => m.kind)).not.toContain('password-reset');

    await page.goto(link);
    await expect(page.getByTestId('reset-closed').innerText()).resolves.toMatch(
      /^This link has been used already/,
    );
    expect(await page.getByTestId('reset-password').count()).toBe(0);
    await screenshot(page, 'choose-password-used-phone');
    await expectAccessible(page);
    await page.getByTestId('reset-ask-again').click();
    await page.getByTestId('forgot-password-screen').waitFor();
    usedLink = link;
    // The 401s are the sign-in refused above and the session ended by the new password.
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the same pages at a wide size', async () => {
    const page = await newPage(env.browser, 'wide');
    await askForLink(page, assistant.email, 'wide');
    await page.goto(await linkMailedTo(assistant.email));
    await page.getByTestId('reset-password').waitFor();
    await screenshot(page, 'choose-password-wide');
    await expectAccessible(page);

    await page.goto(usedLink);
    await page.getByTestId('reset-closed').waitFor();
    await screenshot(page, 'choose-password-used-wide');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
