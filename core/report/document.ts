/**
 * The review report as a pdfmake document definition: cover (project, people, code basis, units,
 * software version, project-file hash), contents, project summary, the method (with its
 * limitations), one chapter per section (drawing, materials, moment–curvature, key points, strain
 * and stress profiles), one chapter per member (inputs, method statement, load–deflection, moment
 * and curvature along the span, hinges and ductility, service deflections, strength, warnings and
 * limitations, caution), and the references. Headers and footers carry the project number,
 * revision and "page x of y"; every page carries the caution in short form.
 *
 * Pure: no pdfmake import, no Date, nothing Node- or browser-specific. The host renders the
 * figures listed by `reportCharts` (core/report/figures.ts), passes them as `images`, sets
 * `info.creationDate`, registers the report font (core/report/fonts.ts) and calls pdfmake.
 */
import { SUPPORT_WORDS, type WriteContext } from './context.ts';
import { planReport, type ReportPlan } from './figures.ts';
import { displaySystem, reportFormatter, type ReportFormatter } from './format.ts';
import { CAUTION_TEXT, COLOURS, DEFAULT_STYLE, FOOTER_CAUTION, STYLES, cautionBox, dataTable, factsTable, h3, heading, pageGeometry, verdict, type PageGeometry } from './layout.ts';
import { memberChapter, statusCell } from './member.ts';
import { strengtheningSummary } from './existing.ts';
import { continuousChapter, continuousSummary } from './continuous.ts';
import { methodChapter } from './method.ts';
import { ReferenceList } from './references.ts';
import { withFonts } from './scripts.ts';
import { sectionChapter } from './sections.ts';
import type { Content, ContentNode, DocumentDefinition, ReportInput } from './types.ts';
import type { MemberResult } from '../assessment/results.ts';
import { serviceOutsideRange } from '../member/small-deflection.ts';

/** `2026-03-14T09:30:00Z` → `2026-03-14 09:30 UTC` (text only; any other text is printed as given). */
export function printableDate(iso: string): string {
  const m = /^(\d{4}-\d{2}-\d{2})(?:T(\d{2}:\d{2})(?::\d{2}(?:\.\d+)?)?(Z|[+-]\d{2}:?\d{2})?)?$/.exec(iso.trim());
  if (!m) return iso;
  if (!m[2]) return m[1]!;
  const zone = !m[3] ? '' : m[3] === 'Z' ? ' UTC' : ` UTC${m[3]}`;
  return `${m[1]} ${m[2]}${zone}`;
}

function cover(input: ReportInput, plan: ReportPlan, page: PageGeometry): Content[] {
  const { info } = input.project;
  const reported = plan.members.length;
  const total = input.project.members.length;
  const units = displaySystem(info.unitSystem) === 'SI' ? 'SI (mm, m, kN, kN·m, MPa)' : 'US customary (in, ft, kip, kip·ft, psi, ksi)';
  const signature = (role: string, name: string): Content => ({
    stack: [
      { text: role, color: COLOURS.muted, fontSize: 8 },
      { text: name || '—', bold: true, margin: [0, 1, 0, 22] },
      { canvas: [{ type: 'line', x1: 0, y1: 0, x2: (page.contentWidth - 30) / 2, y2: 0, lineWidth: 0.5, lineColor: COLOURS.muted }] },
      { text: 'signature and date', color: COLOURS.muted, fontSize: 7, margin: [0, 2, 0, 0] },
    ],
  });
  return [
    { text: 'HINGELINE', color: COLOURS.accent, bold: true, fontSize: 9, characterSpacing: 2, margin: [0, 40, 0, 6] },
    { text: 'Reinforced-concrete beam assessment', ...STYLES.title },
    { text: info.name, ...STYLES.subtitle },
    factsTable([
      ['Project', info.name],
      ['Project number', info.number || '—'],
      ['Description', info.description || '—'],
      ['Engineer', info.engineer || '—'],
      ['Checker', info.checker || '—'],
      ['Revision', info.revision || '—'],
      ['Project date', info.date || '—'],
      ['Code basis', info.codeBasis],
      ['Unit system', units],
      ['Members in this report', `${reported} of ${total}`],
      ['Software', `Hingeline ${input.meta.softwareVersion}`],
      ['Project file (SHA-256)', { text: input.meta.projectHash || '—', fontSize: 7.5 }],
      ['Report generated', printableDate(input.meta.generatedOn)],
    ], 140, [0, 0, 0, 14]),
    cautionBox('Caution', CAUTION_TEXT, [0, 0, 0, 30]),
    { columns: [signature('Prepared by', info.engineer), signature('Checked by', info.checker)], columnGap: 30 },
  ];
}

function summary(plan: ReportPlan, f: ReportFormatter): Content[] {
  const count = (status: MemberResult['status']) => plan.members.filter((m) => m.result?.status === status).length;
  const n = plan.members.length;
  const rows: Content[][] = plan.members.map(({ definition, result, anchor }) => {
    const worstService = result?.service?.checks.reduce<(typeof result.service.checks)[number] | null>((worst, c) => (!worst || c.utilisation > worst.utilisation ? c : worst), null) ?? null;
    const warningCount = (result?.warnings.length ?? 0) + (result?.errors.length ?? 0);
    return [
      { stack: [{ text: definition.name, bold: true }, { text: ['page ', { text: '00', pageReference: anchor }], fontSize: 6.8, color: COLOURS.muted }] },
      { stack: [{ text: f.span(definition.span) }, { text: SUPPORT_WORDS[definition.supports].replace(/ \(.*\)$/, ''), fontSize: 6.8, color: COLOURS.muted }] },
      result?.strength ? { stack: [{ text: f.fixed(result.strength.utilisation, 2) }, verdict(result.strength.pass)] } : '—',
      worstService ? { stack: [{ text: serviceOutsideRange(result!.service, result!.span) ? 'outside the method\'s range' : `${f.fixed(worstService.utilisation, 2)} (ℓ/${worstService.ratio})` }, verdict(result!.service!.checks.every((c) => c.pass))] } : '—',
      f.number(result?.ductility.displacementDuctility),
      statusCell(result?.status ?? null),
      {
        stack: [
          { text: result ? f.say(result.governingMode) : 'No analysis result was supplied for this member.', fontSize: 7 },
          ...(warningCount > 0 ? [{ text: `${warningCount} warning${warningCount === 1 ? '' : 's'} or error${warningCount === 1 ? '' : 's'}: see the member's chapter.`, fontSize: 6.8, color: COLOURS.warn }] : []),
        ],
      },
    ];
  });
  return [
    heading('Project summary', 'h1', { pageBreak: true }),
    {
      text: `${n} member${n === 1 ? '' : 's'} reported: ${count('ok')} pass every check, ${count('check-fails')} fail a check, ${count('brittle')} are brittle (every check passes, but the member would fail without warning), ${count('not-converged')} did not converge, ${count('input-error')} have input errors${plan.members.some((m) => !m.result) ? `, ${plan.members.filter((m) => !m.result).length} have no result` : ''}. Utilisation is demand over capacity (strength) or deflection over its limit (the worst deflection check); μΔ is the displacement ductility.`,
      ...STYLES.body,
    },
    dataTable({
      widths: [44, 62, 40, 56, 30, 54, '*'],
      header: ['Member', 'Span, supports', 'Strength', 'Deflection', 'μΔ', 'Status', 'Governing mode'],
      align: ['left', 'left', 'center', 'center', 'right', 'left', 'left'],
      rows,
    }),
    ...strengtheningSummary(plan.members),
    ...continuousSummary(plan.continuous, f),
    h3('Conventions'),
    {
      ul: [
        'Strains and stresses are positive in compression; sagging moments and curvatures are positive (compression at the top); loads and deflections are positive downward.',
        'Positions x are measured along the span from the left support (the fixed end of a cantilever); depths are measured down from the top fibre of the section.',
        'λ is the load factor on the load–deflection pattern: λ = 1 is the full unfactored service load of the pattern.',
        `Numbers are shown in ${f.system === 'SI' ? 'SI' : 'US customary'} units, rounded to three significant figures (four when the first digit is 1) unless stated.`,
      ],
      fontSize: 8.5,
    },
  ];
}

/** Where a source is cited, shortened: "every member" instead of a list of all of them. */
function citedIn(usedIn: readonly string[], plan: ReportPlan): string {
  const members = plan.members.map((m) => `member ${m.definition.name}`);
  const sections = plan.sections.map((s) => `section ${s.definition.name}`);
  const allMembers = members.length > 1 && members.every((m) => usedIn.includes(m));
  const allSections = sections.length > 1 && sections.every((s) => usedIn.includes(s));
  return [
    ...(usedIn.includes('method') ? ['method'] : []),
    ...(allSections ? ['every section'] : usedIn.filter((u) => u.startsWith('section '))),
    ...(allMembers ? ['every member'] : usedIn.filter((u) => u.startsWith('member '))),
  ].join(', ');
}

function references(refs: ReferenceList, plan: ReportPlan): Content[] {
  const list = refs.list();
  return [
    heading('References', 'h1', { pageBreak: true }),
    { text: 'Every standard and publication the reported analyses used, numbered in order of first citation. Clause numbers refer to the edition listed.', ...STYLES.body },
    list.length === 0
      ? { text: 'No references were cited.', ...STYLES.body }
      : dataTable({
        widths: [18, '*', 120, 90],
        header: ['No.', 'Reference', 'Cited for', 'Cited in'],
        rows: list.map((r) => [`[${r.number}]`, r.citation, { text: r.notes.join('; '), fontSize: 7 }, { text: citedIn(r.usedIn, plan), fontSize: 7 }]),
      }),
  ];
}

/**
 * Builds the pdfmake document definition of the review report.
 * Units: results in internal units (N, mm, N·mm, 1/mm); everything printed in the project's unit
 * system with its unit. Deterministic: the same input gives the same definition.
 * Degenerate cases: a member without a result, or with input errors, gets a chapter that lists its
 * inputs and errors; a figure missing from `images` is replaced by a visible note.
 */
export function buildReportDocument(input: ReportInput): DocumentDefinition {
  const { project, meta } = input;
  const system = displaySystem(project.info.unitSystem);
  const page = pageGeometry(system);
  const f = reportFormatter(system);
  const plan = planReport(input);
  const refs = new ReferenceList();
  const documentImages: Record<string, string> = {};

  const ctx: WriteContext = { project, plan, f, refs, page, images: input.images, documentImages, chartPrograms: input.chartPrograms === true };
  // Chapters are written in reading order, so references are numbered in order of first citation.
  const method = methodChapter(ctx);
  const sections = plan.sections.flatMap((section) => sectionChapter(ctx, section));
  const members = [...plan.members.flatMap((member) => memberChapter(ctx, member)), ...plan.continuous.flatMap((member) => continuousChapter(ctx, member))];
  const info = project.info;
  const content: Content[] = [
    ...cover(input, plan, page),
    { toc: { title: { text: 'Contents', ...STYLES.h1 }, numberStyle: { color: COLOURS.muted } }, pageBreak: 'before' },
    ...summary(plan, f),
    ...method,
    ...sections,
    ...members,
    ...references(refs, plan),
  ];
  // A new node on every call: pdfmake annotates nodes while laying them out, so none may be shared.
  const rule = (): ContentNode => ({ canvas: [{ type: 'line', x1: 0, y1: 0, x2: page.contentWidth, y2: 0, lineWidth: 0.4, lineColor: COLOURS.rule }] });
  const fonts = input.fonts;
  // Names in scripts the report font lacks, and right-to-left text: fallback fonts, visual order.
  const scripted = <T,>(c: T): T => (fonts ? withFonts(c, fonts) : c);
  return {
    pageSize: page.pageSize,
    pageOrientation: 'portrait',
    pageMargins: page.margins,
    info: {
      title: `${info.name}: reinforced-concrete beam assessment`,
      author: info.engineer,
      subject: `${info.codeBasis} assessment of ${plan.members.length} member${plan.members.length === 1 ? '' : 's'}, project ${info.number}, revision ${info.revision}`,
      keywords: 'moment–curvature, load–deflection, plastic hinge, ductility, deflection',
      creator: `Hingeline ${meta.softwareVersion}`,
      producer: `Hingeline ${meta.softwareVersion}`,
    },
    content: scripted(content),
    header: (currentPage: number) => (currentPage === 1 ? null : scripted<Content>({
      margin: [page.margins[0], 24, page.margins[2], 0],
      stack: [
        {
          columns: [
            { text: info.name, bold: true, fontSize: 8 },
            { text: `${info.codeBasis} · ${system === 'SI' ? 'SI units' : 'US customary units'}`, alignment: 'right', fontSize: 7.5, color: COLOURS.muted },
          ],
        },
        { ...rule(), margin: [0, 4, 0, 0] },
      ],
    })),
    footer: (currentPage: number, pageCount: number) => scripted<Content>({
      margin: [page.margins[0], 14, page.margins[2], 0],
      stack: [
        rule(),
        {
          margin: [0, 4, 0, 0],
          columns: [
            { text: `Project ${info.number || '—'} · revision ${info.revision || '—'}`, fontSize: 7.5, width: 120 },
            { text: FOOTER_CAUTION, fontSize: 6.8, color: COLOURS.muted, alignment: 'center', width: '*' },
            { text: `Page ${currentPage} of ${pageCount}`, fontSize: 7.5, alignment: 'right', width: 80 },
          ],
        },
      ],
    }),
    styles: STYLES,
    defaultStyle: DEFAULT_STYLE,
    images: documentImages,
    compress: true,
  };
}

export { reportCharts } from './figures.ts';
