// Adds preload hints to the exported index.html for what the first page needs but the browser
// would only discover after the main bundle has run: the web fonts (the root layout waits for
// them), Expo Router's layout chunks, and the sign-in route's chunk. They then download alongside
// the bundle instead of one after another once it has run.
//   tsx scripts/web-preload.ts [dist]
import fs from 'node:fs';
import path from 'node:path';

const marker = '<!-- preload: scripts/web-preload.ts -->';

/**
 * Route chunks worth fetching on every first load. A phone that has never signed in lands on
 * /sign-in whatever address it opened (the other routes redirect there), and its chunk is small.
 */
const landingRoutes = ['sign-in'];

function* filesUnder(dir: string): Generator<string> {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* filesUnder(full);
    else if (entry.isFile()) yield full;
  }
}

function main() {
  const root = path.resolve(process.argv[2] ?? 'dist');
  const indexFile = path.join(root, 'index.html');
  const html = fs.readFileSync(indexFile, 'utf8');
  if (html.includes(marker)) return;

  const url = (file: string) => `/${path.relative(root, file).split(path.sep).join('/')}`;
  const files = [...filesUnder(root)].sort();
  // Font requests are CORS requests, so their preloads need `crossorigin` to be used.
  const fonts = files
    .filter((f) => f.endsWith('.woff2'))
    .map((f) => `<link rel="preload" href="${url(f)}" as="font" type="font/woff2" crossorigin>`);
  // Expo Router loads every layout before it renders a route; chunks are named after their file.
  const chunk = new RegExp(
    `/_expo/static/js/web/(_layout|${landingRoutes.join('|')})-[0-9a-f]+\\.js$`,
  );
  const scripts = files
    .filter((f) => chunk.test(url(f)))
    .map((f) => `<link rel="preload" href="${url(f)}" as="script">`);
  if (!html.includes('</head>')) throw new Error(`${indexFile} has no </head>`);

  const hints = [marker, ...fonts, ...scripts].join('\n');
  fs.writeFileSync(indexFile, html.replace('</head>', `${hints}\n</head>`));
  console.log(`Preload hints: ${fonts.length} fonts, ${scripts.length} script chunks.`);
}

main();
