// Makes the exported index.html ask up front for what the first page needs but the browser would
// only discover once the main bundle has run:
// - the web fonts, as preload hints (the root layout waits for them);
// - Expo Router's layout chunks and the sign-in route's chunk, as deferred scripts before the
//   entry bundle. A chunk that has already run when the router asks for it is used at once (Expo's
//   async require tries a synchronous import first on the web); one fetched on demand makes the
//   route suspend, and React then holds the page back for up to 300 ms before it shows it.
//   tsx scripts/web-preload.ts [dist]
import fs from 'node:fs';
import path from 'node:path';

import { filesUnder } from './lib/files';

const marker = '<!-- first-load hints: scripts/web-preload.ts -->';

/**
 * Route chunks worth fetching on every first load. A phone that has never signed in lands on
 * /sign-in whatever address it opened (the other routes redirect there), and its chunk is small.
 */
const landingRoutes = ['sign-in'];

function main() {
  const root = path.resolve(process.argv[2] ?? 'dist');
  const indexFile = path.join(root, 'index.html');
  let html = fs.readFileSync(indexFile, 'utf8');
  if (html.includes(marker)) return;

  const url = (file: string) => `/${path.relative(root, file).split(path.sep).join('/')}`;
  const urls = [...filesUnder(root)].map(url).sort();

  // Font requests are CORS requests, so their preloads need `crossorigin` to be used.
  const fonts = urls
    .filter((u) => u.endsWith('.woff2'))
    .map((u) => `<link rel="preload" href="${u}" as="font" type="font/woff2" crossorigin>`);
  if (!html.includes('</head>')) throw new Error(`${indexFile} has no </head>`);
  html = html.replace('</head>', `${[marker, ...fonts].join('\n')}\n</head>`);

  // Expo Router loads every layout before it renders a route; chunks are named after their file.
  const chunk = new RegExp(
    `^/_expo/static/js/web/(_layout|${landingRoutes.join('|')})-[0-9a-f]+\\.js$`,
  );
  const scripts = urls
    .filter((u) => chunk.test(u))
    .map((u) => `<script src="${u}" defer></script>`);
  const entry = /<script src="\/_expo\/static\/js\/web\/entry-[0-9a-f]+\.js" defer><\/script>/;
  if (!entry.test(html)) throw new Error(`${indexFile} has no entry bundle script`);
  html = html.replace(entry, (tag) => `${scripts.join('')}${tag}`);

  fs.writeFileSync(indexFile, html);
  console.log(
    `First-load hints: ${fonts.length} fonts preloaded, ${scripts.length} chunks as scripts.`,
  );
}

main();
