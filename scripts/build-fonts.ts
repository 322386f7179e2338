// Makes the web app's fonts: WOFF2 subsets of the packaged .ttf files, written to assets/fonts/
// and committed, so a fresh clone needs no extra step. Run again after changing scripts/font-subset.ts.
//   npm run fonts
import fs from 'node:fs';
import path from 'node:path';

import subsetFont from 'subset-font';

import { figures, subsetFeatures, subsetFonts, subsetText } from './font-subset';

const root = path.join(__dirname, '..');

async function main() {
  const text = subsetText();
  for (const font of subsetFonts) {
    const source = fs.readFileSync(font.source);
    const subset = await subsetFont(source, font.keep === 'text' ? text : figures, {
      targetFormat: 'woff2',
      keepFeatures: [...subsetFeatures],
    });
    const target = path.join(root, font.target);
    fs.mkdirSync(path.dirname(target), { recursive: true });
    fs.writeFileSync(target, subset);
    console.log(
      `${font.target}: ${(subset.length / 1000).toFixed(1)} KB (from ${(source.length / 1000).toFixed(0)} KB .ttf)`,
    );
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
