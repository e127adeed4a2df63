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
 * pdfmake font descriptors of the report font. `locate` maps a file name (REPORT_FONT_FILES) to
 * what the host's pdfmake opens: an absolute path in Node, the file name itself in the browser
 * (default), where the files live in the virtual file system.
 */
export function reportFontDescriptors(locate: (fileName: string) => string = (name) => name): Record<string, FontDescriptor> {
  return {
    [REPORT_FONT_FAMILY]: {
      normal: locate(REPORT_FONT_FILES.normal),
      bold: locate(REPORT_FONT_FILES.bold),
      italics: locate(REPORT_FONT_FILES.italics),
      bolditalics: locate(REPORT_FONT_FILES.bolditalics),
    },
  };
}
