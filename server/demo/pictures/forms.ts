// The shapes of the demo's generated photographs: a profile for each kind of pot, from foot to rim.

/** What a picture is drawn from: the work's own description. */
export type PictureWork = {
  title: string;
  category: string;
  glaze: string;
  clayBody: string;
  /** Height, width and depth in millimetres. */
  size: readonly [number, number, number];
};

/** The front view; looking down into an open pot; or close up on the glaze of a closed one. */
export type PictureView = 'front' | 'above' | 'detail';

/** A pot thrown on the wheel: round (or oval, from its depth), drawn from its profile. */
export type ThrownForm = {
  kind: 'thrown';
  /** Half-widths up the pot, as [share of the height, share of the widest half-width]. */
  profile: readonly (readonly [t: number, r: number])[];
  /** Open shows the glazed inside; narrow a dark mouth; lidded a closed top with a knob. */
  mouth: 'open' | 'narrow' | 'lidded';
  /** How far above the rim the camera stands, in degrees: plates are shown from higher. */
  elevation: number;
  /** The bare clay foot, as a share of the height. */
  foot: number;
  handle?: boolean;
  spout?: boolean;
  /** Where the lid meets the body, as a share of the height. */
  lidAt?: number;
};

export type Form = ThrownForm | { kind: 'wall-piece' } | { kind: 'standing' };

const thrown = (form: Omit<ThrownForm, 'kind'>): ThrownForm => ({ kind: 'thrown', ...form });

const moonJar = thrown({
  profile: [
    [0, 0.4],
    [0.025, 0.45],
    [0.1, 0.68],
    [0.2, 0.84],
    [0.32, 0.95],
    [0.48, 1],
    [0.64, 0.95],
    [0.76, 0.83],
    [0.86, 0.64],
    [0.92, 0.46],
    [0.95, 0.38],
    [0.98, 0.38],
    [1, 0.41],
  ],
  mouth: 'narrow',
  elevation: 12,
  foot: 0.04,
});

const jar = thrown({
  profile: [
    [0, 0.54],
    [0.03, 0.58],
    [0.3, 0.88],
    [0.62, 1],
    [0.8, 0.88],
    [0.91, 0.6],
    [0.96, 0.52],
    [1, 0.56],
  ],
  mouth: 'narrow',
  elevation: 12,
  foot: 0.05,
});

const crock = thrown({
  profile: [
    [0, 0.84],
    [0.04, 0.88],
    [0.5, 0.97],
    [0.86, 0.95],
    [0.93, 0.88],
    [1, 0.92],
  ],
  mouth: 'open',
  elevation: 16,
  foot: 0.05,
});

const bottle = thrown({
  profile: [
    [0, 0.62],
    [0.03, 0.67],
    [0.2, 0.97],
    [0.34, 1],
    [0.47, 0.8],
    [0.57, 0.42],
    [0.64, 0.23],
    [0.86, 0.2],
    [0.96, 0.22],
    [1, 0.27],
  ],
  mouth: 'narrow',
  elevation: 10,
  foot: 0.03,
});

const vase = thrown({
  profile: [
    [0, 0.5],
    [0.03, 0.54],
    [0.22, 0.88],
    [0.4, 1],
    [0.58, 0.86],
    [0.72, 0.6],
    [0.8, 0.5],
    [0.9, 0.52],
    [1, 0.68],
  ],
  mouth: 'narrow',
  elevation: 12,
  foot: 0.04,
});

const bowl = thrown({
  profile: [
    [0, 0.37],
    [0.06, 0.38],
    [0.1, 0.5],
    [0.25, 0.72],
    [0.5, 0.9],
    [0.75, 0.97],
    [1, 1],
  ],
  mouth: 'open',
  elevation: 22,
  foot: 0.08,
});

const cup = thrown({
  profile: [
    [0, 0.72],
    [0.04, 0.74],
    [0.07, 0.8],
    [0.6, 0.93],
    [1, 1],
  ],
  mouth: 'open',
  elevation: 16,
  foot: 0.08,
});

const mug = thrown({
  profile: [
    [0, 0.9],
    [0.04, 0.95],
    [0.5, 1],
    [0.94, 0.97],
    [1, 0.98],
  ],
  mouth: 'open',
  elevation: 16,
  foot: 0.06,
  handle: true,
});

const jug = thrown({
  profile: [
    [0, 0.64],
    [0.04, 0.68],
    [0.34, 1],
    [0.62, 0.86],
    [0.86, 0.7],
    [1, 0.78],
  ],
  mouth: 'open',
  elevation: 16,
  foot: 0.05,
  handle: true,
  spout: true,
});

const plate = thrown({
  profile: [
    [0, 0.56],
    [0.15, 0.6],
    [0.35, 0.8],
    [0.7, 0.97],
    [1, 1],
  ],
  mouth: 'open',
  elevation: 32,
  foot: 0.15,
});

const coveredDish = thrown({
  profile: [
    [0, 0.84],
    [0.05, 0.88],
    [0.38, 0.94],
    [0.42, 0.97],
    [0.7, 0.93],
    [0.92, 0.66],
    [1, 0.44],
  ],
  mouth: 'lidded',
  elevation: 20,
  foot: 0.06,
  lidAt: 0.4,
});

const box = thrown({
  profile: [
    [0, 0.86],
    [0.04, 0.9],
    [0.58, 1],
    [0.62, 1],
    [0.93, 0.98],
    [1, 0.9],
  ],
  mouth: 'lidded',
  elevation: 18,
  foot: 0.05,
  lidAt: 0.6,
});

/** A few titles name a shape more exactly than the category does. */
const byTitle: [RegExp, Form][] = [
  [/moon jar/i, moonJar],
  [/utensil|crock/i, crock],
  [/butter|covered/i, coveredDish],
];

const byCategory: [RegExp, Form][] = [
  [/jar/i, jar],
  [/bottle/i, bottle],
  [/vase/i, vase],
  [/bowl/i, bowl],
  [/mug|tankard/i, mug],
  [/cup|beaker|yunomi|tumbler/i, cup],
  [/jug|pitcher|pourer/i, jug],
  [/plate|platter|charger/i, plate],
  [/dish/i, { ...bowl, elevation: 26 }],
  [/box|lidded/i, box],
  [/wall|tile|panel/i, { kind: 'wall-piece' }],
  [/sculpture|standing|form/i, { kind: 'standing' }],
];

/** The shape to draw for a work; anything not recognised is drawn as a vase. */
export function formFor(work: Pick<PictureWork, 'category' | 'title'>): Form {
  const named = byTitle.find(([pattern]) => pattern.test(work.title));
  return (named ?? byCategory.find(([pattern]) => pattern.test(work.category)))?.[1] ?? vase;
}
