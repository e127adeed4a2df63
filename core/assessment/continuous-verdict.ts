/**
 * A continuous member assessed: the engine's results (core/continuous), the code's strength and
 * shear checks at every station with brittleness (continuous.ts), and the verdict — the status and
 * the span that governs, what the command line's row, the app and the report say.
 */
export { deflectionSense, governingDeflection } from '../continuous/governing.ts';
import { deflectionSense } from '../continuous/governing.ts';
import { analyzeContinuousBeam, type ContinuousBeamResult, type ContinuousContext } from '../continuous/analyze.ts';
import type { ContinuousBeamDefinition } from '../continuous/definition.ts';
import { capitalised, joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import type { LoadCombination } from './combinations.ts';
import { exceedsBeyondRounding } from '../numeric/ties.ts';
import { continuousChecks, stationWords, type ContinuousChecks } from './continuous.ts';
import type { AciEdition } from './shear-aci.ts';
import type { ShearZone } from './shear-section.ts';

/**
 * Statuses of a continuous member, as a single span's (core/assessment/results.ts MEMBER_STATUSES),
 * and `review`: the code checks at the stations could not be made (no definitions or concrete for
 * the sections) — never shown as OK.
 */
export type ContinuousStatus = 'check-fails' | 'not-converged' | 'input-error' | 'review' | 'brittle' | 'ok';

export interface ContinuousVerdict {
  readonly status: ContinuousStatus;
  /** The span (or cantilever) that governs, e.g. "span 1". */
  readonly governingSpan: string | null;
  /** The governing check in words: span, station, sense, combination and arrangement where a station check governs. */
  readonly governingMode: Text;
  /** Largest deflection utilisation of any span (governing method / limit). */
  readonly deflectionUtilisation: number | null;
  /** Largest load of the analysis to failure over the factored load of the same arrangement. */
  readonly collapseRatio: number | null;
  /** Largest flexural and shear utilisation of the code checks at the stations (null: not made). */
  readonly strengthUtilisation: number | null;
  readonly shearUtilisation: number | null;
  /** False when the beam is brittle: its ductility and hinge rotations are then not to be relied on. */
  readonly ductilityAvailable: boolean;
}

/** The flexural and shear clauses of the sentence. */
function checkClauses(checks: ContinuousChecks): Text[] {
  const f = checks.flexureGoverning;
  const v = checks.shear.governing;
  return [
    phrase`strength check ${checks.flexure.pass ? 'passes' : 'fails'} (utilisation ${f.utilisation.toFixed(2)}: ${stationWords(f, 'moment')})`,
    phrase`shear check ${checks.shear.pass ? 'passes' : 'fails'} (utilisation ${v.utilisation.toFixed(2)}${v.supportFace ? ' at the support face, EN 1992-1-1 Eq. (6.5)' : ''}: ${stationWords(v, 'shear')})`,
  ];
}

/**
 * The verdict of a continuous member, by the rules of a single span (core/assessment/verdict.ts
 * memberStatus): a failing strength or shear check at any station fails the beam even where the
 * analysis to failure did not converge; then not converged; then the mechanism below the factored
 * loads or a span's deflection above its limit fails it; then brittle (brittle.ts findings); OK
 * only when every check passes and the beam is ductile. Without the station checks: review.
 */
export function continuousVerdict(result: ContinuousBeamResult, checks: ContinuousChecks | null): ContinuousVerdict {
  const none = { deflectionUtilisation: null, collapseRatio: null, strengthUtilisation: null, shearUtilisation: null, ductilityAvailable: false };
  if (result.errors.length > 0) return { status: 'input-error', governingSpan: null, governingMode: 'input errors', ...none };
  let worst: { utilisation: number; span: string; words: Text } | null = null;
  for (const part of result.service?.parts ?? []) {
    for (const check of part.checks) {
      if (!worst || exceedsBeyondRounding(check.utilisation, worst.utilisation)) {
        worst = {
          utilisation: check.utilisation,
          span: part.name,
          words: phrase`Deflection check ${check.pass ? 'passes' : 'fails'} in ${part.name} (utilisation ${check.utilisation.toFixed(2)}): ${check.quantity} ${q('deflection', deflectionSense(check.governing).magnitude)}${deflectionSense(check.governing).sense} against ${q('deflection', check.limit)}, ${check.description}`,
        };
      }
    }
  }
  const brittle = checks?.brittle ?? [];
  const common = {
    collapseRatio: result.strengthLevel?.ratio ?? null,
    deflectionUtilisation: worst?.utilisation ?? null,
    strengthUtilisation: checks?.flexure.utilisation ?? null,
    shearUtilisation: checks?.shear.utilisation ?? null,
    ductilityAvailable: brittle.length === 0,
  };
  const collapseRatio = common.collapseRatio;
  const capacity = result.capacity;
  const firstHinge = capacity?.hinges[0]?.part ?? null;
  if (checks && (!checks.flexure.pass || !checks.shear.pass)) {
    const flexureWorse = !checks.flexure.pass && (checks.shear.pass || checks.flexure.utilisation >= checks.shear.utilisation);
    const g = flexureWorse ? checks.flexureGoverning : checks.shear.governing;
    const [flexure, shear] = checkClauses(checks);
    return { status: 'check-fails', governingSpan: g.part, governingMode: flexureWorse ? phrase`${capitalised(flexure!)}; ${shear!}` : phrase`${capitalised(shear!)}; ${flexure!}`, ...common };
  }
  // The station checks (passing here) follow the governing words when they were made.
  const withChecks = (words: Text): Text => (checks ? phrase`${words}; ${joinTexts(checkClauses(checks), '; ')}` : words);
  if (capacity && !capacity.converged) return { status: 'not-converged', governingSpan: worst?.span ?? null, governingMode: withChecks(capitalised(`the analysis to failure did not converge: ${capacity.failureCause}`)), ...common };
  if (collapseRatio !== null && collapseRatio < 1) {
    return { status: 'check-fails', governingSpan: firstHinge, governingMode: withChecks(`The beam fails at ${(collapseRatio * 100).toFixed(0)} % of the factored loads (${capacity!.failureCause})`), ...common };
  }
  if (worst && worst.utilisation > 1) return { status: 'check-fails', governingSpan: worst.span, governingMode: withChecks(worst.words), ...common };
  const deflection = worst ? `deflections within their limits (largest ${worst.utilisation.toFixed(2)} of the limit, ${worst.span})` : 'no deflection limit checked';
  const mechanism = collapseRatio !== null ? `the mechanism at ${collapseRatio.toFixed(2)} × the factored loads` : 'no analysis to failure';
  if (!checks) {
    return { status: 'review', governingSpan: worst?.span ?? firstHinge, governingMode: `${deflection} and ${mechanism}; the code's strength and shear checks at the stations could not be made`, ...common };
  }
  const clauses = checkClauses(checks);
  const governingSpan = checks.flexure.utilisation >= checks.shear.utilisation ? checks.flexureGoverning.part : checks.shear.governing.part;
  if (brittle.length > 0) {
    return { status: 'brittle', governingSpan, governingMode: phrase`Brittle: ${joinTexts(brittle.map((b) => b.text), '; ')}; ${joinTexts(clauses, '; ')}; ${deflection}; ${mechanism}`, ...common };
  }
  return { status: 'ok', governingSpan, governingMode: phrase`${capitalised(joinTexts(clauses, '; '))}; ${deflection}; ${mechanism}`, ...common };
}

/** A continuous member's results with its station checks and verdict (what a project's results hold for it). */
export interface ContinuousMemberResult extends ContinuousBeamResult {
  /** The code's strength and shear checks at every station, and brittleness (continuous.ts); null when not made. */
  readonly checks: ContinuousChecks | null;
  readonly verdict: ContinuousVerdict;
}

/** The results of a continuous member with its checks and verdict. */
export function withVerdict(result: ContinuousBeamResult, checks: ContinuousChecks | null = null): ContinuousMemberResult {
  return { ...result, checks, verdict: continuousVerdict(result, checks) };
}

/** What the assessment of a continuous member needs beyond its engine's context. */
export interface ContinuousAssessmentContext extends ContinuousContext {
  /**
   * What the code's strength and shear checks at every station need: the strength combinations,
   * each section's definition, concrete and stirrup steel, and the form of ACI's unit-dependent
   * expressions. Without it the checks are not made and the verdict reads "review".
   */
  readonly checks?: {
    readonly combinations: readonly LoadCombination[];
    zone(sectionId: string): Omit<ShearZone, 'from' | 'to' | 'analysis'> | undefined;
    readonly edition?: AciEdition;
  };
}

/**
 * A continuous member through the engine, the station checks and the verdict. Never throws for bad
 * input (the engine reports it); a defect in the checks is reported as a warning and the verdict is
 * then "review", never OK.
 */
export function assessContinuousMember(def: ContinuousBeamDefinition, context: ContinuousAssessmentContext): ContinuousMemberResult {
  const result = analyzeContinuousBeam(def, context);
  const given = context.checks;
  if (result.errors.length > 0 || !given || !result.elastic) return withVerdict(result);
  const zones = def.zones.map((z) => {
    const extra = given.zone(z.sectionId);
    const analysis = context.section(z.sectionId);
    return extra && analysis ? { ...extra, from: z.from, to: z.to, analysis } : null;
  });
  if (!zones.every((z): z is ShearZone => z !== null)) {
    return withVerdict({ ...result, warnings: [...result.warnings, 'The strength and shear checks at the stations were not made: a section\'s definition or concrete could not be resolved.'] });
  }
  const capacity = result.capacity;
  try {
    const checks = continuousChecks({
      code: context.code,
      definition: def,
      elastic: result.elastic,
      zones,
      combinations: given.combinations,
      ...(given.edition ? { edition: given.edition } : {}),
      failure: capacity && result.failureLoads && capacity.peakLoadFactor > 0 ? { ...result.failureLoads, loadFactor: capacity.peakLoadFactor, peak: capacity.peakState, distributions: capacity.distributions } : null,
    });
    return withVerdict(result, checks);
  } catch (error) {
    return withVerdict({ ...result, warnings: [...result.warnings, `The strength and shear checks at the stations could not be made (internal error, please report): ${error instanceof Error ? error.message : String(error)}`] });
  }
}

