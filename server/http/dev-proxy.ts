import type { RequestHandler } from 'express';
import { createProxyMiddleware } from 'http-proxy-middleware';

/**
 * Development only (`npm run dev`): everything outside /api goes to Expo's dev server, including its
 * live-reload socket, so the page and the API share one origin and the session cookie just works.
 */
export function devWebProxy(target: string): RequestHandler {
  return createProxyMiddleware({ target, changeOrigin: true, ws: true, logger: undefined });
}
