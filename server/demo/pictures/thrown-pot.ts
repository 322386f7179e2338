// A pot thrown on the wheel, seen from a little above: the body between its two profiles, the
// front of the foot and the back of the rim; its mouth, bare foot, glaze and the light on it.

import { type PictureView, type PictureWork, type ThrownForm } from './forms';
import { crackle, mottle, type Pen, runs, speckles } from './glaze-surface';
import { type Glaze } from './glazes';
import {
  type Box,
  type Drawing,
  ellipse,
  mix,
  n,
  type Point,
  pt,
  rect,
  smoothPath,
  type Stage,
} from './svg';

export function thrownPot(
  work: PictureWork,
  form: ThrownForm,
  view: PictureView,
  pen: Pen,
  stage: Stage,
): Drawing {
  const { glaze, id } = pen;
  const [heightMm, widthMm, depthMm] = work.size;
  // A handle (and a jug's lip) reach beyond the body, whose width is then the depth.
  const bodyMm = form.handle ? Math.min(widthMm, depthMm) : widthMm;
  const reachMm = form.handle ? Math.max(widthMm - depthMm, depthMm * 0.3) : 0;
  const roundness = form.handle ? 1 : Math.min(depthMm / widthMm, 1);
  const elevation = ((view === 'above' ? 58 : form.elevation) * Math.PI) / 180;
  const flat = Math.sin(elevation) * roundness;
  const rise = Math.cos(elevation);
  // Level slices up the pot, foot to rim: each a ring, seen as an ellipse from above.
  const heights = Array.from({ length: 49 }, (_, i) => i / 48);
  const shares = heights.map((t) => profileAt(form.profile, t));
  const aboveMm = Math.max(
    ...heights.map((t, i) => t * heightMm * rise + (shares[i]! * bodyMm * flat) / 2),
  );
  const belowMm = Math.max(
    ...heights.map((t, i) => (shares[i]! * bodyMm * flat) / 2 - t * heightMm * rise),
  );
  const scale = Math.min(stage.maxW / (bodyMm + reachMm), stage.maxH / (aboveMm + belowMm));
  const half = (bodyMm / 2) * scale;
  const cx = stage.cx - (reachMm * scale) / 2 + (form.spout ? half * 0.15 : 0);
  const footY = stage.groundY - belowMm * scale;
  const climb = heightMm * rise * scale;
  const at = (t: number) => footY - t * climb;
  const radiusAt = (t: number) => half * profileAt(form.profile, t);

  const rings = heights.map((t, i) => ({ y: at(t), r: shares[i]! * half }));
  const rim = rings[rings.length - 1]!;
  const widest = Math.max(...rings.map((p) => p.r));
  // The pot up to a height as one shape: down each side, the point on each ring where the wall
  // turns away from view (the slope of the profile says where); the end rings close top and
  // bottom, and a ring whose wall is hidden from the side (a plate's, from above) is added whole.
  const solidUpTo = (limit: number) => {
    const levels = [...heights.filter((t) => t < limit), limit];
    const edge: Point[] = [];
    let caps = '';
    for (const [i, t] of levels.entries()) {
      const r = radiusAt(t);
      const turn = (((radiusAt(t + 0.001) - radiusAt(t - 0.001)) / 0.002) * flat) / climb;
      if (Math.abs(turn) <= 1) edge.push([r * Math.sqrt(1 - turn ** 2), at(t) + r * flat * turn]);
      if (Math.abs(turn) > 1 || i === 0 || i === levels.length - 1) {
        caps += ellipse(cx, at(t), r, r * flat, '');
      }
    }
    const left = edge.map(([x, y]): Point => [cx - x, y]);
    const right = edge.map(([x, y]): Point => [cx + x, y]).reverse();
    return `<path d="M${[...left, ...right].map(pt).join('L')}Z"/>${caps}`;
  };
  const solid = solidUpTo(1);
  const top = Math.min(...rings.map((p) => p.y - p.r * flat));
  const bottom = Math.max(...rings.map((p) => p.y + p.r * flat));
  const box: Box = { x: cx - widest - 2, y: top - 2, w: widest * 2 + 4, h: bottom - top + 4 };
  const onSurface = (across: number, t: number): Point => [cx + across * radiusAt(t), at(t)];

  // The glaze stops short of the foot along the front of the pot, with a drip here and there.
  const bareR = radiusAt(form.foot) * 1.06;
  const glazeLine = Array.from({ length: 25 }, (_, i): Point => {
    const a = Math.PI - (i / 24) * Math.PI;
    const drip = pen.random() < 0.25 ? pen.random() * 0.018 * heightMm * scale : 0;
    return [cx + bareR * Math.cos(a), at(form.foot) + bareR * flat * Math.sin(a) + drip];
  });
  const bare = `${smoothPath(glazeLine)}L${n(box.x + box.w)} ${n(bottom + 2)}L${n(box.x)} ${n(bottom + 2)}Z`;
  // A window's reflection, following the curve of the body on the lit side.
  const shine = smoothPath(
    Array.from({ length: 9 }, (_, i) => onSurface(-0.52, 0.3 + (i / 8) * 0.48)),
  );

  const parts = [
    groundShadow(cx, footY, rings[0]!.r, rings[0]!.r * flat, widest),
    form.handle ? handle(cx, radiusAt, at, heightMm * scale, reachMm * scale, glaze) : '',
    `<defs><clipPath id="${id}-body">${solid}</clipPath>`,
    `<clipPath id="${id}-foot">${solidUpTo(form.foot)}</clipPath>`,
    `${shadingGradients(id, glaze, box, at(1), footY)}</defs>`,
    `<g fill="${glaze.base}">${solid}</g>`,
    `<g clip-path="url(#${id}-body)">`,
    rect(box, `url(#${id}-flow)`),
    mottle(box, pen),
    glaze.runs ? runs(pen, scale, onSurface) : '',
    crackle(box, scale, pen),
    speckles(box, scale, pen),
    /facet/i.test(work.title) ? facets(id, box) + rect(box, `url(#${id}-facets)`) : '',
    `<path d="${bare}" fill="${pen.clay}" clip-path="url(#${id}-foot)"/>`,
    `<path d="${smoothPath(glazeLine)}" fill="none" stroke="${glaze.dark}" stroke-width="2" opacity="0.45"/>`,
    rect(box, `url(#${id}-form)`),
    rect(box, `url(#${id}-low)`),
    // Layered strokes, wide and faint to narrow, make a soft edge without a costly blur.
    `<g fill="none" stroke="#fff" stroke-linecap="round" stroke-opacity="${n(glaze.gloss * 0.07)}">`,
    [1, 0.86, 0.72, 0.6, 0.48, 0.36, 0.25, 0.15]
      .map((share) => `<path d="${shine}" stroke-width="${n(widest * 0.12 * share)}"/>`)
      .join(''),
    '</g>',
    '</g>',
  ];
  const mouth = { cx, cy: rim.y, rx: rim.r, ry: rim.r * flat };
  if (form.mouth === 'open') {
    const inside = radiusAt(form.foot) * 0.9;
    const floor = { cx, cy: at(form.foot), rx: inside, ry: inside * flat };
    parts.push(openMouth(mouth, floor, heightMm / bodyMm, scale, pen));
  }
  if (form.mouth === 'narrow') parts.push(narrowMouth(mouth, glaze));
  if (form.mouth === 'lidded') {
    const seam = form.lidAt ?? 0.6;
    parts.push(lid(mouth, flat, at(seam), radiusAt(seam), glaze));
  }
  if (form.spout) parts.push(spout(mouth, glaze));

  const focusT = form.mouth === 'narrow' ? 0.72 : 0.85;
  return { svg: parts.join(''), focus: [cx - radiusAt(focusT) * 0.25, at(focusT)] };
}

/** How the light falls across the pot, how the glaze thickens down it, the dark at its foot. */
export function shadingGradients(id: string, glaze: Glaze, box: Box, topY: number, footY: number) {
  const stops = (list: [offset: number, colour: string, opacity: number][]) =>
    list.map(([o, c, a]) => `<stop offset="${o}" stop-color="${c}" stop-opacity="${a}"/>`).join('');
  const down = (gid: string, y1: number, y2: number) =>
    `<linearGradient id="${gid}" gradientUnits="userSpaceOnUse" x1="0" y1="${n(y1)}" x2="0" y2="${n(y2)}">`;
  return (
    down(`${id}-flow`, topY, footY) +
    stops([
      [0, glaze.edge, 0.9],
      [0.09, glaze.edge, 0],
      [0.3, glaze.light, 0.18],
      [0.55, glaze.pool, 0],
      [0.85, glaze.pool, 0.55],
      [1, glaze.pool, 0.75],
    ]) +
    `</linearGradient><linearGradient id="${id}-form" gradientUnits="userSpaceOnUse" x1="${n(box.x)}" y1="0" x2="${n(box.x + box.w)}" y2="0">` +
    stops([
      [0, '#000', 0.45],
      [0.09, '#000', 0.2],
      [0.26, '#fff', 0.2],
      [0.4, '#fff', 0.05],
      [0.55, '#000', 0],
      [0.8, '#000', 0.2],
      [0.94, '#000', 0.38],
      [1, '#000', 0.55],
    ]) +
    `</linearGradient>${down(`${id}-low`, box.y, box.y + box.h)}` +
    stops([
      [0.8, '#000', 0],
      [1, '#000', 0.3],
    ]) +
    '</linearGradient>'
  );
}

/** Eight flat faces cut round the pot, each lit by how squarely it faces the light. */
function facets(id: string, box: Box): string {
  const count = 8;
  let stops = '';
  for (let i = 0; i < count; i += 1) {
    const from = (1 - Math.cos((Math.PI * i) / count)) / 2;
    const to = (1 - Math.cos((Math.PI * (i + 1)) / count)) / 2;
    const facing = Math.cos((Math.PI * (i + 0.5)) / count - Math.PI / 2 + 0.6);
    const colour = facing > 0.6 ? '#fff' : '#000';
    const opacity = n(Math.abs(facing - 0.6) * 0.28);
    for (const offset of [from, to]) {
      stops += `<stop offset="${Math.round(offset * 1000) / 1000}" stop-color="${colour}" stop-opacity="${opacity}"/>`;
    }
  }
  return `<defs><linearGradient id="${id}-facets" gradientUnits="userSpaceOnUse" x1="${n(box.x)}" y1="0" x2="${n(box.x + box.w)}" y2="0">${stops}</linearGradient></defs>`;
}

/** A soft shadow thrown back and right by a light in front, left and above; darker at the foot. */
export function groundShadow(cx: number, y: number, rx: number, ry: number, widest: number) {
  return (
    ellipse(
      cx + widest * 0.3,
      y + ry * 0.4,
      widest * 1.35,
      Math.max(ry * 2.2, 40),
      'fill="url(#cast)"',
    ) + ellipse(cx, y + ry * 0.1, rx * 1.12, Math.max(ry * 1.3, 7), 'fill="url(#contact)"')
  );
}

type Mouth = { cx: number; cy: number; rx: number; ry: number };

/** Inside an open pot: glaze pooled on the floor, the far wall in light, the near side in shade. */
function openMouth({ cx, cy, rx, ry }: Mouth, floor: Mouth, deep: number, scale: number, pen: Pen) {
  const { glaze, id } = pen;
  const dark = Math.min(0.55, 0.15 + deep * 0.3);
  const shape = (fill: string) => ellipse(cx, cy, rx, ry, `fill="${fill}"`);
  const box = { x: cx - rx, y: cy - ry, w: rx * 2, h: ry * 2 };
  return `<defs><clipPath id="${id}-mouth">${shape('none')}</clipPath>
<radialGradient id="${id}-well" cx="0.5" cy="0.62" r="0.55">
<stop offset="0" stop-color="${glaze.pool}" stop-opacity="0.85"/>
<stop offset="0.55" stop-color="${glaze.pool}" stop-opacity="0.3"/>
<stop offset="1" stop-color="${glaze.base}" stop-opacity="0"/></radialGradient>
<radialGradient id="${id}-floor"><stop offset="0" stop-color="${glaze.pool}" stop-opacity="0.5"/>
<stop offset="0.75" stop-color="${glaze.pool}" stop-opacity="0.75"/>
<stop offset="0.93" stop-color="${glaze.dark}" stop-opacity="0.3"/>
<stop offset="1" stop-color="${glaze.dark}" stop-opacity="0"/></radialGradient>
<linearGradient id="${id}-inside" x1="0" y1="0" x2="1" y2="0.3">
<stop offset="0" stop-color="#000" stop-opacity="${n(dark)}"/>
<stop offset="0.45" stop-color="#000" stop-opacity="${n(dark * 0.3)}"/>
<stop offset="0.8" stop-color="#fff" stop-opacity="0.12"/>
<stop offset="1" stop-color="#000" stop-opacity="0.1"/></linearGradient>
<linearGradient id="${id}-lip" x1="0" y1="0" x2="0" y2="1">
<stop offset="0.8" stop-color="#000" stop-opacity="0"/>
<stop offset="1" stop-color="#000" stop-opacity="${n(dark * 0.8)}"/></linearGradient></defs>
${shape(glaze.base)}<g clip-path="url(#${id}-mouth)">${shape(`url(#${id}-well)`)}
${ellipse(floor.cx, floor.cy, floor.rx * 1.1, floor.ry * 1.1, `fill="url(#${id}-floor)"`)}
${crackle(box, scale, pen)}${speckles(box, scale, pen)}
${shape(`url(#${id}-inside)`)}${shape(`url(#${id}-lip)`)}</g>
${ellipse(cx, cy, rx, ry, `fill="none" stroke="${glaze.edge}" stroke-width="${n(Math.max(2, rx * 0.025))}"`)}
<path d="M${n(cx - rx)} ${n(cy)}A${n(rx)} ${n(ry)} 0 0 0 ${n(cx)} ${n(cy + ry)}" fill="none" stroke="${mix(glaze.edge, '#ffffff', 0.5)}" stroke-width="${n(Math.max(1.2, rx * 0.008))}" opacity="${n(0.15 + glaze.gloss * 0.3)}"/>`;
}

/** A bottle's or jar's mouth: the lip seen from a little above, dark inside. */
function narrowMouth({ cx, cy, rx, ry }: Mouth, glaze: Glaze) {
  return (
    ellipse(cx, cy, rx, ry, `fill="${glaze.edge}"`) +
    ellipse(cx, cy + ry * 0.06, rx * 0.8, ry * 0.74, 'fill="#1b1410"') +
    ellipse(cx, cy, rx, ry, 'fill="none" stroke="#2a1f17" stroke-width="1" opacity="0.35"')
  );
}

/** The top of a lid, its seam with the body, and a knob. */
function lid({ cx, cy, rx }: Mouth, flat: number, seamY: number, seamR: number, glaze: Glaze) {
  const knob = rx * 0.2;
  const rise = knob * 1.05;
  const seam = (dy: number) =>
    `M${n(cx - seamR)} ${n(seamY + dy)}A${n(seamR)} ${n(seamR * flat)} 0 0 0 ${n(cx + seamR)} ${n(seamY + dy)}`;
  return (
    ellipse(cx, cy, rx, rx * flat, `fill="${mix(glaze.base, glaze.light, 0.3)}"`) +
    `<path d="${seam(0)}" fill="none" stroke="#1d140e" stroke-width="2.5" opacity="0.5"/>` +
    `<path d="${seam(3)}" fill="none" stroke="#fff" stroke-width="1.2" opacity="0.3"/>` +
    ellipse(cx + knob * 0.3, cy + 2, knob * 1.5, knob * flat * 1.6, 'fill="url(#contact)"') +
    `<path d="M${n(cx - knob)} ${n(cy)}C${n(cx - knob)} ${n(cy - rise)} ${n(cx + knob)} ${n(cy - rise)} ${n(cx + knob)} ${n(cy)}A${n(knob)} ${n(knob * flat)} 0 0 1 ${n(cx - knob)} ${n(cy)}Z" fill="${glaze.base}"/>` +
    `<path d="M${n(cx - knob * 0.55)} ${n(cy - rise * 0.4)}Q${n(cx - knob * 0.3)} ${n(cy - rise * 0.68)} ${n(cx + knob * 0.1)} ${n(cy - rise * 0.72)}" fill="none" stroke="#fff" stroke-width="${n(Math.max(1.5, knob * 0.15))}" stroke-linecap="round" opacity="${n(0.2 + glaze.gloss * 0.4)}"/>`
  );
}

/** A pulled strap handle on the right, drawn before the body so its ends tuck behind it. */
function handle(
  cx: number,
  radiusAt: (t: number) => number,
  at: (t: number) => number,
  heightPx: number,
  reachPx: number,
  glaze: Glaze,
) {
  const strap = Math.min(Math.max(heightPx * 0.12, 10), reachPx * 0.5);
  const [x1, y1] = [cx + radiusAt(0.82) - strap, at(0.82)];
  const [x2, y2] = [cx + radiusAt(0.25) - strap, at(0.25)];
  const out = cx + radiusAt(0.55) + reachPx - strap / 2;
  const d = `M${n(x1)} ${n(y1)}C${n(out)} ${n(y1 - strap * 0.6)} ${n(out + strap * 0.2)} ${n(y2 - strap)} ${n(x2)} ${n(y2)}`;
  const stroke = (colour: string, share: number, shift: number, extra = '') =>
    `<path d="${d}" fill="none" stroke="${colour}" stroke-width="${n(strap * share)}" stroke-linecap="round" transform="translate(${n(-strap * shift)} ${n(-strap * shift)})"${extra}/>`;
  return (
    stroke(glaze.dark, 1, 0) +
    stroke(glaze.base, 0.72, 0.1) +
    stroke('#fff', 0.14, 0.22, ` opacity="${n(0.15 + glaze.gloss * 0.3)}"`)
  );
}

/**
 * A jug's pulled lip on the left: the rim drawn out to a point, its outside running down into the
 * body in shade, its inside a channel for the pour.
 */
function spout({ cx, cy, rx, ry }: Mouth, glaze: Glaze) {
  const s = rx * 0.38;
  const tip: Point = [cx - rx - s, cy - s * 0.55];
  const back: Point = [cx - rx * 0.55, cy - ry * 0.84];
  const front: Point = [cx - rx * 0.62, cy + ry * 0.78];
  const below: Point = [cx - rx * 0.97, cy + ry + s * 0.9];
  const outside =
    `M${pt(front)}Q${n(cx - rx * 1.02)} ${n(cy + ry * 0.2)} ${pt(tip)}` +
    `Q${n(cx - rx * 1.02)} ${n(cy + s * 0.4)} ${pt(below)}Z`;
  const inside =
    `M${pt(back)}Q${n(cx - rx * 1.02)} ${n(cy - ry * 0.75)} ${pt(tip)}` +
    `Q${n(cx - rx * 0.98)} ${n(cy + ry * 0.1)} ${pt(front)}Z`;
  return (
    `<path d="${outside}" fill="${mix(glaze.base, glaze.dark, 0.45)}"/>` +
    `<path d="${inside}" fill="${mix(glaze.base, glaze.dark, 0.2)}"/>` +
    `<path d="M${pt(back)}Q${n(cx - rx * 1.02)} ${n(cy - ry * 0.75)} ${pt(tip)}Q${n(cx - rx * 1.02)} ${n(cy + ry * 0.2)} ${pt(front)}" fill="none" stroke="${glaze.edge}" stroke-width="${n(Math.max(2, rx * 0.025))}" stroke-linejoin="round"/>`
  );
}

/** The half-width at a height: a smooth curve through the profile's points (cubic Hermite). */
function profileAt(profile: ThrownForm['profile'], t: number): number {
  const after = profile.findIndex(([pt]) => pt >= t);
  const i = after < 0 ? profile.length - 2 : Math.max(after - 1, 0);
  const [p0, p1] = [profile[i]!, profile[i + 1]!];
  const [before, beyond] = [profile[i - 1] ?? p0, profile[i + 2] ?? p1];
  const span = p1[0] - p0[0];
  const slope = (a: readonly number[], b: readonly number[]) => (b[1]! - a[1]!) / (b[0]! - a[0]!);
  const [m0, m1] = [slope(before, p1) * span, slope(p0, beyond) * span];
  const u = (t - p0[0]) / span;
  return (
    (2 * u ** 3 - 3 * u ** 2 + 1) * p0[1] +
    (u ** 3 - 2 * u ** 2 + u) * m0 +
    (-2 * u ** 3 + 3 * u ** 2) * p1[1] +
    (u ** 3 - u ** 2) * m1
  );
}
