// Photographs for the demo's works, drawn rather than taken: each piece's silhouette from its own
// size and category, in the colours of its glaze, on a paper backdrop. The SVG comes from pure
// functions, so the same work always gives the same picture; sharp turns it into a JPEG.

import sharp from 'sharp';

import { type Form, formFor, type PictureView, type PictureWork } from './forms';
import { type Pen } from './glaze-surface';
import { clayColour, glazeColours } from './glazes';
import { standingForm, wallPiece } from './slab-pieces';
import { type Drawing, n, randomFrom, type Stage } from './svg';
import { thrownPot } from './thrown-pot';

export type { PictureView, PictureWork } from './forms';

/** The JPEG's side in pixels: enough for the work page's cover on a high-density screen. */
export const picturePx = 1000;
/** The drawing's own units: a square this many across, scaled to `picturePx`. */
const size = 1200;
const centre = size / 2;
const horizonY = 790;
const plinthEdgeY = 1045;
const stage: Stage = { cx: centre, groundY: 985, maxW: 860, maxH: 760 };

/** The second photograph worth taking: into a wide open pot from above, else its glaze close up. */
export function secondViewFor(work: PictureWork): PictureView {
  const form = formFor(work);
  const [height, width, depth] = work.size;
  const wideOpen =
    form.kind === 'thrown' && form.mouth === 'open' && height <= Math.min(width, depth) * 0.8;
  return wideOpen ? 'above' : 'detail';
}

/** The picture as a square JPEG, `picturePx` on a side. */
export async function renderVesselPicture(work: PictureWork, view: PictureView): Promise<Buffer> {
  return sharp(Buffer.from(vesselSvg(work, view)))
    .jpeg({ quality: 86 })
    .toBuffer();
}

export function vesselSvg(work: PictureWork, view: PictureView): string {
  const form = formFor(work);
  const pen = (id: string): Pen => ({
    glaze: glazeColours(work.glaze),
    clay: clayColour(work.clayBody),
    random: randomFrom(`${work.title}|${view}|${id}`),
    id,
  });
  let piece: Drawing;
  if (form.kind === 'wall-piece') {
    piece = wallPiece(work, pen('w'), { cx: centre, groundY: 920, maxW: 920, maxH: 700 });
  } else if (form.kind === 'standing') {
    piece = standingForm(work, pen('s'), stage);
  } else if (/^(a )?pair of/i.test(work.title)) {
    const pair = { ...stage, maxW: stage.maxW * 0.55 };
    const behind = thrownPot(work, form, view, pen('b'), {
      ...pair,
      cx: centre + 165,
      groundY: 940,
    });
    const front = thrownPot(work, form, view, pen('f'), {
      ...pair,
      cx: centre - 135,
      groundY: 1005,
    });
    piece = { svg: behind.svg + front.svg, focus: front.focus };
  } else {
    piece = thrownPot(work, form, view, pen('p'), stage);
  }

  const [fx, fy] = view === 'detail' ? piece.focus : [centre, centre];
  const zoom = view === 'detail' ? 2.4 : 1;
  const transform = `translate(${centre} ${centre}) scale(${zoom}) translate(${n(-fx)} ${n(-fy)})`;
  return [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${picturePx}" height="${picturePx}" viewBox="0 0 ${size} ${size}">`,
    backdropDefs,
    backdropFor(work, form.kind),
    `<g transform="${transform}">${piece.svg}</g>`,
    `<rect width="${size}" height="${size}" fill="url(#vignette)"/>`,
    '</svg>',
  ].join('');
}

const backdropDefs = `<defs>
<linearGradient id="wall" x1="0" y1="0" x2="0" y2="1">
<stop offset="0" stop-color="#d2c9ba"/><stop offset="1" stop-color="#e8e1d5"/></linearGradient>
<linearGradient id="sweep" x1="0" y1="0" x2="0" y2="1">
<stop offset="0" stop-color="#d2c9ba"/><stop offset="0.6" stop-color="#e8e1d5"/>
<stop offset="0.8" stop-color="#ece6dc"/><stop offset="1" stop-color="#ddd4c6"/></linearGradient>
<linearGradient id="plinth" x1="0" y1="0" x2="0" y2="1">
<stop offset="0" stop-color="#e0d8cb"/><stop offset="1" stop-color="#eee8de"/></linearGradient>
<linearGradient id="face" x1="0" y1="0" x2="0" y2="1">
<stop offset="0" stop-color="#cfc5b4"/><stop offset="1" stop-color="#c2b7a3"/></linearGradient>
<radialGradient id="vignette" cx="0.5" cy="0.48" r="0.72">
<stop offset="0.62" stop-color="#3b2c1e" stop-opacity="0"/>
<stop offset="1" stop-color="#3b2c1e" stop-opacity="0.2"/></radialGradient>
<radialGradient id="cast"><stop offset="0" stop-color="#3a2a1c" stop-opacity="0.3"/>
<stop offset="0.5" stop-color="#3a2a1c" stop-opacity="0.13"/>
<stop offset="1" stop-color="#3a2a1c" stop-opacity="0"/></radialGradient>
<radialGradient id="contact"><stop offset="0.55" stop-color="#24180f" stop-opacity="0.55"/>
<stop offset="1" stop-color="#24180f" stop-opacity="0"/></radialGradient>
</defs>`;

/**
 * A wall piece hangs on the wall; a piece half a metre tall or more stands on the floor of a
 * seamless paper sweep; anything smaller on a plinth, its top in the light and its edge below.
 */
function backdropFor(work: PictureWork, kind: Form['kind']): string {
  if (kind === 'wall-piece') return wall;
  return work.size[0] >= 500
    ? `<rect width="${size}" height="${size}" fill="url(#sweep)"/>`
    : wall + plinth;
}

const wall = `<rect width="${size}" height="${size}" fill="url(#wall)"/>`;
const plinth = [
  `<rect y="${horizonY}" width="${size}" height="${plinthEdgeY - horizonY}" fill="url(#plinth)"/>`,
  `<rect y="${horizonY - 1}" width="${size}" height="2" fill="#cbc1b0" opacity="0.7"/>`,
  `<rect y="${plinthEdgeY}" width="${size}" height="${size - plinthEdgeY}" fill="url(#face)"/>`,
  `<rect y="${plinthEdgeY}" width="${size}" height="2" fill="#faf7f1" opacity="0.8"/>`,
].join('');
