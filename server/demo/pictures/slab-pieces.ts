// Pieces built from slabs rather than thrown: a panel hung on the wall and a tall standing form.

import { type PictureWork } from './forms';
import { crackle, mottle, type Pen, speckles } from './glaze-surface';
import {
  type Box,
  curveThrough,
  type Drawing,
  mix,
  n,
  type Point,
  pt,
  rect,
  type Stage,
} from './svg';
import { groundShadow, shadingGradients } from './thrown-pot';

/** A slab on the wall, its width across and its depth upright, with bands like tide marks. */
export function wallPiece(work: PictureWork, pen: Pen, stage: Stage): Drawing {
  const { glaze, id, random } = pen;
  const [, widthMm, depthMm] = work.size;
  const scale = Math.min(stage.maxW / widthMm, stage.maxH / depthMm);
  const [w, h] = [widthMm * scale, depthMm * scale];
  const [x, y] = [stage.cx - w / 2, stage.groundY - h];
  // Hand-cut edges: points round the rectangle, each a little off the line.
  const corners: Point[] = [
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ];
  const edge = corners.flatMap(([x0, y0], i) => {
    const [x1, y1] = corners[(i + 1) % 4]!;
    return [0.08, 0.22, 0.36, 0.5, 0.64, 0.78, 0.92].map((s): Point => [
      x0 + (x1 - x0) * s + (random() - 0.5) * 6,
      y0 + (y1 - y0) * s + (random() - 0.5) * 6,
    ]);
  });
  const outline = `M${pt(edge[0]!)}${curveThrough([...edge, edge[0]!])}Z`;
  // The slab stands off the wall on its fixings: a soft shadow below and to the right.
  const shadow = [1, 2, 3, 4, 5, 6]
    .map((i) => {
      const grow = 1 + i * 0.006;
      const move = `translate(${n(stage.cx + i * 4)} ${n(y + h / 2 + i * 6)}) scale(${grow}) translate(${n(-stage.cx)} ${n(-(y + h / 2))})`;
      return `<path d="${outline}" transform="${move}"/>`;
    })
    .join('');
  const box: Box = { x: x - 10, y: y - 10, w: w + 20, h: h + 20 };
  const svg = `<defs><clipPath id="${id}-slab"><path d="${outline}"/></clipPath>
<linearGradient id="${id}-light" x1="0" y1="0" x2="0.4" y2="1">
<stop offset="0" stop-color="#fff" stop-opacity="0.16"/>
<stop offset="0.5" stop-color="#fff" stop-opacity="0"/>
<stop offset="1" stop-color="#000" stop-opacity="0.22"/></linearGradient></defs>
<g fill="#2a1d12" opacity="0.07">${shadow}</g>
<path d="${outline}" fill="${glaze.base}"/>
<g clip-path="url(#${id}-slab)">${tideBands({ x, y, w, h }, pen)}${mottle(box, pen)}
${crackle(box, scale, pen)}${speckles(box, scale, pen)}${rect(box, `url(#${id}-light)`)}</g>
<path d="${outline}" fill="none" stroke="${pen.clay}" stroke-width="5"/>`;
  return { svg, focus: [x + w * 0.3, y + h * 0.4] };
}

/** A tall slab-built form: its front face in the light, its side in shade, a sloping top. */
export function standingForm(work: PictureWork, pen: Pen, stage: Stage): Drawing {
  const { glaze, id } = pen;
  const [heightMm, widthMm, depthMm] = work.size;
  const sideMm = depthMm * 0.45;
  const scale = Math.min(stage.maxH / (heightMm + sideMm * 0.35), stage.maxW / (widthMm + sideMm));
  const [w, d, h] = [widthMm * scale, sideMm * scale, heightMm * scale];
  const x = stage.cx - (w + d) / 2;
  const base = stage.groundY - d * 0.35;
  const front: Point[] = [
    [x, base],
    [x + w, base],
    [x + w * 0.86, base - h * 0.9],
    [x + w * 0.1, base - h],
  ];
  const back = ([px, py]: Point): Point => [px + d, py - d * 0.35];
  const side = [front[1]!, back(front[1]!), back(front[2]!), front[2]!];
  const top = [front[3]!, front[2]!, back(front[2]!), back(front[3]!)];
  const face = (ps: Point[]) => `M${ps.map(pt).join('L')}Z`;
  const box: Box = { x: x - 4, y: base - h - d - 4, w: w + d + 8, h: h + d + 8 };
  const frontBox: Box = { x, y: base - h, w: w + d, h };
  // The bare clay it stands on, a band along the bottom of each face.
  const raise = ([px, py]: Point): Point => [px, py - h * 0.04];
  const footFront = [front[0]!, front[1]!, raise(front[1]!), raise(front[0]!)];
  const footSide = [side[0]!, side[1]!, raise(side[1]!), raise(side[0]!)];
  const svg = `<defs><clipPath id="${id}-all"><path d="${face(front)}"/><path d="${face(side)}"/><path d="${face(top)}"/></clipPath>
<clipPath id="${id}-front"><path d="${face(front)}"/></clipPath>
${shadingGradients(id, glaze, frontBox, base - h, base)}</defs>
${groundShadow(x + (w + d) / 2, base - d * 0.15, (w + d) / 2, d * 0.35, (w + d) / 2)}
<path d="${face(front)}" fill="${glaze.base}"/>
<path d="${face(side)}" fill="${mix(glaze.base, glaze.dark, 0.55)}"/>
<path d="${face(top)}" fill="${mix(glaze.base, glaze.light, 0.6)}"/>
<g clip-path="url(#${id}-front)">${rect(box, `url(#${id}-flow)`)}${tideBands(frontBox, pen)}${mottle(box, pen)}</g>
<g clip-path="url(#${id}-all)">${crackle(box, scale, pen)}${speckles(box, scale, pen)}
<path d="${face(footFront)}" fill="${pen.clay}"/><path d="${face(footSide)}" fill="${mix(pen.clay, '#000000', 0.3)}"/>
${rect(box, `url(#${id}-low)`)}</g>
<path d="${face(front)}" fill="none" stroke="#2a1f17" stroke-width="1.2" opacity="0.3"/>`;
  return { svg, focus: [x + w * 0.45, base - h * 0.75] };
}

/** Wavering bands of the glaze's tones across the piece, like the lines a tide leaves on sand. */
function tideBands(area: Box, pen: Pen): string {
  const { glaze, random } = pen;
  const bands = Array.from({ length: 7 }, (_, i) => {
    const y = area.y + area.h * (0.1 + i * 0.13 + (random() - 0.5) * 0.05);
    const wave = Array.from({ length: 7 }, (__, j): Point => {
      return [area.x - 20 + ((area.w + 40) * j) / 6, y + (random() - 0.5) * area.h * 0.07];
    });
    const colour = [glaze.light, glaze.pool, glaze.edge, glaze.dark][i % 4];
    const width = Math.min(area.h, area.w) * (0.03 + random() * 0.06);
    const band = `M${pt(wave[0]!)}${curveThrough(wave)}`;
    return (
      `<path d="${band}" stroke="${colour}" stroke-width="${n(width * 1.6)}" opacity="0.25"/>` +
      `<path d="${band}" stroke="${colour}" stroke-width="${n(width)}" opacity="${n(0.4 + random() * 0.3)}"/>`
    );
  });
  return `<g fill="none">${bands.join('')}</g>`;
}
