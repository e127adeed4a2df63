/**
 * The figures of a continuous member's report chapter (continuous.ts): the elevation (SVG), the
 * moment and the shear envelopes (chart specs), planned with the rest of the report (figures.ts).
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import { continuousEnvelopeChart } from '../charts/continuous.ts';
import { continuousElevationSvg } from '../charts/continuous-elevation.ts';
import type { ContinuousBeamDefinition } from '../continuous/definition.ts';
import type { Project } from '../project/types.ts';
import { REPORT_FONT_FAMILY } from './fonts.ts';
import type { PageGeometry } from './layout.ts';
import type { ReportFigure } from './types.ts';

/** A continuous member's chapter: definition, result and figure ids. */
export interface ContinuousPlan {
  readonly definition: ContinuousBeamDefinition;
  readonly index: number;
  readonly anchor: string;
  readonly result: ContinuousMemberResult | null;
  readonly elevation: string | null;
  readonly moment: string | null;
  readonly shear: string | null;
}

/**
 * The continuous members to report (all, or those whose ids are in `memberIds`) with their figures,
 * added through `add` (which shares identical figures).
 */
export function planContinuous(project: Project, results: readonly ContinuousMemberResult[], memberIds: readonly string[] | undefined, system: 'SI' | 'US', page: PageGeometry, add: (id: string, figure: ReportFigure) => string): ContinuousPlan[] {
  const wanted = memberIds ? new Set(memberIds) : null;
  const width = Math.floor(page.contentWidth);
  const code = project.info.codeBasis;
  return (project.continuousMembers ?? []).flatMap((definition, index) => {
    if (wanted && !wanted.has(definition.id)) return [];
    const result = results.find((r) => r.memberId === definition.id) ?? null;
    const analysed = result !== null && result.errors.length === 0 && result.elastic !== null;
    let elevation: string | null = null;
    let moment: string | null = null;
    let shear: string | null = null;
    if (analysed) {
      const drawing = continuousElevationSvg(result, definition.supports, definition.zones, system, { width, fontFamily: REPORT_FONT_FAMILY });
      elevation = add(`continuous-${index}/elevation`, { kind: 'svg', svg: drawing.svg, width: drawing.width, height: drawing.height, caption: drawing.caption });
      moment = add(`continuous-${index}/moment`, { kind: 'chart', spec: continuousEnvelopeChart(result, 'moment', system, { design: code }), width, height: 250 });
      if (result.checks) shear = add(`continuous-${index}/shear`, { kind: 'chart', spec: continuousEnvelopeChart(result, 'shear', system, { design: code }), width, height: 230 });
    }
    return [{ definition, index, anchor: `continuous-${index}`, result, elevation, moment, shear }];
  });
}

