/**
 * One chapter per section used by the reported members: the scaled drawing and properties, the
 * reinforcement, the material laws with their parameters and sources, the moment–curvature chart
 * with the key-point tables and bilinear idealisation, and the strain and stress profiles at first
 * yield and at ultimate in each bending direction.
 */
import { KEY_POINT_LABELS, KEY_POINT_ORDER } from '../charts/moment-curvature.ts';
import { hoopsConfine, layerArea } from '../section/definition.ts';
import type { SectionShape } from '../section/shapes.ts';
import type { MomentCurvatureResult } from '../section/results.ts';
import { drawingWithFacts, figureNode, type WriteContext } from './context.ts';
import type { SectionPlan } from './figures.ts';
import type { ReportFormatter } from './format.ts';
import { COLOURS, bullets, dataTable, factsTable, h2, h3, heading, keepTogether, small, STYLES } from './layout.ts';
import { materialLines } from './materials.ts';
import { citationMarker } from './references.ts';
import type { Content } from './types.ts';

export function shapeWords(shape: SectionShape, f: ReportFormatter): string {
  switch (shape.kind) {
    case 'rectangle':
      return `rectangle ${f.length(shape.width)} wide × ${f.length(shape.height)} deep`;
    case 'tee':
      return `T: ${f.length(shape.height)} deep, web ${f.length(shape.webWidth)}, top flange ${f.length(shape.flangeWidth)} × ${f.length(shape.flangeThickness)}`;
    case 'inverted-tee':
      return `inverted T: ${f.length(shape.height)} deep, web ${f.length(shape.webWidth)}, bottom flange ${f.length(shape.flangeWidth)} × ${f.length(shape.flangeThickness)}`;
    case 'ell':
      return `L (flange on the ${shape.flangeSide}): ${f.length(shape.height)} deep, web ${f.length(shape.webWidth)}, flange ${f.length(shape.flangeWidth)} × ${f.length(shape.flangeThickness)}`;
    case 'i-shape':
      return `I: ${f.length(shape.height)} deep, web ${f.length(shape.webWidth)}, top flange ${f.length(shape.topFlangeWidth)} × ${f.length(shape.topFlangeThickness)}, bottom flange ${f.length(shape.bottomFlangeWidth)} × ${f.length(shape.bottomFlangeThickness)}`;
    case 'box':
      return `box ${f.length(shape.width)} × ${f.length(shape.height)}, walls ${f.length(shape.wallThickness)}, top ${f.length(shape.topThickness)}, bottom ${f.length(shape.bottomThickness)}`;
    case 'polygon':
      return `polygon of ${shape.outline.length} points${shape.voids && shape.voids.length > 0 ? ` with ${shape.voids.length} void${shape.voids.length === 1 ? '' : 's'}` : ''}`;
  }
}

function keyPointTable(f: ReportFormatter, curve: MomentCurvatureResult): Content {
  const rows = KEY_POINT_ORDER.flatMap((name) => {
    const kp = curve.keyPoints[name];
    if (!kp) return [];
    return [[
      KEY_POINT_LABELS[name],
      f.curvature(kp.curvature),
      f.moment(kp.moment),
      kp.neutralAxisDepth === null ? '—' : f.length(kp.neutralAxisDepth),
      f.strain(kp.compressionFaceStrain),
      f.strain(-kp.maxSteelTensileStrain),
      { text: kp.description, fontSize: 7 },
    ]];
  });
  return dataTable({
    widths: [58, 66, 52, 44, 44, 44, '*'],
    header: ['Key point', 'Curvature φ', 'Moment M', 'Neutral axis c', 'εc, comp. face', 'εs, extreme bar', 'Definition'],
    align: ['left', 'right', 'right', 'right', 'right', 'right', 'left'],
    rows,
  });
}

function curveFacts(f: ReportFormatter, curve: MomentCurvatureResult): Content {
  const b = curve.bilinear;
  const rows: [string, Content][] = [];
  if (b) {
    rows.push(
      ['Nominal yield of the idealisation φy, My (not first yield)', `${f.curvature(b.yieldCurvature)}, ${f.moment(b.yieldMoment)}`],
      ['Ultimate φu, Mu', `${f.curvature(b.ultimateCurvature)}, ${f.moment(b.ultimateMoment)}`],
      ['Effective stiffness EIeff = M′y/φ′y', f.rigidity(b.effectiveStiffness)],
      ['Idealisation', b.description],
    );
  }
  rows.push(
    ['Curvature ductility μφ = φu/φy', f.number(curve.curvatureDuctility)],
    ['φu/φ′y (first yield)', f.number(curve.firstYieldCurvatureDuctility)],
    ['End of the curve', f.say(curve.status.message)],
  );
  return factsTable(rows, 150);
}

/** The chapter of one section. */
export function sectionChapter(ctx: WriteContext, plan: SectionPlan): Content[] {
  const { f, project, refs } = ctx;
  const section = plan.definition;
  const used = `section ${section.name}`;
  const sr = plan.result;
  const hoops = section.hoops;
  const materialName = (id: string) => project.materials.find((m) => m.id === id)?.name ?? id;
  const facts: [string, Content][] = [
    ['Shape', shapeWords(section.shape, f)],
    ['Concrete', materialName(section.concreteId)],
    ['Hoops', hoops ? `${f.length(hoops.diameter)} ${materialName(hoops.steelId)} at ${f.length(hoops.spacing)}, ${hoops.verticalLegs} vertical legs, clear cover ${f.length(hoops.clearCover)}; ${hoops.closedAndAnchored ? 'closed and anchored' : 'not confirmed closed and anchored'}; core ${hoopsConfine(hoops) ? 'modelled as confined' : 'not modelled as confined'}` : 'none given'],
    ['Axial force', section.axialForce ? `${f.force(section.axialForce)} (compression +)` : 'none'],
  ];
  if (sr) {
    const e = sr.elastic;
    facts.push(
      ['Gross area Ag', f.area(e.grossArea)],
      ['Centroid below the top', f.length(e.centroidDepth)],
      ['Gross Ig', f.secondMoment(e.grossInertia)],
      ['Uncracked transformed I', f.secondMoment(e.uncrackedInertia)],
      ['Cracked Icr, sagging / hogging', `${e.cracked.sagging ? f.secondMoment(e.cracked.sagging.inertia) : '—'} / ${e.cracked.hogging ? f.secondMoment(e.cracked.hogging.inertia) : '—'}`],
      ['Mcr, sagging / hogging', `${f.moment(e.crackingMoment.sagging.gross)} / ${f.moment(e.crackingMoment.hogging.gross)} (fr·Ig/yt, fr = ${f.concreteStress(e.tensileStrength)})`],
      ['Self-weight', f.lineLoad(sr.selfWeight)],
    );
  }
  const bars = dataTable({
    widths: [90, 90, 70, 70, '*'],
    header: ['Layer', 'Bars', 'Area', 'Depth from top', 'Steel, spread'],
    align: ['left', 'left', 'right', 'right', 'left'],
    rows: section.bars.map((b, i) => [
      b.label ?? `layer ${i + 1}`,
      b.count !== undefined && b.diameter !== undefined ? `${b.count} × ${f.length(b.diameter)}` : 'given as an area',
      f.area(layerArea(b)),
      f.length(b.depth),
      `${materialName(b.steelId)}, ${b.spread === 'chord' ? 'across the full width' : 'within the web hoops'}`,
    ]),
  });
  const lines = materialLines(project, [section], f);
  const out: Content[] = [
    heading(`Section ${section.name}`, 'h1', { pageBreak: true, id: plan.anchor }),
    { text: `Used by member${plan.usedBy.length === 1 ? '' : 's'} ${plan.usedBy.join(', ')}.`, color: COLOURS.muted, margin: [0, -4, 0, 6] },
    keepTogether([
      h2('Geometry and properties'),
      drawingWithFacts(ctx, plan.drawing, factsTable(facts, 105, [0, 0, 0, 0])),
    ]),
    small(section.bars.length, [h3('Reinforcement'), bars]),
    ...(section.notes ? [{ text: `Note: ${section.notes}`, ...STYLES.note }] : []),
    small(lines.length * 3, [h3('Materials'), dataTable({
      widths: [95, 110, '*', 38],
      header: ['Material', 'Stress–strain law', 'Parameters (code-basis defaults filled in)', 'Sources'],
      rows: lines.map((line) => [
        line.name,
        line.law,
        { stack: line.parameters.map((p) => ({ text: p })) },
        citationMarker(refs.citeAll(line.references, used, 'stress–strain law')),
      ]),
    })]),
  ];
  if (!sr) {
    out.push({ text: 'This section could not be analysed: see the input errors of the members that use it.', color: COLOURS.fail });
    return out;
  }
  out.push(keepTogether([h2('Moment–curvature'), ...(plan.momentCurvature ? figureNode(ctx, plan.momentCurvature) : [{ text: 'No curve: the section has no tension reinforcement in either direction.', ...STYLES.body }])]));
  for (const direction of ['sagging', 'hogging'] as const) {
    const curve = sr[direction];
    if (!curve) continue;
    out.push(keepTogether([h3(`Key points, ${direction} (curvature and moment as magnitudes; strains compression +)`), keyPointTable(f, curve), curveFacts(f, curve)]));
  }
  const half = Math.floor((ctx.page.contentWidth - 12) / 2);
  for (const profile of plan.profiles) {
    const curve = sr[profile.direction]!;
    profile.states.forEach((state, k) => {
      const pair = { columns: [{ width: half, stack: figureNode(ctx, state.strain) }, { width: half, stack: figureNode(ctx, state.stress) }], columnGap: 12 };
      out.push(keepTogether(k === 0 ? [h2(`Strain and stress over the depth, ${profile.direction}`), pair] : [pair]));
    });
    const rows: Content[][] = [];
    for (const state of profile.states) {
      const kp = curve.keyPoints[state.name];
      if (!kp) continue;
      for (const e of kp.state.elements) rows.push([state.words, e.label, f.length(e.depth), f.strain(e.strain), f.stress(e.stress), f.force(e.force)]);
      rows.push([state.words, { text: 'resultants: compression C, tension T, lever arm z', italics: true }, '', '', `C = ${f.force(kp.state.compressionResultant)}`, `T = ${f.force(kp.state.tensionResultant)}, z = ${kp.state.leverArm === null ? '—' : f.length(kp.state.leverArm)}`]);
    }
    out.push(small(rows.length, [dataTable({
      widths: [52, '*', 52, 52, 62, 110],
      header: ['State', 'Element', 'Depth', 'Strain', 'Stress', 'Force (compression +)'],
      align: ['left', 'left', 'right', 'right', 'right', 'right'],
      rows,
    })]));
  }
  const warnings = [...sr.warnings.map((w) => f.say(w)), ...(sr.sagging?.warnings ?? []).map((w) => `sagging: ${w}`), ...(sr.hogging?.warnings ?? []).map((w) => `hogging: ${w}`)];
  if (warnings.length > 0) out.push(small(warnings.length, [h3('Warnings'), bullets(warnings)]));
  return out;
}
