import { renderLabels } from '@/documents/labels';
import { formatMoney } from '@/shared/money/format';
import { type LabelsData } from '@/shared/schemas/documents';

import { labelsData } from './helpers/fixtures';
import { pdfInfo, pdfPagePng, pdfPages, requirePoppler, squash } from './helpers/pdf';
import { qrReadingDpi, readQrCode } from './helpers/qr';

describe('renderLabels', () => {
  let data: LabelsData;
  let pdf: Buffer;
  let pages: string[];
  let flow: string;

  beforeAll(async () => {
    requirePoppler();
    data = labelsData(14);
    pdf = await renderLabels(data);
    pages = pdfPages(pdf);
    flow = squash(pdfPages(pdf, 'raw').join(' '));
  });

  it('sets ten labels to an A4 sheet', () => {
    expect(pdfInfo(pdf).Pages).toBe('2');
    expect(pdfInfo(pdf)['Page size']).toContain('(A4)');
    expect(pages[0]!.match(/HC-\d{4}/g)).toHaveLength(10);
    expect(pages[1]!.match(/HC-\d{4}/g)).toHaveLength(4);
  });

  // ISO/IEC 18004 (QR Code) symbols, read back by jsQR, an independent decoder, from the page
  // as pdftoppm rasterises it.
  it('draws QR codes that a reader decodes to each piece’s address (ISO/IEC 18004)', async () => {
    const first = pdfPagePng(pdf, 1, qrReadingDpi);
    const second = pdfPagePng(pdf, 2, qrReadingDpi);
    const read = await Promise.all([
      ...Array.from({ length: 10 }, (_, slot) => readQrCode(first, slot)),
      ...Array.from({ length: 4 }, (_, slot) => readQrCode(second, slot)),
    ]);
    expect(read).toEqual(data.labels.map((label) => label.qrUrl));
  });

  it('prints title, materials, dimensions, price, stock number and the studio on every label', () => {
    for (const label of data.labels) {
      expect(flow).toContain(label.title);
      expect(flow).toContain(label.materials);
      expect(flow).toContain(label.stockNumber);
      expect(flow).toContain(formatMoney(label.price, 'en-GB'));
      if (label.dimensions) expect(flow).toContain(label.dimensions);
    }
    expect(flow.match(/HOLLIN CLOUGH POTTERY/g)).toHaveLength(14);
  });

  it('prints the food-use note exactly as given and the care note when there is one', () => {
    const foodUse = (note: string) => data.labels.filter((l) => l.foodUseNote === note).length;
    for (const note of new Set(data.labels.map((l) => l.foodUseNote))) {
      expect(flow.split(note).length - 1).toBe(foodUse(note));
    }
    expect(flow.split('Decorative — not for food use.').length - 1).toBeGreaterThan(0);
    const cared = data.labels.filter((l) => l.careNote !== null).length;
    expect(cared).toBeLessThan(14);
    expect(flow.split('Wash by hand; not for the microwave.').length - 1).toBe(cared);
  });

  it('puts the heavy caution on heavy pieces’ labels only', () => {
    expect(data.labels.some((l) => l.heavy)).toBe(true);
    // In content order each label starts with its stock number, under the QR code.
    const starts = data.labels.map((label) => flow.indexOf(`${label.stockNumber} `));
    data.labels.forEach((label, i) => {
      const words = flow.slice(starts[i], starts[i + 1] ?? flow.length);
      expect(words.includes('Heavy: lift with two people or a trolley')).toBe(label.heavy);
    });
  });

  it('sets a long text smaller rather than cutting the food-use note', async () => {
    const long = labelsData(1);
    long.labels[0]!.title = 'Large lidded storage jar with combed shoulder and three lug handles';
    long.labels[0]!.careNote =
      'Wash by hand in warm soapy water; not for the dishwasher, microwave or oven; dry upside down.';
    long.labels[0]!.foodUseNote =
      'Food-safe liner glaze on the inside only, as declared by the maker; the outside is decorative.';
    const text = squash(pdfPages(await renderLabels(long), 'raw').join(' '));
    expect(text).toContain(long.labels[0]!.title);
    expect(text).toContain(long.labels[0]!.careNote);
    expect(text).toContain(long.labels[0]!.foodUseNote);
  });

  it('cuts a care note too long for any label short, never the food-use note', async () => {
    const long = labelsData(1);
    const care = 'Wash by hand in warm soapy water; not for the dishwasher, microwave or oven. ';
    long.labels[0]!.careNote = care.repeat(12).trim();
    long.labels[0]!.foodUseNote =
      'Food-safe liner glaze on the inside only, as declared by the maker; the outside is decorative.';
    const text = squash(pdfPages(await renderLabels(long), 'raw').join(' '));
    expect(text).toContain(long.labels[0]!.foodUseNote);
    expect(text).toContain(long.labels[0]!.title);
    expect(text).toMatch(/Wash by hand in warm soapy water[^£]*…/);
    expect(text).not.toContain(care.repeat(12).trim());
    expect(text).toContain(formatMoney(long.labels[0]!.price, 'en-GB'));
  });

  it('numbers the sheets and gives the same bytes for the same data', async () => {
    expect(pages[0]).toContain('Page 1 of 2');
    expect(pages[1]).toContain('Page 2 of 2');
    expect(pages[0]).toMatch(/Hollin Clough Pottery\s+Shelf labels · HCP-2026-07/);
    expect((await renderLabels(labelsData(14))).equals(pdf)).toBe(true);
  });
});
