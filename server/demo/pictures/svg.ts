// Small helpers for writing SVG by hand: numbers, points, smooth curves, colours and a seeded random.

export type Point = [x: number, y: number];
export type Box = { x: number; y: number; w: number; h: number };
/** A piece drawn, and the point a close-up of it should centre on. */
export type Drawing = { svg: string; focus: Point };
/** Where a piece stands in the picture and how much room it has. */
export type Stage = { cx: number; groundY: number; maxW: number; maxH: number };

/** A coordinate to one decimal: enough for 1200 pixels, and the same text every time. */
export const n = (v: number) => String(Math.round(v * 10) / 10);
export const pt = ([x, y]: Point) => `${n(x)} ${n(y)}`;

/** A smooth curve (Catmull-Rom, as cubic Béziers) from the first point through the rest. */
export function curveThrough(points: readonly Point[]): string {
  let d = '';
  for (let i = 0; i < points.length - 1; i += 1) {
    const p0 = points[i - 1] ?? points[i]!;
    const p1 = points[i]!;
    const p2 = points[i + 1]!;
    const p3 = points[i + 2] ?? p2;
    const c1: Point = [p1[0] + (p2[0] - p0[0]) / 6, p1[1] + (p2[1] - p0[1]) / 6];
    const c2: Point = [p2[0] - (p3[0] - p1[0]) / 6, p2[1] - (p3[1] - p1[1]) / 6];
    d += `C${pt(c1)} ${pt(c2)} ${pt(p2)}`;
  }
  return d;
}

/** `M` to the first point, then the curve through the rest. */
export const smoothPath = (points: readonly Point[]) => `M${pt(points[0]!)}${curveThrough(points)}`;

export function rect(box: Box, fill: string, extra = ''): string {
  return `<rect x="${n(box.x)}" y="${n(box.y)}" width="${n(box.w)}" height="${n(box.h)}" fill="${fill}"${extra}/>`;
}

export function ellipse(cx: number, cy: number, rx: number, ry: number, extra: string): string {
  return `<ellipse cx="${n(cx)}" cy="${n(cy)}" rx="${n(rx)}" ry="${n(ry)}" ${extra}/>`;
}

/** A colour fading from full at the centre to nothing at the edge, for soft blotches. */
export function fadeGradient(id: string, colour: string): string {
  return `<radialGradient id="${id}"><stop offset="0" stop-color="${colour}"/><stop offset="1" stop-color="${colour}" stop-opacity="0"/></radialGradient>`;
}

/** Blends two #rrggbb colours. */
export function mix(a: string, b: string, t: number): string {
  const channel = (hex: string, i: number) => parseInt(hex.slice(1 + i * 2, 3 + i * 2), 16);
  const out = [0, 1, 2].map((i) =>
    Math.round(channel(a, i) * (1 - t) + channel(b, i) * t)
      .toString(16)
      .padStart(2, '0'),
  );
  return `#${out.join('')}`;
}

/** A small seeded generator (mulberry32 over an FNV-1a hash): the same text, the same sequence. */
export function randomFrom(text: string): () => number {
  let seed = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) seed = Math.imul(seed ^ text.charCodeAt(i), 0x01000193);
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
