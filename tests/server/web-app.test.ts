import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';

import pino from 'pino';
import request from 'supertest';

import { createApp } from '@/server/app';
import { createContext } from '@/server/context';
import { webApp } from '@/server/http/web-app';

import { openTestDatabase } from './helpers/test-database';

const bundle = '/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js';
const font = '/assets/fonts/Body-Regular.0123456789abcdef0123456789abcdef.woff2';
const indexHtml = '<!doctype html><title>Saggar</title>';

// Each copy says which file it is, so a test can tell which one went out once it is decoded.
function writeWithCopies(root: string, urlPath: string, text: string) {
  const file = path.join(root, urlPath);
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, text);
  fs.writeFileSync(`${file}.br`, zlib.brotliCompressSync(`${text} /* br */`));
  fs.writeFileSync(`${file}.gz`, zlib.gzipSync(`${text} /* gz */`));
}

/** The real app over a temporary folder laid out like `expo export`'s, plus compressed copies. */
async function appOver(files: 'built' | 'empty' = 'built') {
  const root = fs.mkdtempSync(path.join(os.tmpdir(), 'saggar-web-'));
  if (files === 'built') {
    writeWithCopies(root, '/index.html', indexHtml);
    writeWithCopies(root, bundle, 'console.log(1)');
    fs.mkdirSync(path.join(root, path.dirname(font)), { recursive: true });
    fs.writeFileSync(path.join(root, font), 'wOF2');
    fs.writeFileSync(path.join(root, 'metadata.json'), '{}');
  }
  const db = await openTestDatabase();
  return createApp(
    createContext({
      db,
      logger: pino({ level: 'silent' }),
      secret: 'test-secret-that-is-long-enough-for-better-auth',
      web: webApp(root),
      trustedOrigins: [],
      filesDir: path.join(root, 'files'),
    }),
  );
}

describe('the web app', () => {
  it('serves index.html for deep links and assets as files, but not for /api', async () => {
    const app = await appOver();
    for (const deepLink of ['/', '/works/12', '/venues/3', '/sign-in']) {
      const res = await request(app).get(deepLink);
      expect(res.status).toBe(200);
      expect(res.text).toContain('<title>Saggar</title>');
    }
    const asset = await request(app).get(bundle).set('Accept-Encoding', 'identity');
    expect(asset.text).toBe('console.log(1)');
    const api = await request(app).get('/api/no-such-resource/12');
    expect(api.status).toBe(404);
    expect(api.body.error.code).toBe('not_found');
  });

  it('answers 503 in plain text while the app is not built', async () => {
    const app = await appOver('empty');
    const res = await request(app).get('/works/12');
    expect(res.status).toBe(503);
    expect(res.headers['content-type']).toMatch(/^text\/plain/);
    expect(res.text).toBe('The web app is not built yet: run `npm run build:web`.');
  });

  it('never serves a file from outside the export', async () => {
    const app = await appOver();
    const res = await request(app).get('/..%2f..%2fetc%2fpasswd');
    expect(res.status).toBe(200);
    expect(res.text).toContain('<title>Saggar</title>');
  });
});

// Content codings and their negotiation: RFC 9110 §8.4 (Content-Encoding) and §12.5.3
// (Accept-Encoding, where a coding with q=0 is refused); Vary: RFC 9110 §12.5.5.
describe('compressed copies', () => {
  it('sends the brotli copy to a browser that accepts br, with the type of the original', async () => {
    const app = await appOver();
    for (const accept of ['br', 'gzip, deflate, br, zstd', 'br;q=1, gzip;q=0.8']) {
      const res = await request(app).get(bundle).set('Accept-Encoding', accept);
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe('br');
      expect(res.headers['content-type']).toBe('text/javascript; charset=utf-8');
      expect(res.headers.vary).toBe('Accept-Encoding');
      expect(res.text).toBe('console.log(1) /* br */');
    }
  });

  it('sends the gzip copy when only gzip is accepted', async () => {
    const app = await appOver();
    for (const accept of ['gzip, deflate', 'br;q=0, gzip', 'gzip;q=1, br;q=0.5']) {
      const res = await request(app).get(bundle).set('Accept-Encoding', accept);
      expect(res.headers['content-encoding']).toBe('gzip');
      expect(res.headers['content-type']).toBe('text/javascript; charset=utf-8');
      expect(res.headers.vary).toBe('Accept-Encoding');
      expect(res.text).toBe('console.log(1) /* gz */');
    }
  });

  it('sends the original, still varying on Accept-Encoding, when neither is accepted', async () => {
    const app = await appOver();
    for (const accept of ['identity', 'deflate', 'br;q=0, gzip;q=0', '']) {
      const res = await request(app).get(bundle).set('Accept-Encoding', accept);
      expect(res.headers['content-encoding']).toBeUndefined();
      expect(res.headers.vary).toBe('Accept-Encoding');
      expect(res.headers['content-length']).toBe(String('console.log(1)'.length));
      expect(res.text).toBe('console.log(1)');
    }
  });

  it('compresses index.html for deep links too', async () => {
    const app = await appOver();
    const res = await request(app).get('/works/12').set('Accept-Encoding', 'gzip, br');
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(res.headers.vary).toBe('Accept-Encoding');
    expect(res.text).toBe(`${indexHtml} /* br */`);
  });

  it('sends a file that has no copies as it is, without Vary', async () => {
    const app = await appOver();
    const res = await request(app).get(font).set('Accept-Encoding', 'br, gzip');
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.headers['content-type']).toBe('font/woff2');
    expect(res.headers.vary).toBeUndefined();
    expect(res.text ?? res.body.toString()).toBe('wOF2');
  });
});

// Cache-Control directives: RFC 9111 §5.2.2 (max-age, no-cache, public) and RFC 8246 (immutable).
describe('caching', () => {
  it('keeps content-hashed files for a year, as immutable', async () => {
    const app = await appOver();
    for (const file of [bundle, font]) {
      const res = await request(app).get(file);
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    }
  });

  it('revalidates index.html on every load, however it is reached', async () => {
    const app = await appOver();
    for (const url of ['/', '/index.html', '/works/12', '/venues/3/edit']) {
      const res = await request(app).get(url);
      expect(res.headers['cache-control']).toBe('no-cache');
      expect(res.text).toBe(`${indexHtml} /* gz */`);
    }
  });

  it('keeps other files that carry no hash for an hour', async () => {
    const app = await appOver();
    const res = await request(app).get('/metadata.json');
    expect(res.headers['cache-control']).toBe('public, max-age=3600');
    expect(res.body).toEqual({});
  });
});
