/** The report's font files for tests (read from the installed packages, as the Node host does). */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { reportFontSet } from '../../../core/report/fonts.ts';
import type { ReportFontSet } from '../../../core/report/scripts.ts';

const require = createRequire(import.meta.url);

/** Bytes of a report font file named as in core/report/fonts.ts. */
export function fontBytes(file: string): Uint8Array {
  const path = file.includes('/') ? require.resolve(file) : join(dirname(require.resolve('pdfmake/package.json')), 'fonts', 'Roboto', file);
  return readFileSync(path);
}

let cached: ReportFontSet | undefined;

/** The report's font set (Roboto and the Noto fallbacks). */
export function testFontSet(): ReportFontSet {
  cached ??= reportFontSet(fontBytes);
  return cached;
}
