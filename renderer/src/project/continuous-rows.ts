/**
 * What the project tree and the overview show of a continuous member: one row per member with its
 * governing span, picked from the results core computed (nothing is computed here). Internal units.
 */
import type { ContinuousMemberDefinition } from '../../../core/project/types.ts';
// Types only: the verdict's module brings the assessment engine with it, which stays in the workers.
import type { ContinuousMemberResult } from '../../../core/assessment/continuous-verdict.ts';
import { governingDeflection } from '../../../core/continuous/governing.ts';
import type { Text } from '../../../core/units/phrase.ts';
import type { BadgeStatus } from './labels.ts';

export interface ContinuousRowData {
  /** e.g. `3 spans, columns` / `2 spans + cantilever, pins`. */
  readonly supportsText: string;
  /** e.g. `3 spans` / `2 spans + c.` (the overview's narrow column; the whole text is its tooltip). */
  readonly supportsShort: string;
  /** The governing span (or cantilever) by name, e.g. `span 1`, and its length, mm. */
  readonly governingPart: string | null;
  readonly governingLength: number | null;
  /** Displacement ductility at the control point (null when withdrawn or not reached). */
  readonly displacementDuctility: number | null;
  /** Plastic rotation capacity of the hinge closest to its capacity, rad. */
  readonly rotationCapacity: number | null;
  /** The governing deflection check (largest utilisation of any span). */
  readonly deflection: { readonly deflection: number; readonly limit: number; readonly utilisation: number; readonly pass: boolean; readonly description: string } | null;
  /** Largest load of the analysis to failure over the factored loads of the same arrangement. */
  readonly collapseRatio: number | null;
  /** Largest flexural utilisation of the code's checks at the stations (null: not made), where it governs, and shear's. */
  readonly strengthUtilisation: number | null;
  readonly strengthWhere: string | null;
  readonly shearUtilisation: number | null;
  /** The verdict's governing check in words (the governing part is `governingPart`). */
  readonly governingMode: Text;
}

/** `3 spans, columns`: the count of spans, cantilevers, and the kinds of the inner supports. */
export function supportsText(def: ContinuousMemberDefinition): string {
  const n = def.spans.length;
  const cantilevers = [(def.leftCantilever ?? 0) > 0, (def.rightCantilever ?? 0) > 0].filter(Boolean).length;
  const kinds = [...new Set(def.supports.map((s) => (s.kind === 'column' ? 'columns' : s.kind === 'fixed' ? 'fixed' : 'pins')))];
  return `${n} span${n === 1 ? '' : 's'}${cantilevers > 0 ? ` + ${cantilevers === 1 ? 'cantilever' : '2 cantilevers'}` : ''}, ${kinds.join('/')}`;
}

/** The row of a continuous member from its results (null results: only the definition's words). */
export function continuousRowData(def: ContinuousMemberDefinition, result: ContinuousMemberResult | null): ContinuousRowData {
  const verdict = result?.verdict ?? null;
  const governing = result ? governingDeflection(result) : null;
  const partName = verdict?.governingSpan ?? governing?.part ?? null;
  const part = result?.parts.find((p) => p.name === partName) ?? null;
  const hinges = result?.capacity?.hinges ?? [];
  const critical = hinges.reduce<(typeof hinges)[number] | null>((a, h) => (!a || (h.demandRatio ?? 0) > (a.demandRatio ?? 0) ? h : a), null);
  const check = governing?.check ?? null;
  const flexure = result?.checks?.flexureGoverning ?? null;
  return {
    supportsText: supportsText(def),
    supportsShort: `${def.spans.length} spans${(def.leftCantilever ?? 0) > 0 || (def.rightCantilever ?? 0) > 0 ? ' + c.' : ''}`,
    governingPart: partName,
    governingLength: part ? part.to - part.from : null,
    // A brittle beam's ductility and hinge rotations are not to be relied on: withheld, as for single spans.
    displacementDuctility: verdict?.ductilityAvailable === false ? null : result?.capacity?.displacementDuctility ?? null,
    rotationCapacity: verdict?.ductilityAvailable === false ? null : critical?.rotationCapacity ?? null,
    deflection: check ? { deflection: check.governing, limit: check.limit, utilisation: check.utilisation, pass: check.pass, description: `${governing!.part}: ${check.description}` } : null,
    collapseRatio: verdict?.collapseRatio ?? null,
    strengthUtilisation: verdict?.strengthUtilisation ?? null,
    strengthWhere: flexure ? `${flexure.part}, ${flexure.direction}, under ${flexure.combination}; ${flexure.arrangement}` : null,
    shearUtilisation: verdict?.shearUtilisation ?? null,
    governingMode: verdict?.governingMode ?? '',
  };
}

/** The badge of a continuous member: its verdict, or not analysed / updating. */
export function continuousStatus(view: { readonly result: ContinuousMemberResult; readonly current: boolean } | null): BadgeStatus {
  if (!view) return 'pending';
  return view.current ? (view.result.verdict.status as BadgeStatus) : 'outdated';
}
