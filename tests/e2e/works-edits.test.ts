import path from 'node:path';

import { type Page } from 'playwright-core';

import { expectAccessible, newPage, problemsOf, screenshot, viewports } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();
const screenshots = path.resolve(__dirname, '../../test-results/screenshots');

const api = async (page: Page, path: string) =>
  (await page.request.get(`${env.server.url}${path}`)).json();

/** Whether the search box's hint, in the box's own font, fits the room inside the box. */
async function searchHintFits(page: Page): Promise<boolean> {
  return page.getByTestId('works-search').evaluate((input: HTMLInputElement) => {
    const style = getComputedStyle(input);
    const context = document.createElement('canvas').getContext('2d')!;
    context.font = `${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
    const room = input.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight);
    return context.measureText(input.placeholder).width <= room;
  });
}

/**
 * The screen as it is this moment, for a passing message: the usual screenshot first waits for
 * every picture, the hidden list's included, and the message can be gone by then.
 */
const shotNow = (page: Page, name: string) =>
  page.screenshot({ path: path.join(screenshots, `${name}.png`) });

/** Whether the page would hold up the browser's unload (and so have it ask first). */
const unloadIsStopped = (page: Page) =>
  page.evaluate(() => {
    const event = new Event('beforeunload', { cancelable: true });
    window.dispatchEvent(event);
    return event.defaultPrevented;
  });

/** Makes a work through the form at phone size and opens its page. */
async function newWorkWithWeight(page: Page, weight: string): Promise<number> {
  await page.getByTestId('nav-works').click();
  await page.getByTestId('works-screen').waitFor();
  await page.getByTestId('works-new').click();
  await page.getByTestId('work-create-screen').waitFor();
  await page.getByTestId('work-title').fill('Tall jug');
  await page.getByTestId('work-retailPrice').fill('85');
  await page.getByTestId('work-heightMm').fill('14 cm');
  await page.getByTestId('work-weightG').fill(weight);
  await page.getByTestId('work-submit').click();
  await page.getByTestId('work-screen').waitFor();
  return Number(new URL(page.url()).pathname.split('/').at(-1));
}

describe('editing works at phone size', () => {
  it('saves a weight typed in kilograms and shows it, with the price on the first screen', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const id = await newWorkWithWeight(page, '1.2 kg');

    const work = await api(page, `/api/works/${id}`);
    expect(work).toMatchObject({ weightG: 1200, heightMm: 140, deletable: true });
    expect(await page.getByTestId('work-weight').innerText()).toBe('1.2 kg');
    await expect(page.getByTestId('toast-message').innerText()).resolves.toMatch(
      /^Saved ‘Tall jug’/,
    );

    // Above the bottom bar at 390 × 844, without scrolling.
    const price = await page.getByTestId('work-price').boundingBox();
    const bar = await page.getByTestId('bottom-bar').boundingBox();
    expect(await page.getByTestId('work-price').innerText()).toBe('£85.00');
    expect(price!.y + price!.height).toBeLessThanOrEqual(bar!.y);
    expect(bar!.y + bar!.height).toBeLessThanOrEqual(viewports.phone.height);
    await shotNow(page, 'work-first-screen-phone');

    // A work with no history may be deleted, and the button says what goes.
    expect(await page.getByTestId('work-delete').innerText()).toBe('Delete ‘Tall jug’…');
    await page.getByTestId('work-delete').click();
    expect(await page.getByTestId('work-delete-confirm').innerText()).toBe(
      'Delete ‘Tall jug’ for good',
    );
    await screenshot(page, 'work-delete-confirm-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('archives at once, undoes it from the message, and shows an archived work as archived', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const id = await newWorkWithWeight(page, '850 g');

    await page.getByTestId('work-archive').click();
    await page.getByTestId('work-archived-toast').waitFor();
    await page.getByTestId('work-archived').waitFor();
    expect((await api(page, `/api/works/${id}`)).archivedAt).toEqual(expect.any(String));
    await screenshot(page, 'work-archived-toast-phone');
    await expectAccessible(page);

    await page.getByTestId('work-archived-toast-action').click();
    await page.getByTestId('work-archived').waitFor({ state: 'detached' });
    expect((await api(page, `/api/works/${id}`)).archivedAt).toBeNull();
    await page.getByTestId('work-archive').waitFor();

    // Archived again and left: its page says so, with a way back.
    await page.getByTestId('work-archive').click();
    await page.getByTestId('work-archived').waitFor();
    await page.getByTestId('toast').waitFor({ state: 'detached', timeout: 15_000 });
    await expect(page.getByTestId('work-archived').innerText()).resolves.toMatch(/^Archived on /);
    await screenshot(page, 'work-archived-phone');
    await page.getByTestId('work-restore').click();
    await page.getByTestId('work-archived').waitFor({ state: 'detached' });
    expect((await api(page, `/api/works/${id}`)).archivedAt).toBeNull();
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('asks before leaving a form with unsaved changes, and confirms a saved edit', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const id = await newWorkWithWeight(page, '1200');
    // The work's page stays underneath the form, so look inside the form.
    const form = page.getByTestId('work-edit-screen');

    await page.getByTestId('work-edit').click();
    await page.getByTestId('work-edit-screen').waitFor();
    // Leaving an untouched form asks nothing.
    await page.getByText('Back to Tall jug').click();
    await page.getByTestId('work-screen').waitFor();
    await page.getByTestId('work-edit').click();
    await page.getByTestId('work-edit-screen').waitFor();
    expect(await unloadIsStopped(page)).toBe(false);
    expect(await form.getByTestId('work-weightG').inputValue()).toBe('1200');
    await form.getByTestId('work-title').fill('Tall jug, ash glaze');

    await page.getByText('Back to Tall jug').click();
    await page.getByTestId('leave-guard').waitFor();
    await screenshot(page, 'work-leave-guard-phone');
    await expectAccessible(page);
    await page.getByTestId('leave-guard-cancel').click();
    await page.getByTestId('leave-guard').waitFor({ state: 'detached' });
    expect(await form.getByTestId('work-title').inputValue()).toBe('Tall jug, ash glaze');

    // Closing or reloading the tab asks too: the page cancels the browser's unload.
    expect(await unloadIsStopped(page)).toBe(true);

    await form.getByTestId('work-weightG').fill('1.25 kg');
    await form.getByTestId('work-weightG').scrollIntoViewIfNeeded();
    await screenshot(page, 'work-edit-sizes-phone');
    await form.getByTestId('work-submit').click();
    await page.getByTestId('work-screen').waitFor();
    await expect(page.getByTestId('work-saved-message').innerText()).resolves.toBe(
      'Saved ‘Tall jug, ash glaze’.',
    );
    expect(await page.getByTestId('work-weight').innerText()).toBe('1.25 kg');
    expect((await api(page, `/api/works/${id}`)).weightG).toBe(1250);
    await shotNow(page, 'work-saved-phone');

    // Leaving for another section asks as well, and goes when told to.
    await page.getByTestId('work-edit').click();
    await page.getByTestId('work-edit-screen').waitFor();
    await form.getByTestId('work-notes').fill('Left unsaved.');
    await page.getByTestId('nav-works').click();
    await page.getByTestId('leave-guard').waitFor();
    await page.getByTestId('leave-guard-confirm').click();
    await page.getByTestId('works-screen').waitFor();
    expect((await api(page, `/api/works/${id}`)).notes).toBeNull();
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('offers no Delete for a consigned work', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const consigned = (await api(page, '/api/works?status=on-consignment&pageSize=1')).items[0];
    expect(consigned.deletable).toBe(false);
    await page.goto(`${env.server.url}/works/${consigned.id}`);
    await page.getByTestId('work-screen').waitFor();
    await page.getByTestId('work-archive').waitFor();
    expect(await page.getByTestId('work-delete').count()).toBe(0);
    expect(await page.getByTestId('work-archive').innerText()).toBe(`Archive ‘${consigned.title}’`);
    await screenshot(page, 'work-consigned-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('opens the works list filtered to a status from the overview, its filters folded', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const overview = await api(page, '/api/overview');
    const count = overview.works.byStatus['on-consignment'];
    expect(count).toBeGreaterThan(0);
    await page.getByTestId('overview-status-link-on-consignment').scrollIntoViewIfNeeded();
    await screenshot(page, 'overview-statuses-phone');

    await page.getByTestId('overview-status-link-on-consignment').click();
    await page.getByTestId('works-screen').waitFor();
    expect(new URL(page.url()).searchParams.get('status')).toBe('on-consignment');
    await page.getByTestId('works-cards').waitFor();
    await expect(page.getByTestId('works-pager-summary').innerText()).resolves.toMatch(
      new RegExp(`^${count} works?`),
    );
    // The works come first: the filters are folded behind one button that counts them.
    expect(await page.getByTestId('works-filters-toggle').innerText()).toBe('Filters (1)');
    expect(await page.getByTestId('works-filter-status').count()).toBe(0);
    const firstCard = await page.locator('[data-testid^="work-card-"]').first().boundingBox();
    expect(firstCard!.y).toBeLessThan(viewports.phone.height / 2);
    expect(await searchHintFits(page)).toBe(true);
    await screenshot(page, 'works-filtered-phone');
    await expectAccessible(page);

    await page.getByTestId('works-filters-toggle').click();
    expect(await page.getByTestId('works-filter-status').inputValue()).toBe('on-consignment');
    await screenshot(page, 'works-filters-open-phone');
    await expectAccessible(page);
    await page.getByTestId('works-filters-clear').click();
    await page.waitForFunction(() => !new URL(location.href).searchParams.has('status'));
    expect(await page.getByTestId('works-filters-toggle').innerText()).toBe('Filters');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});

describe('works at wide size', () => {
  it('keeps the filters open, the hint whole and the column headings alike', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url);
    await page.getByTestId('overview-status-link-sold').scrollIntoViewIfNeeded();
    await screenshot(page, 'overview-statuses-wide');
    await expectAccessible(page);
    await page.getByTestId('overview-status-link-sold').click();
    await page.getByTestId('works-table').waitFor();
    expect(await page.getByTestId('works-filter-status').inputValue()).toBe('sold');
    expect(await searchHintFits(page)).toBe(true);
    const typeOf = (name: string) =>
      page
        .getByRole('columnheader', { name, exact: false })
        .getByText(name, { exact: true })
        .evaluate((el) => {
          const s = getComputedStyle(el);
          return [s.fontFamily, s.fontSize, s.fontWeight, s.color].join(' ');
        });
    const title = await typeOf('Title');
    for (const heading of ['Photo', 'Stock no.', 'Year', 'Series', 'Price', 'Status']) {
      expect(await typeOf(heading)).toBe(title);
    }
    await screenshot(page, 'works-sold-wide');
    await expectAccessible(page);

    const sold = (await api(page, '/api/works?status=sold&pageSize=1')).items[0];
    await page.goto(`${env.server.url}/works/${sold.id}`);
    await page.getByTestId('work-screen').waitFor();
    expect(await page.getByTestId('work-delete').count()).toBe(0);
    await page.getByTestId('work-edit').click();
    await page.getByTestId('work-edit-screen').waitFor();
    await screenshot(page, 'work-edit-wide');
    await page.getByTestId('work-weightG').fill('2.4 kg');
    await page.getByTestId('work-submit').click();
    await page.getByTestId('work-saved').waitFor();
    await screenshot(page, 'work-saved-wide');
    expect((await api(page, `/api/works/${sold.id}`)).weightG).toBe(2400);
    await page.getByTestId('work-archive').click();
    await page.getByTestId('work-archived-toast').waitFor();
    await screenshot(page, 'work-archived-wide');
    await expectAccessible(page);
    await page.getByTestId('work-archived-toast-action').click();
    await page.getByTestId('work-archived').waitFor({ state: 'detached' });
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
