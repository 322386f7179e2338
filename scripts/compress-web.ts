// Writes brotli (.br) and gzip (.gz) copies beside each compressible file of the web export, so
// the server sends them as they are instead of compressing on every request.
//   tsx scripts/compress-web.ts [dist]
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

import { filesUnder } from './lib/files';

/** Text and other formats that compress well; images and WOFF2 fonts are compressed already. */
const compressible = new Set([
  '.html',
  '.js',
  '.mjs',
  '.css',
  '.json',
  '.map',
  '.svg',
  '.txt',
  '.xml',
  '.webmanifest',
  '.ico',
  '.ttf',
  '.otf',
  '.wasm',
]);

/** A copy must save at least this share of the original to be worth a second file. */
const minSaving = 0.05;

function main() {
  const root = path.resolve(process.argv[2] ?? 'dist');
  if (!fs.existsSync(root)) throw new Error(`${root} does not exist: export the web app first.`);
  let before = 0;
  let afterBrotli = 0;
  let written = 0;
  for (const file of filesUnder(root)) {
    if (!compressible.has(path.extname(file).toLowerCase())) continue;
    const source = fs.readFileSync(file);
    const copies = {
      br: zlib.brotliCompressSync(source, {
        params: {
          [zlib.constants.BROTLI_PARAM_QUALITY]: zlib.constants.BROTLI_MAX_QUALITY,
          [zlib.constants.BROTLI_PARAM_SIZE_HINT]: source.length,
        },
      }),
      gz: zlib.gzipSync(source, { level: zlib.constants.Z_BEST_COMPRESSION }),
    };
    before += source.length;
    afterBrotli += source.length;
    for (const [suffix, copy] of Object.entries(copies)) {
      const target = `${file}.${suffix}`;
      if (copy.length > source.length * (1 - minSaving)) {
        fs.rmSync(target, { force: true });
        continue;
      }
      fs.writeFileSync(target, copy);
      written += 1;
      if (suffix === 'br') afterBrotli += copy.length - source.length;
    }
  }
  console.log(
    `Compressed ${path.relative(process.cwd(), root) || '.'}: ${written} files written; ` +
      `${(before / 1000).toFixed(0)} KB of text is ${(afterBrotli / 1000).toFixed(0)} KB as brotli.`,
  );
}

main();
