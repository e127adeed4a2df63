/**
 * The Content-Security-Policy for the renderer, sent as an HTTP header both by the Electron
 * custom protocol (app/main/app-protocol.ts) and by the local web server behind `npm start`
 * (build/scripts/web-server.ts). Node-free.
 *
 * Why these directives:
 * - `default-src 'none'` and then only what the UI needs, all from our own origin.
 * - `script-src 'self'`: no inline scripts and no eval (the Vue runtime build needs neither).
 * - `style-src 'self' 'unsafe-inline'`: Vue may insert static markup with `style` attributes
 *   through innerHTML and the dev server injects <style> tags; inline styles cannot run code,
 *   so allowing them is the usual trade-off.
 * - `img-src`/`font-src` allow `data:` and `blob:` for chart images and embedded report fonts.
 * - `worker-src 'self' blob:` for the analysis Web Worker.
 * - `connect-src 'self' data: blob:`: fetch only from our origin; nothing leaves the machine.
 * - `object-src`, `base-uri`, `form-action`, `frame-src`, `frame-ancestors` all 'none'.
 */
export interface CspOptions {
  /**
   * Origin of the Vite dev server (e.g. `http://localhost:5173`) during development only;
   * adds it and its WebSocket to script and connect sources for hot reload.
   */
  readonly devServerOrigin?: string | null;
}

/** The policy as one header value. Deterministic: same options, same string. */
export function contentSecurityPolicy(options: CspOptions = {}): string {
  const dev = options.devServerOrigin ?? null;
  const devSocket = dev === null ? null : dev.replace(/^http/, 'ws');
  const directives: Array<[string, string[]]> = [
    ['default-src', ["'none'"]],
    ['script-src', ["'self'", ...(dev ? [dev] : [])]],
    ['style-src', ["'self'", "'unsafe-inline'", ...(dev ? [dev] : [])]],
    ['img-src', ["'self'", 'data:', 'blob:']],
    ['font-src', ["'self'", 'data:']],
    ['connect-src', ["'self'", 'data:', 'blob:', ...(dev && devSocket ? [dev, devSocket] : [])]],
    ['worker-src', ["'self'", 'blob:']],
    ['manifest-src', ["'self'"]],
    ['object-src', ["'none'"]],
    ['base-uri', ["'none'"]],
    ['form-action', ["'none'"]],
    ['frame-src', ["'none'"]],
    ['frame-ancestors', ["'none'"]],
  ];
  return directives.map(([name, sources]) => `${name} ${sources.join(' ')}`).join('; ');
}

/** Parses a policy string into directive → sources (used by tests and by the server check). */
export function parseContentSecurityPolicy(policy: string): Map<string, string[]> {
  const result = new Map<string, string[]>();
  for (const part of policy.split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) result.set(name.toLowerCase(), sources);
  }
  return result;
}
