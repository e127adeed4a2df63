import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAppProtocolHandler } from '../../../app/main/app-protocol.ts';

let outside: string;
let root: string;
let handler: (request: Request) => Promise<Response>;
const CSP = "default-src 'none'; script-src 'self'";

beforeAll(async () => {
  outside = await mkdtemp(join(tmpdir(), 'hingeline-protocol-'));
  root = join(outside, 'renderer');
  await mkdir(join(root, 'assets'), { recursive: true });
  await writeFile(join(root, 'index.html'), '<!doctype html><title>t</title>');
  await writeFile(join(root, 'assets', 'index-1.js'), 'console.log(1)');
  await writeFile(join(root, '.secret.json'), '{}');
  await writeFile(join(root, 'tool.exe'), 'MZ');
  await writeFile(join(outside, 'private.json'), '{"secret":true}');
  handler = createAppProtocolHandler(root, CSP);
});
afterAll(async () => {
  await rm(outside, { recursive: true, force: true });
});

const get = (url: string, method = 'GET') => handler(new Request(url, { method }));

describe('the hingeline-app:// protocol handler', () => {
  it('serves index.html for the root with the CSP header and nosniff', async () => {
    const response = await get('hingeline-app://app/');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(response.headers.get('content-security-policy')).toBe(CSP);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(await response.text()).toBe('<!doctype html><title>t</title>');
  });

  it('serves scripts with a JavaScript type (module scripts require it)', async () => {
    const response = await get('hingeline-app://app/assets/index-1.js');
    expect(response.headers.get('content-type')).toBe('text/javascript; charset=utf-8');
    expect(await response.text()).toBe('console.log(1)');
  });

  it('never serves files outside the renderer folder', async () => {
    for (const path of ['/%2e%2e/private.json', '/..%2Fprivate.json', '/assets/%2e%2e/%2e%2e/private.json']) {
      const response = await get(`hingeline-app://app${path}`);
      // Refused outright (403), or the URL parser folded the dots and nothing is there (404).
      expect([403, 404], path).toContain(response.status);
      expect(await response.text()).not.toContain('secret');
    }
  });

  it('refuses hidden files and unknown file types, and answers 404 for missing files', async () => {
    expect((await get('hingeline-app://app/.secret.json')).status).toBe(403);
    expect((await get('hingeline-app://app/tool.exe')).status).toBe(403);
    expect((await get('hingeline-app://app/missing.js')).status).toBe(404);
    expect((await get('hingeline-app://app/assets')).status).toBe(403);
  });

  it('answers only host "app" and only GET and HEAD', async () => {
    expect((await get('hingeline-app://other/index.html')).status).toBe(404);
    expect((await get('hingeline-app://app/index.html', 'POST')).status).toBe(405);
    const head = await get('hingeline-app://app/index.html', 'HEAD');
    expect(head.status).toBe(200);
    expect(await head.text()).toBe('');
  });
});
