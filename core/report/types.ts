/**
 * Inputs of the report builder and the minimal pdfmake document-definition types it produces.
 * pdfmake is not imported in core: the document definition is plain data plus a few pure callback
 * functions (header, footer, table rules), which pdfmake calls while laying out pages.
 */
import type { ChartSpec } from '../charts/types.ts';
import type { ProjectResults } from '../analysis.ts';
import type { Project } from '../project/types.ts';
import type { ReportFontSet } from './scripts.ts';

export interface ReportMeta {
  /** Version of the program that produced the report, e.g. `0.1.0`. */
  readonly softwareVersion: string;
  /** Hash of the project file the results came from (SHA-256, hex), so a reviewer can tie the report to its input. */
  readonly projectHash: string;
  /** Date and time of the report, ISO 8601 (passed in: core has no clock). */
  readonly generatedOn: string;
}

export interface ReportInput {
  readonly project: Project;
  readonly results: ProjectResults;
  /** Members to report, in project order (default: every member). */
  readonly memberIds?: readonly string[];
  /**
   * Rendered figures by id (see `reportCharts`): a PNG data URL (`data:image/png;base64,…`) or an
   * SVG document. A figure that is missing is replaced by a note saying so.
   */
  readonly images: Readonly<Record<string, string>>;
  readonly meta: ReportMeta;
  /**
   * The report's fonts with their metrics (core/report/fonts.ts `reportFontSet`). When given, text the
   * report font cannot print (Hebrew, Arabic, emoji in names) is set in the fallback fonts and
   * right-to-left text is put in visual order (scripts.ts); the host must register the same families
   * with pdfmake (`reportFontDescriptors`).
   */
  readonly fonts?: ReportFontSet;
  /**
   * Whether the host draws charts from figure programs (core/report/figure-pdf.ts): true when it
   * has installed `installFigureDrawing` (core/report/pdfmake-figures.ts) on the pdfmake it calls.
   * Charts given as the recording canvas's SVG then go to the PDF as drawing operators instead of
   * through pdfmake's SVG reader. Default false: svg nodes.
   */
  readonly chartPrograms?: boolean;
}

/** A figure the document needs: a chart to draw from its spec, or a ready SVG drawing. Sizes in points. */
export type ReportFigure =
  | { readonly kind: 'chart'; readonly spec: ChartSpec; readonly width: number; readonly height: number }
  | { readonly kind: 'svg'; readonly svg: string; readonly width: number; readonly height: number; readonly caption: string };

// ---- pdfmake document definition (the subset used) ---------------------------------------------

/** A content node of a pdfmake document: text, stack, columns, table, svg, image, canvas… */
export type Content = string | ContentNode | readonly Content[];

export interface ContentNode {
  readonly [property: string]: unknown;
}

export interface Style {
  readonly font?: string;
  readonly fontSize?: number;
  readonly bold?: boolean;
  readonly italics?: boolean;
  readonly color?: string;
  readonly fillColor?: string;
  readonly lineHeight?: number;
  readonly margin?: readonly [number, number, number, number];
  readonly alignment?: 'left' | 'right' | 'center' | 'justify';
}

export interface DocumentInfo {
  readonly title: string;
  readonly author: string;
  readonly subject: string;
  readonly keywords: string;
  readonly creator: string;
  readonly producer: string;
}

export interface DocumentDefinition {
  readonly pageSize: 'A4' | 'LETTER';
  readonly pageOrientation: 'portrait';
  readonly pageMargins: readonly [number, number, number, number];
  /**
   * Document properties. `creationDate` is absent: core has no Date; the host sets
   * `info.creationDate = new Date(meta.generatedOn)` before calling pdfmake (a fixed date gives
   * byte-identical files).
   */
  readonly info: DocumentInfo & { creationDate?: unknown };
  readonly content: Content[];
  readonly header: (currentPage: number, pageCount: number) => Content | null;
  readonly footer: (currentPage: number, pageCount: number) => Content | null;
  readonly styles: Readonly<Record<string, Style>>;
  readonly defaultStyle: Style;
  /** PNG data URLs and figure programs by image id (other SVG figures are inline `svg` nodes). */
  readonly images: Record<string, string>;
  readonly compress: boolean;
}
