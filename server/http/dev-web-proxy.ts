import { type RequestHandler } from 'express';

/**
 * `npm run dev` only: passes everything outside /api to Expo's dev server, so the app and the
 * API share one origin (and its cookie) just as they do in production.
 */
export async function devWebProxy(target: string): Promise<RequestHandler> {
  const { createProxyMiddleware } = await import('http-proxy-middleware');
  return createProxyMiddleware({ target, changeOrigin: true, ws: true });
}
