import { renderConsignmentSheet } from '@/documents/consignment-sheet';
import { sumMoney } from '@/shared/money/amounts';
import { formatMoney } from '@/shared/money/format';
import { type ConsignmentSheetData } from '@/shared/schemas/documents';

import { sheetData } from './helpers/fixtures';
import { pdfInfo, pdfPages, requirePoppler, squash } from './helpers/pdf';

const stockLine = /^\s*(HC-\d{4})\s/;

/** Every line of every page, with the page it is on. */
const linesOf = (pages: string[]) =>
  pages.flatMap((page, index) => page.split('\n').map((text) => ({ page: index, text })));

const fileId = (pdf: Buffer) => /\/ID \[<([0-9a-f]+)>/.exec(pdf.toString('latin1'))?.[1];

describe('renderConsignmentSheet', () => {
  let data: ConsignmentSheetData;
  let pdf: Buffer;
  let pages: string[];
  let flow: string;

  beforeAll(async () => {
    requirePoppler();
    data = await sheetData(24);
    pdf = await renderConsignmentSheet(data);
    pages = pdfPages(pdf);
    // In content order each cell's wrapped lines come together.
    flow = squash(pdfPages(pdf, 'raw').join(' '));
  });

  it('prints every piece’s stock number, title and materials', () => {
    for (const line of data.lines) {
      expect(flow).toContain(line.stockNumber);
      expect(flow).toContain(line.title);
      expect(flow).toContain(line.materials);
    }
  });

  it('prints each piece’s list price and insured value on its row, as formatMoney writes them', () => {
    const rows = linesOf(pages).filter((line) => stockLine.test(line.text));
    expect(rows.map((row) => stockLine.exec(row.text)![1])).toEqual(
      data.lines.map((line) => line.stockNumber),
    );
    rows.forEach((row, i) => {
      const line = data.lines[i]!;
      const money = `${formatMoney(line.listPrice, 'en-GB')}\\s+${formatMoney(line.insuranceValue, 'en-GB')}`;
      expect(row.text).toMatch(new RegExp(`${money.replaceAll('.', '\\.')}\\s*$`));
    });
  });

  it('prints totals that are the sums of the lines', () => {
    const list = sumMoney(
      data.lines.map((line) => line.listPrice),
      'GBP',
    );
    const insured = sumMoney(
      data.lines.map((line) => line.insuranceValue),
      'GBP',
    );
    const total = linesOf(pages).find((line) => line.text.includes('Total, 24 pieces'));
    expect(total?.text).toMatch(
      new RegExp(`${formatMoney(list)}\\s+${formatMoney(insured)}\\s*$`.replaceAll('.', '\\.')),
    );
  });

  it('refuses totals that are not the sum of the lines, naming both figures', async () => {
    const wrong = {
      ...data,
      totals: {
        ...data.totals,
        listPrice: { amount: data.totals.listPrice.amount + 1, currency: 'GBP' },
      },
    };
    await expect(renderConsignmentSheet(wrong)).rejects.toThrow(
      `The sheet's list price total ${formatMoney(wrong.totals.listPrice)} is not the sum of its lines, ${formatMoney(data.totals.listPrice)}.`,
    );
  });

  it('names both sides with their addresses and VAT number, the reference and the dates', () => {
    for (const words of [
      'Hollin Clough Pottery',
      'The Old Dairy, Hollin Lane',
      'HX7 8QT',
      'VAT no. GB 284 1936 57',
      'Quayside Craft Rooms',
      'For the attention of Ines Hartley',
      '14 Harbour Row',
      'YO21 3PU',
      'Reference HCP-2026-07',
      'Spring porcelain and stoneware',
    ]) {
      expect(flow).toContain(words);
    }
    // en-GB writes day, short month, year (CLDR, through Intl.DateTimeFormat).
    expect(flow).toContain(
      'DISPATCH 14 Mar 2026 OPENING 21 Mar 2026 CLOSING 30 May 2026 RETURN DUE 13 Jun 2026',
    );
  });

  it('prints the terms in words as given', () => {
    for (const sentence of data.termsInWords) expect(flow).toContain(sentence);
  });

  it('puts a handling caution beside each piece over 16 kg and beside no other (HSE INDG143)', () => {
    const lines = linesOf(pages).map((line) => line.text);
    const starts = lines.flatMap((text, i) => (stockLine.test(text) ? [i] : []));
    const heavy = data.lines.filter((line) => (line.weightG ?? 0) > data.heavyWeightG);
    expect(heavy.length).toBeGreaterThan(0);
    starts.forEach((start, i) => {
      const line = data.lines[i]!;
      const end = starts[i + 1] ?? lines.findIndex((text) => text.includes('Total, 24 pieces'));
      const row = lines.slice(start, end).join('\n');
      if ((line.weightG ?? 0) > data.heavyWeightG) {
        const kg = (line.weightG! / 1000).toFixed(1);
        expect(row).toContain(
          `Heavy: ${kg} kg — lift with two people or a trolley (UK HSE guideline weights)`,
        );
      } else {
        expect(row).not.toContain('Heavy');
      }
    });
    expect(flow.match(/Heavy: /g)).toHaveLength(heavy.length);
    expect(flow).toContain('16 kg for women');
  });

  it('has signature, name and date lines for the studio and for the venue on receipt', () => {
    expect(flow).toContain('For the studio');
    expect(flow).toContain('For the venue, received in the condition described');
    expect(flow.match(/SIGNATURE/g)).toHaveLength(2);
    expect(flow.match(/NAME IN CAPITALS/g)).toHaveLength(2);
  });

  it('repeats the table header on every page of a 60-line sheet, numbered “Page n of N”', async () => {
    const long = await sheetData(60);
    const longPdf = await renderConsignmentSheet(long);
    const longPages = pdfPages(longPdf);
    const count = longPages.length;
    expect(count).toBeGreaterThanOrEqual(4);
    expect(pdfInfo(longPdf).Pages).toBe(String(count));
    let rows = 0;
    longPages.forEach((page, i) => {
      const lines = page.split('\n');
      expect(page).toContain(`Page ${i + 1} of ${count}`);
      expect(lines[0]).toMatch(/Hollin Clough Pottery\s+Consignment sheet · HCP-2026-07/);
      expect(page).toContain('Quayside Craft Rooms · HCP-2026-07');
      const first = lines.findIndex((line) => stockLine.test(line));
      if (first === -1) return;
      rows += lines.filter((line) => stockLine.test(line)).length;
      const header = lines.findIndex((line) => /Stock no\.\s+Title and materials/.test(line));
      expect(header).toBeGreaterThan(-1);
      expect(header).toBeLessThan(first);
      expect(lines.slice(header - 1, header + 1).join(' ')).toMatch(/List price\s+Insured at/);
    });
    expect(rows).toBe(60);
    expect(longPages[1]).toContain(`Page 2 of ${count}`);
  });

  it('never leaves the totals alone on a page, and drops the photo column when no piece has one', async () => {
    const long = await sheetData(200);
    const longPages = pdfPages(await renderConsignmentSheet(long));
    const last = longPages.find((page) => page.includes('Total, 200 pieces'))!;
    expect(last.split('\n').some((line) => stockLine.test(line))).toBe(true);

    const bare = { ...data, lines: data.lines.map((line) => ({ ...line, thumbnail: null })) };
    const barePages = pdfPages(await renderConsignmentSheet(bare));
    expect(barePages.join('\n')).toMatch(/^\s*Stock no\.\s+Title and materials/m);
    expect(pages.join('\n')).toMatch(/^\s*Photo\s+Stock no\.\s+Title and materials/m);
  });

  it('gives the same bytes for the same data, and another file identifier for other data', async () => {
    const again = await renderConsignmentSheet(await sheetData(24));
    expect(again.equals(pdf)).toBe(true);
    const other = structuredClone(data);
    other.lines[0]!.title = 'Moon jar, celadon (second)';
    const otherPdf = await renderConsignmentSheet(other);
    expect(fileId(pdf)).toMatch(/^[0-9a-f]{32}$/);
    expect(fileId(otherPdf)).not.toBe(fileId(pdf));
  });

  it('sets the title, the studio as author, and the issue day at 00:00 UTC as its dates', () => {
    const info = pdfInfo(pdf);
    expect(info.Title).toBe('Consignment sheet HCP-2026-07');
    expect(info.Author).toBe('Hollin Clough Pottery');
    expect(info.CreationDate).toBe('2026-03-14T00:00:00Z');
    expect(info.ModDate).toBe('2026-03-14T00:00:00Z');
    expect(info['Page size']).toContain('(A4)');
  });
});
