import type { WebContents } from 'electron';
import { describe, expect, it, vi } from 'vitest';
import {
  APP_ENTRY_URL,
  APP_SCHEME,
  denyPermissionCheck,
  denyPermissionRequest,
  devServerOrigin,
  hardenWebContents,
  isTrustedSender,
  privilegedSchemes,
  windowOptions,
  windowTitle,
} from '../../../app/main/security.ts';

describe('windowOptions (Electron security checklist)', () => {
  const options = windowOptions({ preloadPath: '/app/out/preload/index.cjs', devTools: false });
  const web = options.webPreferences ?? {};

  it('isolates the page: context isolation, sandbox, no Node integration anywhere', () => {
    expect(web.contextIsolation).toBe(true);
    expect(web.sandbox).toBe(true);
    expect(web.nodeIntegration).toBe(false);
    expect(web.nodeIntegrationInWorker).toBe(false);
    expect(web.nodeIntegrationInSubFrames).toBe(false);
  });

  it('keeps web security on and refuses insecure content, experimental features and <webview>', () => {
    expect(web.webSecurity).toBe(true);
    expect(web.allowRunningInsecureContent).toBe(false);
    expect(web.experimentalFeatures).toBe(false);
    expect(web.enableBlinkFeatures).toBeUndefined();
    expect(web.webviewTag).toBe(false);
    expect(web.navigateOnDragDrop).toBe(false);
  });

  it('uses the given preload, hides DevTools in production and waits for ready-to-show', () => {
    expect(web.preload).toBe('/app/out/preload/index.cjs');
    expect(web.devTools).toBe(false);
    expect(windowOptions({ preloadPath: '/p', devTools: true }).webPreferences?.devTools).toBe(true);
    expect(options.show).toBe(false);
  });
});

describe('the app scheme', () => {
  it('is registered standard and secure with fetch, without CSP bypass, CORS or service workers', () => {
    const [scheme] = privilegedSchemes();
    expect(scheme?.scheme).toBe(APP_SCHEME);
    expect(scheme?.privileges).toMatchObject({ standard: true, secure: true, supportFetchAPI: true });
    expect(scheme?.privileges?.bypassCSP).toBeUndefined();
    expect(scheme?.privileges?.corsEnabled).toBeUndefined();
    expect(scheme?.privileges?.allowServiceWorkers).toBeUndefined();
    expect(APP_ENTRY_URL).toBe('hingeline-app://app/index.html');
  });
});

describe('isTrustedSender', () => {
  const top = (url: string) => ({ url, parent: null });

  it('trusts the top frame of our page', () => {
    expect(isTrustedSender(top('hingeline-app://app/index.html'))).toBe(true);
    expect(isTrustedSender(top('hingeline-app://app/index.html#/members/2'))).toBe(true);
  });

  it('refuses other hosts of our scheme, other schemes, sub-frames, detached and missing frames', () => {
    expect(isTrustedSender(top('hingeline-app://evil/index.html'))).toBe(false);
    expect(isTrustedSender(top('file:///app/out/renderer/index.html'))).toBe(false);
    expect(isTrustedSender(top('https://example.com/'))).toBe(false);
    expect(isTrustedSender({ url: 'hingeline-app://app/index.html', parent: {} })).toBe(false);
    expect(isTrustedSender({ url: 'hingeline-app://app/index.html', parent: null, detached: true })).toBe(false);
    expect(isTrustedSender(null)).toBe(false);
    expect(isTrustedSender(undefined)).toBe(false);
    expect(isTrustedSender(top('not a url'))).toBe(false);
  });

  it('trusts the dev server only when its origin is given, and only that exact origin', () => {
    expect(isTrustedSender(top('http://localhost:5173/'))).toBe(false);
    expect(isTrustedSender(top('http://localhost:5173/'), 'http://localhost:5173')).toBe(true);
    expect(isTrustedSender(top('http://localhost:5174/'), 'http://localhost:5173')).toBe(false);
  });
});

describe('devServerOrigin', () => {
  it('is used only unpackaged and only for loopback http', () => {
    expect(devServerOrigin({ ELECTRON_RENDERER_URL: 'http://localhost:5173/' }, false)).toBe('http://localhost:5173');
    expect(devServerOrigin({ ELECTRON_RENDERER_URL: 'http://127.0.0.1:5173' }, false)).toBe('http://127.0.0.1:5173');
    expect(devServerOrigin({ ELECTRON_RENDERER_URL: 'http://localhost:5173/' }, true)).toBeNull();
    expect(devServerOrigin({ ELECTRON_RENDERER_URL: 'https://example.com/' }, false)).toBeNull();
    expect(devServerOrigin({ ELECTRON_RENDERER_URL: 'http://192.168.1.5:5173/' }, false)).toBeNull();
    expect(devServerOrigin({}, false)).toBeNull();
  });
});

describe('permissions and navigation', () => {
  it('refuses every permission request and check', () => {
    for (const permission of ['media', 'notifications', 'clipboard-read', 'geolocation', 'openExternal']) {
      const callback = vi.fn();
      denyPermissionRequest({}, permission, callback);
      expect(callback).toHaveBeenCalledWith(false);
    }
    expect(denyPermissionCheck()).toBe(false);
  });

  it('blocks navigation, frame navigation, redirects and webviews, and denies new windows', () => {
    const listeners = new Map<string, (event: { preventDefault(): void }) => void>();
    let openHandler: (() => unknown) | null = null;
    const contents = {
      on: (name: string, listener: (event: { preventDefault(): void }) => void) => listeners.set(name, listener),
      setWindowOpenHandler: (handler: () => unknown) => (openHandler = handler),
    };
    hardenWebContents(contents as unknown as WebContents);
    for (const name of ['will-navigate', 'will-frame-navigate', 'will-redirect', 'will-attach-webview']) {
      const event = { preventDefault: vi.fn() };
      listeners.get(name)?.(event);
      expect(event.preventDefault, name).toHaveBeenCalledOnce();
    }
    expect(openHandler).not.toBeNull();
    expect(openHandler!()).toEqual({ action: 'deny' });
  });
});

describe('windowTitle', () => {
  it('marks unsaved changes with a bullet except on macOS (which marks the close button)', () => {
    expect(windowTitle({ title: 'Beam B1', dirty: false }, 'linux')).toBe('Beam B1 — Hingeline');
    expect(windowTitle({ title: 'Beam B1', dirty: true }, 'win32')).toBe('• Beam B1 — Hingeline');
    expect(windowTitle({ title: 'Beam B1', dirty: true }, 'darwin')).toBe('Beam B1 — Hingeline');
    expect(windowTitle({ title: '  ', dirty: false }, 'linux')).toBe('Hingeline');
  });
});
