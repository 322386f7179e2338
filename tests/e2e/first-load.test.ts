import { type Page, type Response } from 'playwright-core';

import { demoSignIns } from '@/server/demo/demo-studio';

import { newPage, problemsOf } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

/** Every response the page receives from now on. */
function recordResponses(page: Page): Response[] {
  const responses: Response[] = [];
  page.on('response', (r) => responses.push(r));
  return responses;
}

const pathOf = (r: Response) => new URL(r.url()).pathname;
const isScript = (r: Response) => pathOf(r).startsWith('/_expo/static/js/');

describe('the first load', () => {
  it('of /sign-in fetches brotli scripts and WOFF2 fonts, and none of the studio screens', async () => {
    const page = await newPage(env.browser, 'phone');
    const responses = recordResponses(page);
    await page.goto(`${env.server.url}/sign-in`);
    await page.getByTestId('sign-in-email').waitFor();
    await page.waitForLoadState('networkidle');

    const scripts = responses.filter(isScript);
    expect(scripts.length).toBeGreaterThan(3);
    for (const script of scripts) {
      expect([pathOf(script), await script.headerValue('content-encoding')]).toEqual([
        pathOf(script),
        'br',
      ]);
      expect(await script.headerValue('cache-control')).toBe('public, max-age=31536000, immutable');
    }
    expect(scripts.map(pathOf)).not.toContainEqual(expect.stringContaining('studio-screens'));
    const fonts = responses.filter((r) => /\.(woff2|ttf|otf)$/.test(pathOf(r)));
    // Two faces each of Literata and Atkinson Hyperlegible Next, and two of IBM Plex Sans's digits.
    expect(fonts.map((r) => pathOf(r).split('.').at(-1))).toEqual(Array(6).fill('woff2'));
    const html = responses.find((r) => pathOf(r) === '/sign-in');
    expect(await html?.headerValue('cache-control')).toBe('no-cache');
    // The faces the sign-in form draws with came from those files and are in use.
    const loaded = await page.evaluate(() => {
      const families: string[] = [];
      document.fonts.forEach((face) => {
        if (face.status === 'loaded') families.push(face.family.replace(/"/g, ''));
      });
      return families.sort();
    });
    expect(loaded).toEqual(
      expect.arrayContaining([
        'AtkinsonHyperlegibleNext_400Regular',
        'AtkinsonHyperlegibleNext_600SemiBold',
        'Literata_600SemiBold',
      ]),
    );
    const emailFont = await page
      .getByTestId('sign-in-email')
      .evaluate((input) => getComputedStyle(input).fontFamily);
    expect(emailFont).toContain('AtkinsonHyperlegibleNext_400Regular');
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('of a deep link into the studio loads the studio screens and shows the page', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    const works = await (await page.request.get(`${env.server.url}/api/works?pageSize=1`)).json();
    const venues = await (await page.request.get(`${env.server.url}/api/venues`)).json();

    for (const [url, screen] of [
      [`/works/${works.items[0].id}`, 'work-screen'],
      [`/venues/${venues.items[0].id}`, 'venue-screen'],
      ['/works', 'works-screen'],
    ] as const) {
      const responses = recordResponses(page);
      await page.goto(`${env.server.url}${url}`);
      await page.getByTestId(screen).waitFor();
      expect(responses.filter(isScript).map(pathOf)).toContainEqual(
        expect.stringContaining('studio-screens'),
      );
    }
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });

  it('of a deep link for gallery staff never fetches the studio screens', async () => {
    const page = await newPage(env.browser, 'phone');
    const responses = recordResponses(page);
    await page.goto(`${env.server.url}/sign-in`);
    await page.getByTestId('sign-in-email').fill(demoSignIns.people[2].email);
    await page.getByTestId('sign-in-password').fill(demoSignIns.password);
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('venue-home-screen').waitFor();
    await page.goto(`${env.server.url}/venue`);
    await page.getByTestId('venue-home-screen').waitFor();
    expect(responses.filter(isScript).map(pathOf)).not.toContainEqual(
      expect.stringContaining('studio-screens'),
    );
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
