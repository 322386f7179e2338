// What makes a glaze look like itself on any shape: thick and thin patches, the flame's blush,
// runs, iron specks and crazing. Each returns SVG to draw inside the piece's clip path.

import { type Glaze } from './glazes';
import { type Box, ellipse, fadeGradient, n, type Point, pt, smoothPath } from './svg';

export type Pen = {
  glaze: Glaze;
  /** The clay body's fired colour, seen at the bare foot and edges. */
  clay: string;
  random: () => number;
  /** Prefix for gradient and clip-path ids, unique within one picture. */
  id: string;
};

/** Soft patches where the glaze went on thicker or thinner, and a blush of flame on one side. */
export function mottle(box: Box, pen: Pen): string {
  const { glaze, id, random } = pen;
  const blots = (name: string, count: number, size: number, opacity: number, from = 0, to = 1) =>
    Array.from({ length: count }, () => {
      const x = box.x + box.w * (from + random() * (to - from));
      const y = box.y + box.h * (0.1 + random() * 0.8);
      const r = box.w * size * (0.6 + random() * 0.8);
      const ry = r * (0.8 + random() * 0.8);
      return ellipse(x, y, r, ry, `fill="url(#${id}-${name})" opacity="${n(opacity)}"`);
    }).join('');
  const side = random() < 0.5 ? 0 : 0.45;
  return (
    `<defs>${fadeGradient(`${id}-thick`, glaze.pool)}${fadeGradient(`${id}-thin`, glaze.light)}` +
    `${glaze.flash ? fadeGradient(`${id}-flash`, glaze.flash) : ''}</defs>` +
    blots('thick', 5, 0.22, 0.35) +
    blots('thin', 4, 0.18, 0.3) +
    (glaze.flash ? blots('flash', 4, 0.34, 0.5, side, side + 0.55) : '')
  );
}

/**
 * Glassy runs from the shoulder towards the foot. `onSurface(across, t)` places a point on the
 * piece: across from -1 (left edge) to 1 (right), t from 0 (foot) to 1 (rim).
 */
export function runs(pen: Pen, scale: number, onSurface: (across: number, t: number) => Point) {
  const { glaze, random } = pen;
  const drips = Array.from({ length: 9 }, () => {
    const from = 0.6 + random() * 0.28;
    const to = 0.12 + random() * 0.3;
    const across = (random() - 0.5) * 1.6;
    const line = [from, (from + to) / 2, to].map((t): Point => {
      const [x, y] = onSurface(across, t);
      return [x + (random() - 0.5) * 4, y];
    });
    return { d: smoothPath(line), width: Math.max(3, (2 + random() * 5) * scale) };
  });
  const layer = (colour: string, opacity: number, widthShare: number, dx = 0) =>
    `<g fill="none" stroke-linecap="round" stroke="${colour}" opacity="${opacity}">` +
    drips
      .map(
        ({ d, width }) =>
          `<path d="${d}" stroke-width="${n(width * widthShare)}" transform="translate(${n(dx * width)} 0)"/>`,
      )
      .join('') +
    '</g>';
  return (
    layer(glaze.pool, 0.3, 1.6) + layer(glaze.pool, 0.6, 1) + layer(glaze.light, 0.4, 0.25, -0.2)
  );
}

/** Iron specks about a millimetre across, as many as the area drawn would show. */
export function speckles(box: Box, scale: number, pen: Pen): string {
  const colour = pen.glaze.speckle;
  if (!colour) return '';
  const count = Math.min(500, Math.round((box.w * box.h) / (scale * scale) / 90));
  const dots = Array.from({ length: count }, () => {
    const x = box.x + pen.random() * box.w;
    const y = box.y + pen.random() * box.h;
    const r = Math.min(4, Math.max(0.8, (0.25 + pen.random() * 0.6) * scale));
    return `<circle cx="${n(x)}" cy="${n(y)}" r="${n(r)}"/>`;
  });
  return `<g fill="${colour}" opacity="0.7">${dots.join('')}</g>`;
}

/** Crazing: short broken lines wandering across the glaze, a centimetre or so apart. */
export function crackle(box: Box, scale: number, pen: Pen): string {
  const colour = pen.glaze.crackle;
  if (!colour) return '';
  const { random } = pen;
  const count = Math.max(24, Math.min(140, Math.round((box.w * box.h) / (scale * scale) / 900)));
  const lines = Array.from({ length: count }, () => {
    let point: Point = [box.x + random() * box.w, box.y + random() * box.h];
    let angle = random() * Math.PI * 2;
    let d = `M${pt(point)}`;
    for (let step = 0; step < 5; step += 1) {
      angle += (random() - 0.5) * 1.4;
      const length = (6 + random() * 10) * scale;
      point = [point[0] + Math.cos(angle) * length, point[1] + Math.sin(angle) * length];
      d += `L${pt(point)}`;
    }
    return `<path d="${d}"/>`;
  });
  const width = n(Math.max(0.7, 0.2 * scale));
  return `<g fill="none" stroke="${colour}" stroke-width="${width}" stroke-linejoin="round" opacity="0.3">${lines.join('')}</g>`;
}
