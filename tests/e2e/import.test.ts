import fs from 'node:fs';

import Papa from 'papaparse';
import { type Page } from 'playwright-core';

import { expectAccessible, newPage, problemsOf, screenshot } from './helpers/browser';
import { withServerAndBrowser } from './helpers/setup';
import { signInToStudio } from './helpers/studio';

const env = withServerAndBrowser();

/** Opens the import page and hands its file chooser a CSV. */
async function chooseFile(page: Page, name: string, csv: string) {
  const [chooser] = await Promise.all([
    page.waitForEvent('filechooser'),
    page.getByTestId('import-choose').click(),
  ]);
  await chooser.setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await page.getByTestId('import-summary').waitFor();
}

const text = (page: Page, testID: string) => page.getByTestId(testID).innerText();

/** Two good rows with stock numbers, one without, a row with no title, an ambiguous price, and a repeat. */
const roundTrip = [
  'Stock number,Title,Year,Price,Height,Weight',
  'RT-001,Round trip bowl,2025,£85.00,14 cm,1.2 kg',
  'RT-002,Round trip charger,2025,"1,250.00",40 mm,2400 g',
  ',Round trip cup,2025,"12,50",90,350 g',
  'RT-004,,2025,30,,',
  'RT-005,Round trip jug,2025,"1,250",,',
  ',Round trip cup,2025,"12,50",90,350 g',
  '',
].join('\n');

describe('importing works at phone size', () => {
  it('keeps the skipped rows listed and downloadable, and catches the same file imported again', async () => {
    const page = await newPage(env.browser, 'phone');
    await signInToStudio(page, env.server.url);
    await page.goto(`${env.server.url}/works/import`);
    await page.getByTestId('work-import-screen').waitFor();

    // Before a file: the columns it reads and a template.
    await page.getByTestId('import-columns-toggle').click();
    await expect(text(page, 'import-column-retailPrice')).resolves.toContain(
      'Retail price (required)',
    );
    await expect(text(page, 'import-column-weightG')).resolves.toContain('1.2 kg');
    await screenshot(page, 'import-before-phone');
    await page.getByTestId('import-column-weightG').scrollIntoViewIfNeeded();
    await screenshot(page, 'import-columns-phone');
    await expectAccessible(page);
    const [template] = await Promise.all([
      page.waitForEvent('download'),
      page.getByTestId('import-template').click(),
    ]);
    expect(template.suggestedFilename()).toBe('works-import-template.csv');
    const templateRows = Papa.parse<string[]>(fs.readFileSync((await template.path())!, 'utf8'), {
      skipEmptyLines: true,
    }).data;
    expect(templateRows).toHaveLength(2);
    expect(templateRows[0]!.slice(0, 2)).toEqual(['Stock number', 'Title']);

    // The preview: what each row reads as, problems and the repeat.
    await chooseFile(page, 'round-trip.csv', roundTrip);
    await expect(text(page, 'import-summary')).resolves.toBe(
      '6 rows: 3 ready to import, 2 with problems, 1 duplicate.',
    );
    await expect(text(page, 'import-row-read-2')).resolves.toBe(
      'Reads as £85.00 GBP · 140 mm · 1.2 kg',
    );
    await expect(text(page, 'import-row-read-3')).resolves.toBe(
      'Reads as £1,250.00 GBP · 40 mm · 2.4 kg',
    );
    await expect(text(page, 'import-row-read-4')).resolves.toBe(
      'Reads as £12.50 GBP · 90 mm · 350 g',
    );
    await expect(text(page, 'import-row-error-6')).resolves.toContain(
      '“1,250” could be 1250 or 1.25',
    );
    await expect(text(page, 'import-row-error-7')).resolves.toContain(
      'Same title, year and price as row 4.',
    );
    await expect(text(page, 'import-duplicates-same-in-file')).resolves.toContain('Row 7');
    await screenshot(page, 'import-preview-phone');
    await page.getByTestId('import-row-2').scrollIntoViewIfNeeded();
    await screenshot(page, 'import-preview-rows-phone');
    await expectAccessible(page);

    // The import: the skipped rows stay, with why.
    await expect(text(page, 'import-commit')).resolves.toBe('Import 3 works');
    await page.getByTestId('import-commit').click();
    await page.getByTestId('import-done').waitFor();
    await expect(text(page, 'import-done')).resolves.toContain('3 works imported');
    await expect(text(page, 'import-done-summary')).resolves.toMatch(/^3 rows skipped/);
    for (const row of [5, 6, 7]) await page.getByTestId(`import-row-error-${row}`).waitFor();
    await expect(text(page, 'import-row-error-5')).resolves.toContain('Title: Enter a title.');
    await screenshot(page, 'import-result-phone');
    await expectAccessible(page);

    const [skipped] = await Promise.all([
      page.waitForEvent('download'),
      page.getByTestId('import-skipped-csv').click(),
    ]);
    expect(skipped.suggestedFilename()).toBe('round-trip-skipped.csv');
    const { data } = Papa.parse<string[]>(fs.readFileSync((await skipped.path())!, 'utf8'), {
      skipEmptyLines: true,
    });
    expect(data.map((row) => row.slice(0, 2))).toEqual([
      ['Stock number', 'Title'],
      ['RT-004', ''],
      ['RT-005', 'Round trip jug'],
      ['', 'Round trip cup'],
    ]);
    expect(data[0]![6]).toBe('Problem');
    expect(data[2]![6]).toContain('could be 1250 or 1.25');

    // The same file again: nothing new unless asked, and a taken stock number never.
    await page.getByTestId('import-another').click();
    await chooseFile(page, 'round-trip.csv', roundTrip);
    await expect(text(page, 'import-summary')).resolves.toBe(
      '6 rows: 0 ready to import, 2 with problems, 4 duplicates.',
    );
    await expect(text(page, 'import-duplicates-stock-number-in-catalogue')).resolves.toContain(
      'Rows 2 and 3',
    );
    await expect(text(page, 'import-duplicates-same-in-catalogue')).resolves.toContain(
      'Rows 4 and 7',
    );
    expect(await page.getByTestId('import-commit').getAttribute('aria-disabled')).toBe('true');
    await page.getByTestId('import-duplicates-anyway').click();
    await expect(text(page, 'import-commit')).resolves.toBe('Import 2 works');
    await screenshot(page, 'import-again-phone');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});

describe('importing works on a wide screen', () => {
  it('shows the page before, the preview and the result', async () => {
    const page = await newPage(env.browser, 'wide');
    await signInToStudio(page, env.server.url);
    await page.goto(`${env.server.url}/works/import`);
    await page.getByTestId('work-import-screen').waitFor();
    await screenshot(page, 'import-before-wide');
    await chooseFile(
      page,
      'wide.csv',
      [
        'Title,Retail price,Height,Width,Depth,Weight,Food use',
        'Wide platter,"1.250,00",3 cm,42 cm,42 cm,3.1 kg,food safe',
        'Wide beaker,38,120,80,80,420,',
        'Wide vase,twelve,,,,,',
      ].join('\n'),
    );
    await expect(text(page, 'import-row-read-2')).resolves.toBe(
      'Reads as £1,250.00 GBP · 30 × 420 × 420 mm · 3.1 kg',
    );
    await page.getByTestId('import-row-2').scrollIntoViewIfNeeded();
    await screenshot(page, 'import-preview-wide');
    await page.getByTestId('import-commit').click();
    await page.getByTestId('import-done').waitFor();
    await expect(text(page, 'import-done')).resolves.toContain('2 works imported');
    await screenshot(page, 'import-result-wide');
    await expectAccessible(page);
    expect(problemsOf(page)).toEqual([]);
    await page.context().close();
  });
});
