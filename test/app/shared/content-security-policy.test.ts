import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, parseContentSecurityPolicy } from '../../../app/shared/content-security-policy.ts';

describe('contentSecurityPolicy', () => {
  const policy = parseContentSecurityPolicy(contentSecurityPolicy());

  it('denies everything by default and allows scripts only from our own origin (no inline, no eval)', () => {
    expect(policy.get('default-src')).toEqual(["'none'"]);
    expect(policy.get('script-src')).toEqual(["'self'"]);
  });

  it('never allows unsafe-eval, wildcards or remote http(s) sources in production', () => {
    const text = contentSecurityPolicy();
    expect(text).not.toContain('unsafe-eval');
    expect(text).not.toMatch(/(^|\s)\*(\s|;|$)/);
    expect(text).not.toMatch(/https?:/);
  });

  it('blocks plugins, base-tag hijacking, form posts and framing', () => {
    for (const directive of ['object-src', 'base-uri', 'form-action', 'frame-src', 'frame-ancestors']) {
      expect(policy.get(directive), directive).toEqual(["'none'"]);
    }
  });

  it('allows what the UI needs: images and fonts from data URLs, a worker, fetch only to itself', () => {
    expect(policy.get('img-src')).toEqual(["'self'", 'data:', 'blob:']);
    expect(policy.get('font-src')).toEqual(["'self'", 'data:']);
    expect(policy.get('worker-src')).toEqual(["'self'", 'blob:']);
    expect(policy.get('connect-src')).toEqual(["'self'", 'data:', 'blob:']);
  });

  it('adds the dev server and its WebSocket only when given a dev server origin', () => {
    const dev = parseContentSecurityPolicy(contentSecurityPolicy({ devServerOrigin: 'http://localhost:5173' }));
    expect(dev.get('script-src')).toEqual(["'self'", 'http://localhost:5173']);
    expect(dev.get('connect-src')).toContain('ws://localhost:5173');
    expect(contentSecurityPolicy({ devServerOrigin: null })).toBe(contentSecurityPolicy());
  });
});
