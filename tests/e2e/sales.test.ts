import { type Page } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';
import { formatDate } from '@/shared/format/dates';
import { formatMoney } from '@/shared/money/format';
import { trySplitSale } from '@/shared/money/split';
import {
  type Consignment,
  type ConsignmentLine,
  type VenuePiece,
} from '@/shared/schemas/consignment';
import { type Money } from '@/shared/schemas/money';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { consignmentOf, labelAddresses, sendConsignment, waitFor } from './helpers/consignments';
import { withServerAndBrowser } from './helpers/setup';
import { fillSignIn, makeImage, openSection, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

const [maker, , gallery] = demoSignIns.people;
const venueName = 'The Lanthorn Gallery';
const title = 'Winter window';
const gbp = (amount: number): Money => ({ amount, currency: 'GBP' });

/** One piece as the venue's staff see it, asked of the API at the page's own origin. */
async function pieceOf(page: Page, lineId: number): Promise<VenuePiece> {
  const res = await page.request.get(`${new URL(page.url()).origin}/api/venue/lines/${lineId}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as VenuePiece;
}

/** The page's inner text, with runs of white space as one space. */
const textOf = async (page: Page, testId: string) =>
  (await page.getByTestId(testId).innerText()).replace(/\s+/g, ' ').trim();

const out = 'venue-piece-outcome';

describe('a gallery marks pieces sold, and the maker sees them', () => {
  let sent: Consignment;
  /** The eight pieces, in label order: the first label's QR code opens lines[0], and so on. */
  let lines: ConsignmentLine[];
  let addresses: string[];
  let today: string;

  it('the owner sends eight pieces to the Lanthorn, whose labels’ QR codes open each piece', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    sent = await sendConsignment(page, { venueName, title, count: 8 });
    expect(sent.state).toBe('dispatched');
    today = sent.today;
    expect(sent.dispatchDate).toBe(today);

    // The shelf labels as the venue prints them: each QR code holds the piece's own address on
    // the app's public address (http://localhost:PORT by default), nothing else.
    addresses = await labelAddresses(page, sent.id, 8);
    const port = new URL(env.server.url).port;
    const byAddress = new Map(
      sent.lines.map((l) => [`http://localhost:${port}/venue/piece/${l.id}`, l]),
    );
    lines = addresses.map((address) => {
      const line = byAddress.get(address);
      if (!line) throw new Error(`A label holds an address of no piece: ${address}`);
      return line;
    });
    expect(new Set(lines.map((l) => l.id)).size).toBe(8);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the gallery member scans a label, signs in, lands on the piece and sells it with a discount (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    const first = lines[0]!;
    await page.goto(addresses[0]!);
    // Signed out, the piece sends to sign-in, remembering where to come back to.
    await page.getByTestId('sign-in-screen').waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe(`/venue/piece/${first.id}`);
    await fillSignIn(page, gallery.email);
    await page.getByTestId('venue-piece-screen').waitFor();
    expect(new URL(page.url()).pathname).toBe(`/venue/piece/${first.id}`);
    await expect(textOf(page, 'venue-piece-title')).resolves.toBe(first.title);
    await expect(textOf(page, 'venue-piece-state')).resolves.toBe('Out');
    await page.getByTestId(`${out}-sell`).waitFor();
    await screenshot(page, 'sales-piece-phone');
    await expectAccessible(page);

    // "Sold" is the first action; the form starts from today and the list price.
    await page.getByTestId(`${out}-sell`).click();
    const form = `${out}-sale-form`;
    expect(await page.getByTestId(`${form}-date`).inputValue()).toBe(today);
    const list = first.listPrice;
    expect(await page.getByTestId(`${form}-price`).inputValue()).toBe(
      (list.amount / 100).toFixed(2),
    );

    // A tenth off, to the pound, for a regular customer.
    const paid = gbp(Math.round((list.amount * 0.9) / 100) * 100);
    await page.getByTestId(`${form}-price`).fill((paid.amount / 100).toFixed(2));
    await page.getByTestId(`${form}-reason`).fill('Regular customer, a tenth off');
    // The preview is the shared money engine's split under the consignment's terms.
    const split = trySplitSale(sent.terms, list, paid)!;
    await expect(textOf(page, `${form}-preview-commission`)).resolves.toBe(
      formatMoney(split.commission),
    );
    await expect(textOf(page, `${form}-preview-share`)).resolves.toBe(
      formatMoney(split.makerShare),
    );
    if (sent.terms.commissionVat !== 'none') {
      await expect(textOf(page, `${form}-preview-vat`)).resolves.toBe(
        formatMoney(split.vatOnCommission),
      );
    }
    await page.getByTestId(`${form}-submit`).scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-piece-form-phone');
    await expectAccessible(page);

    await page.getByTestId(`${form}-submit`).click();
    await page.getByTestId(`${out}-sale`).waitFor();
    await expect(textOf(page, `${out}-sale-summary`)).resolves.toBe(
      `Sold on ${formatDate(today)} for ${formatMoney(paid)}`,
    );
    await expect(textOf(page, `${out}-sale-discount`)).resolves.toContain(
      'Regular customer, a tenth off',
    );
    await expect(textOf(page, `${out}-news`)).resolves.toContain('Sale recorded.');
    await page.getByTestId(`${out}-sale`).scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-piece-sold-phone');
    await expectAccessible(page);

    const after = await pieceOf(page, first.id);
    expect(after.line.state).toBe('sold');
    expect(after.line.sale).toMatchObject({
      soldOn: today,
      price: paid,
      discount: gbp(list.amount - paid.amount),
      discountReason: 'Regular customer, a tenth off',
      enteredBy: 'venue',
      recordedBy: gallery.name,
      split,
    });
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('from the counter list: finds a piece by its number, sells it, returns one, records one damaged with a photo, undoes the sale (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await page.goto(`${env.server.url}/sign-in`);
    await fillSignIn(page, gallery.email);
    await page.getByTestId('venue-home-screen').waitFor();
    await page.getByTestId('counter-list').waitFor();
    // Pieces out first, then those sold.
    const order = await page
      .locator('[data-testid^="counter-piece-"]')
      .evaluateAll((cards) => cards.map((c) => c.getAttribute('data-testid')));
    const soldAt = order.indexOf(`counter-piece-${lines[0]!.id}`);
    expect(soldAt).toBeGreaterThan(order.indexOf(`counter-piece-${lines[1]!.id}`));
    await screenshot(page, 'sales-counter-phone');
    await expectAccessible(page);

    // Search by the stock number on the label.
    const second = lines[1]!;
    await page.getByTestId('counter-search').fill(second.stockNumber);
    await waitFor(async () => {
      const shown = await page.locator('[data-testid^="counter-piece-"]').count();
      return shown === 1 ? shown : undefined;
    }, 'the search to leave one piece');
    await page.getByTestId(`counter-piece-${second.id}`).waitFor();
    await screenshot(page, 'sales-counter-search-phone');

    // "Mark sold" opens the piece with the sale begun; at the list price there is no reason.
    await page.getByTestId(`counter-sell-${second.id}`).click();
    await page.getByTestId(`${out}-sale-form-submit`).waitFor();
    expect(await page.getByTestId(`${out}-sale-form-reason`).count()).toBe(0);
    await page.getByTestId(`${out}-sale-form-submit`).click();
    await page.getByTestId(`${out}-sale`).waitFor();
    expect((await pieceOf(page, second.id)).line.sale?.price).toEqual(second.listPrice);

    // Returned to the maker, with the day and a note.
    const third = lines[2]!;
    await page.goto(`${env.server.url}/venue/piece/${third.id}`);
    await page.getByTestId(`${out}-returned`).click();
    const returned = `${out}-returned-form`;
    expect(await page.getByTestId(`${returned}-date`).inputValue()).toBe(today);
    await page.getByTestId(`${returned}-note`).fill('Collected by the maker for a commission.');
    await screenshot(page, 'sales-return-phone');
    await expectAccessible(page);
    await page.getByTestId(`${returned}-submit`).click();
    await page.getByTestId(`${out}-resolution`).waitFor();
    await expect(textOf(page, `${out}-resolution-summary`)).resolves.toBe(
      `Returned to the maker on ${formatDate(today)}`,
    );
    await expect(textOf(page, 'venue-piece-state')).resolves.toBe('Returned');
    expect((await pieceOf(page, third.id)).line.resolution).toMatchObject({
      on: today,
      note: 'Collected by the maker for a commission.',
      enteredBy: 'venue',
    });

    // Knocked off its plinth: damaged, with a note and a photo of the damage.
    const eighth = lines[7]!;
    await page.goto(`${env.server.url}/venue/piece/${eighth.id}`);
    await page.getByTestId(`${out}-damaged`).click();
    const damaged = `${out}-damaged-form`;
    await page.getByTestId(`${damaged}-submit`).click();
    await expect(textOf(page, `${damaged}-note-error`)).resolves.toBe(
      'Say what happened to the piece.',
    );
    await page.getByTestId(`${damaged}-note`).fill('Knocked off its plinth; a chip on the rim.');
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId(`${damaged}-photo`).click(),
    ]);
    await chooser.setFiles({
      name: 'rim.jpg',
      mimeType: 'image/jpeg',
      buffer: await makeImage('jpeg', [140, 150, 120]),
    });
    await page.getByTestId(`${damaged}-photo`).getByText('Change the photo').waitFor();
    await page.getByTestId(`${damaged}-submit`).scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-damaged-phone');
    await expectAccessible(page);
    await page.getByTestId(`${damaged}-submit`).click();
    await page.getByTestId(`${out}-resolution`).waitFor();
    await expect(textOf(page, 'venue-piece-state')).resolves.toBe('Damaged');
    const broken = (await pieceOf(page, eighth.id)).line.resolution!;
    expect(broken).toMatchObject({ on: today, note: 'Knocked off its plinth; a chip on the rim.' });
    expect(broken.photo?.url).toMatch(/^\/api\/condition-photos\/\d+$/);

    // The second sale was a mistake: undone, asked once more first.
    await page.goto(`${env.server.url}/venue/piece/${second.id}`);
    await page.getByTestId(`${out}-sale-undo`).click();
    await page.getByTestId(`${out}-sale-undo-confirm`).click();
    await page.getByTestId(`${out}-sell`).waitFor();
    await expect(textOf(page, 'venue-piece-state')).resolves.toBe('Out');
    expect((await pieceOf(page, second.id)).line).toMatchObject({ state: 'consigned', sale: null });
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('a piece sold at the same moment elsewhere: the refusal says who sold it and when (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    const fourth = lines[3]!;
    await page.goto(`${env.server.url}/sign-in`);
    await fillSignIn(page, gallery.email);
    await page.getByTestId('venue-home-screen').waitFor();
    await page.goto(`${env.server.url}/venue/piece/${fourth.id}`);
    await page.getByTestId(`${out}-sell`).click();
    await page.getByTestId(`${out}-sale-form-submit`).waitFor();

    // Meanwhile a colleague's phone records the same piece.
    const other = await page.request.post(
      `${env.server.url}/api/consignment-lines/${fourth.id}/sale`,
      { data: { soldOn: today, salePrice: fourth.listPrice } },
    );
    expect(other.status()).toBe(201);

    await page.getByTestId(`${out}-sale-form-submit`).click();
    const news = page.getByTestId(`${out}-news`);
    await news.waitFor();
    expect(await news.innerText()).toMatch(
      new RegExp(
        `^${fourth.stockNumber} .* is already sold: ${gallery.name} at ${venueName} recorded the sale on ${formatDate(today)} at \\d\\d:\\d\\d UTC\\.$`,
      ),
    );
    // The piece is fetched again and shows the sale that won.
    await page.getByTestId(`${out}-sale`).waitFor();
    await expect(textOf(page, 'venue-piece-state')).resolves.toBe('Sold');
    await screenshot(page, 'sales-race-phone');
    expect(problemsOf(page)).toEqual([
      'Failed to load resource: the server responded with a status of 409 (Conflict)',
    ]);
    await page.context().close();
  });

  it('after acknowledging arrival, several pieces go on one till receipt (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await page.goto(`${env.server.url}/sign-in`);
    await fillSignIn(page, gallery.email);
    await page.getByTestId('venue-home-screen').waitFor();
    // The consignment waiting to be acknowledged comes first, saying so.
    const card = page.getByTestId(`consignment-card-${sent.id}`);
    await expect(card.innerText()).resolves.toContain('Arrived? Check and acknowledge it');
    await card.click();
    await page.getByTestId('acknowledge-submit').click();
    await page.getByTestId('venue-acknowledged').waitFor();

    const second = lines[1]!;
    const fifth = lines[4]!;
    await page.getByTestId('receipt-open').click();
    await page.getByTestId(`receipt-tick-${second.id}`).click();
    await page.getByTestId(`receipt-tick-${fifth.id}`).click();
    // A price above the list price is refused beside that piece.
    const above = (fifth.listPrice.amount + 500) / 100;
    await page.getByTestId(`receipt-price-${fifth.id}`).fill(above.toFixed(2));
    await page.getByTestId('receipt-submit').click();
    await expect(textOf(page, `receipt-price-${fifth.id}-error`)).resolves.toBe(
      `The price paid cannot be above the list price, ${formatMoney(fifth.listPrice)}.`,
    );
    const lower = gbp(fifth.listPrice.amount - 1000);
    await page.getByTestId(`receipt-price-${fifth.id}`).fill((lower.amount / 100).toFixed(2));
    await page.getByTestId(`receipt-reason-${fifth.id}`).fill('Bought with the bottle');
    await expect(textOf(page, 'receipt-total')).resolves.toBe(
      `Total, 2 pieces ${formatMoney(gbp(second.listPrice.amount + lower.amount))}`,
    );
    await page.getByTestId('receipt-submit').scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-receipt-phone');
    await expectAccessible(page);
    await page.getByTestId('receipt-submit').click();
    await expect(textOf(page, 'receipt-done')).resolves.toBe(
      '2 sales recorded. The maker is e-mailed within minutes.',
    );
    expect((await pieceOf(page, fifth.id)).line.sale).toMatchObject({
      price: lower,
      discountReason: 'Bought with the bottle',
    });
    expect((await pieceOf(page, second.id)).line.state).toBe('sold');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('shows the counter list, a piece’s sale and the sold piece wide', async () => {
    const page = await newPage(env.browser, 'wide');
    const seventh = lines[6]!;
    await page.goto(`${env.server.url}/sign-in`);
    await fillSignIn(page, gallery.email);
    await page.getByTestId('counter-list').waitFor();
    await screenshot(page, 'sales-counter-wide');
    await expectAccessible(page);
    await page.getByTestId(`counter-sell-${seventh.id}`).click();
    const form = `${out}-sale-form`;
    await page
      .getByTestId(`${form}-price`)
      .fill(((seventh.listPrice.amount - 500) / 100).toFixed(2));
    await page.getByTestId(`${form}-reason`).fill('Small glaze skip on the foot');
    await screenshot(page, 'sales-piece-form-wide');
    await expectAccessible(page);
    await page.getByTestId(`${form}-submit`).click();
    await page.getByTestId(`${out}-sale`).waitFor();
    await screenshot(page, 'sales-piece-sold-wide');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the maker sees the sales on the consignment, records one phoned in, and sees recent sales (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    const sixth = lines[5]!;
    await signInToStudio(page, env.server.url, maker.email);
    await page.goto(`${env.server.url}/consignments/${sent.id}`);
    await page.getByTestId('consignment-screen').waitFor();

    // The venue phones in the last piece: the studio records it with the same form.
    await page.getByTestId(`piece-${sixth.id}-outcome-sell`).click();
    const form = `piece-${sixth.id}-outcome-sale-form`;
    expect(await page.getByTestId(`${form}-date`).inputValue()).toBe(today);
    const atList = trySplitSale(sent.terms, sixth.listPrice, sixth.listPrice)!;
    await expect(textOf(page, `${form}-preview-share`)).resolves.toBe(
      formatMoney(atList.makerShare),
    );
    await page.getByTestId(`${form}-submit`).click();
    const record = `piece-${sixth.id}-outcome-sale`;
    await page.getByTestId(record).waitFor();
    await expect(textOf(page, `${record}-entered`)).resolves.toBe(
      `Entered by the studio (${maker.name})`,
    );

    // Every piece accounted for: six sold, one returned, one damaged, nothing insured out.
    await expect(textOf(page, 'tally-out')).resolves.toBe('0');
    await expect(textOf(page, 'tally-sold')).resolves.toBe('6');
    await expect(textOf(page, 'tally-returned')).resolves.toBe('1');
    await expect(textOf(page, 'tally-damaged-lost')).resolves.toBe('1');
    await expect(textOf(page, 'tally-insured-out')).resolves.toBe('£0.00');
    const now = await consignmentOf(page, sent.id);
    const first = now.lines.find((l) => l.id === lines[0]!.id)!;
    await expect(textOf(page, `piece-${first.id}-outcome-sale-summary`)).resolves.toBe(
      `Sold on ${formatDate(today)} for ${formatMoney(first.sale!.price)}`,
    );
    await expect(textOf(page, `piece-${first.id}-outcome-sale-split-share`)).resolves.toBe(
      formatMoney(first.sale!.split.makerShare),
    );
    await expect(textOf(page, `piece-${first.id}-outcome-sale-entered`)).resolves.toBe(
      `Recorded by ${gallery.name} at the venue`,
    );
    await expect(textOf(page, `piece-${lines[2]!.id}-outcome-resolution-summary`)).resolves.toBe(
      `Returned to the maker on ${formatDate(today)}`,
    );
    await page.getByTestId(`piece-${first.id}-outcome-sale`).scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-consignment-phone');
    await page.getByTestId('consignment-tallies').scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-consignment-tallies-phone');
    await expectAccessible(page);

    // The overview's recent sales: the piece, where, when, the price and the maker's share.
    await page.getByTestId('nav-overview').click();
    await page.getByTestId('recent-sales').waitFor();
    const overview = await (await page.request.get(`${env.server.url}/api/overview`)).json();
    const latest = overview.recentSales.find((s: { lineId: number }) => s.lineId === first.id) as {
      price: Money;
      makerShare: Money;
    };
    const row = `recent-sale-${first.id}`;
    const rowText = await textOf(page, row);
    for (const part of [
      first.title,
      venueName,
      formatDate(today),
      formatMoney(latest.price),
      formatMoney(latest.makerShare),
    ]) {
      expect(rowText).toContain(part);
    }
    await page.getByTestId('recent-sales').scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-overview-phone');
    await expectAccessible(page);
    await page.getByTestId(row).click();
    await page.getByTestId('consignment-screen').waitFor();
    expect(new URL(page.url()).pathname).toBe(`/consignments/${sent.id}`);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('shows the consignment with its sales and the recent sales wide', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url, maker.email);
    await page.getByTestId('recent-sales').scrollIntoViewIfNeeded();
    // Wide, the same rows sit in columns: piece, venue, date, price and share.
    await page.getByTestId(`recent-sale-${lines[0]!.id}`).waitFor();
    await screenshot(page, 'sales-overview-wide');
    await expectAccessible(page);
    await page.getByTestId(`recent-sale-${lines[0]!.id}`).click();
    await page.getByTestId('consignment-screen').waitFor();
    await page.getByTestId(`piece-${lines[0]!.id}-outcome-sale`).scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-consignment-wide');
    await page.getByTestId('consignment-tallies').scrollIntoViewIfNeeded();
    await screenshot(page, 'sales-consignment-tallies-wide');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the maker’s sale e-mail waits under Sent mail with each piece, its price and share (phone)', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await openSection(page, 'mail');
    await page.getByTestId('mail-screen').waitFor();
    const card = page
      .locator('[data-testid^="mail-card-"]', { hasText: `sold at ${venueName}` })
      .first();
    await card.waitFor();
    // Held two minutes to gather sales recorded together; it may have gone by now.
    await expect(card.innerText()).resolves.toMatch(/Waiting to go|Sent/);
    await screenshot(page, 'sales-mail-phone');
    await card.click();
    await page.getByTestId('message-screen').waitFor();
    const state = await textOf(page, 'message-state');
    if (state === 'Waiting to go') {
      await expect(textOf(page, 'message-waiting')).resolves.toMatch(
        /^Waiting to go at .*: sales recorded within a few minutes of each other go as one message\.$/,
      );
    }
    await screenshot(page, 'sales-mail-message-top-phone');
    await page.getByTestId('message-body-view-text').getByText('Plain text').click();
    const body = await textOf(page, 'message-body');
    // The latest message holds the latest sale, the one the studio entered, with its split.
    const now = await consignmentOf(page, sent.id);
    const phoned = now.lines.find((l) => l.id === lines[5]!.id)!;
    expect(body).toContain(`${phoned.stockNumber} ${phoned.title}`);
    expect(body).toContain(`your share ${formatMoney(phoned.sale!.split.makerShare)}`);
    expect(body).toContain(`recorded by the studio (${maker.name})`);
    expect(await textOf(page, 'message-subject')).toContain(`sold at ${venueName}`);

    // Between them the sale messages name every sale that stands, the discounts with reasons.
    const list = await (await page.request.get(`${env.server.url}/api/outbox`)).json();
    const texts: string[] = [];
    for (const item of list.items.filter((m: { kind: string }) => m.kind === 'sale')) {
      texts.push(
        (await (await page.request.get(`${env.server.url}/api/outbox/${item.id}`)).json()).text,
      );
    }
    const all = texts.join('\n');
    for (const line of now.lines.filter((l) => l.state === 'sold')) {
      expect(all).toContain(`${line.stockNumber} ${line.title}`);
      expect(all).toContain(`your share ${formatMoney(line.sale!.split.makerShare)}`);
    }
    expect(all).toContain('Regular customer, a tenth off');
    expect(all).toContain('Bought with the bottle');
    expect(all).not.toContain(`${lines[2]!.stockNumber} ${lines[2]!.title}`);
    await screenshot(page, 'sales-mail-message-phone');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
