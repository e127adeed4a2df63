/**
 * One chapter per member: status, inputs (supports, span, zones, loads, combinations, settings,
 * the sections with their scaled drawings and key values), the member's method statement, the
 * load–deflection curve with its events, moment and curvature along the span, plastic hinges and
 * ductility, service deflections against their limits, the strength check, and the warnings,
 * limitations and caution. Every number comes from the results and is only formatted here.
 */
import type { DeflectionLimitCase, MemberLoad } from '../member/definition.ts';
import { EVENT_WORDS } from '../charts/load-deflection.ts';
import { drawingWithFacts, figureNode, pageOf, SUPPORT_WORDS, type WriteContext } from './context.ts';
import type { MemberPlan } from './figures.ts';
import { CAUTION_TEXT, COLOURS, KEEP_TOGETHER_ROWS, bullets, cautionBox, dataTable, factsTable, h2, h3, heading, keepTogether, small, verdict, STYLES } from './layout.ts';
import { HINGE_WORDS, METHOD_ANCHOR, memberMethod } from './method.ts';
import { citationMarker, hingeLengthReference } from './references.ts';
import type { Content, ContentNode } from './types.ts';
import type { MemberResult } from '../assessment/results.ts';
import { combinationText, strengthCombinations } from '../assessment/combinations.ts';
import { existingChapter } from './existing.ts';
import { serviceOutsideRange } from '../member/small-deflection.ts';

const LOAD_CASE_WORDS: Readonly<Record<MemberLoad['loadCase'], string>> = { dead: 'dead', superimposed: 'superimposed dead', live: 'live' };

const LIMIT_WORDS: Readonly<Record<DeflectionLimitCase, string>> = {
  'aci-roof-immediate': 'ACI 318-19 Table 24.2.2: flat roof, immediate live load, ℓ/180',
  'aci-floor-immediate': 'ACI 318-19 Table 24.2.2: floor, immediate live load, ℓ/360',
  'aci-sensitive-after-attachment': 'ACI 318-19 Table 24.2.2: supporting elements likely to be damaged, ℓ/480',
  'aci-insensitive-after-attachment': 'ACI 318-19 Table 24.2.2: supporting elements not likely to be damaged, ℓ/240',
  'en-appearance': 'EN 1992-1-1 7.4.1(4): appearance, span/250',
  'en-after-construction': 'EN 1992-1-1 7.4.1(5): after construction, span/500',
  custom: 'limit set by the engineer',
};


export const STATUS_WORDS: Readonly<Record<MemberResult['status'], { text: string; color: string }>> = {
  ok: { text: 'OK', color: COLOURS.pass },
  'check-fails': { text: 'CHECK FAILS', color: COLOURS.fail },
  brittle: { text: 'BRITTLE', color: COLOURS.fail },
  'not-converged': { text: 'NOT CONVERGED', color: COLOURS.warn },
  'input-error': { text: 'INPUT ERROR', color: COLOURS.fail },
};

export function statusCell(status: MemberResult['status'] | null): ContentNode {
  const s = status ? STATUS_WORDS[status] : { text: 'NO RESULT', color: COLOURS.fail };
  return { text: s.text, bold: true, color: s.color };
}

/** Load per unit load factor, N (the pattern is proportional to λ), or null without points. */
export function loadPerFactor(result: MemberResult): number | null {
  const last = [...result.loadDeflection.points].reverse().find((p) => p.loadFactor > 0 && Number.isFinite(p.totalLoad / p.loadFactor));
  return last ? last.totalLoad / last.loadFactor : null;
}

function inputs(ctx: WriteContext, member: MemberPlan): Content[] {
  const { f, project } = ctx;
  const d = member.definition;
  const code = project.info.codeBasis;
  const combinations = strengthCombinations(d, code, project.settings).map(combinationText).join('; ');
  const s = d.service;
  const sectionAnchor = (id: string) => ctx.plan.sections.find((p) => p.definition.id === id)?.anchor;
  const sectionName = (id: string) => project.sections.find((x) => x.id === id)?.name ?? id;
  const zones: Content = {
    stack: d.zones.map((z) => {
      const anchor = sectionAnchor(z.sectionId);
      // A page reference ends its line: pdfmake reserves room for five digits after it.
      return { text: [`${f.span(z.from)} to ${f.span(z.to)}: section ${sectionName(z.sectionId)}`, ...(anchor ? [', page ', pageOf(anchor)] : [])] };
    }),
  };
  const limits = s.limitCases.map((c) => (c === 'custom' ? `limit set by the engineer, span/${s.customLimitRatio ?? '—'}` : LIMIT_WORDS[c])).join('; ') || 'none chosen';
  const hingeRef = hingeLengthReference(d.capacity.hingeLengthMethod);
  const rows: Content[][] = [];
  const includeSelfWeight = d.includeSelfWeight ?? true;
  for (const zone of d.zones) {
    const section = member.result?.sections.find((x) => x.sectionId === zone.sectionId);
    rows.push(['dead', 'self-weight', section ? f.lineLoad(section.selfWeight) : '—', `${f.span(zone.from)} to ${f.span(zone.to)}`, includeSelfWeight ? 'from the concrete density and gross area' : 'not included (switched off)']);
  }
  for (const load of d.loads) {
    rows.push(load.kind === 'uniform'
      ? [LOAD_CASE_WORDS[load.loadCase], 'uniform', f.lineLoad(load.magnitude), load.from === undefined && load.to === undefined ? 'whole span' : `${f.span(load.from ?? 0)} to ${f.span(load.to ?? d.span)}`, load.label ?? '']
      : [LOAD_CASE_WORDS[load.loadCase], 'point', f.force(load.magnitude), `at ${f.span(load.position)}`, load.label ?? '']);
  }
  return [
    keepTogether([h2('Inputs'), factsTable([
      ['Supports', SUPPORT_WORDS[d.supports]],
      ['Span L', f.span(d.span)],
      ['Zones (section along the span)', zones],
      ['Load–deflection pattern', d.capacity.pattern === 'proportional' ? 'all service loads increased together: λ × (D + L)' : 'live load increased with the dead load held: D + λ × L'],
      ['Plastic hinge length', `${HINGE_WORDS[d.capacity.hingeLengthMethod]}${d.capacity.hingeLengthMethod === 'user' ? `: Lp = ${f.length(d.capacity.userHingeLength)}` : ''}${hingeRef ? ` ${citationMarker([ctx.refs.cite(hingeRef, `member ${d.name}`, 'plastic hinge length')])}` : ''}`],
      ['Strength combinations (the envelope is checked)', combinations],
      ['Service combinations', `immediate: D + L; sustained: D + ψL with ψ = ${f.fixed(s.sustainedLiveFraction, 2)}; load duration ${s.durationMonths} months`],
      ['Deflection limits checked', limits],
      ['Shrinkage curvature (EN method)', s.includeShrinkage === false ? 'not included' : 'included'],
      ...(d.notes ? [['Notes', d.notes] as [string, Content]] : []),
    ])]),
    small(rows.length, [h3('Loads (unfactored; downward positive)'), dataTable({ widths: [62, 52, 70, 120, '*'], header: ['Load case', 'Type', 'Magnitude', 'Extent (from the left support)', 'Note'], rows })]),
  ];
}

function sectionsUsed(ctx: WriteContext, member: MemberPlan): Content[] {
  const { f } = ctx;
  const out: Content[] = [];
  const ids = [...new Set(member.definition.zones.map((z) => z.sectionId))];
  ids.forEach((id, k) => {
    const plan = ctx.plan.sections.find((p) => p.definition.id === id);
    if (!plan) return;
    const sr = member.result?.sections.find((s) => s.sectionId === id) ?? plan.result;
    const extents = member.definition.zones.filter((z) => z.sectionId === id).map((z) => `${f.span(z.from)} to ${f.span(z.to)}`).join(', ');
    const facts: [string, Content][] = [['Where', extents], ['Full results', { text: ['section chapter, page ', pageOf(plan.anchor)] }]];
    for (const direction of ['sagging', 'hogging'] as const) {
      const curve = sr?.[direction];
      if (!curve) continue;
      const b = curve.bilinear;
      facts.push([`${direction === 'sagging' ? 'Sagging' : 'Hogging'}: My (idealisation), Mu`, b ? `${f.moment(b.yieldMoment)}, ${f.moment(b.ultimateMoment)}` : '—']);
      facts.push([`${direction === 'sagging' ? 'Sagging' : 'Hogging'}: φy, φu, μφ`, b ? `${f.curvature(b.yieldCurvature)}, ${f.curvature(b.ultimateCurvature)}, ${f.number(curve.curvatureDuctility)}` : '—']);
    }
    out.push(keepTogether([
      ...(k === 0 ? [h2('Sections')] : []),
      h3(`Section ${plan.definition.name}`),
      drawingWithFacts(ctx, plan.drawing, factsTable(facts, 90, [0, 0, 0, 0])),
    ]));
  });
  return out;
}

function response(ctx: WriteContext, member: MemberPlan, result: MemberResult): Content[] {
  const { f } = ctx;
  const out: Content[] = [keepTogether([h2('Member response'), ...(member.loadDeflection ? figureNode(ctx, member.loadDeflection) : [{ text: `No load–deflection curve: ${result.loadDeflection.status}.`, ...STYLES.note }])])];
  const perFactor = loadPerFactor(result);
  if (result.loadDeflection.events.length > 0) {
    out.push(small(result.loadDeflection.events.length, [h3(`Events along the curve (deflection at x = ${f.span(result.loadDeflection.controlPosition)})`), dataTable({
      widths: [62, 34, 52, 46, 46, '*'],
      header: ['Event', 'λ', 'Total load P', 'Deflection Δ', 'At x', 'Description'],
      align: ['left', 'right', 'right', 'right', 'right', 'left'],
      rows: result.loadDeflection.events.map((e) => [EVENT_WORDS[e.kind], f.loadFactor(e.loadFactor), perFactor === null ? '—' : f.force(e.loadFactor * perFactor), f.deflection(e.deflection), f.span(e.position), { text: e.description, fontSize: 7 }]),
    })]));
  }
  out.push({ text: `Curve status: ${result.loadDeflection.status}.`, ...STYLES.note });
  if (member.span) out.push(keepTogether(figureNode(ctx, member.span)));
  return out;
}

function hingesAndDuctility(ctx: WriteContext, member: MemberPlan, result: MemberResult): Content[] {
  const { f, refs } = ctx;
  const d = result.ductility;
  const out: Content[] = [];
  if (d.hinges.length > 0) {
    const name = (id: string) => result.sections.find((s) => s.sectionId === id)?.sectionName ?? id;
    out.push(keepTogether([h2('Plastic hinges and ductility'), dataTable({
      widths: [46, 46, '*', 44, 56, 56, 40],
      header: ['At x', 'Direction', 'Section', 'Lp', 'θp capacity', 'θp at ultimate', 'μφ'],
      align: ['right', 'left', 'left', 'right', 'right', 'right', 'right'],
      rows: d.hinges.map((h) => [f.span(h.position), h.direction, name(h.sectionId), f.length(h.length), f.rotation(h.rotationCapacity), f.rotation(h.rotationAtUltimate), f.number(h.curvatureDuctility)]),
    })]));
    out.push(keepTogether([h3('Hinge length, with the numbers used'), bullets(d.hinges.map((h) => {
      const reference = hingeLengthReference(h.lengthMethod);
      const marker = reference ? ` ${citationMarker([refs.cite(reference, `member ${member.definition.name}`, 'plastic hinge length')])}` : '';
      return { text: `x = ${f.span(h.position)} (${h.direction}, shear span ${f.length(h.shearSpan)}): ${f.say(h.lengthFormula)}${marker}` };
    }))]));
  } else {
    out.push(keepTogether([h2('Plastic hinges and ductility'), { text: 'No plastic hinge formed before the analysis ended.', ...STYLES.body }]));
  }
  out.push(factsTable([
    ['Deflection at first yield', f.deflection(d.firstYieldDeflection)],
    ['Nominal yield deflection Δy', f.deflection(d.yieldDeflection)],
    ['Ultimate deflection Δu', result.ultimateOutsideRange ? 'not given' : f.deflection(d.ultimateDeflection)],
    ['Displacement ductility μΔ = Δu/Δy', result.ultimateOutsideRange ? 'not given' : f.number(d.displacementDuctility)],
    ...(result.ultimateOutsideRange ? [['Outside the small-deflection range: Δu and μΔ', { text: f.say(result.ultimateOutsideRange), color: COLOURS.fail }] as [string, Content]] : []),
    ['What ends the curve', d.failureCause || '—'],
    ...(result.ductilityUnavailable ? [['Brittle member: ductility and hinge rotations', { text: f.say(result.ductilityUnavailable), color: COLOURS.fail }] as [string, Content]] : []),
  ], 170));
  return out;
}

function service(ctx: WriteContext, result: MemberResult): Content[] {
  const { f } = ctx;
  const s = result.service;
  if (!s) return [keepTogether([h2('Service deflections and limits'), { text: 'Not computed for this member.', ...STYLES.body }])];
  const outside = serviceOutsideRange(s, result.span);
  if (outside) return [keepTogether([h2('Service deflections and limits'), { text: f.say(outside), ...STYLES.body }])];
  const i = s.immediate.integration;
  const c = s.immediate.code;
  const rows: Content[][] = [
    ['Immediate, dead load (incl. self-weight and superimposed)', f.deflection(i.dead), f.deflection(c.dead)],
    ['Immediate, dead + live', f.deflection(i.deadPlusLive), f.deflection(c.deadPlusLive)],
    ['Immediate, live load increment', f.deflection(i.live), f.deflection(c.live)],
    ['Immediate, sustained load D + ψL', f.deflection(i.sustained), f.deflection(c.sustained)],
    ['Long-term additional under sustained load', f.deflection(s.longTerm.integrationAdditional), f.deflection(s.longTerm.codeAdditional)],
    ['Long-term total under sustained load', f.deflection(s.longTerm.integrationTotal), f.deflection(s.longTerm.codeTotal)],
  ];
  const facts: [string, Content][] = [
    ['Code method', s.codeMethod.name],
    ['Details', s.codeMethod.notes],
    ['Long-term method', `${s.longTerm.method}${s.longTerm.multiplier !== null ? `; λΔ = ${f.number(s.longTerm.multiplier)}` : ''}`],
    ...(s.methodDifferences ?? []).map((t): [string, Content] => ['Why the methods differ', f.say(t)]),
  ];
  if (s.codeMethod.effectiveInertia) {
    const ie = s.codeMethod.effectiveInertia;
    facts.push(['Effective Ie: dead / dead + live / sustained', `${f.secondMoment(ie.dead)} / ${f.secondMoment(ie.deadPlusLive)} / ${f.secondMoment(ie.sustained)}`]);
  }
  if (s.codeMethod.legacyBranson) {
    const b = s.codeMethod.legacyBranson;
    facts.push(['For comparison, Branson Ie (ACI 318-14): dead / dead + live / live', `${f.deflection(b.dead)} / ${f.deflection(b.deadPlusLive)} / ${f.deflection(b.live)}`]);
  }
  const out: Content[] = [
    keepTogether([h2('Service deflections and limits'), h3('Deflections at the control point (downward +), both methods side by side'), dataTable({ widths: ['*', 100, 100], header: ['Quantity', 'Integration of M–φ', 'Code method'], align: ['left', 'right', 'right'], rows })]),
    factsTable(facts, 150),
  ];
  if (s.checks.length > 0) {
    out.push(small(s.checks.length * 2, [h3('Checks against the limits (the larger of the two methods governs)'), dataTable({
      widths: ['*', 50, 50, 50, 52, 40, 34],
      header: ['Limit and quantity checked', 'Limit', 'Integration', 'Code', 'Governs', 'Util.', 'Result'],
      align: ['left', 'right', 'right', 'right', 'left', 'right', 'center'],
      rows: s.checks.map((k) => [
        { stack: [{ text: k.description }, { text: k.quantity, fontSize: 6.8, color: COLOURS.muted }] },
        `${f.deflection(k.limit)} (ℓ/${k.ratio})`,
        f.deflection(k.byIntegration),
        f.deflection(k.byCode),
        k.byIntegration >= k.byCode ? 'integration' : 'code method',
        f.fixed(k.utilisation, 2),
        verdict(k.pass),
      ]),
    })]));
  }
  return out;
}

function strength(ctx: WriteContext, result: MemberResult): Content[] {
  const { f } = ctx;
  const s = result.strength;
  if (!s) return [keepTogether([h2('Flexural strength check'), { text: 'Not computed for this member.', ...STYLES.body }])];
  const resistance = ctx.project.info.codeBasis === 'ACI 318-19' ? 'φMn' : 'M_Rd';
  const name = (id: string) => result.sections.find((x) => x.sectionId === id)?.sectionName ?? id;
  const cell = (p: (typeof s.zones)[number]['sagging']): Content => (p ? { stack: [{ text: `${f.fixed(p.utilisation, 2)} at ${f.span(p.position)}` }, { text: `${f.moment(p.demand)} / ${p.resistance === null ? 'no tension steel' : f.moment(p.resistance)}`, fontSize: 6.8, color: COLOURS.muted }] } : '—');
  return [
    keepTogether([h2('Flexural strength check'), factsTable([
      ['Governing point', `x = ${f.span(s.position)}, ${s.direction}, section ${name(s.sectionId)}`],
      ['Governing combination', s.combination],
      [`Demand / resistance ${resistance} there`, `${f.moment(s.demand)} / ${s.resistance === null ? 'no tension reinforcement on that side' : f.moment(s.resistance)}`],
      ['Utilisation', f.fixed(s.utilisation, 2)],
      ['Result', verdict(s.pass)],
      ['Every combination (largest utilisation)', s.combinations.map((c) => `${c.combination}: ${f.fixed(c.utilisation, 2)}`).join('; ')],
      ['Resistances', f.say(s.notes) || '—'],
    ], 170)]),
    small(s.zones.length, [h3('Worst point of each zone and sense (utilisation at x; demand / resistance)'), dataTable({
      widths: [90, '*', 92, 92],
      header: ['Zone', 'Section', 'Sagging', 'Hogging'],
      align: ['left', 'left', 'right', 'right'],
      rows: s.zones.map((z) => [`${f.span(z.from)} to ${f.span(z.to)}`, name(z.sectionId), cell(z.sagging), cell(z.hogging)]),
    })]),
  ];
}

/** Shear, when the analysis checked it (capacities and demands from core/assessment/shear.ts). */
function shear(ctx: WriteContext, result: MemberResult): Content[] {
  const v = result.shear;
  if (!v) return [];
  const { f } = ctx;
  const point = (p: { position: number; shear: number; nominal: number; design: number; supportFace: boolean }) =>
    `V = ${f.force(p.shear)} at ${f.span(p.position)}${p.supportFace ? ' (support face)' : ''}; Vn = ${f.force(p.nominal)}, design ${f.force(p.design)}`;
  const facts: [string, Content][] = [['Governs', v.governs === 'shear' ? { text: 'shear', bold: true, color: COLOURS.fail } : v.governs]];
  if (v.factored) {
    facts.push(['Factored combination', v.factored.combination], ['Governing point', point(v.factored.governing)], ['Utilisation', f.fixed(v.factored.utilisation, 2)], ['Result', verdict(v.factored.pass)]);
  }
  if (v.mechanism) {
    const m = v.mechanism;
    facts.push(
      ['At the flexural mechanism', `λ = ${f.loadFactor(m.loadFactor)}, total load ${f.force(m.totalLoad)}; hinge moments × ${f.number(m.overstrengthFactor)} (${m.overstrengthBasis})`],
      ['Governing point at the mechanism', point(m.governing)],
      ['V/Vn, V/design strength', `${f.fixed(m.nominalRatio, 2)}, ${f.fixed(m.designRatio, 2)}`],
    );
  }
  if (v.shearFailureLoadFactor !== null) facts.push(['Load factor at nominal shear strength', f.loadFactor(v.shearFailureLoadFactor)]);
  facts.push(['In words', f.say(v.sentence)], ['Sections near the supports', f.say(v.criticalSectionRule)]);
  return [keepTogether([h2('Shear'), factsTable(facts, 170)]), ...(v.warnings.length > 0 ? [bullets(v.warnings.map((w) => ({ text: [{ text: 'Warning ', bold: true, color: COLOURS.warn }, f.say(w)] })))] : [])];
}

function warnings({ f }: WriteContext, result: MemberResult | null): Content[] {
  const items: Content[] = [];
  if (result) {
    for (const e of result.errors) items.push({ text: [{ text: 'Input error ', bold: true, color: COLOURS.fail }, `${e.path}: ${f.say(e.message)}`] });
    for (const w of result.warnings) items.push({ text: [{ text: 'Warning ', bold: true, color: COLOURS.warn }, f.say(w)] });
    if (result.retrofit) {
      const r = result.retrofit;
      items.push({ text: [{ text: 'Condition ', bold: true, color: COLOURS.warn }, `the results above describe the ${r.basis === 'as-found' ? 'as-found' : 'design'} beam. ${r.caution}`] });
      for (const w of r.warnings) items.push({ text: [{ text: 'Warning ', bold: true, color: COLOURS.warn }, f.say(w)] });
      for (const e of r.errors) items.push({ text: [{ text: 'Input error ', bold: true, color: COLOURS.fail }, `${e.path}: ${f.say(e.message)}`] });
    }
  } else {
    items.push({ text: 'No analysis results were supplied for this member.', color: COLOURS.fail });
  }
  const list = items.length > 0 ? bullets(items) : { text: 'The analysis raised no warnings for this member (warnings of its sections are listed in their chapters).', ...STYLES.body };
  // The caution closes the chapter together with the limitations it qualifies (and the warnings when
  // they are few): a page never holds the caution box alone.
  const closing: Content[] = [
    { text: `The general limitations of the method apply: ${result?.shear ? 'flexure and shear only (no torsion, bond or anchorage checks)' : 'flexure only'}; plane sections and perfect bond; static, monotonic loading; the strength check is not a complete code design.`, ...STYLES.body },
    { text: ['Limitations in full: Method chapter, page ', pageOf(METHOD_ANCHOR)], ...STYLES.note },
    cautionBox('Caution', CAUTION_TEXT),
  ];
  return items.length <= KEEP_TOGETHER_ROWS
    ? [keepTogether([h2('Warnings and limitations'), list, ...closing])]
    : [{ stack: [h2('Warnings and limitations'), list] }, keepTogether(closing)];
}

/** The chapter of one member. */
export function memberChapter(ctx: WriteContext, member: MemberPlan): Content[] {
  const { f } = ctx;
  const { definition: d, result } = member;
  const out: Content[] = [
    heading(`Member ${d.name}`, 'h1', { pageBreak: true, id: member.anchor }),
    { text: `${SUPPORT_WORDS[d.supports]}, span ${f.span(d.span)}`, color: COLOURS.muted, margin: [0, -4, 0, 6] },
    factsTable([
      ['Status', statusCell(result?.status ?? null)],
      ['Governing mode', result ? f.say(result.governingMode) : 'No analysis result was supplied for this member.'],
    ], 90, [0, 0, 0, 6]),
    ...inputs(ctx, member),
    ...sectionsUsed(ctx, member),
    ...memberMethod(ctx, member, ctx.project),
  ];
  if (result && result.status !== 'input-error') {
    out.push(...response(ctx, member, result), ...hingesAndDuctility(ctx, member, result), ...service(ctx, result), ...strength(ctx, result), ...shear(ctx, result), ...existingChapter(ctx, member));
  }
  out.push(...warnings(ctx, result));
  return out;
}
