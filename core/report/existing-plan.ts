/**
 * The figures of an existing beam's part of the report (core/report/existing.ts): the sections as
 * found and as each scheme changes them (SVG drawings), the variants on shared moment–curvature and
 * load–deflection axes, and the shear diagram along the span. Planned with the other figures
 * (figures.ts) so that the host draws them before the document is written.
 */
import type { MemberResult } from '../assessment/results.ts';
import { shownVariants, variantLoadDeflectionChart, variantMomentCurvatureChart, variantSectionDrawing } from '../charts/retrofit.ts';
import { shearDiagramChart } from '../charts/shear.ts';
import { criticalOf } from '../charts/variant-table.ts';
import type { MemberDefinition, Project } from '../project/types.ts';
import { REPORT_FONT_FAMILY } from './fonts.ts';
import type { PageGeometry } from './layout.ts';
import type { ReportFigure } from './types.ts';

/** Figures of an existing member's part of the chapter (ids into the plan's figures). */
export interface ExistingPlan {
  /** The member's sections as found, each with its figure id. */
  readonly asFound: readonly { readonly baseSectionId: string; readonly figure: string }[];
  /** Each scheme's strengthened section (the critical one, else the first it changes). */
  readonly schemes: readonly { readonly schemeId: string; readonly figure: string }[];
  readonly momentCurvature: string | null;
  readonly loadDeflection: string | null;
  readonly shear: string | null;
}

/** What the existing-beam part of a chapter reads of a member's plan (figures.ts MemberPlan). */
export interface ExistingMember {
  readonly definition: MemberDefinition;
  readonly result: MemberResult | null;
  readonly existing: ExistingPlan | null;
}

/** True when the member is assessed as an existing beam (a condition or schemes given). */
export function isExisting(definition: MemberDefinition, result: MemberResult | null): boolean {
  return result?.retrofit !== undefined && (definition.asFound !== undefined || (definition.schemes ?? []).length > 0);
}

/**
 * Plans the figures of an existing member. `add` lists a figure (or returns the id of an identical
 * one). Units: the report's display system. Null for a member that is not an existing beam.
 */
export function planExisting(
  member: { readonly definition: MemberDefinition; readonly index: number; readonly result: MemberResult | null },
  project: Project,
  system: 'SI' | 'US',
  page: PageGeometry,
  add: (id: string, figure: ReportFigure) => string,
): ExistingPlan | null {
  const { definition, index, result } = member;
  if (!result || !isExisting(definition, result)) return null;
  const retrofit = result.retrofit!;
  const full = { width: Math.floor(page.contentWidth), height: 240 };
  const drawingSize = { maxWidth: Math.floor(page.contentWidth * 0.62), maxHeight: 200, fontFamily: REPORT_FONT_FAMILY };
  const id = (name: string) => `member-${index}/existing/${name}`;
  const asFound = (retrofit.asFound?.variant?.sections ?? []).map((section) => {
    const original = project.sections.find((s) => s.id === section.baseSectionId) ?? null;
    const shift = retrofit.asFound?.sections.find((s) => s.baseSectionId === section.baseSectionId)?.shift ?? 0;
    const d = variantSectionDrawing(section, original, shift, system, drawingSize);
    return { baseSectionId: section.baseSectionId, figure: add(id(`as-found/${section.baseSectionId}`), { kind: 'svg', svg: d.svg, width: d.width, height: d.height, caption: `Section ${original?.name ?? section.baseSectionId} as found, ${d.scaleText}.` }) };
  });
  const critical = criticalOf(retrofit);
  const schemes = retrofit.schemes.flatMap((s) => {
    const sections = s.variant?.sections ?? [];
    const section = sections.find((x) => x.baseSectionId === critical.baseSectionId && x.added.length > 0) ?? sections.find((x) => x.added.length > 0);
    if (!section) return [];
    const d = variantSectionDrawing(section, null, 0, system, drawingSize);
    return [{ schemeId: s.schemeId, figure: add(id(`scheme/${s.schemeId}`), { kind: 'svg', svg: d.svg, width: d.width, height: d.height, caption: `${s.name}: the section ${section.baseSectionId} as strengthened, ${d.scaleText}.` }) }];
  });
  const variants = shownVariants(retrofit);
  const momentCurvature = variants.length > 1 ? add(id('moment-curvature'), { kind: 'chart', spec: variantMomentCurvatureChart(retrofit, critical.baseSectionId, critical.direction, system), ...full }) : null;
  const loadDeflection = variants.length > 1 ? add(id('load-deflection'), { kind: 'chart', spec: variantLoadDeflectionChart(retrofit, system), ...full }) : null;
  const shear = result.shear?.diagram && result.shear.diagram.x.length > 0 ? add(id('shear'), { kind: 'chart', spec: shearDiagramChart(result.shear, system), ...full }) : null;
  return { asFound, schemes, momentCurvature, loadDeflection, shear };
}
