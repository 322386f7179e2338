import { type Page } from 'playwright-core';

import { demoSignIns, demoWorks } from '@/server/demo/demo-studio';
import { workStatuses } from '@/shared/schemas/work';

import {
  expectAccessible,
  newPage,
  problemsOf,
  screenshot,
  type ViewportName,
} from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';

const env = withServerAndBrowser();

const [maker, , gallery] = demoSignIns.people;

async function signIn(page: Page, email: string, password: string = demoSignIns.password) {
  await page.goto(`${env.server.url}/sign-in`);
  await page.getByTestId('sign-in-screen').waitFor();
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
}

const figure = async (page: Page, testId: string) =>
  Number((await page.getByTestId(testId).innerText()).trim());

describe.each<ViewportName>(['phone', 'wide'])('at %s size', (viewport) => {
  it('the owner signs in and sees the overview with the figures the API gives', async () => {
    const page = await newPage(env.browser, viewport);
    await page.goto(`${env.server.url}/`);
    // Signed out, the studio side sends you to sign in.
    await page.getByTestId('sign-in-screen').waitFor();
    await screenshot(page, `sign-in-${viewport}`);
    await expectAccessible(page);

    await signIn(page, maker.email);
    await page.getByTestId('overview-screen').waitFor();
    await page.getByTestId('overview-works-total').waitFor();
    const api = await (await page.request.get(`${env.server.url}/api/overview`)).json();
    expect(await figure(page, 'overview-works-total')).toBe(demoWorks.length);
    expect(await figure(page, 'overview-works-total')).toBe(api.works.total);
    for (const status of workStatuses) {
      expect(await figure(page, `overview-status-${status}`)).toBe(api.works.byStatus[status]);
    }
    expect(await figure(page, 'overview-venues-total')).toBe(api.venues.total);
    expect(await figure(page, 'overview-consignments-out')).toBe(api.consignments.outCount);
    for (const c of api.consignments.out) {
      await expect(page.getByTestId(`consignment-card-${c.id}`).innerText()).resolves.toContain(
        c.reference,
      );
    }
    // The browser tab names the page (Expo Router sets it through its Head component).
    expect(await page.title()).toBe('Overview · Saggar');
    await screenshot(page, `overview-${viewport}`);
    await expectAccessible(page);

    // A deep link reloads into the same signed-in app.
    await page.reload();
    await page.getByTestId('overview-screen').waitFor();

    await page.getByTestId('sign-out').click();
    await page.getByTestId('sign-in-screen').waitFor();
    expect((await page.request.get(`${env.server.url}/api/me`)).status()).toBe(401);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('the gallery member sees the venue home and is kept out of the studio side', async () => {
    const page = await newPage(env.browser, viewport);
    await signIn(page, gallery.email);
    await page.getByTestId('venue-home-screen').waitFor();
    expect(new URL(page.url()).pathname).toBe('/venue');
    const api = await (await page.request.get(`${env.server.url}/api/venue/consignments`)).json();
    expect(api.consignments.length).toBeGreaterThan(0);
    for (const c of api.consignments) {
      await page.getByTestId(`consignment-card-${c.id}`).waitFor();
    }
    await expect(page.getByTestId('venue-home-screen').innerText()).resolves.toContain(
      api.places[0].venue.name,
    );
    await screenshot(page, `venue-home-${viewport}`);
    await expectAccessible(page);

    await page.goto(`${env.server.url}/`);
    await page.getByTestId('venue-home-screen').waitFor();
    expect(new URL(page.url()).pathname).toBe('/venue');
    expect(await page.getByTestId('overview-screen').count()).toBe(0);
    expect((await page.request.get(`${env.server.url}/api/overview`)).status()).toBe(403);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('a wrong password shows the error and leaves no session', async () => {
    const page = await newPage(env.browser, viewport);
    await signIn(page, maker.email, 'not-the-password');
    const error = page.getByTestId('sign-in-error');
    await error.waitFor();
    expect(await error.innerText()).toMatch(/do not match/);
    expect(await page.getByTestId('sign-in-email').inputValue()).toBe(maker.email);
    await screenshot(page, `sign-in-error-${viewport}`);
    await expectAccessible(page);
    const cookies = await page.context().cookies();
    expect(cookies.filter((c) => c.name.includes('session'))).toEqual([]);
    expect((await page.request.get(`${env.server.url}/api/me`)).status()).toBe(401);
    await page.context().close();
  });

  it('an unknown address shows the not-found screen', async () => {
    const page = await newPage(env.browser, viewport);
    await page.goto(`${env.server.url}/no/such/page`);
    await page.getByTestId('not-found-screen').waitFor();
    await screenshot(page, `not-found-${viewport}`);
    await page.context().close();
  });
});
