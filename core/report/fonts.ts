/**
 * The report font: Roboto (regular, medium, italic, medium italic), which prints every symbol the
 * report uses (σ φ ε Δ √ ‰ ℓ ψ λ μ θ ζ ξ ρ ≤ ≥ × · ² ⁴). The TTF files ship with pdfmake
 * (pdfmake/fonts/Roboto/*.ttf, and base64 in pdfmake/build/vfs_fonts.js for the browser) under the
 * SIL Open Font License 1.1, which permits embedding in documents.
 *
 * The document definition names the family only; each host supplies the files:
 *  - Node (app/report): absolute paths of the TTFs (svg text in charts is drawn through PDFKit,
 *    which opens fonts by path), with pdfmake's local access policy allowing exactly those paths;
 *  - browser: pdfmake's virtual file system (`pdfMake.addVirtualFileSystem(vfs)` with the vfs of
 *    pdfmake/build/vfs_fonts.js), whose keys are the same file names.
 * See docs/report.md.
 */

import { readFontMetrics } from './font-metrics.ts';
import type { FontFamilyMetrics, ReportFontSet } from './scripts.ts';

/** Family name used by the document definition, the charts and the section drawings. */
export const REPORT_FONT_FAMILY = 'Roboto';

/** File name of each style, as in pdfmake's package and virtual file system. */
export const REPORT_FONT_FILES = {
  normal: 'Roboto-Regular.ttf',
  bold: 'Roboto-Medium.ttf',
  italics: 'Roboto-Italic.ttf',
  bolditalics: 'Roboto-MediumItalic.ttf',
} as const;

export type ReportFontStyle = keyof typeof REPORT_FONT_FILES;

/** pdfmake font dictionary entry: one file reference per style. */
export interface FontDescriptor {
  readonly normal: string;
  readonly bold: string;
  readonly italics: string;
  readonly bolditalics: string;
}

/**
 * Fallback fonts for names in scripts Roboto does not cover (scripts.ts picks the font per piece):
 * Noto Sans Hebrew, Noto Sans Arabic, Noto Emoji (monochrome) and Noto Sans Math (symbols), TTF files from the
 * @expo-google-fonts packages, under the SIL Open Font License 1.1 (embedding permitted; the PDF
 * embeds subsets). Regular and medium weights; italics print upright. Keys are the family names used
 * in the document definition and the charts' SVG.
 */
export const FALLBACK_FONTS = {
  NotoSansHebrew: { package: '@expo-google-fonts/noto-sans-hebrew', normal: '400Regular/NotoSansHebrew_400Regular.ttf', bold: '500Medium/NotoSansHebrew_500Medium.ttf' },
  NotoSansArabic: { package: '@expo-google-fonts/noto-sans-arabic', normal: '400Regular/NotoSansArabic_400Regular.ttf', bold: '500Medium/NotoSansArabic_500Medium.ttf' },
  NotoEmoji: { package: '@expo-google-fonts/noto-emoji', normal: '400Regular/NotoEmoji_400Regular.ttf', bold: '500Medium/NotoEmoji_500Medium.ttf' },
  // Arrows (→ ⇒), geometric shapes (▲) and combining marks over Latin letters (f̄c: a cluster the
  // report font cannot draw whole goes to the first font that can). Last: it also
  // has Arabic letters, which it cannot join. One weight only: bold prints regular.
  NotoSansMath: { package: '@expo-google-fonts/noto-sans-math', normal: '400Regular/NotoSansMath_400Regular.ttf', bold: '400Regular/NotoSansMath_400Regular.ttf' },
} as const;

export type FallbackFamily = keyof typeof FALLBACK_FONTS;

/** Every font file the report may embed, as `package/path` (the fallbacks) or a pdfmake Roboto file name. */
export function reportFontFiles(): { readonly family: string; readonly style: 'normal' | 'bold'; readonly file: string }[] {
  return [
    { family: REPORT_FONT_FAMILY, style: 'normal', file: REPORT_FONT_FILES.normal },
    { family: REPORT_FONT_FAMILY, style: 'bold', file: REPORT_FONT_FILES.bold },
    ...Object.entries(FALLBACK_FONTS).flatMap(([family, f]) => [
      { family, style: 'normal' as const, file: `${f.package}/${f.normal}` },
      { family, style: 'bold' as const, file: `${f.package}/${f.bold}` },
    ]),
  ];
}

/**
 * pdfmake font descriptors of the report font. `locate` maps a file name (REPORT_FONT_FILES) to
 * what the host's pdfmake opens: an absolute path in Node, the file name itself in the browser
 * (default), where the files live in the virtual file system.
 */
export function reportFontDescriptors(locate: (fileName: string) => string = (name) => name): Record<string, FontDescriptor> {
  const fallbacks = Object.fromEntries(Object.entries(FALLBACK_FONTS).map(([family, f]) => {
    const normal = locate(`${f.package}/${f.normal}`);
    const bold = locate(`${f.package}/${f.bold}`);
    return [family, { normal, bold, italics: normal, bolditalics: bold }];
  }));
  return {
    [REPORT_FONT_FAMILY]: {
      normal: locate(REPORT_FONT_FILES.normal),
      bold: locate(REPORT_FONT_FILES.bold),
      italics: locate(REPORT_FONT_FILES.italics),
      bolditalics: locate(REPORT_FONT_FILES.bolditalics),
    },
    ...fallbacks,
  };
}

/**
 * The report's font set for measuring and choosing fonts (scripts.ts), from the font files' bytes
 * keyed as in `reportFontFiles()`. Throws when a file is missing or not a font.
 */
export function reportFontSet(bytes: (file: string) => Uint8Array): ReportFontSet {
  const family = (name: string, normal: string, bold: string): FontFamilyMetrics => {
    const read = (file: string) => {
      try {
        return readFontMetrics(bytes(file));
      } catch (error) {
        throw new Error(`The report font ${file} cannot be read: ${error instanceof Error ? error.message : String(error)}`);
      }
    };
    return { family: name, normal: read(normal), bold: read(bold) };
  };
  return {
    primary: family(REPORT_FONT_FAMILY, REPORT_FONT_FILES.normal, REPORT_FONT_FILES.bold),
    fallbacks: Object.entries(FALLBACK_FONTS).map(([name, f]) => family(name, `${f.package}/${f.normal}`, `${f.package}/${f.bold}`)),
  };
}
