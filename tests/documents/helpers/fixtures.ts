// Invented data for the document tests and the benchmark: a studio, a venue, and as many pieces
// as asked for, with small JPEG photographs drawn by sharp.
import sharp from 'sharp';

import { sumMoney } from '@/shared/money/amounts';
import {
  type ConditionReportData,
  type ConsignmentSheetData,
  type DocumentHeading,
  type LabelsData,
  type SheetLine,
} from '@/shared/schemas/documents';
import { defaultTerms, type Terms } from '@/shared/schemas/terms';
import { termsInWords } from '@/shared/terms/terms-in-words';

const glazes = [
  ['celadon', '#9DB8A5', '#E9E4DA'],
  ['tenmoku', '#3B2418', '#D8CFC0'],
  ['shino', '#E6C7A8', '#CFC6B8'],
  ['ash', '#A79A6B', '#E2DDD2'],
  ['cobalt', '#2D4C8C', '#ECE8E0'],
  ['tin white', '#F1ECE1', '#B9B0A3'],
] as const;

const forms = [
  ['Moon jar', 290, 300, 300, 5_200],
  ['Tall bottle', 340, 140, 140, 1_850],
  ['Tea bowl', 85, 125, 125, 380],
  ['Lidded jar', 210, 180, 180, 2_400],
  ['Wide bowl', 110, 320, 320, 2_900],
  ['Beaker', 120, 85, 85, 310],
  ['Garden urn', 640, 520, 520, 23_400],
  ['Storage jar', 520, 410, 410, 18_600],
  ['Jug', 230, 170, 140, 1_150],
  ['Faceted vase', 260, 130, 130, 1_400],
] as const;

const clays = ['Porcelain', 'Stoneware', 'Buff stoneware', 'Crank'] as const;

/** A small square picture of a pot: a rounded silhouette in a glaze colour on a pale ground. */
export async function potPhoto(
  glaze: string,
  ground: string,
  side = 160,
  format: 'jpeg' | 'png' = 'jpeg',
): Promise<Uint8Array> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${side}" height="${side}" viewBox="0 0 100 100">
    <rect width="100" height="100" fill="${ground}"/>
    <ellipse cx="50" cy="88" rx="30" ry="4" fill="#00000022"/>
    <path d="M38 18 h24 v6 c14 6 20 22 16 40 c-3 14 -10 22 -18 24 h-20 c-8 -2 -15 -10 -18 -24 c-4 -18 2 -34 16 -40 z" fill="${glaze}"/>
  </svg>`;
  const picture = sharp(Buffer.from(svg));
  return new Uint8Array(
    await (format === 'png' ? picture.png() : picture.jpeg({ quality: 80 })).toBuffer(),
  );
}

let photoCache: Promise<Uint8Array[]> | undefined;
/** One photograph per glaze, made once. */
export function glazePhotos(): Promise<Uint8Array[]> {
  photoCache ??= Promise.all(glazes.map(([, colour, ground]) => potPhoto(colour, ground)));
  return photoCache;
}

export const terms: Terms = {
  ...defaultTerms,
  paymentTerms: { ...defaultTerms.paymentTerms },
  commissionRateBp: 4000,
  insuredBy: 'venue',
  insuredInTransitBy: 'maker',
};

export function heading(): DocumentHeading {
  return {
    studio: {
      name: 'Hollin Clough Pottery',
      address: ['The Old Dairy, Hollin Lane', 'Hebden Bridge', 'HX7 8QT'],
      email: 'studio@hollinclough.example',
      vatNumber: 'GB 284 1936 57',
    },
    venue: {
      name: 'Quayside Craft Rooms',
      address: ['14 Harbour Row', 'Whitby', 'YO21 3PU'],
      email: 'ines@quaysidecraft.example',
      vatNumber: null,
      contactName: 'Ines Hartley',
    },
    reference: 'HCP-2026-07',
    title: 'Spring porcelain and stoneware',
    dates: {
      dispatch: '2026-03-14',
      opening: '2026-03-21',
      closing: '2026-05-30',
      returnDue: '2026-06-13',
    },
    issuedOn: '2026-03-14',
    locale: 'en-GB',
  };
}

export type FixturePiece = {
  line: Omit<SheetLine, 'thumbnail'>;
  /** Which of the glaze photographs shows it. */
  glaze: number;
  heavy: boolean;
};

/** The n-th piece of the invented catalogue; every fifth is a heavy garden piece or store jar. */
export function piece(i: number): FixturePiece {
  const [form, h, w, d, baseWeight] = forms[i % forms.length]!;
  const glaze = (i * 7) % glazes.length;
  const clay = clays[i % clays.length]!;
  const weightG = i % 13 === 11 ? null : baseWeight + ((i * 37) % 90);
  const price = 4_500 + ((i * 7_919) % 180_000);
  const roundedPrice = price - (price % 500);
  const line = {
    stockNumber: `HC-${String(2601 + i).padStart(4, '0')}`,
    title: `${form}, ${glazes[glaze]![0]}${i % 9 === 4 ? ' with iron-spot rim and combed shoulder' : ''}`,
    materials: `${clay}, ${glazes[glaze]![0]} glaze, ${i % 2 === 0 ? '1280 °C reduction' : '1260 °C oxidation'}`,
    dimensions: i % 11 === 10 ? '' : `${h} × ${w} × ${d} mm`,
    weightG,
    listPrice: { amount: roundedPrice, currency: 'GBP' },
    // The maker's net at 40% commission, the usual insurance basis (docs/money-rules.md).
    insuranceValue: {
      amount: roundedPrice - Math.round((roundedPrice * 4000) / 10000),
      currency: 'GBP',
    },
  };
  return { line, glaze, heavy: weightG !== null && weightG > 16_000 };
}

export async function sheetData(count: number): Promise<ConsignmentSheetData> {
  const photos = await glazePhotos();
  const lines: SheetLine[] = Array.from({ length: count }, (_, i) => {
    const { line, glaze } = piece(i);
    return { ...line, thumbnail: i % 8 === 7 ? null : photos[glaze]! };
  });
  return {
    ...heading(),
    terms,
    termsInWords: termsInWords(terms),
    lines,
    totals: {
      listPrice: sumMoney(
        lines.map((l) => l.listPrice),
        'GBP',
      ),
      insuranceValue: sumMoney(
        lines.map((l) => l.insuranceValue),
        'GBP',
      ),
    },
    heavyWeightG: 16_000,
  };
}

export async function conditionData(): Promise<ConditionReportData> {
  const photos = await glazePhotos();
  // Finding photographs come as PNG here, the pieces' as JPEG: the renderers take both.
  const chipPhoto = await potPhoto('#C9BFAF', '#6E665C', 120, 'png');
  return {
    ...heading(),
    title: 'Spring porcelain and stoneware: dispatch and arrival',
    dates: { ...heading().dates },
    pieces: [
      {
        stockNumber: 'HC-2601',
        title: 'Moon jar, celadon',
        photos: [photos[0]!, photos[1]!],
        dispatch: {
          stage: 'dispatch',
          examinerName: 'Maya Lindqvist',
          examinedOn: '2026-03-13',
          overallGrade: 'sound',
          findings: [],
          notes: 'Photographed in daylight on all four sides before wrapping.',
        },
        arrival: {
          stage: 'arrival',
          examinerName: 'Ines Hartley',
          examinedOn: '2026-03-16',
          overallGrade: 'marked',
          findings: [
            {
              kind: 'chip',
              grade: 'marked',
              location: 'Rim, above the seam',
              sizeMm: 4,
              notes: 'Fresh break, white body showing; the fragment was in the box.',
              photo: chipPhoto,
            },
            {
              kind: 'abrasion',
              grade: 'slight',
              location: 'Foot ring',
              sizeMm: 12,
              notes: null,
              photo: null,
            },
          ],
          notes: 'Outer box dented on one corner.',
        },
        differences: [
          'New: chip, marked, on the rim above the seam, 4 mm.',
          'New: abrasion, slight, on the foot ring, 12 mm.',
        ],
      },
      {
        stockNumber: 'HC-2602',
        title: 'Tall bottle, tenmoku',
        photos: [photos[1]!],
        dispatch: {
          stage: 'dispatch',
          examinerName: 'Maya Lindqvist',
          examinedOn: '2026-03-13',
          overallGrade: 'slight',
          findings: [
            {
              kind: 'crazing',
              grade: 'slight',
              location: 'Inside the neck',
              sizeMm: null,
              notes: 'From the firing, as made.',
              photo: null,
            },
          ],
          notes: null,
        },
        arrival: {
          stage: 'arrival',
          examinerName: 'Ines Hartley',
          examinedOn: '2026-03-16',
          overallGrade: 'slight',
          findings: [
            {
              kind: 'crazing',
              grade: 'slight',
              location: 'Inside the neck',
              sizeMm: null,
              notes: null,
              photo: null,
            },
          ],
          notes: null,
        },
        differences: [],
      },
      {
        stockNumber: 'HC-2603',
        title: 'Tea bowl, shino',
        photos: [photos[2]!],
        dispatch: {
          stage: 'dispatch',
          examinerName: 'Maya Lindqvist',
          examinedOn: '2026-03-13',
          overallGrade: 'slight',
          findings: [
            {
              kind: 'hairline-crack',
              grade: 'slight',
              location: 'Foot, inside the ring',
              sizeMm: 9,
              notes: 'Stable; does not weep.',
              photo: chipPhoto,
            },
            {
              kind: 'glaze-fault',
              grade: 'slight',
              location: 'Lip',
              sizeMm: 3,
              notes: 'Pinhole.',
              photo: null,
            },
          ],
          notes: null,
        },
        arrival: null,
        differences: [],
      },
    ],
  };
}

export function labelsData(count: number): LabelsData {
  return {
    studioName: heading().studio.name,
    venueName: heading().venue.name,
    reference: heading().reference,
    issuedOn: '2026-03-14',
    locale: 'en-GB',
    labels: Array.from({ length: count }, (_, i) => {
      const { line, heavy } = piece(i);
      return {
        stockNumber: line.stockNumber,
        title: line.title,
        materials: line.materials,
        dimensions: line.dimensions,
        price: line.listPrice,
        careNote: i % 4 === 3 ? null : 'Wash by hand; not for the microwave.',
        foodUseNote:
          i % 3 === 0
            ? 'Food-safe glaze on the inside, as declared by the maker.'
            : 'Decorative — not for food use.',
        heavy,
        qrUrl: `https://saggar.example/venue/pieces/${line.stockNumber}`,
      };
    }),
  };
}
