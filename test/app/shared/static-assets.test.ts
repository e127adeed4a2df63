import { describe, expect, it } from 'vitest';
import { assetSegments, contentTypeFor } from '../../../app/shared/static-assets.ts';

describe('assetSegments', () => {
  it('maps the root and folder paths to index.html', () => {
    expect(assetSegments('/')).toEqual(['index.html']);
    expect(assetSegments('/docs/')).toEqual(['docs', 'index.html']);
  });

  it('maps asset paths to their segments, decoding percent-escapes', () => {
    expect(assetSegments('/assets/index-AbC123.js')).toEqual(['assets', 'index-AbC123.js']);
    expect(assetSegments('/fonts/Roboto%20Medium.ttf')).toEqual(['fonts', 'Roboto Medium.ttf']);
  });

  it('refuses every way of climbing out of the root', () => {
    for (const path of ['/../package.json', '/assets/../../x', '/%2e%2e/x', '/..%2fx', '/a/%2e%2e%2f%2e%2e/x', '/..\\x', '/a%5c..%5cx']) {
      expect(assetSegments(path), path).toBeNull();
    }
  });

  it('refuses hidden files, empty segments, drive letters, NUL and broken escapes', () => {
    for (const path of ['/.env', '/assets/.git/config', '//etc/passwd', '/C:/Windows/win.ini', '/a%00.js', '/%E0%A4%A', 'relative.js']) {
      expect(assetSegments(path), path).toBeNull();
    }
  });
});

describe('contentTypeFor', () => {
  it('gives the types a Vite build emits, with charset for text', () => {
    expect(contentTypeFor('index.html')).toBe('text/html; charset=utf-8');
    expect(contentTypeFor('a.JS')).toBe('text/javascript; charset=utf-8');
    expect(contentTypeFor('a.css')).toBe('text/css; charset=utf-8');
    expect(contentTypeFor('f.woff2')).toBe('font/woff2');
    expect(contentTypeFor('i.svg')).toBe('image/svg+xml');
  });

  it('has no type for unknown or missing extensions (such files are not served)', () => {
    expect(contentTypeFor('run.exe')).toBeNull();
    expect(contentTypeFor('Makefile')).toBeNull();
  });
});
