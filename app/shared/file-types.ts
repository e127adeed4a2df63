/**
 * File names and types the desktop host reads and writes. Node-free.
 *
 * Projects are JSON text saved with the extension `.hingeline`. A single extension of our own
 * (rather than `.hingeline.json`) is what Windows, macOS and Linux can all associate with the
 * application for double-click opening; Windows and macOS only look at the last extension.
 * Plain `.json` files (including `name.hingeline.json`) can still be opened.
 */
export const PROJECT_EXTENSION = '.hingeline';

/** Extensions (without dot) accepted by the open dialog. */
export const PROJECT_OPEN_EXTENSIONS = ['hingeline', 'json'] as const;

/** MIME type registered for project files (Linux desktop association). */
export const PROJECT_MIME_TYPE = 'application/x-hingeline-project+json';

export interface ExportType {
  readonly mime: string;
  readonly extension: string;
  readonly label: string;
}

/** The only kinds of file the renderer may ask the host to export. */
export const EXPORT_TYPES: readonly ExportType[] = [
  { mime: 'application/pdf', extension: '.pdf', label: 'PDF document' },
  { mime: 'text/csv', extension: '.csv', label: 'CSV table' },
  { mime: 'application/json', extension: '.json', label: 'JSON data' },
  { mime: 'text/plain', extension: '.txt', label: 'Text' },
  { mime: 'image/png', extension: '.png', label: 'PNG image' },
  { mime: 'image/svg+xml', extension: '.svg', label: 'SVG image' },
];

/** The export type for `mime`, or null when the host does not export that type. */
export function exportTypeFor(mime: string): ExportType | null {
  return EXPORT_TYPES.find((type) => type.mime === mime) ?? null;
}

/** Last segment of a POSIX or Windows path ('' for an empty path). */
export function baseName(path: string): string {
  const parts = path.split(/[\\/]/);
  return parts[parts.length - 1] ?? '';
}

/**
 * Replaces characters that are not allowed in file names on any of Windows, macOS or Linux
 * (and control characters) with '-', trims dots and spaces at the ends, and falls back to
 * `fallback` when nothing is left. Keeps the result to at most 200 characters before the extension.
 */
export function sanitizeFileName(name: string, fallback = 'Untitled'): string {
  const cleaned = name.replace(/[<>:"/\\|?*\u0000-\u001f\u007f]/g, '-').replace(/^[\s.]+|[\s.]+$/g, '');
  const reserved = /^(con|prn|aux|nul|com\d|lpt\d)(\..*)?$/i;
  const safe = cleaned.length === 0 || reserved.test(cleaned) ? fallback : cleaned;
  return safe.slice(0, 200);
}

/** True when `name` ends with `extension`, ignoring case. */
export function hasExtension(name: string, extension: string): boolean {
  return name.toLowerCase().endsWith(extension.toLowerCase());
}

/**
 * `name` with the project extension: `Beam B1` → `Beam B1.hingeline`,
 * `Beam B1.hingeline.json` → `Beam B1.hingeline`, `Beam B1.json` → `Beam B1.hingeline`.
 */
export function withProjectExtension(name: string): string {
  const stem = name.replace(/(\.hingeline)?(\.json)?$/i, '');
  return `${stem.length > 0 ? stem : 'Untitled'}${PROJECT_EXTENSION}`;
}

/** `name` ending in `extension` (appended unless already present, case-insensitive). */
export function withExtension(name: string, extension: string): string {
  return hasExtension(name, extension) ? name : `${name}${extension}`;
}

/** True for names the open dialog accepts as projects (`.hingeline` or `.json`). */
export function isProjectFileName(name: string): boolean {
  return PROJECT_OPEN_EXTENSIONS.some((extension) => hasExtension(name, `.${extension}`));
}
