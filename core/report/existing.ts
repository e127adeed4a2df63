/**
 * Existing beams in the report: for a member with an as-found condition or strengthening schemes,
 * a part of its chapter with the tested strengths and their statistics (the method named), the
 * steel data, the defects and what each did, the section as found, each scheme's inputs and
 * drawing with the FRP design values and the substrate strain at installation, the variants on
 * shared moment–curvature and load–deflection charts, the comparison table (core/charts
 * variant-table.ts, the app's own rows) with the strengthening method's code checks, the governing
 * mode before and after, and the shear diagram along the span. The project summary lists which
 * members need strengthening and the scheme the engineer marked preferred.
 *
 * Every number comes from the results (RetrofitResult, ShearResult) and is only formatted here.
 */
import { needsStrengthening, type RetrofitResult } from '../assessment/results.ts';
import { variantComparisonTable, type ComparisonCell } from '../charts/variant-table.ts';
import type { MemberDefinition } from '../project/types.ts';
import { asFoundStrengthUse } from '../retrofit/in-place-strength.ts';
import type { WriteContext } from './context.ts';
import { figureNode } from './context.ts';
import type { ExistingMember, ExistingPlan } from './existing-plan.ts';
import { bullets, COLOURS, dataTable, factsTable, h2, h3, keepTogether, small, STYLES, verdict } from './layout.ts';
import type { Content, ContentNode } from './types.ts';

/**
 * A sentence of the results as the report font can print it: the font has no arrow and no
 * combining macron, so `a → b` reads `a to b` and the mean strength f̄c reads fc,mean.
 */
function printable(text: string): string {
  return text.replace(/\s*→\s*/g, ' to ').replace(/f̄c/g, 'fc,mean');
}

const cellContent = (c: ComparisonCell): Content => {
  const main: ContentNode = c.verdict === undefined ? { text: c.text } : { text: c.text, ...(c.verdict === 'fail' ? { color: COLOURS.fail, bold: true } : c.status === 'ok' || c.verdict === 'pass' ? { color: COLOURS.pass } : {}) };
  return c.detail ? { stack: [main, { text: c.detail, fontSize: 6.8, color: c.verdict === 'fail' ? COLOURS.fail : COLOURS.muted }] } : main;
};

function asFoundInputs(ctx: WriteContext, retrofit: RetrofitResult, plan: ExistingPlan): Content[] {
  const { f, project } = ctx;
  const summary = retrofit.asFound;
  if (!summary) return [{ text: 'No as-found condition is given: the schemes are compared with the beam as designed.', ...STYLES.body }];
  const aci = project.info.codeBasis === 'ACI 318-19';
  const name = (id: string) => project.materials.find((m) => m.id === id)?.name ?? id;
  const out: Content[] = [];
  if (summary.concrete.length > 0) {
    out.push(small(summary.concrete.length + 2, [
      h3('Tested concrete strength (cores)'),
      dataTable({
        widths: ['*', 24, 50, 30, 44, 30, 56, 50],
        header: ['Concrete', 'n', 'Mean fc,mean (behaviour)', 'V', 's', aci ? 'K' : 'kn', aci ? 'f′c,eq (code checks)' : 'fck,is (code checks)', 'Specified'],
        align: ['left', 'right', 'right', 'right', 'right', 'right', 'right', 'right'],
        rows: summary.concrete.map((c) => [name(c.concreteId), String(c.cores.count), f.concreteStress(c.cores.meanStrength), f.fixed(c.cores.coefficientOfVariation, 3), f.concreteStress(c.inPlace.standardDeviation), f.fixed(c.inPlace.factor, 3), { text: f.concreteStress(c.inPlace.strength), bold: true }, f.concreteStress(c.specifiedStrength)]),
      }),
      bullets(summary.concrete.map((c) => ({ text: [{ text: `${name(c.concreteId)}: `, bold: true }, `${c.inPlace.method}. ${printable(f.say(c.inPlace.formula))}${c.note ? ` — ${c.note}` : ''}` ], fontSize: 7.5 }))),
      { text: printable(asFoundStrengthUse(project.info.codeBasis)), ...STYLES.body, fontSize: 7.5 },
    ]));
  }
  if (summary.steel.length > 0) {
    out.push(small(summary.steel.length + 2, [
      h3('Steel'),
      dataTable({
        widths: ['*', 90, 50, 50, 44],
        header: ['Steel replaced', 'Source', 'fy', 'fu', 'εsu'],
        align: ['left', 'left', 'right', 'right', 'right'],
        rows: summary.steel.map((s) => [{ stack: [{ text: name(s.steelId) }, ...(s.note ? [{ text: s.note, fontSize: 6.8, color: COLOURS.muted }] : [])] }, s.source === 'coupons' ? 'coupon tests' : 'era of construction', f.stress(s.yieldStress), f.stress(s.ultimateStress), s.ruptureStrain === null ? 'library value' : f.number(s.ruptureStrain)]),
      }),
    ]));
  }
  if (summary.defects.length > 0) {
    out.push(keepTogether([h3('Defects and what they did'), bullets(summary.defects.map((d) => ({ text: [{ text: d.kind === 'section-loss' ? 'Bar section loss: ' : 'Cover loss: ', bold: true }, `${printable(f.say(d.effect))}${d.note ? ` (${d.note})` : ''}`] })))]));
  }
  for (const drawing of plan.asFound) out.push(keepTogether(figureNode(ctx, drawing.figure)));
  if (summary.notes) out.push({ text: `Survey notes: ${summary.notes}`, ...STYLES.note });
  return out;
}

function schemeInputs(ctx: WriteContext, retrofit: RetrofitResult, plan: ExistingPlan): Content[] {
  const { f } = ctx;
  if (retrofit.schemes.length === 0) return [{ text: 'No strengthening scheme is given.', ...STYLES.body }];
  return retrofit.schemes.map((s) => {
    const facts: [string, Content][] = [['What it adds', printable(f.say(s.description))]];
    if (s.frp) {
      const d = s.frp;
      facts.push(
        ['FRP: Ef, ε*fu, CE, εfu', `${f.modulus(d.tensileModulus)}, ${f.number(d.manufacturerRuptureStrain)}, ${f.fixed(d.environmentalFactor, 2)}, ${f.number(d.designRuptureStrain)}`],
        ['Strain limit (ACI 440.2R-17)', `${f.number(d.limitStrain)} (${d.limitCause === 'frp-debonding' ? 'debonding εfd' : 'rupture cap 0.9εfu'}); ${printable(f.say(d.formula))}`],
      );
    }
    for (const inst of s.installation) {
      facts.push([`Strain at installation, ${inst.baseSectionId}`, `${f.moment(inst.moment)} at ${f.span(inst.position)}; ${printable(f.say(inst.formula))}`]);
    }
    const drawing = plan.schemes.find((d) => d.schemeId === s.schemeId);
    return keepTogether([
      h3(`Scheme: ${s.name}`),
      factsTable(facts, 120),
      ...(drawing ? figureNode(ctx, drawing.figure) : []),
      ...(s.errors.length > 0 ? [bullets(s.errors.map((e) => ({ text: [{ text: 'Input error ', bold: true, color: COLOURS.fail }, `${e.path}: ${printable(f.say(e.message))}`] })))] : []),
    ]);
  });
}

function comparison(ctx: WriteContext, definition: MemberDefinition, retrofit: RetrofitResult, plan: ExistingPlan): Content[] {
  const { f, project } = ctx;
  const table = variantComparisonTable(retrofit, f.system, project.info.codeBasis);
  if (table.variants.length < 2) return [];
  const preferred = (key: string) => (definition.preferredSchemeId === key ? ' (preferred)' : '');
  const results = table.rows.filter((r) => r.group === 'results');
  const checks = table.rows.filter((r) => r.group === 'checks');
  const label = (r: (typeof table.rows)[number]): Content => ({ stack: [{ text: r.label }, { text: r.hint, fontSize: 6.8, color: COLOURS.muted }] });
  const width = Math.max(54, Math.floor((ctx.page.contentWidth - 120) / table.variants.length) - 6);
  const rows: Content[][] = [
    ...results.map((r) => [label(r), ...r.cells.map(cellContent)]),
    ...(checks.length > 0 ? [[{ text: 'Code checks of the strengthening method', bold: true, colSpan: table.variants.length + 1 }, ...table.variants.map(() => '')]] : []),
    ...checks.map((r) => [label(r), ...r.cells.map(cellContent)]),
  ];
  return [
    keepTogether([h3('Comparison of the beam as it stands with each scheme'), ...(plan.momentCurvature ? figureNode(ctx, plan.momentCurvature) : [])]),
    ...(plan.loadDeflection ? [keepTogether(figureNode(ctx, plan.loadDeflection))] : []),
    small(rows.length, [
      { text: `Resistance at section ${table.baseSectionId}, ${table.direction}: where the strength check of the beam as it stands governs.`, ...STYLES.note },
      dataTable({
        widths: ['*', ...table.variants.map(() => width)],
        header: ['', ...table.variants.map((v) => `${v.label}${preferred(v.key)}`)],
        align: ['left', ...table.variants.map(() => 'right' as const)],
        rows,
      }),
    ]),
    keepTogether([
      h3('Governing mode, before and after'),
      bullets(table.variants.map((v) => ({ text: [{ text: `${v.label}${preferred(v.key)}: `, bold: true }, printable(f.say(v.variant.governingMode))] }))),
    ]),
    ...(retrofit.schemes.some((s) => s.comparison)
      ? [keepTogether([h3('What each scheme changes'), bullets(retrofit.schemes.filter((s) => s.comparison).map((s) => ({ text: printable(f.say(s.comparison!.statement)) })))])]
      : []),
  ];
}

/** The existing-beam part of a member's chapter (nothing for a member that is not an existing beam). */
export function existingChapter(ctx: WriteContext, member: ExistingMember): Content[] {
  const { definition, result } = member;
  const plan = member.existing;
  if (!plan || !result?.retrofit) return [];
  const retrofit = result.retrofit;
  const preferred = definition.preferredSchemeId ? retrofit.schemes.find((s) => s.schemeId === definition.preferredSchemeId) : undefined;
  const verdictText = needsStrengthening(result)
    ? `The beam as it stands (${retrofit.basis === 'as-found' ? 'as found' : 'as designed'}) fails a check: it needs strengthening. ${preferred ? `Preferred scheme: ${preferred.name}${preferred.variant ? `, ${preferred.variant.status === 'ok' ? 'which passes every check' : 'which still fails a check'}` : ''}.` : 'No scheme is marked preferred.'}`
    : `The beam as it stands (${retrofit.basis === 'as-found' ? 'as found' : 'as designed'}) ${result.status === 'ok' ? 'passes every check' : 'has no complete result'}.${preferred ? ` Preferred scheme: ${preferred.name}.` : ''}`;
  const [first, ...rest] = asFoundInputs(ctx, retrofit, plan);
  return [
    keepTogether([
      h2('Existing beam: as found and strengthening'),
      { text: verdictText, ...STYLES.body },
      { text: retrofit.caution, ...STYLES.note },
      ...(first ? [first] : []),
    ]),
    ...rest,
    ...schemeInputs(ctx, retrofit, plan),
    ...comparison(ctx, definition, retrofit, plan),
    ...(plan.shear ? [keepTogether([h3('Shear along the span'), ...figureNode(ctx, plan.shear)])] : []),
  ];
}

/**
 * The project summary's list of existing beams: whether each needs strengthening (as it stands),
 * the schemes analysed, and the scheme the engineer marked preferred with its status. Empty when
 * no reported member is an existing beam.
 */
export function strengtheningSummary(members: readonly ExistingMember[]): Content[] {
  const existing = members.filter((m) => m.existing !== null && m.result?.retrofit);
  if (existing.length === 0) return [];
  const rows: Content[][] = existing.map(({ definition, result }) => {
    const retrofit = result!.retrofit!;
    const preferred = definition.preferredSchemeId ? retrofit.schemes.find((s) => s.schemeId === definition.preferredSchemeId) : undefined;
    const needed = needsStrengthening(result!);
    return [
      { text: definition.name, bold: true },
      retrofit.basis === 'as-found' ? 'as found' : 'as designed',
      needed ? { text: 'yes', bold: true, color: COLOURS.fail } : result!.status === 'ok' ? 'no' : 'no result',
      String(retrofit.schemes.length),
      preferred ? preferred.name : needed ? { text: 'none marked', color: COLOURS.warn } : '—',
      preferred?.variant ? verdict(preferred.variant.status === 'ok') : '—',
    ];
  });
  const need = existing.filter((m) => needsStrengthening(m.result!)).length;
  return [
    keepTogether([
      h3('Existing beams: strengthening'),
      { text: `${existing.length} existing beam${existing.length === 1 ? '' : 's'} reported; ${need} need${need === 1 ? 's' : ''} strengthening as ${need === 1 ? 'it stands' : 'they stand'}. The preferred scheme is the one the engineer marked; its result is that of the strengthened beam.`, ...STYLES.body },
      dataTable({
        widths: [44, 56, 54, 40, '*', 44],
        header: ['Member', 'Assessed', 'Needs strengthening', 'Schemes', 'Preferred scheme', 'Its checks'],
        align: ['left', 'left', 'center', 'right', 'left', 'center'],
        rows,
      }),
    ]),
  ];
}
