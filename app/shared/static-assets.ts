/**
 * Mapping URL paths to files of the built renderer, shared by the Electron custom protocol and
 * the local web server. Node-free: callers join the returned segments onto their root folder.
 */

const CONTENT_TYPES: Readonly<Record<string, string>> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.jpg': 'image/jpeg',
  '.jpeg': 'image/jpeg',
  '.gif': 'image/gif',
  '.webp': 'image/webp',
  '.ico': 'image/x-icon',
  '.woff': 'font/woff',
  '.woff2': 'font/woff2',
  '.ttf': 'font/ttf',
  '.otf': 'font/otf',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
  '.webmanifest': 'application/manifest+json',
  '.hingeline': 'application/json; charset=utf-8',
};

/** The Content-Type for a file name by its extension, or null for types we do not serve. */
export function contentTypeFor(fileName: string): string | null {
  const dot = fileName.lastIndexOf('.');
  if (dot < 0) return null;
  return CONTENT_TYPES[fileName.slice(dot).toLowerCase()] ?? null;
}

/**
 * The path segments under the asset root for a URL pathname, or null when the path must not be
 * served: undecodable percent-escapes, `..` or `.` segments, empty segments, backslashes, colons
 * (drive letters, alternate data streams), NUL or other control characters, and hidden files
 * (segments starting with a dot). `/` and paths ending in `/` map to `index.html`.
 */
export function assetSegments(pathname: string): string[] | null {
  if (!pathname.startsWith('/')) return null;
  let decoded: string;
  try {
    decoded = decodeURIComponent(pathname);
  } catch {
    return null;
  }
  if (/[\\:\u0000-\u001f\u007f]/.test(decoded)) return null;
  const segments = decoded.slice(1).split('/');
  if (segments[segments.length - 1] === '') segments[segments.length - 1] = 'index.html';
  for (const segment of segments) {
    if (segment.length === 0 || segment.startsWith('.')) return null;
  }
  return segments;
}
