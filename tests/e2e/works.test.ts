import { importFieldLabels } from '@/shared/schemas/work-import';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { makeImage, signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

describe('works at phone size', () => {
  it('creates a work with two photos and finds it in the list by search', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-works').click();
    await page.getByTestId('works-screen').waitFor();
    await page.getByTestId('works-new').click();
    await page.getByTestId('work-create-screen').waitFor();

    const studio = await (await page.request.get(`${env.server.url}/api/studio`)).json();
    expect(await page.getByTestId('work-stockNumber').inputValue()).toBe(studio.nextStockNumber);

    await page.getByTestId('work-title').fill('Salt-glazed cider jar, two handles');
    await page.getByTestId('work-series').fill('Estuary');
    await page.getByTestId('work-firingTempC').fill('1285');
    await expect(page.getByTestId('work-cone').innerText()).resolves.toMatch(/Nearest cone: 10/);
    await page.getByTestId('work-weightG').fill('17250');
    await page.getByTestId('work-retailPrice').fill('1,245.50');

    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId('work-photos-add').click(),
    ]);
    expect(chooser.isMultiple()).toBe(true);
    await chooser.setFiles([
      {
        name: 'jar-front.png',
        mimeType: 'image/png',
        buffer: await makeImage('png', [47, 107, 90]),
      },
      {
        name: 'jar-side.jpg',
        mimeType: 'image/jpeg',
        buffer: await makeImage('jpeg', [158, 110, 60]),
      },
    ]);
    await page.getByTestId('work-photos-tile-1').waitFor();
    // The second photo becomes the cover before anything is sent.
    await page.getByTestId('work-photos-cover-1').click();
    await screenshot(page, 'work-create-phone');
    await expectAccessible(page);

    await page.getByTestId('work-submit').click();
    await page.getByTestId('work-screen').waitFor();
    await page.getByTestId('work-cover').waitFor();
    const id = Number(new URL(page.url()).pathname.split('/').at(-1));
    const work = await (await page.request.get(`${env.server.url}/api/works/${id}`)).json();
    expect(work.stockNumber).toBe(studio.nextStockNumber);
    expect(work.retailPrice).toEqual({ amount: 124550, currency: 'GBP' });
    expect(work.photos).toHaveLength(2);
    expect(await page.getByTestId('work-title').innerText()).toBe(
      'Salt-glazed cider jar, two handles',
    );
    expect(await page.getByTestId('work-price').innerText()).toBe('£1,245.50');
    await expect(page.getByTestId('work-heavy').innerText()).resolves.toMatch(/16 kg guideline/);
    await expect(page.getByTestId('work-food-use').innerText()).resolves.toMatch(
      /Decorative — not for food use/,
    );
    await screenshot(page, 'work-page-phone');
    await expectAccessible(page);

    await page.getByTestId('nav-works').click();
    await page.getByTestId('works-screen').waitFor();
    await page.getByTestId('works-search').fill('cider jar');
    await page.getByTestId(`work-card-${id}`).waitFor();
    await expect(page.getByTestId('works-pager-summary').innerText()).resolves.toMatch(/^1 work/);
    await expect(page.getByTestId(`work-card-${id}`).innerText()).resolves.toContain(
      studio.nextStockNumber,
    );
    await screenshot(page, 'works-search-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('previews a CSV of 50 works with three bad rows, then imports the other 47', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const before = (await (await page.request.get(`${env.server.url}/api/works?pageSize=1`)).json())
      .total;
    const existing = (
      await (await page.request.get(`${env.server.url}/api/works?pageSize=1`)).json()
    ).items[0].stockNumber;

    const header = [
      'stockNumber',
      'title',
      'year',
      'series',
      'glaze',
      'weightG',
      'retailPrice',
    ] as const;
    const lines = [header.map((f) => importFieldLabels[f]).join(',')];
    for (let n = 1; n <= 50; n += 1) {
      const stock = `IMP-${String(n).padStart(3, '0')}`;
      let row = [stock, `Imported beaker ${n}`, '2024', 'Import test', 'Shino', '420', '38.00'];
      if (n === 7) row = [stock, '', '2024', 'Import test', 'Shino', '420', '38.00'];
      if (n === 19)
        row = [stock, 'Priced in words', '2024', 'Import test', 'Shino', '420', 'forty'];
      if (n === 33)
        row = [existing, 'Same stock number', '2024', 'Import test', 'Shino', '420', '38'];
      lines.push(row.join(','));
    }
    const csv = `${lines.join('\n')}\n`;

    await page.goto(`${env.server.url}/works/import`);
    await page.getByTestId('work-import-screen').waitFor();
    await expectAccessible(page);
    const [chooser] = await Promise.all([
      page.waitForEvent('filechooser'),
      page.getByTestId('import-choose').click(),
    ]);
    await chooser.setFiles({ name: 'beakers.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await page.getByTestId('import-summary').waitFor();
    expect(await page.getByTestId('import-summary').innerText()).toBe(
      '50 rows: 47 ready to import, 2 with problems, 1 duplicate.',
    );
    // Rows as a spreadsheet numbers them: the header is row 1.
    const bad = page.locator('[data-testid^="import-row-error-"]');
    expect(await bad.count()).toBe(3);
    for (const row of [8, 20, 34]) await page.getByTestId(`import-row-error-${row}`).waitFor();
    await expect(page.getByTestId('import-row-error-34').innerText()).resolves.toContain(existing);
    expect(await page.getByTestId('import-map-title').inputValue()).toBe(importFieldLabels.title);
    await screenshot(page, 'work-import-preview-phone');
    await expectAccessible(page);

    await page.getByTestId('import-commit').click();
    await page.getByTestId('import-done').waitFor();
    await expect(page.getByTestId('import-done').innerText()).resolves.toContain(
      '47 works imported',
    );
    const after = (await (await page.request.get(`${env.server.url}/api/works?pageSize=1`)).json())
      .total;
    expect(after - before).toBe(47);
    await screenshot(page, 'work-import-done-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('creates a venue, the net preview following the commission', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-venues').click();
    await page.getByTestId('venues-screen').waitFor();
    await screenshot(page, 'venues-phone');
    await expectAccessible(page);
    await page.getByTestId('venues-new').click();
    await page.getByTestId('venue-create-screen').waitFor();

    await page.getByTestId('venue-name').fill('Harbour Light Gallery');
    await page.getByTestId('venue-kind-shop').click();
    await page.getByTestId('venue-town').fill('Southwold');
    await page.getByTestId('venue-postcode').fill('ip18 6ex');
    await page.getByTestId('venue-email').fill('hello@harbourlight.example');
    // The usual terms: 40% shared, no VAT on commission, so £60.00 of £100.00.
    expect(await page.getByTestId('venue-commissionRate').inputValue()).toBe('40');
    expect(await page.getByTestId('net-preview-share').innerText()).toBe('£60.00');
    await page.getByTestId('venue-commissionRate').fill('35');
    await page.waitForFunction(
      () => document.querySelector('[data-testid="net-preview-share"]')?.textContent === '£65.00',
    );
    await page.getByTestId('venue-commissionRate').fill('45.5');
    await page.waitForFunction(
      () => document.querySelector('[data-testid="net-preview-share"]')?.textContent === '£54.50',
    );
    await screenshot(page, 'venue-form-phone');
    await expectAccessible(page);

    await page.getByTestId('venue-submit').click();
    await page.getByTestId('venue-screen').waitFor();
    expect(await page.getByTestId('venue-name').innerText()).toBe('Harbour Light Gallery');
    expect(await page.getByTestId('venue-commission').innerText()).toBe('45.5%');
    const id = Number(new URL(page.url()).pathname.split('/').at(-1));
    const detail = await (await page.request.get(`${env.server.url}/api/venues/${id}`)).json();
    expect(detail.venue.postcode).toBe('IP18 6EX');
    expect(detail.venue.defaultTerms).toMatchObject({
      commissionRateBp: 4550,
      insuranceBasis: 'maker-net',
      venueRole: 'agent',
      discountRule: 'shared',
    });
    await screenshot(page, 'venue-page-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});

describe('works at wide size', () => {
  it('shows the works table, a work page, the venue form and settings', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('nav-works').click();
    await page.getByTestId('works-table').waitFor();
    await page.getByTestId('sort-price').click();
    await page.waitForFunction(() =>
      document.querySelector('[data-testid="sort-price"]')?.closest('[aria-sort="ascending"]'),
    );
    const cheapest = await (
      await page.request.get(`${env.server.url}/api/works?sort=price&pageSize=1`)
    ).json();
    await page.getByTestId(`work-row-${cheapest.items[0].id}`).waitFor();
    await screenshot(page, 'works-table-wide');
    await expectAccessible(page);

    // The work made at phone size, with its two photos.
    const made = await (await page.request.get(`${env.server.url}/api/works?search=cider`)).json();
    expect(made.items[0].photos).toHaveLength(2);
    await page.goto(`${env.server.url}/works/${made.items[0].id}`);
    await page.getByTestId('work-screen').waitFor();
    await page.getByTestId('work-cover').waitFor();
    await screenshot(page, 'work-page-wide');
    await expectAccessible(page);

    // A consigned work is kept for the record: archiving is offered, deleting is not.
    const consigned = await (
      await page.request.get(`${env.server.url}/api/works?status=on-consignment&pageSize=1`)
    ).json();
    await page.goto(`${env.server.url}/works/${consigned.items[0].id}`);
    await page.getByTestId('work-archive').waitFor();
    expect(await page.getByTestId('work-delete').count()).toBe(0);

    await page.goto(`${env.server.url}/venues/new`);
    await page.getByTestId('venue-create-screen').waitFor();
    await page.getByTestId('net-preview-share').waitFor();
    await page.getByTestId('venue-commissionRate').fill('30');
    await page.getByTestId('net-preview').scrollIntoViewIfNeeded();
    await screenshot(page, 'venue-form-wide');
    await expectAccessible(page);

    await page.goto(`${env.server.url}/settings`);
    await page.getByTestId('settings-pattern').waitFor();
    await screenshot(page, 'settings-wide');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
