import { type Page } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();
const [maker] = demoSignIns.people;

/** The API as the signed-in page calls it, at the page's own origin. */
async function api<T>(page: Page, method: 'GET' | 'POST', path: string, data?: unknown) {
  const res = await page.request.fetch(`${new URL(page.url()).origin}${path}`, { method, data });
  if (!res.ok()) throw new Error(`${method} ${path}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

type Statement = {
  id: number;
  reference: string;
  state: string;
  balance: { amount: number };
  payments: unknown[];
};

describe('payments from a bank statement, and the calendar address', () => {
  it('matches a credit to the statement it pays, and records it when the maker confirms (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    // A demo show with sales, its statement made and issued as the statement page would.
    const { items } = await api<{ items: { id: number; linesSold: number; state: string }[] }>(
      page,
      'GET',
      '/api/consignments',
    );
    const show = items.find((c) => c.linesSold > 0 && c.state === 'on-show')!;
    const draft = await api<Statement>(page, 'POST', '/api/statements', { consignmentId: show.id });
    const issued = await api<Statement>(page, 'POST', `/api/statements/${draft.id}/issue`);
    const owed = (issued.balance.amount / 100).toFixed(2);

    await page.goto(`${env.server.url}/statements`);
    await page.getByTestId('statements-bank').click();
    await page.getByTestId('bank-import-screen').waitFor();
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId('bank-import-choose').click(),
    ]);
    // A UK bank's export: day-first dates, a debit as a minus amount (common practice).
    await chooser.setFiles({
      name: 'bank.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(
        [
          'Date,Description,Amount',
          `03/12/2026,"BACS ${issued.reference} GALLERY",${owed}`,
          '03/12/2026,CLAY AND GLAZE SUPPLIES,-86.40',
        ].join('\r\n'),
      ),
    });
    const credit = page.getByTestId('bank-credit-2');
    await credit.waitFor();
    expect(await credit.innerText()).toContain(`Pays ${issued.reference}`);
    expect(await credit.innerText()).toContain('matched by its reference and the amount owed');
    expect(await page.getByText('Left out: row 3 (Not a credit (money paid in).)').count()).toBe(1);
    await screenshot(page, 'bank-import-phone');
    await expectAccessible(page);
    await page.getByTestId('bank-credit-2-confirm').click();
    await credit.getByText(`Recorded against ${issued.reference}.`).waitFor();
    const paid = await api<Statement>(page, 'GET', `/api/statements/${issued.id}`);
    expect(paid.payments).toHaveLength(1);
    expect(paid.balance.amount).toBe(0);
    expect(paid.state).toBe('settled');
    expect(problemsOf(page)).toEqual([]);
  });

  it('gives the owner a private calendar address a calendar program can read (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/settings`);
    await page.getByTestId('settings-calendar-make').click();
    const shown = await page.getByTestId('settings-calendar-url').innerText();
    // The address names the public host; the test reaches the same path on its own server.
    const address = `${env.server.url}${new URL(shown.trim()).pathname}`;
    await screenshot(page, 'settings-calendar-phone');
    const feed = await page.request.get(address);
    expect(feed.status()).toBe(200);
    // RFC 5545 §3.4: a calendar stream is BEGIN:VCALENDAR … END:VCALENDAR.
    expect((await feed.text()).startsWith('BEGIN:VCALENDAR')).toBe(true);
    await page.getByTestId('settings-calendar-stop').click();
    await page.getByText('No address yet.').waitFor();
    expect((await page.request.get(address)).status()).toBe(404);
    expect(problemsOf(page)).toEqual([]);
  });
});
