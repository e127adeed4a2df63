/**
 * What the report contains and which figures it needs, with stable ids: chart specs (drawn by the
 * host with chart.js) and section drawings (SVG, drawn here).
 *
 * Sections are analysed once per project, so each section used by the reported members gets one
 * chapter (drawing, moment–curvature, key points, strain and stress profiles); member chapters
 * refer to it. Figures with identical content (e.g. the curves of two identical bays) are listed
 * once and shared.
 */
import { sectionMomentCurvatureChart } from '../charts/moment-curvature.ts';
import { loadDeflectionChart } from '../charts/load-deflection.ts';
import { spanPanelsChart } from '../charts/span-distribution.ts';
import { sectionProfileChart } from '../charts/section-profile.ts';
import { sectionDrawingSvg } from '../charts/section-drawing.ts';
import type { SectionResult } from '../member/results.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { BendingDirection } from '../section/model.ts';
import type { KeyPointName } from '../section/results.ts';
import { displaySystem } from './format.ts';
import { pageGeometry } from './layout.ts';
import { REPORT_FONT_FAMILY } from './fonts.ts';
import type { ReportFigure, ReportInput } from './types.ts';
import type { MemberDefinition } from '../project/types.ts';
import type { MemberResult } from '../assessment/results.ts';
import { planExisting, type ExistingPlan } from './existing-plan.ts';
import { planContinuous, type ContinuousPlan } from './continuous-plan.ts';

/** States whose strain and stress profiles are shown. */
export const PROFILE_STATES: readonly { readonly name: KeyPointName; readonly words: string }[] = [
  { name: 'firstYield', words: 'first yield' },
  { name: 'ultimate', words: 'ultimate' },
];

export interface ProfileFigures {
  readonly direction: BendingDirection;
  readonly states: readonly { readonly name: KeyPointName; readonly words: string; readonly strain: string; readonly stress: string }[];
}

/** A section chapter: the definition, its results (from any member that uses it) and figures. */
export interface SectionPlan {
  readonly definition: SectionDefinition;
  readonly index: number;
  /** Anchor id of the chapter (for page references). */
  readonly anchor: string;
  readonly result: SectionResult | null;
  /** Names of the reported members that use it. */
  readonly usedBy: readonly string[];
  readonly drawing: string;
  readonly momentCurvature: string | null;
  readonly profiles: readonly ProfileFigures[];
}

export interface MemberPlan {
  readonly definition: MemberDefinition;
  readonly index: number;
  readonly anchor: string;
  readonly result: MemberResult | null;
  readonly loadDeflection: string | null;
  readonly span: string | null;
  /** An existing beam's figures (as found, schemes, comparison, shear), or null. */
  readonly existing: ExistingPlan | null;
}

export interface ReportPlan {
  readonly sections: readonly SectionPlan[];
  /** Members to report, in project order, with their results (null: no result for that member). */
  readonly members: readonly MemberPlan[];
  /** Continuous members to report, in project order (continuous.ts). */
  readonly continuous: readonly ContinuousPlan[];
  readonly figures: Record<string, ReportFigure>;
}

/** Share of the content width a section drawing may take beside its properties table. */
export const SIDE_DRAWING_SHARE = 0.55;

/** Sections (ids) a member uses, in zone order, without repeats. */
export function memberSectionIds(definition: MemberDefinition): string[] {
  return [...new Set(definition.zones.map((z) => z.sectionId))];
}

/**
 * Plans the report (pure; deterministic ids and specs). Units: the project's display system.
 * A figure whose content equals an earlier one reuses that figure's id.
 */
export function planReport(input: Pick<ReportInput, 'project' | 'results' | 'memberIds'>): ReportPlan {
  const { project, results } = input;
  const system = displaySystem(project.info.unitSystem);
  const page = pageGeometry(system);
  const full = { width: Math.floor(page.contentWidth), height: 250 };
  const tall = { width: Math.floor(page.contentWidth), height: 330 };
  const half = { width: Math.floor((page.contentWidth - 12) / 2), height: 215 };
  const wanted = input.memberIds ? new Set(input.memberIds) : null;
  const figures: Record<string, ReportFigure> = {};
  const byContent = new Map<string, string>();
  /** Adds a figure, or returns the id of an identical one already listed. */
  const add = (id: string, figure: ReportFigure): string => {
    const key = JSON.stringify(figure);
    const existing = byContent.get(key);
    if (existing) return existing;
    byContent.set(key, id);
    figures[id] = figure;
    return id;
  };

  const members: MemberPlan[] = project.members
    .map((definition, index) => ({ definition, index, result: results.members.find((r) => r.memberId === definition.id) ?? null }))
    .filter((m) => !wanted || wanted.has(m.definition.id))
    .map(({ definition, index, result }) => ({ definition, index, result, anchor: `member-${index}`, loadDeflection: null, span: null, existing: null }));

  const sections: SectionPlan[] = [];
  project.sections.forEach((definition, index) => {
    const users = members.filter((m) => memberSectionIds(m.definition).includes(definition.id));
    if (users.length === 0) return;
    const result = users.map((m) => m.result?.sections.find((s) => s.sectionId === definition.id)).find((s) => s !== undefined) ?? null;
    // Beside the properties table when the drawing can be large enough there; a wide, shallow
    // section (a T-beam with its slab) gets the full width above the table instead.
    let drawing = sectionDrawingSvg(definition, system, { maxWidth: Math.floor(page.contentWidth * SIDE_DRAWING_SHARE), maxHeight: 230, fontFamily: REPORT_FONT_FAMILY });
    if (drawing.scale === null || drawing.scale > 20) {
      const wide = sectionDrawingSvg(definition, system, { maxWidth: Math.floor(page.contentWidth), maxHeight: 180, fontFamily: REPORT_FONT_FAMILY });
      if (wide.scale !== null && (drawing.scale === null || wide.scale < drawing.scale)) drawing = wide;
    }
    const drawingId = add(`section-${index}/drawing`, { kind: 'svg', svg: drawing.svg, width: drawing.width, height: drawing.height, caption: `Section ${definition.name}, ${drawing.scaleText}.` });
    let momentCurvature: string | null = null;
    const profiles: ProfileFigures[] = [];
    if (result && (result.sagging || result.hogging)) {
      momentCurvature = add(`section-${index}/moment-curvature`, { kind: 'chart', spec: sectionMomentCurvatureChart(result, system), ...full });
      for (const direction of ['sagging', 'hogging'] as const) {
        const curve = result[direction];
        if (!curve) continue;
        const states: ProfileFigures['states'][number][] = [];
        for (const state of PROFILE_STATES) {
          const kp = curve.keyPoints[state.name];
          if (!kp) continue;
          const title = `${direction === 'sagging' ? 'Sagging' : 'Hogging'}, ${state.words}`;
          const strain = add(`section-${index}/${direction}/${state.name}/strain`, { kind: 'chart', spec: sectionProfileChart(kp.state, system, 'strain', { title: `Strain: ${title.toLowerCase()}` }), ...half });
          const stress = add(`section-${index}/${direction}/${state.name}/stress`, { kind: 'chart', spec: sectionProfileChart(kp.state, system, 'stress', { title: `Stress: ${title.toLowerCase()}` }), ...half });
          states.push({ name: state.name, words: state.words, strain, stress });
        }
        if (states.length > 0) profiles.push({ direction, states });
      }
    }
    sections.push({ definition, index, anchor: `section-${index}`, result, usedBy: users.map((m) => m.definition.name), drawing: drawingId, momentCurvature, profiles });
  });

  const planned = members.map((m) => {
    const r = m.result;
    const loadDeflection = r && r.loadDeflection.points.length > 0 ? add(`member-${m.index}/load-deflection`, { kind: 'chart', spec: loadDeflectionChart(r, system), ...full }) : null;
    const span = r && r.distributions.length > 0 ? add(`member-${m.index}/span`, { kind: 'chart', spec: spanPanelsChart(r, 'all', system), ...tall }) : null;
    return { ...m, loadDeflection, span, existing: planExisting(m, project, system, page, add) };
  });
  const continuous = planContinuous(project, results.continuous ?? [], input.memberIds, system, page, add);
  return { sections, members: planned, continuous, figures };
}

/**
 * Every figure the report document needs, by id: chart specs to draw (chart.js, any canvas) and
 * SVG section drawings (ready to use). The caller draws the charts and passes the results to
 * `buildReportDocument` as `images` (PNG data URL or SVG text per id).
 */
export function reportCharts(input: Pick<ReportInput, 'project' | 'results' | 'memberIds'>): Record<string, ReportFigure> {
  return planReport(input).figures;
}
