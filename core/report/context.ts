/**
 * What the chapters of the report share while the document is written: the project, the plan of
 * chapters and figures, the number formatter, the reference list and the image store.
 */
import type { SupportType } from '../member/definition.ts';
import type { Project } from '../project/types.ts';
import type { ReportPlan } from './figures.ts';
import type { ReportFormatter } from './format.ts';
import type { PageGeometry } from './layout.ts';
import { COLOURS, STYLES } from './layout.ts';
import type { ReferenceList } from './references.ts';
import { figureProgram } from './figure-pdf.ts';
import type { Content, ContentNode, ReportFigure } from './types.ts';

export interface WriteContext {
  readonly project: Project;
  readonly plan: ReportPlan;
  readonly f: ReportFormatter;
  readonly refs: ReferenceList;
  readonly page: PageGeometry;
  /** Rendered figures supplied by the caller. */
  readonly images: Readonly<Record<string, string>>;
  /** PNG images and figure programs the document embeds, by id (filled while writing). */
  readonly documentImages: Record<string, string>;
  /** Whether the host draws charts from figure programs (ReportInput.chartDrawing). */
  readonly chartPrograms: boolean;
}

export const SUPPORT_WORDS: Readonly<Record<SupportType, string>> = {
  'simply-supported': 'simply supported',
  cantilever: 'cantilever (fixed at x = 0, free at x = L)',
  'fixed-fixed': 'fixed at both ends',
  'propped-cantilever': 'propped cantilever (fixed at x = 0, pinned at x = L)',
};

/**
 * A figure by id: an image node (PNG data URL, embedded once in the document; or a chart's figure
 * program when the host draws those), an svg node, or a visible note when the caller did not supply
 * it. Chart notes are printed underneath.
 */
export function figureNode(ctx: WriteContext, id: string | null, caption?: string): Content[] {
  if (id === null) return [];
  const figure = ctx.plan.figures[id];
  if (!figure) return [];
  const supplied = ctx.images[id] ?? (figure.kind === 'svg' ? figure.svg : undefined);
  const out: Content[] = [];
  if (supplied && /^data:image\/(png|jpeg);base64,/.test(supplied)) {
    ctx.documentImages[id] = supplied;
    out.push({ image: id, width: figure.width, height: figure.height, alignment: 'center' });
  } else if (supplied && /^\s*(<\?xml[^>]*\?>\s*)?<svg[\s>]/.test(supplied)) {
    // A chart the recording canvas drew goes to the PDF directly where the host can (figure-pdf.ts).
    const program = ctx.chartPrograms && figure.kind === 'chart' ? figureProgram(supplied) : null;
    if (program) {
      ctx.documentImages[id] = program;
      out.push({ image: id, width: figure.width, height: figure.height, alignment: 'center' });
      return withNotes(figure, out, caption);
    }
    out.push({ svg: supplied, width: figure.width, height: figure.height, alignment: 'center' });
  } else {
    out.push({
      table: { widths: [figure.width - 10], heights: [Math.min(figure.height, 60)], body: [[{ text: `Figure "${id}" was not supplied to the report builder.`, color: COLOURS.fail, alignment: 'center', margin: [0, 20, 0, 0] }]] },
      layout: { hLineColor: () => COLOURS.rule, vLineColor: () => COLOURS.rule },
      alignment: 'center',
    } satisfies ContentNode);
  }
  return withNotes(figure, out, caption);
}

/** `out` with the chart's notes and the caption underneath. */
function withNotes(figure: ReportFigure, out: Content[], caption: string | undefined): Content[] {
  const notes = figure.kind === 'chart' ? figure.spec.notes : [];
  for (const note of notes) out.push({ text: note, ...STYLES.note });
  const text = caption ?? (figure.kind === 'svg' ? figure.caption : '');
  if (text) out.push({ text, ...STYLES.caption, alignment: 'center' });
  return out;
}

/** Inline text giving the page of an anchor, e.g. `page 12`. */
export function pageOf(anchor: string): ContentNode {
  return { text: '00', pageReference: anchor };
}

/**
 * A drawing with its facts table: side by side when the drawing leaves room, else the drawing above
 * the table (wide sections).
 */
export function drawingWithFacts(ctx: WriteContext, drawingId: string, facts: Content): ContentNode {
  const width = ctx.plan.figures[drawingId]?.width ?? 200;
  if (width > ctx.page.contentWidth * 0.6) return { stack: [...figureNode(ctx, drawingId), facts] };
  return { columns: [{ width, stack: figureNode(ctx, drawingId) }, { width: '*', stack: [facts] }], columnGap: 10 };
}
