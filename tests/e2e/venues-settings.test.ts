import { type Locator, type Page } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { openSection, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();
const [maker, assistant, gallery] = demoSignIns.people;

type VenueRow = { id: number; name: string; defaultTerms: { commissionVat: string } };

async function venueNamed(page: Page, name: string): Promise<VenueRow> {
  const venues = await (await page.request.get(`${env.server.url}/api/venues`)).json();
  return venues.items.find((v: VenueRow) => v.name === name);
}

/** Whether a person sees an element: its middle inside the window and nothing drawn over it. */
const shows = (locator: Locator) =>
  locator.evaluate((el) => {
    const box = el.getBoundingClientRect();
    const hit = document.elementFromPoint(box.left + box.width / 2, box.top + box.height / 2);
    return hit !== null && (hit === el || el.contains(hit));
  });

/**
 * Whether text is cut off: held in a box that hides what overflows (a clamp to some lines) and
 * longer than it, or running past the window's edge.
 */
const clipped = (locator: Locator) =>
  locator.evaluate((el) => {
    const hides = getComputedStyle(el).overflow !== 'visible';
    const longer = el.scrollWidth > el.clientWidth + 1 || el.scrollHeight > el.clientHeight + 1;
    return (hides && longer) || el.getBoundingClientRect().right > window.innerWidth;
  });

describe('venues and settings at phone size', () => {
  it('a new venue that charges no VAT: rate asked only where VAT applies, range said at once, net in view', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-venues').click();
    await page.getByTestId('venues-new').click();
    await page.getByTestId('venue-create-screen').waitFor();

    // The usual terms charge no VAT on commission and the maker is not registered: no rate to ask.
    expect(await page.getByTestId('venue-vatRate').count()).toBe(0);
    const name = 'The Harbour Street Gallery of Contemporary Craft and Design, Aldeburgh';
    await page.getByTestId('venue-name').fill(name);

    const commission = page.getByTestId('venue-commissionRate');
    const summary = page.getByTestId('net-summary-text');
    // As a person would: the field in the middle of the screen, where a tap brings it.
    await commission.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await commission.fill('140');
    const commissionError = page.getByTestId('venue-commissionRate-error');
    await commissionError.waitFor();
    expect(await commissionError.innerText()).toBe('A percentage cannot be above 100.');
    await expect(summary.innerText()).resolves.toBe('Complete the rates to see your net.');
    await screenshot(page, 'venue-new-out-of-range-phone');

    await commission.fill('35');
    await commissionError.waitFor({ state: 'detached' });
    // 35% of £100 with no VAT on it leaves £65 (docs/money-rules.md, split).
    await expect(summary.innerText()).resolves.toBe('On £100.00 you receive £65.00');
    // The full preview sits below all the terms; the summary stays in view with the field.
    expect([await shows(commission), await shows(summary)]).toEqual([true, true]);
    expect(await shows(page.getByTestId('net-preview'))).toBe(false);
    await screenshot(page, 'venue-new-summary-phone');

    await page.getByTestId('venue-commissionVat-added').click();
    const vatRate = page.getByTestId('venue-vatRate');
    await vatRate.waitFor();
    await vatRate.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await vatRate.fill('-5');
    const vatError = page.getByTestId('venue-vatRate-error');
    await vatError.waitFor();
    expect(await vatError.innerText()).toBe('A percentage cannot be below 0.');
    await vatRate.fill('20');
    await vatError.waitFor({ state: 'detached' });
    // 35% commission plus 20% VAT on it: £42 of £100 (HMRC, VAT at 20% on a £35 charge is £7).
    await expect(summary.innerText()).resolves.toBe('On £100.00 you receive £58.00');
    expect([await shows(vatRate), await shows(summary)]).toEqual([true, true]);
    await screenshot(page, 'venue-new-vat-phone');

    await page.getByTestId('venue-commissionVat-none').click();
    await vatRate.waitFor({ state: 'detached' });
    await expect(summary.innerText()).resolves.toBe('On £100.00 you receive £65.00');
    await expectAccessible(page);

    await page.getByTestId('venue-submit').click();
    await page.getByTestId('venue-screen').waitFor();
    await expect(page.getByTestId('venue-commission-vat').innerText()).resolves.toContain(
      'No VAT on commission',
    );
    expect(await page.getByTestId('venue-screen').innerText()).not.toMatch(/VAT rate/);
    const heading = page.getByTestId('venue-name');
    expect([await heading.innerText(), await clipped(heading)]).toEqual([name, false]);
    // Figures come from the digits face, whose zero is plain, ahead of the text face.
    const figures = await page.getByTestId('venue-commission').evaluate((el) => ({
      family: getComputedStyle(el).fontFamily,
      loaded: document.fonts.check('17px IBMPlexSans_400Regular', '0'),
    }));
    expect(figures.family).toMatch(
      /^"?IBMPlexSans_400Regular"?, "?AtkinsonHyperlegibleNext_400Regular/,
    );
    expect(figures.loaded).toBe(true);
    await screenshot(page, 'venue-no-vat-phone');
    await expectAccessible(page);

    const venue = await venueNamed(page, name);
    expect(venue.defaultTerms.commissionVat).toBe('none');
    // Back to the section's own list, as the bottom bar goes (the venue's pages leave the stack).
    await page.getByTestId('nav-venues').click();
    await page.getByTestId('venues-screen').waitFor();
    await expect(page.getByTestId(`venue-card-${venue.id}-vat`).innerText()).resolves.toBe(
      'No VAT on commission',
    );
    await screenshot(page, 'venues-phone');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('a long venue name wraps in the phone header instead of being cut off', async () => {
    const owner = await newPage(env.browser, 'phone');
    await signInToStudio(owner, env.server.url);
    const lanthorn = await venueNamed(owner, 'The Lanthorn Gallery');
    const long = 'The Lanthorn Gallery of Contemporary Craft, Harbour Street';
    await owner.goto(`${env.server.url}/venues/${lanthorn.id}/edit`);
    await owner.getByTestId('venue-name').fill(long);
    await owner.getByTestId('venue-submit').click();
    await owner.getByTestId('venue-screen').waitFor();
    await owner.context().close();

    const page = await newPage(env.browser, 'phone');
    await page.goto(`${env.server.url}/sign-in`);
    await page.getByTestId('sign-in-email').fill(gallery.email);
    await page.getByTestId('sign-in-password').fill(demoSignIns.password);
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('venue-home-screen').waitFor();
    const place = page.getByTestId('shell-place');
    expect([await place.innerText(), await clipped(place)]).toEqual([long, false]);
    await screenshot(page, 'venue-home-long-name-phone');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the assistant sees venue details, with the terms locked', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, assistant.email);
    const quayside = await venueNamed(page, 'Quayside Crafts');
    expect(quayside.defaultTerms.commissionVat).toBe('none');
    await page.goto(`${env.server.url}/venues/${quayside.id}`);
    await page.getByTestId('venue-screen').waitFor();
    expect(await page.getByTestId('venue-edit').innerText()).toBe('Edit venue details');
    await expect(page.getByTestId('venue-commission-vat').innerText()).resolves.toContain(
      'No VAT on commission',
    );
    await page.getByTestId('venue-edit').click();
    await page.getByTestId('venue-edit-screen').waitFor();
    expect(await page.getByTestId('venue-edit-what').innerText()).toBe('Venue details');
    await page.getByTestId('venue-terms-locked').waitFor();
    expect(await page.getByTestId('venue-commissionRate').count()).toBe(0);
    expect(await page.getByTestId('venue-edit-screen').innerText()).not.toMatch(
      /Edit venue and terms/,
    );
    await screenshot(page, 'venue-details-assistant-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('settings: the next stock number follows the pattern as it is typed', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url, maker.email);
    await openSection(page, 'settings');
    await page.getByTestId('settings-screen').waitFor();
    const studio = await (await page.request.get(`${env.server.url}/api/studio`)).json();
    const next = page.getByTestId('settings-next');
    await expect(next.innerText()).resolves.toBe(`Next stock number: ${studio.nextStockNumber}`);
    // The demo's step is £5.00: 61.25 rounded up to a multiple of 5 is 65 (arithmetic).
    await expect(page.getByTestId('settings-screen').innerText()).resolves.toContain(
      'with £5.00, £61.25 becomes £65.00',
    );

    const pattern = page.getByTestId('settings-pattern');
    await pattern.fill('SK-{YY}-');
    await expect(next.innerText()).resolves.toBe(
      'Next stock number: shown when the pattern is complete.',
    );
    await expect(page.getByTestId('settings-pattern-error').innerText()).resolves.toBe(
      'Include a counter such as {NNN} in the pattern.',
    );
    await pattern.pressSequentially('{NN}');
    const yy = new Intl.DateTimeFormat('en-GB', {
      timeZone: studio.timeZone,
      year: '2-digit',
    }).format(new Date());
    // No work yet carries an SK- number, so the counter starts at 1.
    await expect(next.innerText()).resolves.toBe(`Next stock number: SK-${yy}-01`);
    await screenshot(page, 'settings-phone');
    await expectAccessible(page);

    await page.getByTestId('settings-submit').click();
    await page.getByTestId('settings-saved').waitFor();
    const saved = await (await page.request.get(`${env.server.url}/api/studio`)).json();
    expect(saved.nextStockNumber).toBe(`SK-${yy}-01`);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});

describe('venues and settings on a wide screen', () => {
  it('lists each venue’s VAT on commission, and keeps the full preview beside the terms', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-venues').click();
    await page.getByTestId('venues-screen').waitFor();
    const quayside = await venueNamed(page, 'Quayside Crafts');
    const fair = await venueNamed(page, 'Deepwinter Makers Fair');
    await expect(page.getByTestId(`venue-row-${quayside.id}-vat`).innerText()).resolves.toBe(
      'No VAT on commission',
    );
    await expect(page.getByTestId(`venue-row-${fair.id}-vat`).innerText()).resolves.toMatch(
      /^VAT at \d+(\.\d+)?% included in the rate$/,
    );
    await screenshot(page, 'venues-wide');

    await page.goto(`${env.server.url}/venues/${quayside.id}/edit`);
    await page.getByTestId('venue-edit-screen').waitFor();
    await page.getByTestId('net-preview').waitFor();
    expect(await page.getByTestId('net-summary').count()).toBe(0);
    expect(await page.getByTestId('venue-vatRate').count()).toBe(0);
    await page.getByTestId('venue-makerVatRegistered-yes').click();
    await page.getByTestId('venue-vatRate').waitFor();
    await screenshot(page, 'venue-edit-wide');

    await openSection(page, 'settings');
    await page.getByTestId('settings-screen').waitFor();
    await screenshot(page, 'settings-wide');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
