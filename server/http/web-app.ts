import fs from 'node:fs';
import path from 'node:path';

import express, { type Request, type Response, type Router } from 'express';

/** Encodings written beside each text file of the export by `scripts/compress-web.ts`. */
const encodings = [
  { name: 'br', suffix: '.br' },
  { name: 'gzip', suffix: '.gz' },
] as const;
type Encoding = (typeof encodings)[number]['name'];

const immutable = 'public, max-age=31536000, immutable';
const shortLived = 'public, max-age=3600';

/**
 * Files whose name changes with their content, so a browser may keep them for good: Metro's
 * bundles under /_expo/static/ and the assets Expo names `<name>.<32 hex digits>.<ext>`.
 */
const isHashed = (urlPath: string) =>
  urlPath.startsWith('/_expo/static/') || /\.[0-9a-f]{32}(@\d+x)?\.[a-z0-9]+$/i.test(urlPath);

/**
 * The quality (q) the request's Accept-Encoding gives each coding, following RFC 9110 §12.5.3:
 * a coding not listed takes the q of `*` if there is one and is refused otherwise.
 */
function acceptedQuality(header: string | undefined, coding: Encoding): number {
  if (!header) return 0;
  let star = 0;
  for (const part of header.split(',')) {
    const [token = '', ...params] = part.trim().toLowerCase().split(';');
    const qParam = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    const q = qParam ? Number(qParam.slice(2)) : 1;
    if (Number.isNaN(q)) continue;
    if (token.trim() === coding) return q;
    if (token.trim() === '*') star = q;
  }
  return star;
}

/** The smallest acceptable variant present on disk: brotli before gzip when both are as welcome. */
function chooseVariant(req: Request, file: string) {
  const header = req.headers['accept-encoding'];
  let best: { encoding: Encoding; file: string; q: number } | null = null;
  let hasVariants = false;
  for (const { name, suffix } of encodings) {
    if (!isFile(file + suffix)) continue;
    hasVariants = true;
    const q = acceptedQuality(header, name);
    if (q > 0 && (!best || q > best.q)) best = { encoding: name, file: file + suffix, q };
  }
  return { variant: best, hasVariants };
}

function isFile(file: string): boolean {
  try {
    return fs.statSync(file).isFile();
  } catch {
    return false;
  }
}

/** The file a URL path names inside the export, or null for anything that leaves it. */
function fileFor(root: string, urlPath: string): string | null {
  let decoded: string;
  try {
    decoded = decodeURIComponent(urlPath);
  } catch {
    return null;
  }
  if (decoded.includes('\0')) return null;
  const file = path.join(root, decoded);
  return file.startsWith(root + path.sep) ? file : null;
}

function sendVariant(req: Request, res: Response, file: string, cacheControl: string) {
  const { variant, hasVariants } = chooseVariant(req, file);
  if (hasVariants) res.vary('Accept-Encoding');
  // The type is the original file's, whichever bytes go out; `sendFile` keeps a type already set.
  res.type(path.extname(file));
  res.set('Cache-Control', cacheControl);
  if (variant) res.set('Content-Encoding', variant.encoding);
  res.sendFile(variant?.file ?? file, { cacheControl: false, dotfiles: 'deny' });
}

/**
 * Serves the exported web app, precompressed (brotli or gzip, as the browser accepts) where the
 * build wrote compressed copies. Content-hashed files are cached for a year, index.html is
 * revalidated on every load, anything else for an hour. Any other GET outside /api gets
 * index.html so that a deep link such as /works/12 loads the app, whose router takes it from there.
 */
export function webApp(webRoot: string): Router {
  const root = path.resolve(webRoot);
  const index = path.join(root, 'index.html');
  const router = express.Router();
  router.get('/{*splat}', (req, res) => {
    const file = fileFor(root, req.path);
    if (file && file !== index && isFile(file)) {
      sendVariant(req, res, file, isHashed(req.path) ? immutable : shortLived);
      return;
    }
    if (!isFile(index)) {
      res.status(503).type('text').send('The web app is not built yet: run `npm run build:web`.');
      return;
    }
    sendVariant(req, res, index, 'no-cache');
  });
  return router;
}
