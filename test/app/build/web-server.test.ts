import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { request as httpRequest } from 'node:http';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseContentSecurityPolicy } from '../../../app/shared/content-security-policy.ts';
import { portFromEnvironment, startWebServer, type RunningWebServer } from '../../../build/scripts/web-server.ts';

let outside: string;
let server: RunningWebServer;

beforeAll(async () => {
  outside = await mkdtemp(join(tmpdir(), 'hingeline-web-'));
  const root = join(outside, 'web');
  await mkdir(join(root, 'assets'), { recursive: true });
  await writeFile(join(root, 'index.html'), '<!doctype html><title>Hingeline</title>');
  await writeFile(join(root, 'assets', 'app.js'), 'export {};');
  await writeFile(join(root, 'assets', 'app.css'), 'body{}');
  await writeFile(join(outside, 'secret.json'), '{"secret":true}');
  server = await startWebServer(root, 0);
});
afterAll(async () => {
  await server.close();
  await rm(outside, { recursive: true, force: true });
});

/** A raw request (no URL normalisation by the client), so traversal attempts reach the server as typed. */
function get(path: string, options: { method?: string; host?: string } = {}): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: string }> {
  return new Promise((resolve, reject) => {
    const request = httpRequest(
      { host: '127.0.0.1', port: server.port, path, method: options.method ?? 'GET', headers: { host: options.host ?? `127.0.0.1:${server.port}` } },
      (response) => {
        let body = '';
        response.on('data', (chunk: Buffer) => (body += chunk.toString()));
        response.on('end', () => resolve({ status: response.statusCode ?? 0, headers: response.headers, body }));
      },
    );
    request.on('error', reject);
    request.end();
  });
}

describe('the local web server of npm start', () => {
  it('listens on 127.0.0.1 only', () => {
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
    expect(server.server.address()).toMatchObject({ address: '127.0.0.1' });
  });

  it('serves the app with correct types, the CSP and protective headers', async () => {
    const page = await get('/?demo');
    expect(page.status).toBe(200);
    expect(page.headers['content-type']).toBe('text/html; charset=utf-8');
    expect(parseContentSecurityPolicy(String(page.headers['content-security-policy'])).get('script-src')).toEqual(["'self'"]);
    expect(page.headers['x-content-type-options']).toBe('nosniff');
    expect(page.body).toContain('<title>Hingeline</title>');
    expect((await get('/assets/app.js')).headers['content-type']).toBe('text/javascript; charset=utf-8');
    expect((await get('/assets/app.css')).headers['content-type']).toBe('text/css; charset=utf-8');
  });

  it('never serves anything outside its folder', async () => {
    for (const path of ['/../secret.json', '/assets/../../secret.json', '/%2e%2e/secret.json', '/..%2fsecret.json', '/assets%2f..%2f..%2fsecret.json', '/..\\secret.json']) {
      const response = await get(path);
      expect(response.status, path).toBe(403);
      expect(response.body).not.toContain('secret');
    }
  });

  it('answers 404 for missing files, 403 for folders without index and unknown types, 405 for writes', async () => {
    expect((await get('/missing.js')).status).toBe(404);
    expect((await get('/assets')).status).toBe(403);
    expect((await get('/assets/')).status).toBe(404);
    expect((await get('/index.html', { method: 'POST' })).status).toBe(405);
    const head = await get('/index.html', { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(head.body).toBe('');
  });

  it('refuses requests for other host names (DNS rebinding)', async () => {
    expect((await get('/', { host: 'attacker.example' })).status).toBe(421);
    expect((await get('/', { host: `localhost:${server.port}` })).status).toBe(200);
  });

  it('reports a taken port instead of picking another one', async () => {
    const blocker = createServer();
    await new Promise<void>((resolve) => blocker.listen(0, '127.0.0.1', resolve));
    const port = (blocker.address() as { port: number }).port;
    try {
      await expect(startWebServer(outside, port)).rejects.toMatchObject({ code: 'EADDRINUSE' });
    } finally {
      blocker.close();
    }
  });
});

describe('portFromEnvironment', () => {
  it('reads HINGELINE_PORT, 0 meaning any free port', () => {
    expect(portFromEnvironment({})).toBe(0);
    expect(portFromEnvironment({ HINGELINE_PORT: '' })).toBe(0);
    expect(portFromEnvironment({ HINGELINE_PORT: ' 8080 ' })).toBe(8080);
  });

  it('refuses anything but a whole number from 0 to 65535', () => {
    for (const value of ['-1', '65536', '80.5', 'http', '1e3', 'NaN']) {
      expect(() => portFromEnvironment({ HINGELINE_PORT: value }), value).toThrow(RangeError);
    }
  });
});
