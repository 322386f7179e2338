import fs from 'node:fs';
import path from 'node:path';

import { type Page } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';
import { formatMoney } from '@/shared/money/format';
import { type Consignment } from '@/shared/schemas/consignment';
import { type Statement } from '@/shared/schemas/statement';

import { pdfPagePng, pdfPages } from '../documents/helpers/pdf';
import {
  expectAccessible,
  newPage,
  problemsOf,
  screenshot,
  type ViewportName,
} from './helpers/browser';
import { consignmentOf, sendConsignment } from './helpers/consignments';
import { withServerAndBrowser } from './helpers/setup';
import { fillSignIn, openSection, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

const [maker] = demoSignIns.people;
/** The demo's show whose shelves came down on 15 November, with pieces still out. */
const reference = 'QUA-2026-02';
const venueName = 'Quayside Crafts';
const staff = {
  name: 'Declan Ferris',
  email: 'shop@quayside.example',
  password: 'a counter password long enough',
};

const textOf = async (page: Page, testId: string) =>
  (await page.getByTestId(testId).innerText()).replace(/\s+/g, ' ').trim();

/** Waits up to 10 s for an element's text to become `expected`, then checks it. */
async function textBecomes(page: Page, testId: string, expected: string) {
  let last = '';
  for (let i = 0; i < 100 && last !== expected; i += 1) {
    if (i > 0) await new Promise((resolve) => setTimeout(resolve, 100));
    last = await textOf(page, testId).catch(() => '');
  }
  expect(last).toBe(expected);
}

async function statementOf(page: Page, id: number): Promise<Statement> {
  const res = await page.request.get(`${new URL(page.url()).origin}/api/statements/${id}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as Statement;
}

describe('the end of a show: closed, its statement issued, paid online, and the year', () => {
  let show: Consignment;
  let statementId: number;
  /** The app at its public address: links in e-mails and the payment page's return point there. */
  let publicUrl: string;

  it('the maker finds the show past its closing date with pieces still out; closing is refused, naming them (wide)', async () => {
    publicUrl = env.server.url.replace('127.0.0.1', 'localhost');
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url, maker.email);
    const list = await (await page.request.get(`${env.server.url}/api/consignments`)).json();
    const id = (list.items as { id: number; reference: string }[]).find(
      (c) => c.reference === reference,
    )!.id;
    show = await consignmentOf(page, id);
    expect(show.state).toBe('on-show');
    const out = show.lines.filter((l) => l.state === 'consigned');
    expect(out.length).toBeGreaterThan(0);

    await page.goto(`${env.server.url}/consignments/${id}`);
    await page.getByTestId('step-close').waitFor();
    await expect(textOf(page, 'step-close-summary')).resolves.toBe(
      `${out.length} pieces are still out, and the show closed on 15 Nov 2026: say what became of each, then close the show.`,
    );
    await page.getByTestId('consignment-close').click();
    await page.getByTestId('consignment-close-error').waitFor();
    const refusal = await textOf(page, 'consignment-close-error');
    expect(refusal).toContain(`Account for every piece before closing ${reference}`);
    for (const line of out) {
      expect(refusal).toContain(`${line.stockNumber} ${line.title}`);
      await expect(textOf(page, `closing-${line.id}-refused`)).resolves.toBe(
        `${line.stockNumber} is still out: mark it sold, returned, damaged or lost.`,
      );
    }
    await page.getByTestId('step-close').scrollIntoViewIfNeeded();
    await screenshot(page, 'statements-closing-refused-wide');
    await expectAccessible(page);
    // The refusal is the 409 the browser logs; nothing else may be.
    expect(problemsOf(page)).toEqual([
      'Failed to load resource: the server responded with a status of 409 (Conflict)',
    ]);
    await page.context().close();
  });

  it('resolves what is out from the closing step, checks a returned piece against dispatch, and closes the show (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/consignments/${show.id}`);
    await page.getByTestId('step-close').waitFor();
    const [sold, ...back] = show.lines.filter((l) => l.state === 'consigned');

    // One sold, phoned in at list price; the rest came back.
    await page.getByTestId(`closing-${sold!.id}-outcome-sell`).click();
    await page.getByTestId(`closing-${sold!.id}-outcome-sale-form-submit`).click();
    // Accounted for, it leaves the list of pieces still out.
    await page.getByTestId(`closing-${sold!.id}`).waitFor({ state: 'detached' });
    for (const line of back) {
      await page.getByTestId(`closing-${line.id}-outcome-returned`).click();
      await page.getByTestId(`closing-${line.id}-outcome-returned-form-submit`).click();
      await page.getByTestId(`closing-${line.id}`).waitFor({ state: 'detached' });
    }
    await textBecomes(
      page,
      'step-close-summary',
      'Every piece is accounted for: close the show to make its statement final.',
    );

    // The first piece back has a chip it did not leave with: new damage, with who insured it.
    const damaged = back[0]!;
    const check = `piece-${damaged.id}-check`;
    await page.getByTestId(`${check}-on-return-start`).click();
    const form = `${check}-on-return-form`;
    await page.getByTestId(`${form}-add-finding`).click();
    await page.getByTestId(`${form}-finding-kind`).selectOption('chip');
    await page.getByTestId(`${form}-finding-grade-marked`).click();
    await page.getByTestId(`${form}-finding-location`).fill('on the rim');
    await page.getByTestId(`${form}-finding-add`).click();
    await page.getByTestId(`${form}-submit`).click();
    await page.getByTestId(`${check}-return`).waitFor();
    await expect(textOf(page, `${check}-return`)).resolves.toContain('On return');
    await expect(textOf(page, `${check}-dispatch`)).resolves.toContain('At dispatch');
    const damage = `${check}-damage`;
    await expect(textOf(page, damage)).resolves.toContain('New damage since dispatch');
    await expect(textOf(page, damage)).resolves.toContain('Chip, marked, on the rim');
    const now = await consignmentOf(page, show.id);
    const line = now.lines.find((l) => l.id === damaged.id)!;
    expect(line.newDamage).not.toBeNull();
    // Quayside's terms: the venue insures the work on its premises, the maker in transit.
    await expect(textOf(page, `${damage}-insurer`)).resolves.toBe(
      `Insured there by the venue, for ${formatMoney(line.newDamage!.insuranceValue)}.`,
    );
    const claim = await page.request.get(
      `${env.server.url}${await page.getByTestId(`${damage}-claim`).getAttribute('href')}`,
    );
    expect(claim.status()).toBe(200);
    expect(claim.headers()['content-type']).toBe('application/pdf');
    await page.getByTestId(damage).scrollIntoViewIfNeeded();
    await screenshot(page, 'statements-return-check-phone');

    await page.getByTestId('consignment-close').click();
    await textBecomes(page, 'step-close-summary', 'Closed: every piece is accounted for.');
    expect((await consignmentOf(page, show.id)).state).toBe('closed');
    await page.getByTestId('step-close').scrollIntoViewIfNeeded();
    await screenshot(page, 'statements-closed-phone');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('makes the statement: a draft whose every figure is the server’s (phone and wide)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/consignments/${show.id}`);
    await page.getByTestId('consignment-make-statement').click();
    await page.getByTestId('statement-screen').waitFor();
    await page.getByTestId('statement-lines').waitFor();
    statementId = Number(/\/statements\/(\d+)/.exec(page.url())![1]);
    const draft = await statementOf(page, statementId);
    expect(draft.state).toBe('draft');
    const sold = (await consignmentOf(page, show.id)).lines.filter((l) => l.state === 'sold');
    expect(draft.lines.map((l) => l.lineId).sort()).toEqual(sold.map((l) => l.id).sort());
    await expect(textOf(page, 'statement-state')).resolves.toBe('Draft');
    const total = await textOf(page, 'statement-total');
    expect(total).toContain(formatMoney(draft.totals.sales));
    expect(total).toContain(formatMoney(draft.totals.makerShare));
    for (const l of draft.lines) {
      await expect(textOf(page, `statement-line-${l.lineId}`)).resolves.toContain(
        formatMoney(l.makerShare),
      );
    }
    // Quayside is not VAT-registered and neither is the maker: no VAT lines.
    await expect(page.getByTestId('statement-vat').count()).resolves.toBe(0);
    await screenshot(page, 'statements-draft-phone');
    await page.setViewportSize({ width: 1280, height: 800 });
    await page.getByTestId('statement-lines').waitFor();
    await screenshot(page, 'statements-draft-wide');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('issues it after confirming, and the venue’s e-mail with the PDF waits under Sent mail (wide)', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/statements/${statementId}`);
    await page.getByTestId('statement-issue-button').click();
    await expect(textOf(page, 'statement-issue-confirm')).resolves.toContain(
      `e-mails the statement with a link to pay to ${venueName}`,
    );
    await page.getByTestId('statement-issue-confirm-button').click();
    await textBecomes(page, 'statement-state', 'Issued, awaiting payment');
    const issued = await statementOf(page, statementId);
    expect(issued.state).toBe('issued');
    await expect(textOf(page, 'statement-balance-words')).resolves.toBe(
      `${formatMoney(issued.balance)} to pay.`,
    );

    // The PDF, page 1 as a reader sees it, kept to look at.
    const pdf = await page.request.get(`${env.server.url}/api/statements/${statementId}.pdf`);
    expect(pdf.status()).toBe(200);
    const bytes = await pdf.body();
    const first = pdfPages(bytes)[0]!;
    expect(first).toContain(issued.reference);
    expect(first).toContain(venueName);
    const dir = path.resolve(__dirname, '../../test-results');
    fs.mkdirSync(dir, { recursive: true });
    fs.writeFileSync(path.join(dir, 'statement-page-1.png'), pdfPagePng(bytes, 1, 80));

    await openSection(page, 'mail');
    const card = page.locator('[data-testid^="mail-row-"]', {
      hasText: `Statement ${issued.reference}`,
    });
    await card.waitFor();
    await expect(card.innerText()).resolves.toContain(staff.email);
    await screenshot(page, 'statements-mail-wide');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('records a remittance short of the balance and explains part of the difference (phone and wide)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/statements/${statementId}`);
    const before = await statementOf(page, statementId);
    const short = { ...before.balance, amount: before.balance.amount - 500 };
    await page.getByTestId('statement-record-payment').click();
    await page.getByTestId('payment-amount').fill((short.amount / 100).toFixed(2));
    await page.getByTestId('payment-reference').fill('QUAYSIDE REMIT 11');
    await page.getByTestId('payment-submit').click();
    await textBecomes(
      page,
      'statement-balance-words',
      '£5.00 short of the statement: wait for the rest, or explain the difference below.',
    );

    // The shop kept £2.00 as a card fee; the other £3.00 it will pay online.
    await page.getByTestId('statement-explain').click();
    await page.getByTestId('adjustment-kind-fee-deducted').click();
    await page.getByTestId('adjustment-amount').fill('2.00');
    await page.getByTestId('adjustment-note').fill('Card terminal fee');
    await page.getByTestId('adjustment-submit').click();
    await textBecomes(page, 'statement-balance-amount', '£3.00');
    const after = await statementOf(page, statementId);
    expect(after.balance).toEqual({ amount: 300, currency: 'GBP' });
    await expect(
      textOf(page, `statement-balance-adjustment-${after.adjustments[0]!.id}`),
    ).resolves.toBe('A fee the venue deducted: Card terminal fee − £2.00');
    await screenshot(page, 'statements-difference-phone');
    await page.setViewportSize({ width: 1280, height: 800 });
    await screenshot(page, 'statements-difference-wide');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the shop’s staff, invited, open the statement, pay online on the checkout page and come back to it paid (phone)', async () => {
    // Nobody at Quayside has an account in the demo: sending them a piece invites the shop.
    const owner = await newPage(env.browser, 'wide');
    await signInToStudio(owner, env.server.url, maker.email);
    await sendConsignment(owner, { venueName, title: 'One more for the shelves', count: 1 });
    const mail = await (await owner.request.get(`${env.server.url}/api/outbox`)).json();
    const dispatch = (mail.items as { id: number; kind: string; to: string }[]).find(
      (m) => m.kind === 'consignment-dispatch' && m.to === staff.email,
    )!;
    const text = (
      await (await owner.request.get(`${env.server.url}/api/outbox/${dispatch.id}`)).json()
    ).text as string;
    const token = /\/invite\/([A-Za-z0-9_-]+)/.exec(text)![1];
    const accepted = await owner.request.post(`${env.server.url}/api/invitations/accept`, {
      data: { token, name: staff.name, password: staff.password },
      headers: { origin: env.server.url },
    });
    expect(accepted.status()).toBe(200);
    await owner.context().close();

    const page = await newPage(env.browser, 'phone');
    await page.goto(`${publicUrl}/venue/statements/${statementId}`);
    await fillSignIn(page, staff.email, staff.password);
    await page.getByTestId('venue-statement-screen').waitFor();
    await page.getByTestId('statement-pay-online').waitFor();
    await expect(textOf(page, 'statement-pay-online')).resolves.toBe('Pay £3.00 online');
    await screenshot(page, 'statements-venue-phone');
    await expectAccessible(page);

    expect(problemsOf(page)).toEqual([]);
    await page.getByTestId('statement-pay-online').click();
    await page.waitForURL(/127\.0\.0\.1:\d+\/c\//);
    await expect(page.locator('body').innerText()).resolves.toContain(
      'Test payment — no card is charged',
    );
    await screenshot(page, 'statements-checkout-phone');
    // The stand-in's checkout page has no icon: the browser's request for one is its only 404.
    for (let i = 0; i < 30 && problemsOf(page).length === 0; i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    expect(problemsOf(page).splice(0)).toEqual([
      'Failed to load resource: the server responded with a status of 404 (Not Found)',
    ]);
    await page.getByRole('button', { name: 'Pay £3.00' }).click();
    await page.waitForURL(/\/venue\/statements\/\d+\?payment=done/);
    await page.getByTestId('statement-payment-received').waitFor({ timeout: 20_000 });
    await expect(textOf(page, 'statement-state')).resolves.toBe('Settled');
    await expect(textOf(page, 'statement-balance-words')).resolves.toBe(
      'Nothing is left to pay: the statement is settled.',
    );
    await expect(page.getByTestId('statement-pay-online').count()).resolves.toBe(0);
    await screenshot(page, 'statements-venue-paid-phone');

    // The venue's list of statements shows it settled.
    await page.getByTestId('nav-venue-statements').click();
    await page.getByTestId(`statement-card-${statementId}`).waitFor();
    await expect(textOf(page, `statement-card-${statementId}`)).resolves.toContain('Settled');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the maker sees the statement settled and the show settled (wide and phone)', async () => {
    for (const size of ['wide', 'phone'] as ViewportName[]) {
      const page = await newPage(env.browser, size);
      await signInToStudio(page, env.server.url, maker.email);
      await openSection(page, 'statements');
      await page.getByTestId('statements-screen').waitFor();
      const row =
        size === 'wide' ? `statement-row-${statementId}` : `statement-card-${statementId}`;
      await expect(textOf(page, row)).resolves.toContain('Settled');
      await expect(textOf(page, row)).resolves.toContain('£0.00');
      await screenshot(page, `statements-list-${size}`);
      await page.goto(`${env.server.url}/statements/${statementId}`);
      await textBecomes(page, 'statement-state', 'Settled');
      const paid = await statementOf(page, statementId);
      expect(paid.payments.map((p) => p.method).sort()).toEqual(['bank-transfer', 'online']);
      await screenshot(page, `statements-settled-${size}`);
      await page.goto(`${env.server.url}/consignments/${show.id}`);
      await textBecomes(
        page,
        'step-statement-summary',
        'Settled: every statement is paid or its difference explained.',
      );
      expect((await consignmentOf(page, show.id)).state).toBe('settled');
      expect(problemsOf(page)).toEqual([]);
      await page.context().close();
    }
  });

  it('the year: charts with the same figures in a table under each, the VAT caution, CSV files (phone and wide)', async () => {
    for (const size of ['phone', 'wide'] as ViewportName[]) {
      const page = await newPage(env.browser, size);
      await signInToStudio(page, env.server.url, maker.email);
      await openSection(page, 'year');
      await page.getByTestId('year-screen').waitFor();
      await page.locator('[data-testid="year-GBP-months-chart"] svg').first().waitFor();
      await page.locator('[data-testid="year-GBP-venues-chart"] svg').first().waitFor();
      const year = await (await page.request.get(`${env.server.url}/api/year?year=2026`)).json();
      const gbp = year.currencies.find((c: { currency: string }) => c.currency === 'GBP');
      const venues = await textOf(page, 'year-GBP-venues');
      for (const v of gbp.byVenue) {
        expect(venues).toContain(v.venueName);
        expect(venues).toContain(formatMoney(v.makerShare));
        expect(venues).toContain(formatMoney(v.paid));
      }
      await expect(textOf(page, 'year-vat-caution')).resolves.toContain(
        'Guidance: check with HMRC or an accountant.',
      );
      const csv = await page.request.get(
        `${env.server.url}${await page.getByTestId('year-csv-sales').getAttribute('href')}`,
      );
      expect(csv.status()).toBe(200);
      // Nothing on the page runs wider than the screen.
      const overflow = await page.evaluate(
        () => document.documentElement.scrollWidth - window.innerWidth,
      );
      expect(overflow).toBeLessThanOrEqual(0);
      await screenshot(page, `statements-year-${size}`);
      for (const chart of ['vat', 'GBP-months', 'GBP-venues', 'GBP-series', 'GBP-exposure']) {
        await page.getByTestId(`year-${chart}-chart`).scrollIntoViewIfNeeded();
        await screenshot(page, `statements-year-${chart}-${size}`);
      }
      await expectAccessible(page);
      expect(problemsOf(page)).toEqual([]);
      await page.context().close();
    }
  });

  it('a statement the shop pays later: coming back cancelled says so plainly (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await page.goto(`${publicUrl}/sign-in`);
    await fillSignIn(page, staff.email, staff.password);
    await page.getByTestId('venue-home-screen').waitFor();
    await page.goto(`${publicUrl}/venue/statements/${statementId}?payment=cancelled`);
    await page.getByTestId('statement-payment-cancelled').waitFor();
    await expect(textOf(page, 'statement-payment-cancelled')).resolves.toBe(
      'The payment was cancelled and nothing was taken. Pay whenever you are ready.',
    );
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
