/**
 * The report's chapter for a continuous member (core/assessment/continuous-verdict.ts results):
 * the elevation with spans, supports and hinges numbered in order of formation; the loads, the
 * strength combinations and the live-load arrangements; the moment and shear envelopes with the
 * governing arrangement of each span; the code's strength and shear checks at every station; the
 * hinge sequence of the analysis to failure (load factor at each event, rotation demand against
 * capacity); redistribution used against permitted (ACI 318-19 6.6.5, EN 1992-1-1 5.5); the
 * deflections of every span by both methods, immediate and long-term, against their limits;
 * brittleness, warnings and the caution. Also the project summary's
 * table of continuous members (the plan of its figures: continuous-plan.ts).
 *
 * Pure; numbers in the project's unit system with their units.
 */
import type { ContinuousStatus } from '../assessment/continuous-verdict.ts';
import type { StationCheck } from '../assessment/continuous.ts';
import type { ContinuousBeamDefinition, ContinuousSupport } from '../continuous/definition.ts';
import { deflectionSense } from '../continuous/governing.ts';
import { figureNode, pageOf, type WriteContext } from './context.ts';
import type { ReportFormatter } from './format.ts';
import { CAUTION_TEXT, COLOURS, STYLES, bullets, cautionBox, dataTable, factsTable, h2, h3, heading, small, verdict } from './layout.ts';
import type { ContinuousPlan } from './continuous-plan.ts';
import type { Content } from './types.ts';

const STATUS_WORDS: Readonly<Record<ContinuousStatus, { text: string; color: string }>> = {
  ok: { text: 'OK', color: COLOURS.pass },
  'check-fails': { text: 'CHECK FAILS', color: COLOURS.fail },
  brittle: { text: 'BRITTLE', color: COLOURS.fail },
  'not-converged': { text: 'NOT CONVERGED', color: COLOURS.warn },
  'input-error': { text: 'INPUT ERROR', color: COLOURS.fail },
  review: { text: 'REVIEW', color: COLOURS.warn },
};

function statusCell(status: ContinuousStatus | null): Content {
  const s = status ? STATUS_WORDS[status] : { text: 'NO RESULT', color: COLOURS.fail };
  return { text: s.text, bold: true, color: s.color };
}

/** The project summary's table of continuous members (empty when there are none). */
export function continuousSummary(plans: readonly ContinuousPlan[], f: ReportFormatter): Content[] {
  if (plans.length === 0) return [];
  const rows = plans.map(({ definition, result, anchor }) => [
    { stack: [{ text: definition.name, bold: true }, { text: ['page ', pageOf(anchor)], fontSize: 6.8, color: COLOURS.muted }] },
    definition.spans.map((s) => f.span(s)).join(' + '),
    result?.verdict.strengthUtilisation !== null && result?.verdict.strengthUtilisation !== undefined ? { stack: [{ text: f.fixed(result.verdict.strengthUtilisation, 2) }, verdict(result.verdict.strengthUtilisation <= 1)] } : '—',
    result?.verdict.shearUtilisation !== null && result?.verdict.shearUtilisation !== undefined ? { stack: [{ text: f.fixed(result.verdict.shearUtilisation, 2) }, verdict(result.verdict.shearUtilisation <= 1)] } : '—',
    result?.verdict.deflectionUtilisation !== null && result?.verdict.deflectionUtilisation !== undefined ? { stack: [{ text: f.fixed(result.verdict.deflectionUtilisation, 2) }, verdict(result.verdict.deflectionUtilisation <= 1)] } : '—',
    statusCell(result?.verdict.status ?? null),
    { text: result ? `${result.verdict.governingSpan ? `${result.verdict.governingSpan}: ` : ''}${f.say(result.verdict.governingMode)}` : 'No analysis result was supplied for this member.', fontSize: 7 },
  ]);
  return [
    h3('Continuous members'),
    { text: 'Strength and shear: the largest utilisation of the code checks at every station of every span, for every load combination and live-load arrangement; deflection: the worst span.', ...STYLES.body },
    dataTable({ widths: [44, 70, 36, 36, 40, 54, '*'], header: ['Member', 'Spans', 'Strength', 'Shear', 'Deflection', 'Status', 'Governing'], align: ['left', 'left', 'center', 'center', 'center', 'left', 'left'], rows }),
  ];
}

function supportWords(s: ContinuousSupport, f: ReportFormatter): string {
  if (s.kind !== 'column') return s.kind === 'pinned' ? 'pinned' : 'fixed';
  const col = (c: NonNullable<ContinuousSupport['above']>, where: string) => `column ${where}: EI = ${f.rigidity(c.stiffness)}, height ${f.span(c.height)}, far end ${c.farEnd}`;
  return [s.above ? col(s.above, 'above') : '', s.below ? col(s.below, 'below') : ''].filter((x) => x !== '').join('; ');
}

/** A station of a check in a table cell: utilisation, where, under what. */
function stationCell(p: StationCheck | null, f: ReportFormatter, pass: (u: number) => boolean = (u) => u <= 1): Content {
  if (!p) return '—';
  return {
    stack: [
      { text: [{ text: f.fixed(p.utilisation, 2), bold: true }, ' ', verdict(pass(p.utilisation))] },
      { text: `at ${f.span(p.s)}${p.demand > 0 ? `; ${p.resistance === null ? 'no tension steel' : ''}` : ''}`, fontSize: 6.8 },
      { text: `${p.combination}${p.arrangement ? `; ${p.arrangement}` : ''}`, fontSize: 6.3, color: COLOURS.muted },
    ],
  };
}

/** The chapter of one continuous member. */
export function continuousChapter(ctx: WriteContext, plan: ContinuousPlan): Content[] {
  const { f, project } = ctx;
  const d = plan.definition;
  const r = plan.result;
  const code = project.info.codeBasis;
  const usedIn = `member ${d.name}`;
  const cite = (clause: string, note: string) => `[${ctx.refs.cite(clause, usedIn, note)}]`;
  const out: Content[] = [
    heading(`Continuous member ${d.name}`, 'h1', { pageBreak: true, id: plan.anchor }),
    factsTable([
      ['Spans', `${d.spans.map((s, i) => `span ${i + 1}: ${f.span(s)}`).join(', ')}${d.leftCantilever ? `; left cantilever ${f.span(d.leftCantilever)}` : ''}${d.rightCantilever ? `; right cantilever ${f.span(d.rightCantilever)}` : ''}`],
      ['Supports', d.supports.map((s, i) => `${i + 1}: ${supportWords(s, f)}`).join('; ')],
      ['Zones', d.zones.map((z) => `${f.span(z.from)}–${f.span(z.to)}: ${project.sections.find((s) => s.id === z.sectionId)?.name ?? z.sectionId}`).join('; ')],
      ['Status', statusCell(r?.verdict.status ?? null)],
      ['Governing', r ? `${r.verdict.governingSpan ? `${r.verdict.governingSpan}: ` : ''}${f.say(r.verdict.governingMode)}` : 'No analysis result was supplied for this member.'],
    ], 90, [0, 0, 0, 6]),
  ];
  if (!r || r.errors.length > 0 || !r.elastic) {
    if (r) out.push(h2('Input errors'), bullets(r.errors.map((e) => `${e.path}: ${f.say(e.message)}`)));
    out.push(cautionBox('Caution', CAUTION_TEXT));
    return out;
  }
  const elastic = r.elastic;
  out.push(...figureNode(ctx, plan.elevation));

  // --- loads, combinations and arrangements ----------------------------------------------------------
  const partOf = (span: ContinuousBeamDefinition['loads'][number]['span']) => (typeof span === 'number' ? `span ${span}` : span.replace('-', ' '));
  const loadRows = d.loads.map((l) => [
    l.loadCase === 'superimposed' ? 'superimposed dead' : l.loadCase,
    partOf(l.span),
    l.kind === 'point' ? `point ${f.force(l.magnitude)} at ${f.span(l.position)}` : `uniform ${f.lineLoad(l.magnitude)}${l.from !== undefined || l.to !== undefined ? ` from ${f.span(l.from ?? 0)} to ${l.to !== undefined ? f.span(l.to) : 'the end'}` : ''}`,
    l.label ?? '',
  ]);
  const arrangements = elastic.arrangements.map((a) => a.description);
  out.push(small(loadRows.length + 4, [
    h2('Loads, combinations and live-load arrangements'),
    { text: `Positions of loads from the left end of their span or cantilever. Self-weight ${d.includeSelfWeight === false ? 'not included' : 'included in the dead load (concrete density × section area)'}.`, ...STYLES.body },
    loadRows.length > 0 ? dataTable({ widths: [70, 70, '*', 80], header: ['Case', 'On', 'Load', 'Label'], rows: loadRows }) : { text: 'No loads given.', ...STYLES.body },
  ]));
  out.push(bullets([
    `Strength combinations: ${(r.checks?.combinations ?? []).join('; ') || elastic.envelopes.strength.description} ${cite(code === 'ACI 318-19' ? 'ACI 318-19 5.3.1' : 'EN 1990 6.4.3.2', 'strength combinations')}.`,
    `Live-load arrangements ${cite(code === 'ACI 318-19' ? 'ACI 318-19 6.4.2' : 'EN 1992-1-1 5.1.3', 'arrangements of live load')}: ${arrangements.join('; ')}.`,
  ]));

  // --- envelopes ---------------------------------------------------------------------------------------
  const arrangementWords = (i: number) => (i < 0 ? 'dead-only combination' : elastic.arrangements[i]?.description ?? '—');
  out.push(h2('Moment and shear envelopes'));
  out.push({ text: 'Elastic analysis on the gross sections at the code modulus with the columns\' rotational springs, no redistribution; the live load of every span and cantilever solved alone and the arrangements superposed.', ...STYLES.body });
  out.push(...figureNode(ctx, plan.moment));
  out.push(dataTable({
    widths: [62, '*', '*', '*'],
    header: ['Part', 'Largest sagging moment', 'Largest hogging moment', 'Largest shear |V|'],
    rows: elastic.parts.map((p) => [
      `${p.name} (${f.span(p.to - p.from)})`,
      { stack: [{ text: `${f.moment(p.maxSagging.value)} at ${f.span(p.maxSagging.x - p.from)}` }, { text: arrangementWords(p.maxSagging.arrangement), fontSize: 6.5, color: COLOURS.muted }] },
      { stack: [{ text: `${f.moment(p.maxHogging.value)} at ${f.span(p.maxHogging.x - p.from)}` }, { text: arrangementWords(p.maxHogging.arrangement), fontSize: 6.5, color: COLOURS.muted }] },
      { stack: [{ text: `${f.force(Math.abs(p.maxShear.value))} at ${f.span(p.maxShear.x - p.from)}` }, { text: arrangementWords(p.maxShear.arrangement), fontSize: 6.5, color: COLOURS.muted }] },
    ]),
  }));
  out.push({ text: `Strength envelope ${elastic.envelopes.strength.description}; positions from the left end of each part; the arrangement that gives each extreme is named under it.`, ...STYLES.note });
  out.push(...figureNode(ctx, plan.shear));

  // --- station checks ---------------------------------------------------------------------------------
  const checks = r.checks;
  out.push(h2('Strength and shear at every station'));
  if (!checks) {
    out.push({ text: 'The code\'s strength and shear checks at the stations could not be made for this member (see the warnings); its status is REVIEW, not OK.', ...STYLES.body });
  } else {
    out.push({
      text: `The factored moment and shear of every combination and every live-load arrangement at every station (equal divisions of each part, both sides of every change of section, point load and support, and the points of zero shear between them) against the design resistance of the section there in the sense of the moment (${code === 'ACI 318-19' ? 'φMn, φVn' : 'M_Rd, VRd'}) — the same checks as a single span. ${f.say(checks.shear.criticalSectionRule)}`,
      ...STYLES.body,
    });
    out.push(dataTable({
      widths: [56, '*', '*', '*'],
      header: ['Part', 'Sagging', 'Hogging', 'Shear'],
      rows: checks.parts.map((p) => [p.part, stationCell(p.sagging, f), stationCell(p.hogging, f), stationCell(p.shear, f)]),
    }));
    out.push(bullets([
      `Flexure: ${checks.flexure.pass ? 'passes' : 'FAILS'}, utilisation ${f.fixed(checks.flexure.utilisation, 2)} at ${checks.flexureGoverning.part}, ${f.span(checks.flexureGoverning.s)} from its left end, ${checks.flexureGoverning.direction} (${f.moment(checks.flexureGoverning.demand)} against ${f.moment(checks.flexureGoverning.resistance)}), under ${checks.flexureGoverning.combination}, ${checks.flexureGoverning.arrangement}.`,
      `Shear: ${checks.shear.pass ? 'passes' : 'FAILS'}, utilisation ${f.fixed(checks.shear.utilisation, 2)} at ${checks.shear.governing.part}, ${f.span(checks.shear.governing.s)} from its left end${checks.shear.governing.supportFace ? ' (support face, EN 1992-1-1 Eq. (6.5))' : ''} (${f.force(checks.shear.governing.demand)} against ${f.force(checks.shear.governing.resistance)}), under ${checks.shear.governing.combination}, ${checks.shear.governing.arrangement}.`,
      checks.shear.mechanism
        ? `At the largest load of the analysis to failure the shear reaches ${f.force(checks.shear.mechanism.governing.demand)} at ${checks.shear.mechanism.governing.part}, ${f.span(checks.shear.mechanism.governing.s)} from its left end, against the nominal strength ${f.force(checks.shear.mechanism.governing.resistance)} (ratio ${f.fixed(checks.shear.mechanism.nominalRatio, 2)}): ${checks.shear.governs === 'shear' ? 'shear is reached before the flexural mechanism (brittle)' : 'flexure governs'}.`
        : 'No analysis to failure: whether shear or flexure is reached first is not determined.',
      ...(checks.flexure.notes ? [f.say(checks.flexure.notes)] : []),
    ]));
    if (checks.shear.capacities.length > 0) {
      out.push(small(checks.shear.capacities.length + 2, [
        h3('Shear strength of the sections'),
        dataTable({
          widths: [70, 44, 36, 36, '*'],
          header: ['Section, sense', code === 'ACI 318-19' ? 'φVn' : 'VRd', 'd', 'bw', 'Expression'],
          rows: checks.shear.capacities.map((c) => [`${c.sectionName}, ${c.direction}`, f.force(c.design), f.length(c.effectiveDepth), f.length(c.webWidth), { text: f.say(c.formula), fontSize: 6.5 }]),
        }),
      ]));
    }
  }

  // --- analysis to failure -------------------------------------------------------------------------------
  const capacity = r.capacity;
  out.push(h2('Analysis to failure: hinge sequence'));
  if (!capacity) {
    out.push({ text: 'No analysis to failure (the load pattern is empty).', ...STYLES.body });
  } else {
    const ductile = r.verdict.ductilityAvailable;
    out.push(bullets([
      `Load pattern: ${r.failurePattern}; ${r.failureArrangement}.`,
      `Largest load factor ${f.loadFactor(capacity.peakLoadFactor)}${r.strengthLevel ? ` — ${f.fixed(r.strengthLevel.ratio, 2)} × the factored loads of the same arrangement (${f.force(r.strengthLevel.collapseTotal)} against ${f.force(r.strengthLevel.factoredTotal)})` : ''}; ${capacity.failureCause}${capacity.converged ? '' : ' (the analysis did not converge further)'}.`,
      `Displacement ductility at ${capacity.controlPart}, ${f.span(capacity.controlPosition)} from the left end: ${ductile ? f.number(capacity.displacementDuctility) : 'not available — the member is brittle'}.`,
    ]));
    if (capacity.hinges.length > 0) {
      out.push(dataTable({
        widths: [18, 56, 44, 40, 56, 38, 48, 48, 36],
        header: ['No.', 'Part', 'Position', 'Sense', 'Section', 'λ', 'θ demand', 'θ capacity', 'Ratio'],
        align: ['right', 'left', 'right', 'left', 'left', 'right', 'right', 'right', 'right'],
        rows: capacity.hinges.map((h) => {
          const part = r.parts.find((p) => p.name === h.part);
          return [
            String(h.order), h.part, f.span(h.position - (part?.from ?? 0)), h.direction, project.sections.find((s) => s.id === h.sectionId)?.name ?? h.sectionId,
            f.loadFactor(h.loadFactor), f.rotation(h.rotation), ductile ? f.rotation(h.rotationCapacity) : 'n/a', ductile && h.demandRatio !== null ? f.fixed(h.demandRatio, 2) : '—',
          ];
        }),
      }));
      out.push({ text: 'Hinges numbered in order of formation (first yield of the hinge section); λ is the load factor on the pattern when the hinge formed; positions from the left end of the part; θ demand is the plastic rotation at the end of the analysis.', ...STYLES.note });
    } else out.push({ text: 'No plastic hinge formed.', ...STYLES.body });
    if (capacity.events.length > 0) {
      out.push(bullets(capacity.events.map((e) => `λ = ${f.loadFactor(e.loadFactor)}${Number.isFinite(e.deflection) ? `, deflection ${f.deflection(e.deflection)}` : ''}: ${e.description}`)));
    }
  }

  // --- redistribution -------------------------------------------------------------------------------------
  out.push(h2('Redistribution of moments'));
  if (r.redistribution.length === 0) {
    out.push({ text: 'No support carries a hogging moment to redistribute.', ...STYLES.body });
  } else {
    out.push({ text: `At each support with a hogging moment: the non-linear moment at the largest load against the elastic moment (gross stiffness) under the same loads, and the redistribution the code permits ${cite(code === 'ACI 318-19' ? 'ACI 318-19 6.6.5' : 'EN 1992-1-1 5.5', 'permitted redistribution')}.`, ...STYLES.body });
    out.push(dataTable({
      widths: [40, '*', '*', 44, 48, 36],
      header: ['Support', 'Elastic moment', 'Non-linear moment', 'Used', 'Permitted', ''],
      align: ['left', 'right', 'right', 'right', 'right', 'center'],
      rows: r.redistribution.map((x) => [String(x.support), f.moment(x.elasticMoment), f.moment(x.nonlinearMoment), `${f.fixed(x.usedPercent, 1)} %`, `${f.fixed(x.permitted.percent, 1)} %`, verdict(x.withinPermitted)]),
    }));
    out.push(bullets(r.redistribution.map((x) => `Support ${x.support}: ${x.permitted.clause}, ${x.permitted.basis}.`)));
  }

  // --- deflections ------------------------------------------------------------------------------------------
  out.push(h2('Deflections per span'));
  const service = r.service;
  if (!service) out.push({ text: 'The service deflections could not be computed (see the warnings).', ...STYLES.body });
  else {
    out.push({ text: `Each span under the live-load arrangement that gives it its largest deflection (downward, or upward where the load on other spans lifts it; each check under the worse); by integration of the section laws and by the code method (${service.codeMethod}). Deflections are downward unless marked upward (a span lifted by the load on its neighbours); the limits apply to the magnitude.`, ...STYLES.body });
    const d = (value: number) => `${f.deflection(deflectionSense(value).magnitude)}${deflectionSense(value).sense}`;
    out.push(dataTable({
      widths: [54, '*', 50, 50, 50, 50],
      header: ['Part', 'Arrangement', 'D + L, immediate', 'L, immediate', 'Long-term added', 'Long-term total'],
      align: ['left', 'left', 'right', 'right', 'right', 'right'],
      rows: service.parts.map((p) => [
        p.name,
        { text: p.arrangement, fontSize: 6.5 },
        `${d(p.integration.deadPlusLive)} / ${d(p.code.deadPlusLive)}`,
        `${d(p.integration.live)} / ${d(p.code.live)}`,
        `${d(p.integration.longTermAdditional)} / ${d(p.code.longTermAdditional)}`,
        `${d(p.integration.longTermTotal)} / ${d(p.code.longTermTotal)}`,
      ]),
    }));
    out.push({ text: 'Each cell: by integration / by the code method.', ...STYLES.note });
    const checkRows = service.parts.flatMap((p) => p.checks.map((c) => [p.name, { text: `${c.quantity}: ${c.description}${c.arrangement === p.arrangement ? '' : `; under ${c.arrangement}`}`, fontSize: 7 }, `${d(c.byIntegration)} / ${d(c.byCode)}`, f.deflection(c.limit), f.fixed(c.utilisation, 2), verdict(c.pass)]));
    if (checkRows.length > 0) {
      out.push(dataTable({ widths: [54, '*', 70, 44, 36, 34], header: ['Part', 'Limit', 'Integration / code', 'Limit', 'Ratio', ''], align: ['left', 'left', 'right', 'right', 'right', 'center'], rows: checkRows }));
    }
  }

  // --- brittleness, warnings, caution --------------------------------------------------------------------
  const brittle = checks?.brittle ?? [];
  if (brittle.length > 0) {
    out.push(h2('Brittle'), { text: 'The member would fail without warning: its ductility and hinge rotation capacities are not to be relied on.', ...STYLES.body }, bullets(brittle.map((b) => f.say(b.text))));
  }
  if (r.warnings.length > 0) out.push(h2('Warnings'), bullets(r.warnings.map((w) => ({ text: f.say(w), color: COLOURS.warn }))));
  out.push(cautionBox('Caution', CAUTION_TEXT));
  return out;
}
