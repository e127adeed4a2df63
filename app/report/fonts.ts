/**
 * Node side of the report fonts (core/report/fonts.ts): where the files are — Roboto shipped by
 * pdfmake, the Noto fallbacks by their @expo-google-fonts packages, all under the SIL Open Font
 * License 1.1 — their metrics for the charts, and the Roboto registration with the chart canvas
 * (used only for PNG charts).
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { REPORT_FONT_FAMILY, REPORT_FONT_FILES, reportFontDescriptors, reportFontFiles, reportFontSet, type FontDescriptor } from '../../core/report/fonts.ts';
import type { ReportFontSet } from '../../core/report/scripts.ts';

const require = createRequire(import.meta.url);
let robotoFolder: string | undefined;

/** Folder holding pdfmake's Roboto TTF files (resolved once). Throws with a clear message when missing. */
export function reportFontDirectory(): string {
  if (robotoFolder) return robotoFolder;
  const folder = join(dirname(require.resolve('pdfmake/package.json')), 'fonts', 'Roboto');
  const missing = Object.values(REPORT_FONT_FILES).filter((file) => !existsSync(join(folder, file)));
  if (missing.length > 0) throw new Error(`The report font is missing from ${folder}: ${missing.join(', ')} (reinstall pdfmake).`);
  robotoFolder = folder;
  return folder;
}

/** Absolute path of a report font file named as in core/report/fonts.ts (a Roboto file name or `package/path`). */
export function reportFontPath(file: string): string {
  if (!file.includes('/')) return join(reportFontDirectory(), file);
  try {
    return require.resolve(file);
  } catch {
    throw new Error(`The report font ${file} is missing (run "npm install").`);
  }
}

/** Absolute paths of every font file the report may embed. */
export function reportFontPaths(): string[] {
  return [...Object.values(REPORT_FONT_FILES).map((file) => reportFontPath(file)), ...reportFontFiles().filter((f) => f.family !== REPORT_FONT_FAMILY).map((f) => reportFontPath(f.file))];
}

/** pdfmake font descriptors with absolute paths. */
export function nodeFontDescriptors(): Record<string, FontDescriptor> {
  return reportFontDescriptors(reportFontPath);
}

let fontSet: ReportFontSet | undefined;

/** The report's font metrics (read once per process). */
export function nodeReportFontSet(): ReportFontSet {
  fontSet ??= reportFontSet((file) => readFileSync(reportFontPath(file)));
  return fontSet;
}

let registered = false;

/** Registers Roboto with @napi-rs/canvas under REPORT_FONT_FAMILY (once per process; PNG charts). */
export async function registerCanvasFonts(): Promise<void> {
  if (registered) return;
  const { GlobalFonts } = await import('@napi-rs/canvas');
  for (const file of [REPORT_FONT_FILES.normal, REPORT_FONT_FILES.bold]) GlobalFonts.registerFromPath(reportFontPath(file), REPORT_FONT_FAMILY);
  registered = true;
}
