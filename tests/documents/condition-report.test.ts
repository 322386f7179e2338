import { renderConditionReport } from '@/documents/condition-report';
import { type ConditionReportData } from '@/shared/schemas/documents';

import { conditionData } from './helpers/fixtures';
import { pdfInfo, pdfPages, requirePoppler, squash } from './helpers/pdf';

describe('renderConditionReport', () => {
  let data: ConditionReportData;
  let pdf: Buffer;
  let pages: string[];
  let flow: string;

  beforeAll(async () => {
    requirePoppler();
    data = await conditionData();
    pdf = await renderConditionReport(data);
    pages = pdfPages(pdf);
    flow = squash(pdfPages(pdf, 'raw').join(' '));
  });

  it('shows the dispatch check beside the arrival check, on the same lines', () => {
    const all = pages.join('\n').split('\n');
    const headings = all.filter((line) => /At dispatch\s+On arrival/.test(line));
    expect(headings).toHaveLength(3);
    const grades = all.find((line) => line.includes('Overall: sound'));
    expect(grades).toMatch(/Overall: sound\s+Overall: marked/);
    expect(
      all.some((line) => /on 13 Mar 2026\s+Examined by Ines Hartley on 16 Mar 2026/.test(line)),
    ).toBe(true);
  });

  it('gives each check its examiner, date, overall grade in words and its findings', () => {
    for (const words of [
      'Examined by Maya Lindqvist on 13 Mar 2026',
      'Examined by Ines Hartley on 16 Mar 2026',
      'Overall: sound',
      'Overall: marked',
      'Overall: slight',
      'Chip — marked',
      'Rim, above the seam · 4 mm',
      'Fresh break, white body showing; the fragment was in the box.',
      'Abrasion — slight',
      'Foot ring · 12 mm',
      'Crazing — slight',
      // Kinds in words, not codes: 'hairline-crack' is a hairline crack.
      'Hairline crack — slight',
      'Glaze fault — slight',
      'Outer box dented on one corner.',
    ]) {
      expect(flow).toContain(words);
    }
    expect(flow).not.toMatch(/hairline-crack|glaze-fault/);
  });

  it('lists the differences under their own heading, and says when there are none', () => {
    expect(flow).toContain(
      'Differences since dispatch New: chip, marked, on the rim above the seam, 4 mm. ' +
        'New: abrasion, slight, on the foot ring, 12 mm.',
    );
    expect(flow.match(/Differences since dispatch/g)).toHaveLength(1);
    expect(flow).toContain('No differences since dispatch.');
  });

  it('says when a piece has not been checked on arrival yet', () => {
    expect(flow).toMatch(/HC-2603 Tea bowl, shino .*Not checked yet\./);
  });

  it('cites the method of the overall grade (Collections Trust, Spectrum)', () => {
    expect(flow).toContain('overall grade is the grade of its most serious finding');
    expect(flow).toContain('Collections Trust, Spectrum 5.0');
    for (const grade of ['sound: no findings', 'slight', 'marked', 'serious']) {
      expect(flow).toContain(grade);
    }
  });

  it('numbers its pages and repeats studio, reference and venue on each', () => {
    pages.forEach((page, i) => {
      expect(page).toContain(`Page ${i + 1} of ${pages.length}`);
      expect(page).toMatch(/Hollin Clough Pottery\s+Condition report · HCP-2026-07/);
      expect(page).toContain('Quayside Craft Rooms · HCP-2026-07');
    });
  });

  it('gives the same bytes for the same data and dates it from issuedOn', async () => {
    const again = await renderConditionReport(await conditionData());
    expect(again.equals(pdf)).toBe(true);
    expect(pdfInfo(pdf).CreationDate).toBe('2026-03-14T00:00:00Z');
  });

  it('keeps a long list of findings in order across pages, the columns headed again', async () => {
    const many = structuredClone(data);
    const arrival = many.pieces[0]!.arrival!;
    arrival.findings = Array.from({ length: 30 }, (_, i) => ({
      kind: 'abrasion' as const,
      grade: 'slight' as const,
      location: `Point ${i + 1} on the wall`,
      sizeMm: i + 1,
      notes: null,
      photo: null,
    }));
    const longPages = pdfPages(await renderConditionReport(many));
    const text = longPages.join('\n');
    const order = [...text.matchAll(/Point (\d+) on the wall/g)].map((m) => Number(m[1]));
    expect(order).toEqual(Array.from({ length: 30 }, (_, i) => i + 1));
    const continued = longPages.filter((page) => page.includes('Moon jar, celadon (continued)'));
    expect(continued.length).toBeGreaterThan(0);
    for (const page of continued) expect(page).toMatch(/At dispatch\s+On arrival/);
  });
});
