/**
 * Answers requests for `hingeline-app://app/…` with files of the built renderer and the strict
 * Content-Security-Policy header. Node-only, no Electron import: `protocol.handle` takes the
 * returned function, and tests call it with plain `Request` objects.
 */
import { readFile, stat } from 'node:fs/promises';
import { join, resolve, sep } from 'node:path';
import { assetSegments, contentTypeFor } from '../shared/static-assets.ts';
import { APP_HOST, APP_SCHEME } from './security.ts';

function textResponse(status: number, text: string, csp: string): Response {
  return new Response(text, {
    status,
    headers: { 'content-type': 'text/plain; charset=utf-8', 'content-security-policy': csp, 'x-content-type-options': 'nosniff' },
  });
}

/**
 * A `protocol.handle` handler serving files under `rootFolder`. Only GET and HEAD on host `app`;
 * paths outside the root, hidden files and unknown file types are refused.
 */
export function createAppProtocolHandler(rootFolder: string, csp: string): (request: Request) => Promise<Response> {
  const root = resolve(rootFolder);
  return async (request) => {
    let url: URL;
    try {
      url = new URL(request.url);
    } catch {
      return textResponse(400, 'Bad request', csp);
    }
    if (url.protocol !== `${APP_SCHEME}:` || url.host !== APP_HOST) return textResponse(404, 'Not found', csp);
    if (request.method !== 'GET' && request.method !== 'HEAD') return textResponse(405, 'Method not allowed', csp);
    const segments = assetSegments(url.pathname);
    if (!segments) return textResponse(403, 'Forbidden', csp);
    const file = join(root, ...segments);
    // Defence in depth: the segments cannot climb, but never serve anything outside the root.
    if (!file.startsWith(root + sep)) return textResponse(403, 'Forbidden', csp);
    const contentType = contentTypeFor(file);
    if (!contentType) return textResponse(403, 'Forbidden', csp);
    try {
      if (!(await stat(file)).isFile()) return textResponse(404, 'Not found', csp);
      const body = await readFile(file);
      return new Response(request.method === 'HEAD' ? null : new Uint8Array(body), {
        status: 200,
        headers: {
          'content-type': contentType,
          'content-length': String(body.byteLength),
          'content-security-policy': csp,
          'x-content-type-options': 'nosniff',
          'cache-control': 'no-cache',
        },
      });
    } catch {
      return textResponse(404, 'Not found', csp);
    }
  };
}
