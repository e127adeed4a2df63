/**
 * Page set-up, text styles and building blocks (tables, facts, notes, cautions) of the report.
 * Sizes are in points (1/72 in). A4 for SI projects, US Letter for US-customary projects.
 */
import type { Content, ContentNode, Style } from './types.ts';
import { REPORT_FONT_FAMILY } from './fonts.ts';

export interface PageGeometry {
  readonly pageSize: 'A4' | 'LETTER';
  readonly width: number;
  readonly height: number;
  readonly margins: readonly [number, number, number, number];
  /** Width available to content, points. */
  readonly contentWidth: number;
}

/** Page geometry for a display system: A4 (595.28 × 841.89 pt, ISO 216) or Letter (612 × 792 pt). */
export function pageGeometry(system: 'SI' | 'US'): PageGeometry {
  const margins = [50, 58, 50, 52] as const;
  const [width, height] = system === 'US' ? [612, 792] : [595.28, 841.89];
  return { pageSize: system === 'US' ? 'LETTER' : 'A4', width, height, margins, contentWidth: width - margins[0] - margins[2] };
}

export const COLOURS = {
  ink: '#1b2733',
  muted: '#5b6670',
  rule: '#c5ccd3',
  headerFill: '#e8edf2',
  zebra: '#f6f8fa',
  pass: '#1e7b34',
  fail: '#b3261e',
  warn: '#9a5b00',
  cautionFill: '#fff6e6',
  cautionRule: '#d98e04',
  accent: '#2364aa',
} as const;

export const STYLES: Readonly<Record<string, Style>> = {
  title: { fontSize: 24, bold: true, color: COLOURS.ink, margin: [0, 0, 0, 6] },
  subtitle: { fontSize: 13, color: COLOURS.muted, margin: [0, 0, 0, 18] },
  h1: { fontSize: 15, bold: true, color: COLOURS.ink, margin: [0, 0, 0, 8] },
  h2: { fontSize: 11.5, bold: true, color: COLOURS.accent, margin: [0, 12, 0, 5] },
  h3: { fontSize: 9.5, bold: true, color: COLOURS.ink, margin: [0, 8, 0, 3] },
  body: { fontSize: 9, margin: [0, 0, 0, 5], alignment: 'justify' },
  small: { fontSize: 7.5, color: COLOURS.muted },
  caption: { fontSize: 7.5, color: COLOURS.muted, italics: true, margin: [0, 2, 0, 8] },
  tableHeader: { fontSize: 7.5, bold: true, color: COLOURS.ink },
  table: { fontSize: 7.8 },
  note: { fontSize: 8, color: COLOURS.muted, margin: [0, 2, 0, 4] },
};

export const DEFAULT_STYLE: Style = { font: REPORT_FONT_FAMILY, fontSize: 9, lineHeight: 1.18, color: COLOURS.ink };

/** The caution printed on the cover, at the end of each member and (short form) on every page. */
export const CAUTION_TEXT =
  'The results in this report depend on the assumptions and inputs shown in it. They are to be checked by a qualified engineer before they are relied on, and they defer to the local building code and to licensed professional practice, which take precedence.';

/** Short caution for the page footer. */
export const FOOTER_CAUTION = 'For review by a qualified engineer. Local codes and licensed practice govern.';

/** A table layout: light horizontal rules, header band, optional zebra rows, no vertical rules. */
function tableLayout(headerRows: number, zebra: boolean): ContentNode {
  return {
    hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length ? 0.8 : i === headerRows ? 0.6 : 0.25),
    vLineWidth: () => 0,
    hLineColor: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length || i === headerRows ? COLOURS.ink : COLOURS.rule),
    fillColor: (row: number) => (row < headerRows ? COLOURS.headerFill : zebra && (row - headerRows) % 2 === 1 ? COLOURS.zebra : null),
    paddingLeft: () => 4,
    paddingRight: () => 4,
    paddingTop: () => 2.2,
    paddingBottom: () => 2.2,
  };
}

export interface TableOptions {
  readonly widths: readonly (number | string)[];
  readonly header: readonly Content[];
  readonly rows: readonly (readonly Content[])[];
  readonly zebra?: boolean;
  /** Alignment per column ('left' default). */
  readonly align?: readonly ('left' | 'right' | 'center')[];
  readonly margin?: readonly [number, number, number, number];
}

const cellOf = (c: Content, align: 'left' | 'right' | 'center' | undefined, header: boolean): Content => {
  const base = typeof c === 'string' ? { text: c } : Array.isArray(c) ? { stack: c } : c;
  return { ...(base as ContentNode), ...(align && align !== 'left' ? { alignment: align } : {}), ...(header ? { ...STYLES.tableHeader } : {}) };
};

/**
 * A data table that never splits a row across pages, repeats its header on each page and keeps
 * the header with at least the first row.
 */
export function dataTable(options: TableOptions): ContentNode {
  const header = options.header.map((c, i) => cellOf(c, options.align?.[i], true));
  const rows = options.rows.map((row) => row.map((c, i) => cellOf(c, options.align?.[i], false)));
  return {
    ...STYLES.table,
    margin: options.margin ?? [0, 2, 0, 8],
    table: { headerRows: 1, keepWithHeaderRows: 1, dontBreakRows: true, widths: [...options.widths], body: [header, ...rows] },
    layout: tableLayout(1, options.zebra ?? true),
  };
}

/** A two-column table of labels and values (inputs, properties). Never splits a row. */
export function factsTable(rows: readonly (readonly [string, Content])[], labelWidth: number | string = 150, margin: readonly [number, number, number, number] = [0, 2, 0, 8]): ContentNode {
  return {
    ...STYLES.table,
    margin,
    table: { dontBreakRows: true, widths: [labelWidth, '*'], body: rows.map(([label, value]) => [{ text: label, color: COLOURS.muted }, typeof value === 'string' ? { text: value } : value]) },
    layout: {
      hLineWidth: (i: number, node: { table: { body: unknown[] } }) => (i === 0 || i === node.table.body.length ? 0.6 : 0.25),
      vLineWidth: () => 0,
      hLineColor: () => COLOURS.rule,
      paddingLeft: () => 3,
      paddingRight: () => 3,
      paddingTop: () => 2,
      paddingBottom: () => 2,
    },
  };
}

/** PASS / FAIL in words and colour (the word carries the meaning; the colour only helps). */
export function verdict(pass: boolean | null): ContentNode {
  if (pass === null) return { text: 'n/a', color: COLOURS.muted };
  return { text: pass ? 'PASS' : 'FAIL', bold: true, color: pass ? COLOURS.pass : COLOURS.fail };
}

/** A boxed caution paragraph. */
export function cautionBox(title: string, text: string, margin: readonly [number, number, number, number] = [0, 8, 0, 10]): ContentNode {
  return {
    margin,
    table: {
      widths: ['*'],
      dontBreakRows: true,
      body: [[{ stack: [{ text: title, bold: true, margin: [0, 0, 0, 2] }, { text, alignment: 'justify' }], fontSize: 8.5 }]],
    },
    layout: {
      hLineWidth: () => 0,
      vLineWidth: (i: number) => (i === 0 ? 2.5 : 0),
      vLineColor: () => COLOURS.cautionRule,
      fillColor: () => COLOURS.cautionFill,
      paddingLeft: () => 8,
      paddingRight: () => 8,
      paddingTop: () => 6,
      paddingBottom: () => 6,
    },
  };
}

/** A heading that appears in the table of contents. */
export function heading(text: string, style: 'h1' | 'h2', options: { pageBreak?: boolean; id?: string } = {}): ContentNode {
  return {
    text,
    // Style properties inline rather than by name: pdfmake resolves a named style on every property
    // lookup of every text inside it, which costs about a second in a 500-page report.
    ...STYLES[style],
    tocItem: true,
    tocStyle: style === 'h1' ? { bold: true } : {},
    tocMargin: style === 'h1' ? [0, 5, 0, 0] : [12, 1, 0, 0],
    ...(options.pageBreak ? { pageBreak: 'before' } : {}),
    ...(options.id ? { id: options.id } : {}),
  };
}

/**
 * A second- or third-level heading (kept with what follows by `keepTogether`).
 */
export function h2(text: string): ContentNode {
  return { text, ...STYLES.h2, headlineLevel: 2 };
}

export function h3(text: string): ContentNode {
  return { text, ...STYLES.h3, headlineLevel: 3 };
}

/** A bulleted list in body text. */
export function bullets(items: readonly Content[], margin: readonly [number, number, number, number] = [0, 0, 0, 6]): ContentNode {
  return { ul: [...items], margin, fontSize: 8.5 };
}

/**
 * Keeps a block on one page (a heading with its table or figure), so that no heading ends a page.
 * Only for blocks well below a page in height.
 */
export function keepTogether(items: readonly Content[]): ContentNode {
  return { stack: [...items], unbreakable: true };
}

/** Rows up to which a heading and its table are kept on one page; longer tables may split (header repeated). */
export const KEEP_TOGETHER_ROWS = 18;

/** `keepTogether` when the block has at most KEEP_TOGETHER_ROWS rows, else a plain stack. */
export function small(rows: number, items: readonly Content[]): ContentNode {
  return rows <= KEEP_TOGETHER_ROWS ? keepTogether(items) : { stack: [...items] };
}
