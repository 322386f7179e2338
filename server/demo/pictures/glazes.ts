// Colours for the demo's generated photographs: each glaze as a potter would describe it, and the
// clay that shows at the bare foot.

export type Glaze = {
  base: string;
  light: string;
  dark: string;
  /** Where the glaze runs thick: low on the pot, in the well of a bowl. */
  pool: string;
  /** Where it breaks thin: the rim and edges. */
  edge: string;
  /** 0 for a dry matt surface, 1 for a glassy one: how strong the reflections are. */
  gloss: number;
  /** Iron specks coming through the glaze. */
  speckle?: string;
  /** Blushes left by the flame, soda or wood ash on one side. */
  flash?: string;
  /** Runs of glassy ash down the body. */
  runs?: boolean;
  /** Fine crazing in the glaze. */
  crackle?: string;
};

const stoneware: Glaze = {
  base: '#b4a897',
  light: '#d6cdbf',
  dark: '#776c5e',
  pool: '#9a8f7f',
  edge: '#c4aa8a',
  gloss: 0.4,
};

/** First match wins, so the specific names come before the plain colour words. */
const glazes: [RegExp, Glaze][] = [
  [
    /celadon/i,
    {
      base: '#a9bea4',
      light: '#d3dfcc',
      dark: '#6d8a72',
      pool: '#6e9685',
      edge: '#cdd6c2',
      gloss: 0.8,
      crackle: '#5b6b58',
    },
  ],
  [
    /ying.?ching|qingbai/i,
    {
      base: '#cadcdc',
      light: '#eff5f2',
      dark: '#8eacb2',
      pool: '#7ba5b1',
      edge: '#e7ede7',
      gloss: 0.9,
    },
  ],
  [
    /chun|\bjun\b/i,
    {
      base: '#8aa3c6',
      light: '#bfcfe3',
      dark: '#4d6590',
      pool: '#5c6ea9',
      edge: '#c7bba5',
      gloss: 0.65,
      flash: '#86508a',
    },
  ],
  [
    /tenmoku|temmoku/i,
    {
      base: '#2b1c15',
      light: '#6e4733',
      dark: '#0e0907',
      pool: '#180f0b',
      edge: '#93502a',
      gloss: 1,
    },
  ],
  [
    /shino/i,
    {
      base: '#ecdcc8',
      light: '#f8f0e5',
      dark: '#c49874',
      pool: '#e5d2bd',
      edge: '#d0764a',
      gloss: 0.3,
      speckle: '#8a5a3c',
      flash: '#d98552',
    },
  ],
  [
    /\bash\b/i,
    {
      base: '#8d8651',
      light: '#bbb177',
      dark: '#4a4427',
      pool: '#5a7b45',
      edge: '#a8693e',
      gloss: 0.5,
      speckle: '#3a2e1f',
      flash: '#6e4a2d',
      runs: true,
    },
  ],
  [
    /soda|salt/i,
    {
      base: '#a96f46',
      light: '#d49d6b',
      dark: '#4a3427',
      pool: '#70603f',
      edge: '#3d332d',
      gloss: 0.45,
      speckle: '#2a221d',
      flash: '#e2a56c',
    },
  ],
  [
    /barium/i,
    {
      base: '#7b9aa0',
      light: '#a9c1c1',
      dark: '#40575e',
      pool: '#5b8984',
      edge: '#4a443e',
      gloss: 0.1,
      speckle: '#2c3436',
    },
  ],
  [
    /copper|green/i,
    {
      base: '#3e7758',
      light: '#7aab8c',
      dark: '#1e4934',
      pool: '#2a5d43',
      edge: '#9dbf98',
      gloss: 0.75,
    },
  ],
  [
    /oatmeal/i,
    {
      base: '#d8cbb2',
      light: '#ede4d3',
      dark: '#a6957a',
      pool: '#c3b294',
      edge: '#b99f7c',
      gloss: 0.15,
      speckle: '#6e543c',
    },
  ],
  [
    /nuka/i,
    {
      base: '#ebe8df',
      light: '#fbfaf5',
      dark: '#bcb7aa',
      pool: '#b5c3c8',
      edge: '#d9c8a7',
      gloss: 0.5,
    },
  ],
  [
    /speckle/i,
    {
      base: '#ebe6da',
      light: '#faf7f0',
      dark: '#bdb4a3',
      pool: '#dcd5c5',
      edge: '#cdbfa6',
      gloss: 0.45,
      speckle: '#4d3b2c',
    },
  ],
  [
    /white|clear|cream/i,
    {
      base: '#ebe7de',
      light: '#faf8f2',
      dark: '#bdb7a9',
      pool: '#d6d4ca',
      edge: '#d4c4a6',
      gloss: 0.5,
    },
  ],
  [
    /black|iron|brown|rust/i,
    {
      base: '#3a2a20',
      light: '#7a5840',
      dark: '#150e0a',
      pool: '#22160f',
      edge: '#8a5a34',
      gloss: 0.8,
    },
  ],
  [
    /blue/i,
    {
      base: '#6f8fb5',
      light: '#a8c0da',
      dark: '#3c5780',
      pool: '#435f95',
      edge: '#c9c2b0',
      gloss: 0.7,
    },
  ],
];

/** The glaze's colours by name; an unknown glaze gets a warm grey stoneware glaze. */
export function glazeColours(name: string): Glaze {
  return glazes.find(([pattern]) => pattern.test(name))?.[1] ?? stoneware;
}

const clays: [RegExp, string][] = [
  [/porcelain/i, '#eeebe3'],
  [/black/i, '#35302c'],
  [/iron|speckled/i, '#a88a69'],
  [/buff/i, '#d5be98'],
  [/terracotta|earthenware|red/i, '#b0613d'],
];

/** The fired colour of the clay body, seen where the foot is left bare. */
export function clayColour(name: string): string {
  return clays.find(([pattern]) => pattern.test(name))?.[1] ?? '#c2a888';
}
