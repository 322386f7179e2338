import request from 'supertest';

import { differenceInWords } from '@/shared/condition/words';
import { formatDate } from '@/shared/format/dates';
import { formatMoney } from '@/shared/money/format';
import { type Consignment, consignmentSchema } from '@/shared/schemas/consignment';

import {
  pdfImages,
  pdfInfo,
  pdfPagePng,
  pdfPages,
  requirePoppler,
  squash,
} from '../../documents/helpers/pdf';
import { qrReadingDpi, readQrCode } from '../../documents/helpers/qr';
import { as, soundCheck } from '../helpers/consignment-fixture';
import {
  bottleChip,
  type DocumentFixture,
  documentFixture,
  readyToSend,
  sentDocumentFixture,
  testAppUrl,
} from '../helpers/document-fixture';
import { getBytes } from '../helpers/mail';
import { picture } from '../helpers/pictures';
import { addConsignment, addPerson, addVenue, signIn } from '../helpers/test-app';

// pdftotext, pdfinfo, pdfimages and pdftoppm from Debian's poppler-utils read the files back.
beforeAll(requirePoppler);

const documents = [
  { path: 'sheet.pdf', fileWords: 'consignment sheet', pdfTitle: 'Consignment sheet' },
  { path: 'condition-report.pdf', fileWords: 'condition report', pdfTitle: 'Condition report' },
  { path: 'labels.pdf', fileWords: 'labels', pdfTitle: 'Shelf labels' },
] as const;
type DocumentPath = (typeof documents)[number]['path'];

const notFound = {
  error: { code: 'not_found', message: 'That consignment was not found.' },
};

async function pdf(f: DocumentFixture, path: DocumentPath, cookie: string) {
  const res = await getBytes(f.app, `/api/consignments/${f.draft.id}/${path}`, cookie);
  if (res.status !== 200) throw new Error(`${path}: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as Buffer;
}

async function consignmentOf(f: DocumentFixture): Promise<Consignment> {
  const res = await as(f, 'owner').get(`/api/consignments/${f.draft.id}`);
  return consignmentSchema.parse(res.body);
}

/** Every line of every page, in order. */
const layoutLines = (file: Buffer) => pdfPages(file).join('\n').split('\n');
/** The words in the order they were drawn, whitespace collapsed. */
const flowOf = (file: Buffer) => squash(pdfPages(file, 'raw').join(' '));
const count = (text: string, words: string) => text.split(words).length - 1;
const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** A staff member of a second venue of studio A, signed in. */
async function otherVenueStaff(f: DocumentFixture) {
  const venue = await addVenue(f.db, f.studioA, 'Second venue of A');
  await addPerson(f.db, 'second-venue@example.test', [
    { studioId: f.studioA, role: 'gallery', venueId: venue },
  ]);
  return signIn(f.app, 'second-venue@example.test');
}

describe('GET /api/consignments/:id/{sheet,condition-report,labels}.pdf', () => {
  let f: DocumentFixture;
  let consignment: Consignment;
  beforeAll(async () => {
    f = await sentDocumentFixture();
    consignment = await consignmentOf(f);
  });

  it('serves each as a PDF shown inline, named for the reference, never cached', async () => {
    for (const who of ['owner', 'assistant', 'gallery'] as const) {
      for (const document of documents) {
        const res = await getBytes(
          f.app,
          `/api/consignments/${f.draft.id}/${document.path}`,
          await f.cookie(who),
        );
        expect(res.status).toBe(200);
        expect(res.headers['content-type']).toBe('application/pdf');
        expect(res.headers['content-disposition']).toBe(
          `inline; filename="${consignment.reference} ${document.fileWords}.pdf"`,
        );
        expect(res.headers['cache-control']).toBe('private, no-store');
        const body = res.body as Buffer;
        // ISO 32000-1, 7.5.2: a PDF file begins with its header, "%PDF-" and the version.
        expect(body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
        // pdfinfo (poppler-utils) reads the document's title from its information dictionary.
        expect(pdfInfo(body).Title).toBe(`${document.pdfTitle} ${consignment.reference}`);
      }
    }
  });

  it('gives the venue’s staff the same file as the studio', async () => {
    for (const document of documents) {
      const owner = await pdf(f, document.path, await f.cookie('owner'));
      const gallery = await pdf(f, document.path, await f.cookie('gallery'));
      expect(gallery.equals(owner)).toBe(true);
    }
  });

  describe('the consignment sheet', () => {
    let sheet: Buffer;
    let lines: string[];
    beforeAll(async () => {
      sheet = await pdf(f, 'sheet.pdf', await f.cookie('owner'));
      lines = layoutLines(sheet);
    });

    const pieceRow = /^\s*(A-\d)\s/;

    it('prints each piece’s list price and insured value as the money engine answers them', () => {
      const rows = lines.filter((line) => pieceRow.test(line));
      expect(rows.map((row) => pieceRow.exec(row)![1])).toEqual(
        consignment.lines.map((line) => line.stockNumber),
      );
      rows.forEach((row, i) => {
        const line = consignment.lines[i]!;
        expect(row).toContain(line.title);
        const list = escape(formatMoney(line.listPrice, 'en-GB'));
        const insured = escape(formatMoney(line.insuranceValue, 'en-GB'));
        expect(row).toMatch(new RegExp(`${list}\\s+${insured}\\s*$`));
      });
      // Worked by hand (docs/money-rules.md): insured at the maker's net, the list price less
      // 40% commission, without VAT: £100 → £60, £240 → £144, £480 → £288, £950 → £570.
      expect(consignment.lines.map((line) => line.insuranceValue.amount)).toEqual([
        6_000, 14_400, 28_800, 57_000,
      ]);
      expect(rows.map((row) => row.trim().split(/\s+/).slice(-2).join(' '))).toEqual([
        '£100.00 £60.00',
        '£240.00 £144.00',
        '£480.00 £288.00',
        '£950.00 £570.00',
      ]);
    });

    it('prints the totals the money engine answers, which are the sums of the lines', () => {
      const totals = consignment.totals!;
      const total = lines.find((line) => line.includes('Total, 4 pieces'));
      expect(total).toMatch(
        new RegExp(
          `Total, 4 pieces\\s+${escape(formatMoney(totals.listPrice, 'en-GB'))}\\s+${escape(
            formatMoney(totals.insuranceValue, 'en-GB'),
          )}\\s*$`,
        ),
      );
      // By hand: £100 + £240 + £480 + £950 = £1,770; £60 + £144 + £288 + £570 = £1,062.
      expect(total).toMatch(/£1,770\.00\s+£1,062\.00\s*$/);
    });

    it('sets the handling caution under the piece over 16 kg, and only there (HSE INDG143)', () => {
      const rowAt = (stock: string) =>
        lines.findIndex((line) => pieceRow.exec(line)?.[1] === stock);
      const cautions = lines
        .map((line, index) => ({ line, index }))
        .filter(({ line }) => line.includes('Heavy:'));
      expect(cautions).toHaveLength(1);
      const urn = rowAt('A-4');
      const totalAt = lines.findIndex((line) => line.includes('Total, 4 pieces'));
      // Between the urn's row and the totals, so beside the urn and no other piece. 23,400 g is
      // 23.4 kg, over the 16 kg guideline weight (docs/cautions.md).
      expect(cautions[0]!.index).toBeGreaterThan(urn);
      expect(cautions[0]!.index).toBeLessThan(totalAt);
      expect(cautions[0]!.line.trim()).toBe(
        'Heavy: 23.4 kg — lift with two people or a trolley (UK HSE guideline weights)',
      );
      expect(squash(lines.join('\n'))).toContain('(HSE, “Manual handling at work”, INDG143)');
    });

    it('shows the cover photograph of the one piece that has one', () => {
      // pdfimages: the moon jar's cover, resized to 160 px square for the row.
      expect(pdfImages(sheet)).toEqual([{ page: 1, width: 160, height: 160 }]);
    });
  });

  describe('the condition report before arrival', () => {
    let report: Buffer;
    let flow: string;
    beforeAll(async () => {
      report = await pdf(f, 'condition-report.pdf', await f.cookie('owner'));
      flow = flowOf(report);
    });

    it('shows each dispatch check, with the finding under its piece', () => {
      const examined = `Examined by ${soundCheck.examinerName} on ${formatDate(soundCheck.examinedOn)}`;
      expect(examined).toBe('Examined by Ines on 20 Nov 2026');
      expect(count(flow, examined)).toBe(4);
      expect(count(flow, 'Not checked yet.')).toBe(4);
      expect(count(flow, 'Overall: sound')).toBe(3);
      expect(count(flow, 'Overall: slight')).toBe(1);
      const finding = `Chip — slight foot ring · 3 mm ${bottleChip.notes}`;
      expect(count(flow, finding)).toBe(1);
      const at = flow.indexOf(finding);
      expect(at).toBeGreaterThan(flow.indexOf('A-2 Tall bottle'));
      expect(at).toBeLessThan(flow.indexOf('A-3 Tea bowl'));
      expect(flow).not.toContain('Differences since dispatch');
    });

    it('carries the piece’s photograph and the finding’s', () => {
      // pdfimages: the moon jar at 320 px, the chip's photograph at 400 px.
      expect(pdfImages(report).map(({ width, height }) => [width, height])).toEqual([
        [320, 320],
        [400, 400],
      ]);
    });
  });

  describe('the shelf labels', () => {
    let labels: Buffer;
    let flow: string;
    beforeAll(async () => {
      labels = await pdf(f, 'labels.pdf', await f.cookie('owner'));
      flow = flowOf(labels);
    });

    /** One label's words: from its stock number to the next label's, in drawing order. */
    const labelWords = (i: number) => {
      const from = flow.indexOf(`${consignment.lines[i]!.stockNumber} STUDIO A`);
      const next = consignment.lines[i + 1];
      const to = next ? flow.indexOf(`${next.stockNumber} STUDIO A`) : flow.indexOf('Studio A');
      expect(from).toBeGreaterThanOrEqual(0);
      expect(to).toBeGreaterThan(from);
      return flow.slice(from, to);
    };

    it('sets one label per piece on one sheet, in the consignment’s order', () => {
      expect(pdfInfo(labels).Pages).toBe('1');
      expect(count(flow, 'STUDIO A')).toBe(4);
      const titles = consignment.lines.map((line) => flow.indexOf(line.title));
      expect(titles.every((at) => at >= 0)).toBe(true);
      expect([...titles].sort((a, b) => a - b)).toEqual(titles);
    });

    it('prints each piece’s title, list price and food-use note on its own label', () => {
      // The maker's declaration word for word; not stated reads as decorative (docs/cautions.md).
      const foodUse = [
        'Food-safe, as declared by the maker.',
        'Decorative — not for food use.',
        'Decorative — not for food use.',
        'Decorative — not for food use.',
      ];
      consignment.lines.forEach((line, i) => {
        const words = labelWords(i);
        expect(words).toContain(line.title);
        expect(words).toContain(formatMoney(line.listPrice, 'en-GB'));
        expect(words).toContain(foodUse[i]);
      });
      expect(labelWords(0)).toContain('Hand wash only.');
      expect(count(flow, 'Food-safe, as declared by the maker.')).toBe(1);
      expect(count(flow, 'Decorative — not for food use.')).toBe(3);
    });

    it('marks only the piece over 16 kg as heavy (docs/cautions.md)', () => {
      expect(count(flow, 'Heavy: lift with two people or a trolley')).toBe(1);
      expect(labelWords(3)).toContain('Heavy: lift with two people or a trolley');
    });

    it('draws QR codes that open each piece on the venue’s side (ISO/IEC 18004, read by jsQR)', async () => {
      const page = pdfPagePng(labels, 1, qrReadingDpi);
      const read = await Promise.all([0, 1, 2, 3, 4].map((slot) => readQrCode(page, slot)));
      expect(read).toEqual([
        ...consignment.lines.map((line) => `${testAppUrl}/venue/piece/${line.id}`),
        undefined,
      ]);
      // The app's page at that address asks the API for the piece: the venue's staff get it.
      for (const [i, address] of read.slice(0, 4).entries()) {
        const lineId = address!.slice(`${testAppUrl}/venue/piece/`.length);
        const piece = await as(f, 'gallery').get(`/api/venue/lines/${lineId}`);
        expect(piece.status).toBe(200);
        expect(piece.body.line.title).toBe(consignment.lines[i]!.title);
      }
    });
  });

  describe('who may have them', () => {
    it('answers 404 to another studio’s owner and to the staff of another venue', async () => {
      const stranger = await otherVenueStaff(f);
      for (const cookie of [stranger, await f.cookie('otherOwner')]) {
        for (const document of documents) {
          const res = await request(f.app)
            .get(`/api/consignments/${f.draft.id}/${document.path}`)
            .set('Cookie', cookie);
          expect(res.status).toBe(404);
          expect(res.body).toEqual(notFound);
        }
      }
    });

    it('answers 404 for another studio’s consignment and for one that does not exist', async () => {
      const theirs = await addConsignment(f.db, f.studioB, f.venueB, 'B-1');
      for (const id of [theirs, 9999]) {
        for (const document of documents) {
          const res = await as(f, 'owner').get(`/api/consignments/${id}/${document.path}`);
          expect(res.status).toBe(404);
          expect(res.body).toEqual(notFound);
        }
      }
      // Studio B's owner does get it: the 404 above is the scope, not a broken consignment.
      const own = await as(f, 'otherOwner').get(`/api/consignments/${theirs}/sheet.pdf`);
      expect(own.status).toBe(200);
    });

    it('answers 400 with the issues for an id that is not a number', async () => {
      for (const document of documents) {
        const res = await as(f, 'owner').get(`/api/consignments/abc/${document.path}`);
        expect(res.status).toBe(400);
        expect(res.body).toEqual({
          error: {
            code: 'invalid_request',
            message: 'Some fields need attention.',
            issues: [{ path: ['id'], message: 'The id must be a number.' }],
          },
        });
      }
    });

    it('answers 401 without a session', async () => {
      for (const document of documents) {
        const res = await request(f.app).get(`/api/consignments/${f.draft.id}/${document.path}`);
        expect(res.status).toBe(401);
        expect(res.body).toEqual({
          error: { code: 'unauthenticated', message: 'Sign in to continue.' },
        });
      }
    });
  });
});

describe('a consignment’s documents before it is agreed', () => {
  it('are the studio’s own: the venue’s staff get 404 until the terms are agreed', async () => {
    const f = await documentFixture();
    for (const document of documents) {
      const owner = await getBytes(
        f.app,
        `/api/consignments/${f.draft.id}/${document.path}`,
        await f.cookie('owner'),
      );
      expect(owner.status).toBe(200);
      expect((owner.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
      const gallery = await as(f, 'gallery').get(
        `/api/consignments/${f.draft.id}/${document.path}`,
      );
      expect(gallery.status).toBe(404);
      expect(gallery.body).toEqual(notFound);
    }
    await readyToSend(f);
    const agreed = await getBytes(
      f.app,
      `/api/consignments/${f.draft.id}/sheet.pdf`,
      await f.cookie('gallery'),
    );
    expect(agreed.status).toBe(200);
  });
});

describe('the condition report after the venue’s acknowledgment', () => {
  let f: DocumentFixture;
  let consignment: Consignment;
  let report: Buffer;
  let lines: string[];
  let flow: string;
  const arrival = { examinerName: 'Priya', examinedOn: '2026-11-22' };

  beforeAll(async () => {
    f = await sentDocumentFixture();
    const upload = await request(f.app)
      .post('/api/condition-photos')
      .set('Cookie', await f.cookie('gallery'))
      .attach('photo', await picture(500, 500, '#603020'), 'rim.jpg');
    expect(upload.status).toBe(201);
    const [jar, bottle, bowl, urn] = f.draft.lines;
    const ack = await as(f, 'gallery').post(`/api/consignments/${f.draft.id}/acknowledge`, {
      reports: [
        { lineId: jar!.id, ...arrival, findings: [] },
        // The chip seen at dispatch, seen again: no difference.
        {
          lineId: bottle!.id,
          ...arrival,
          findings: [{ kind: 'chip', grade: 'slight', location: 'Foot ring', sizeMm: 3 }],
        },
        {
          lineId: bowl!.id,
          ...arrival,
          findings: [
            {
              kind: 'chip',
              grade: 'marked',
              location: 'rim',
              sizeMm: 4,
              photoFileId: upload.body.fileId,
            },
          ],
        },
        { lineId: urn!.id, ...arrival, findings: [] },
      ],
    });
    expect(ack.status).toBe(200);
    consignment = await consignmentOf(f);
    report = await pdf(f, 'condition-report.pdf', await f.cookie('owner'));
    lines = layoutLines(report);
    flow = flowOf(report);
  });

  it('sets each arrival check beside the dispatch check', () => {
    const examined = /Examined by Ines on 20 Nov 2026\s+Examined by Priya on 22 Nov 2026/;
    expect(lines.filter((line) => examined.test(line))).toHaveLength(4);
    expect(lines.filter((line) => /Overall: slight\s+Overall: slight/.test(line))).toHaveLength(1);
    expect(lines.filter((line) => /Overall: sound\s+Overall: marked/.test(line))).toHaveLength(1);
    expect(lines.filter((line) => /Overall: sound\s+Overall: sound/.test(line))).toHaveLength(2);
    expect(flow).not.toContain('Not checked yet.');
  });

  it('shows the findings of both checks', () => {
    expect(count(flow, 'Chip — slight')).toBe(2);
    expect(count(flow, 'Chip — marked rim · 4 mm')).toBe(1);
    // pdfimages: the moon jar at 320 px; the dispatch chip's and the arrival chip's photographs.
    expect(pdfImages(report).map(({ width, height }) => [width, height])).toEqual([
      [320, 320],
      [400, 400],
      [400, 400],
    ]);
  });

  it('lists the difference the API reports, under the piece it is on', () => {
    const bowl = consignment.lines[2]!;
    expect(bowl.differences).toHaveLength(1);
    const words = differenceInWords(bowl.differences[0]!);
    // "New since dispatch" for a finding the dispatch check did not have (docs/condition.md).
    expect(words).toBe('New since dispatch: Chip, marked, rim, 4 mm');
    expect(count(flow, `Differences since dispatch ${words}`)).toBe(1);
    const at = flow.indexOf(words);
    expect(at).toBeGreaterThan(flow.indexOf('A-3 Tea bowl'));
    expect(at).toBeLessThan(flow.indexOf('A-4 Garden urn'));
    expect(count(flow, 'No differences since dispatch.')).toBe(3);
    expect(consignment.lines.filter((line) => line.differences.length === 0)).toHaveLength(3);
  });
});
