// The demo scenario: an invented studio, its venues and pieces. Demo only; nothing else reads it.

import { type FoodUse } from '@/shared/schemas/work';

export const demoSignIns = {
  password: 'saggar-demo-2026',
  people: [
    { email: 'maker@saggar.test', name: 'Ines Calloway', description: 'owner of Saltmarsh Kiln' },
    { email: 'assistant@saggar.test', name: 'Tomas Brill', description: 'studio assistant' },
    {
      email: 'gallery@saggar.test',
      name: 'Priya Ondaatje',
      description: 'staff of the Lanthorn Gallery (venue side)',
    },
  ],
} as const;

export const demoStudio = {
  name: 'Saltmarsh Kiln',
  country: 'GB',
  currency: 'GBP',
  stockNumberPattern: '{YYYY}-{NNN}',
  priceStep: 500,
};

const gbp = { currency: 'GBP', vatRateBp: 2000, makerVatRegistered: false } as const;

export const demoVenues = [
  {
    key: 'lanthorn',
    name: 'The Lanthorn Gallery',
    kind: 'gallery',
    town: 'Aldeburgh',
    postcode: 'IP15 5AB',
    contactName: 'Priya Ondaatje',
    email: 'priya@lanthorn.example',
    vatNumber: null,
    terms: {
      ...gbp,
      commissionRateBp: 4000,
      venueRole: 'agent',
      commissionVat: 'added',
      discountRule: 'shared',
      insuranceBasis: 'maker-net',
      insuredBy: 'venue',
      paymentTerms: { days: 30, from: 'month-end' },
    },
  },
  {
    key: 'quayside',
    name: 'Quayside Crafts',
    kind: 'shop',
    town: 'Wells-next-the-Sea',
    postcode: 'NR23 1AT',
    contactName: 'Declan Ferris',
    email: 'shop@quayside.example',
    vatNumber: null,
    terms: {
      ...gbp,
      commissionRateBp: 3500,
      venueRole: 'agent',
      commissionVat: 'none',
      discountRule: 'shared',
      insuranceBasis: 'maker-net',
      insuredBy: 'venue',
      paymentTerms: { days: 30, from: 'month-end' },
    },
  },
  {
    key: 'fair',
    name: 'Deepwinter Makers Fair',
    kind: 'fair',
    town: 'Norwich',
    postcode: 'NR2 1NH',
    contactName: 'Hattie Marsh',
    email: 'stands@deepwinter.example',
    vatNumber: null,
    terms: {
      ...gbp,
      commissionRateBp: 3000,
      venueRole: 'agent',
      commissionVat: 'included',
      discountRule: 'venue',
      insuranceBasis: 'maker-net',
      insuredBy: 'maker',
      paymentTerms: { days: 14, from: 'closing' },
    },
  },
] as const;

type DemoWork = {
  title: string;
  series: string;
  category: string;
  clayBody: string;
  glaze: string;
  firingTempC: number;
  atmosphere: string;
  kiln: string;
  size: [height: number, width: number, depth: number];
  weightG: number;
  pricePence: number;
  costPence?: number;
  foodUse: FoodUse;
  careNotes?: string;
};

const moon = { series: 'Tideline', clayBody: 'Porcelain', kiln: 'Gas' };
const ash = { series: 'Reedbed', clayBody: 'Iron-speckled stoneware', kiln: 'Wood' };
const table = { series: 'Kitchen table', clayBody: 'Buff stoneware', kiln: 'Electric' };
const dish = 'Dishwasher safe; not for the microwave.';

export const demoWorks: DemoWork[] = [
  { ...moon, title: 'Moon jar, pale celadon', category: 'Jar', glaze: 'Celadon', firingTempC: 1290, atmosphere: 'Reduction', size: [380, 360, 360], weightG: 5200, pricePence: 180000, costPence: 21000, foodUse: 'decorative' },
  { ...moon, title: 'Small moon jar, ying-ching', category: 'Jar', glaze: 'Ying-ching', firingTempC: 1290, atmosphere: 'Reduction', size: [210, 200, 200], weightG: 1800, pricePence: 64000, foodUse: 'decorative' },
  { ...moon, title: 'Tall bottle, chun blue', category: 'Bottle', glaze: 'Chun', firingTempC: 1285, atmosphere: 'Reduction', size: [340, 140, 140], weightG: 1400, pricePence: 42000, foodUse: 'not-stated' },
  { ...moon, title: 'Lidded box, celadon', category: 'Box', glaze: 'Celadon', firingTempC: 1290, atmosphere: 'Reduction', size: [90, 110, 110], weightG: 420, pricePence: 14500, foodUse: 'not-stated' },
  { ...moon, title: 'Tea bowl, ying-ching', category: 'Bowl', glaze: 'Ying-ching', firingTempC: 1290, atmosphere: 'Reduction', size: [80, 120, 120], weightG: 310, pricePence: 9500, foodUse: 'food-safe', careNotes: dish },
  { ...moon, title: 'Faceted vase, celadon', category: 'Vase', glaze: 'Celadon', firingTempC: 1285, atmosphere: 'Reduction', size: [260, 130, 130], weightG: 1100, pricePence: 38000, foodUse: 'decorative' },
  { ...moon, title: 'Pair of cups, celadon', category: 'Cup', glaze: 'Celadon', firingTempC: 1285, atmosphere: 'Reduction', size: [90, 85, 85], weightG: 460, pricePence: 7800, foodUse: 'food-safe', careNotes: dish },
  { ...moon, title: 'Wide bowl, chun', category: 'Bowl', glaze: 'Chun', firingTempC: 1290, atmosphere: 'Reduction', size: [110, 320, 320], weightG: 1900, pricePence: 52000, foodUse: 'not-stated' },
  { ...ash, title: 'Reed jar, natural ash', category: 'Jar', glaze: 'Natural ash', firingTempC: 1300, atmosphere: 'Wood', size: [420, 300, 300], weightG: 7400, pricePence: 240000, costPence: 32000, foodUse: 'decorative' },
  { ...ash, title: 'Floor jar, salt-marsh ash', category: 'Jar', glaze: 'Natural ash', firingTempC: 1300, atmosphere: 'Wood', size: [720, 520, 520], weightG: 18600, pricePence: 460000, costPence: 60000, foodUse: 'decorative', careNotes: 'Two people to lift; carry by the base, never the rim.' },
  { ...ash, title: 'Shino bottle', category: 'Bottle', glaze: 'Shino', firingTempC: 1280, atmosphere: 'Wood', size: [290, 150, 150], weightG: 1600, pricePence: 48000, foodUse: 'decorative' },
  { ...ash, title: 'Ash-glazed yunomi', category: 'Cup', glaze: 'Natural ash', firingTempC: 1300, atmosphere: 'Wood', size: [100, 80, 80], weightG: 330, pricePence: 6500, foodUse: 'not-stated' },
  { ...ash, title: 'Flattened vase, shino', category: 'Vase', glaze: 'Shino', firingTempC: 1280, atmosphere: 'Wood', size: [240, 200, 90], weightG: 1300, pricePence: 36000, foodUse: 'decorative' },
  { ...ash, title: 'Charger, ash run', category: 'Plate', glaze: 'Natural ash', firingTempC: 1300, atmosphere: 'Wood', size: [60, 420, 420], weightG: 3600, pricePence: 68000, foodUse: 'decorative' },
  { ...ash, title: 'Tenmoku tea bowl', category: 'Bowl', glaze: 'Tenmoku', firingTempC: 1280, atmosphere: 'Reduction', size: [85, 125, 125], weightG: 380, pricePence: 12000, foodUse: 'food-safe', careNotes: 'Hand wash.' },
  { ...ash, title: 'Tall vase, tenmoku and rust', category: 'Vase', glaze: 'Tenmoku', firingTempC: 1280, atmosphere: 'Reduction', size: [410, 160, 160], weightG: 2400, pricePence: 56000, foodUse: 'decorative' },
  { ...table, title: 'Everyday mug, oatmeal', category: 'Mug', glaze: 'Oatmeal matt', firingTempC: 1260, atmosphere: 'Oxidation', size: [95, 120, 85], weightG: 360, pricePence: 3200, costPence: 650, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Everyday mug, nuka white', category: 'Mug', glaze: 'Nuka', firingTempC: 1260, atmosphere: 'Oxidation', size: [95, 120, 85], weightG: 360, pricePence: 3200, costPence: 650, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Jug, nuka white', category: 'Jug', glaze: 'Nuka', firingTempC: 1260, atmosphere: 'Oxidation', size: [190, 170, 120], weightG: 980, pricePence: 7800, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Serving bowl, oatmeal', category: 'Bowl', glaze: 'Oatmeal matt', firingTempC: 1260, atmosphere: 'Oxidation', size: [110, 280, 280], weightG: 1500, pricePence: 9500, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Side plate, speckled', category: 'Plate', glaze: 'Speckled white', firingTempC: 1250, atmosphere: 'Oxidation', size: [25, 210, 210], weightG: 520, pricePence: 2800, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Dinner plate, speckled', category: 'Plate', glaze: 'Speckled white', firingTempC: 1250, atmosphere: 'Oxidation', size: [28, 270, 270], weightG: 840, pricePence: 3800, foodUse: 'food-safe', careNotes: dish },
  { ...table, title: 'Butter dish, copper green', category: 'Dish', glaze: 'Copper green', firingTempC: 1240, atmosphere: 'Oxidation', size: [80, 180, 110], weightG: 700, pricePence: 6200, foodUse: 'not-stated' },
  { ...table, title: 'Oil pourer, copper green', category: 'Jug', glaze: 'Copper green', firingTempC: 1240, atmosphere: 'Oxidation', size: [160, 90, 90], weightG: 430, pricePence: 4800, foodUse: 'not-stated' },
  { ...table, title: 'Utensil jar, oatmeal', category: 'Jar', glaze: 'Oatmeal matt', firingTempC: 1260, atmosphere: 'Oxidation', size: [170, 120, 120], weightG: 1100, pricePence: 5400, foodUse: 'food-safe', careNotes: dish },
  { series: 'Shoreline', clayBody: 'Black stoneware', kiln: 'Soda', title: 'Soda-fired bottle, flashing', category: 'Bottle', glaze: 'Soda flashing', firingTempC: 1290, atmosphere: 'Soda', size: [300, 160, 160], weightG: 1700, pricePence: 46000, foodUse: 'decorative' },
  { series: 'Shoreline', clayBody: 'Black stoneware', kiln: 'Soda', title: 'Pebble bowl, soda', category: 'Bowl', glaze: 'Soda flashing', firingTempC: 1290, atmosphere: 'Soda', size: [90, 160, 140], weightG: 620, pricePence: 11000, foodUse: 'not-stated' },
  { series: 'Shoreline', clayBody: 'Black stoneware', kiln: 'Soda', title: 'Wall piece, tide marks', category: 'Wall piece', glaze: 'Dry barium', firingTempC: 1280, atmosphere: 'Soda', size: [40, 450, 300], weightG: 4200, pricePence: 89000, foodUse: 'decorative', careNotes: 'Hang from two fixings rated for at least 10 kg.' },
  { series: 'Shoreline', clayBody: 'Black stoneware', kiln: 'Soda', title: 'Standing form, breakwater', category: 'Sculpture', glaze: 'Dry barium', firingTempC: 1280, atmosphere: 'Soda', size: [560, 220, 180], weightG: 9800, pricePence: 210000, foodUse: 'decorative' },
  { series: 'Shoreline', clayBody: 'Black stoneware', kiln: 'Soda', title: 'Beaker, soda', category: 'Cup', glaze: 'Soda flashing', firingTempC: 1290, atmosphere: 'Soda', size: [120, 80, 80], weightG: 340, pricePence: 5800, foodUse: 'not-stated' },
];

/** Which works (by index in demoWorks) go where, and what has happened to them. */
export const demoConsignments = [
  {
    venue: 'lanthorn',
    reference: 'LAN-2026-03',
    title: 'Tideline and Reedbed, winter exhibition',
    state: 'on-show',
    dispatchDate: '2026-10-19',
    openingDate: '2026-10-31',
    closingDate: '2027-01-10',
    returnDueDate: '2027-01-24',
    lines: [
      { work: 0 },
      { work: 1, sold: { on: '2026-11-08', price: 64000 } },
      { work: 2 },
      { work: 5 },
      { work: 8 },
      { work: 9 },
      { work: 12, sold: { on: '2026-11-21', price: 34200 } },
      { work: 15 },
    ],
  },
  {
    venue: 'quayside',
    reference: 'QUA-2026-02',
    title: 'Autumn shelves',
    state: 'closed',
    dispatchDate: '2026-08-28',
    openingDate: '2026-09-01',
    closingDate: '2026-11-15',
    returnDueDate: '2026-11-30',
    lines: [
      { work: 16, sold: { on: '2026-09-13', price: 3200 } },
      { work: 17, sold: { on: '2026-10-02', price: 3200 } },
      { work: 18, sold: { on: '2026-10-25', price: 7800 } },
      { work: 19 },
      { work: 20 },
      { work: 22 },
    ],
  },
] as const;
