/**
 * Service deflections as the loads come on and time passes, by both methods, with the deflection
 * limits: the control-point deflection at each step of a load history (dead load; the sustained
 * load D + ψL; the full service load for a moment; back to the sustained load for the load
 * duration, creep and shrinkage acting; the rest of the live load on top), one line for the
 * integration of the moment–curvature laws and one for the code method.
 *
 * Each limit check compares an increase of deflection between two steps of this history (member
 * service.ts `checkQuantity`): e.g. the ACI immediate live-load limit the step from dead load to
 * the full service load. Its limit is drawn as a short line over the step where it is checked, at
 * the deflection the governing method had at the step the increase is counted from plus the
 * allowed increase — so the governing line passes the check exactly when it stays below the
 * limit line (test/core/charts/service.test.ts checks these increases against the checks).
 *
 * Units: deflections mm → display (mm / in).
 */
import type { DeflectionLimitCase } from '../member/definition.ts';
import type { DeflectionCheck, ServiceDeflections } from '../member/results.ts';
import type { ChartPoint, ChartSpec, MarkerSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitText } from './units.ts';
import { OUTSIDE_SMALL_DEFLECTION, SMALL_DEFLECTION_RATIO, serviceOutsideRange } from '../member/small-deflection.ts';

/** Steps of the load history, in order. */
export const SERVICE_STEPS = ['unloaded', 'dead', 'sustained', 'service', 'sustained-long', 'final'] as const;
export type ServiceStep = (typeof SERVICE_STEPS)[number];

/** Deflection at each step by one method, mm. */
export function serviceStepDeflections(service: ServiceDeflections, method: 'integration' | 'code'): Readonly<Record<ServiceStep, number>> {
  const immediate = service.immediate[method];
  const longTotal = method === 'integration' ? service.longTerm.integrationTotal : service.longTerm.codeTotal;
  return {
    unloaded: 0,
    dead: immediate.dead,
    sustained: immediate.sustained,
    service: immediate.deadPlusLive,
    'sustained-long': longTotal,
    // The non-sustained live load on top of the long-term state adds its short-term increment.
    final: longTotal + (immediate.deadPlusLive - immediate.sustained),
  };
}

/**
 * Where a limit check sits in the history: the step whose deflection is checked and the step the
 * increase is counted from (member/service.ts `checkQuantity`).
 */
export const CHECK_STEPS: Readonly<Record<DeflectionLimitCase, { readonly at: ServiceStep; readonly from: ServiceStep }>> = {
  // ACI 318-19 Table 24.2.2: immediate deflection due to live load.
  'aci-roof-immediate': { at: 'service', from: 'dead' },
  'aci-floor-immediate': { at: 'service', from: 'dead' },
  // ACI 318-19 Table 24.2.2: the part after attachment of non-structural elements — long-term under sustained load plus the immediate live load.
  'aci-sensitive-after-attachment': { at: 'final', from: 'dead' },
  'aci-insensitive-after-attachment': { at: 'final', from: 'dead' },
  // EN 1992-1-1 7.4.1(4): total under the quasi-permanent load; 7.4.1(5): after construction.
  'en-appearance': { at: 'sustained-long', from: 'unloaded' },
  'en-after-construction': { at: 'sustained-long', from: 'dead' },
  custom: { at: 'final', from: 'unloaded' },
};

/** The increase of deflection a check compares, by one method, from the history (mm). */
export function checkIncrease(service: ServiceDeflections, check: Pick<DeflectionCheck, 'limitCase'>, method: 'integration' | 'code'): number {
  const steps = serviceStepDeflections(service, method);
  const { at, from } = CHECK_STEPS[check.limitCase];
  return steps[at] - steps[from];
}

/** Names of the steps on the axis (lines of one label). */
function stepNames(durationMonths: number | null): readonly (readonly string[])[] {
  return [
    ['unloaded'],
    ['dead load', 'D'],
    ['sustained', 'D + ψL'],
    ['service', 'D + L'],
    ['D + ψL after', durationMonths !== null ? `${durationMonths} months` : 'long term'],
    ['then the', 'rest of L'],
  ];
}

/**
 * Chart spec of the service deflections of a member.
 * @param durationMonths the load duration, for the axis label (null: "long term")
 * @param span the member's span, mm: deflections beyond span/50 are outside the method's range and not drawn
 * Degenerate cases: no service result or one outside the range → `emptyMessage`; values that are not finite are left out.
 */
export function serviceDeflectionChart(service: ServiceDeflections | null, unitsInput: UnitsInput, durationMonths: number | null = null, span?: number): ChartSpec {
  const units = resolveUnits(unitsInput);
  const base: ChartSpec = {
    kind: 'service-deflection',
    title: 'Service deflections by load step',
    subtitle: 'at the control point, downward positive; ψ = sustained part of the live load',
    x: { ...axisFor('Load step', '', 1), categories: stepNames(durationMonths) },
    y: axisFor('Deflection Δ', unitText('deflection', units), 1, { includeZero: true }),
    series: [],
    markers: [],
    bands: [],
    referenceLines: [],
    notes: [],
  };
  if (!service) return { ...base, emptyMessage: 'No service deflections (the member was not analysed).' };
  if (span !== undefined && serviceOutsideRange(service, span)) return { ...base, emptyMessage: `No service deflections: ${OUTSIDE_SMALL_DEFLECTION} (beyond span/${SMALL_DEFLECTION_RATIO}).` };
  const integration = serviceStepDeflections(service, 'integration');
  const code = serviceStepDeflections(service, 'code');
  const values = [...Object.values(integration), ...Object.values(code), ...service.checks.map((c) => c.limit)].map((v) => display('deflection', v, units));
  const yScale = axisScale(values);
  const y = (mm: number) => display('deflection', mm, units) / yScale;
  const line = (steps: Readonly<Record<ServiceStep, number>>): ChartPoint[] => SERVICE_STEPS.map((s, i) => (finite(steps[s]) && finite(y(steps[s])) ? { x: i, y: y(steps[s]) } : null));
  const series: SeriesSpec[] = [
    { id: 'integration', label: 'integration of the moment–curvature laws', points: line(integration), colour: 'blue', style: 'solid', width: 1.8 },
    { id: 'code', label: `code method (${service.codeMethod.name.split(':')[0]!.split(' effective')[0]})`, points: line(code), colour: 'orange', style: 'dashed', width: 1.6 },
  ];
  const markers: MarkerSpec[] = [];
  service.checks.forEach((check, k) => {
    const { at, from } = CHECK_STEPS[check.limitCase];
    const governing = check.byIntegration >= check.byCode ? integration : code;
    const top = governing[from] + check.limit;
    if (!finite(top) || !finite(y(top))) return;
    const i = SERVICE_STEPS.indexOf(at);
    // Short lines over the step, side by side when two checks share a step.
    const shared = service.checks.filter((c) => CHECK_STEPS[c.limitCase].at === at);
    const slot = shared.indexOf(check);
    const half = 0.36 / shared.length;
    const centre = i + (slot - (shared.length - 1) / 2) * 2 * half;
    series.push({
      id: `limit-${k}`,
      label: `limit ℓ/${check.ratio}${from === 'unloaded' ? '' : ', counted from the dead-load deflection'}${check.pass ? '' : ' (exceeded)'}`,
      points: [{ x: centre - half, y: y(top) }, { x: centre + half, y: y(top) }],
      colour: 'red',
      style: 'dotted',
      width: 2,
    });
    markers.push({ x: centre, y: y(top), label: `ℓ/${check.ratio}`, shape: check.pass ? 'diamond' : 'cross', colour: 'red' });
  });
  return {
    ...base,
    y: axisFor('Deflection Δ', unitText('deflection', units), yScale, { includeZero: true }),
    series,
    markers,
    notes: [],
  };
}
