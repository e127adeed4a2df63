/**
 * Node side of the report font (core/report/fonts.ts): where the Roboto TTF files are (shipped by
 * pdfmake under the SIL Open Font License 1.1) and their registration with the chart canvas.
 */
import { existsSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { GlobalFonts } from '@napi-rs/canvas';
import { REPORT_FONT_FAMILY, REPORT_FONT_FILES, reportFontDescriptors, type FontDescriptor } from '../../core/report/fonts.ts';

let fontDirectory: string | undefined;

/** Folder holding pdfmake's Roboto TTF files (resolved once). Throws with a clear message when missing. */
export function reportFontDirectory(): string {
  if (fontDirectory) return fontDirectory;
  const require = createRequire(import.meta.url);
  const packageJson = require.resolve('pdfmake/package.json');
  const folder = join(dirname(packageJson), 'fonts', 'Roboto');
  const missing = Object.values(REPORT_FONT_FILES).filter((file) => !existsSync(join(folder, file)));
  if (missing.length > 0) throw new Error(`The report font is missing from ${folder}: ${missing.join(', ')} (reinstall pdfmake).`);
  fontDirectory = folder;
  return folder;
}

/** Absolute paths of the four font files. */
export function reportFontPaths(): string[] {
  const folder = reportFontDirectory();
  return Object.values(REPORT_FONT_FILES).map((file) => join(folder, file));
}

/** pdfmake font descriptors with absolute paths. */
export function nodeFontDescriptors(): Record<string, FontDescriptor> {
  const folder = reportFontDirectory();
  return reportFontDescriptors((file) => join(folder, file));
}

let registered = false;

/** Registers the report font with @napi-rs/canvas under REPORT_FONT_FAMILY (once per process). */
export function registerCanvasFonts(): void {
  if (registered) return;
  const folder = reportFontDirectory();
  for (const file of [REPORT_FONT_FILES.normal, REPORT_FONT_FILES.bold]) {
    GlobalFonts.registerFromPath(join(folder, file), REPORT_FONT_FAMILY);
  }
  registered = true;
}
