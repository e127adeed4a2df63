/**
 * A small static file server for the browser build (out/web), used by `npm start` when the
 * Electron runtime is missing. Listens on 127.0.0.1 only, serves GET/HEAD of known file types
 * under the root (no directory traversal, no hidden files), sends the renderer's CSP and refuses
 * requests whose Host header is not the loopback address it listens on (DNS rebinding).
 */
import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join, resolve, sep } from 'node:path';
import { contentSecurityPolicy } from '../../app/shared/content-security-policy.ts';
import { assetSegments, contentTypeFor } from '../../app/shared/static-assets.ts';

export interface RunningWebServer {
  readonly server: Server;
  readonly port: number;
  /** `http://127.0.0.1:<port>/` */
  readonly url: string;
  close(): Promise<void>;
}

/**
 * The port from HINGELINE_PORT: an integer 0–65535 (0 or unset: any free port).
 * Throws a RangeError naming the bad value.
 */
export function portFromEnvironment(env: Readonly<Record<string, string | undefined>>): number {
  const raw = env.HINGELINE_PORT?.trim();
  if (raw === undefined || raw === '') return 0;
  const port = Number(raw);
  if (!/^\d+$/.test(raw) || !Number.isInteger(port) || port > 65535) {
    throw new RangeError(`HINGELINE_PORT must be a whole number from 0 to 65535, got "${raw}"`);
  }
  return port;
}

function send(response: ServerResponse, status: number, text: string, csp: string): void {
  response.writeHead(status, {
    'content-type': 'text/plain; charset=utf-8',
    'content-security-policy': csp,
    'x-content-type-options': 'nosniff',
  });
  response.end(text);
}

/** The request handler for files under `rootFolder`; `allowedHosts()` lists acceptable Host headers. */
export function createStaticHandler(rootFolder: string, allowedHosts: () => readonly string[], csp = contentSecurityPolicy()) {
  const root = resolve(rootFolder);
  return async (request: IncomingMessage, response: ServerResponse): Promise<void> => {
    if (!allowedHosts().includes((request.headers.host ?? '').toLowerCase())) return send(response, 421, 'Misdirected request', csp);
    if (request.method !== 'GET' && request.method !== 'HEAD') {
      response.setHeader('allow', 'GET, HEAD');
      return send(response, 405, 'Method not allowed', csp);
    }
    let pathname: string;
    try {
      pathname = new URL(request.url ?? '/', 'http://127.0.0.1').pathname;
    } catch {
      return send(response, 400, 'Bad request', csp);
    }
    // Look at the raw path too: URL parsing folds `/a/../b` away before we could refuse it.
    const rawPath = (request.url ?? '/').split(/[?#]/)[0] ?? '/';
    if (/(^|\/)\.\.?(\/|$)|\\|%2e|%2f|%5c/i.test(rawPath)) return send(response, 403, 'Forbidden', csp);
    const segments = assetSegments(pathname);
    if (!segments) return send(response, 403, 'Forbidden', csp);
    const file = join(root, ...segments);
    if (!file.startsWith(root + sep)) return send(response, 403, 'Forbidden', csp);
    const contentType = contentTypeFor(file);
    if (!contentType) return send(response, 403, 'Forbidden', csp);
    let size: number;
    try {
      const info = await stat(file);
      if (!info.isFile()) return send(response, 404, 'Not found', csp);
      size = info.size;
    } catch {
      return send(response, 404, 'Not found', csp);
    }
    response.writeHead(200, {
      'content-type': contentType,
      'content-length': size,
      'content-security-policy': csp,
      'x-content-type-options': 'nosniff',
      'referrer-policy': 'no-referrer',
      'cross-origin-opener-policy': 'same-origin',
      'cache-control': 'no-cache',
    });
    if (request.method === 'HEAD') {
      response.end();
      return;
    }
    createReadStream(file)
      .on('error', () => response.destroy())
      .pipe(response);
  };
}

/** Serves `root` on 127.0.0.1:`port` (0: a free port). Rejects when the port is taken. */
export async function startWebServer(root: string, port: number): Promise<RunningWebServer> {
  let actualPort = port;
  const allowedHosts = (): string[] => [`127.0.0.1:${actualPort}`, `localhost:${actualPort}`];
  const handler = createStaticHandler(root, allowedHosts);
  const server = createServer((request, response) => {
    handler(request, response).catch(() => {
      if (!response.headersSent) send(response, 500, 'Internal error', contentSecurityPolicy());
      else response.destroy();
    });
  });
  await new Promise<void>((resolvePromise, reject) => {
    server.once('error', reject);
    server.listen({ host: '127.0.0.1', port, exclusive: true }, () => {
      server.off('error', reject);
      resolvePromise();
    });
  });
  actualPort = (server.address() as AddressInfo).port;
  return {
    server,
    port: actualPort,
    url: `http://127.0.0.1:${actualPort}/`,
    close: () =>
      new Promise<void>((resolvePromise) => {
        server.close(() => resolvePromise());
        server.closeAllConnections();
      }),
  };
}
