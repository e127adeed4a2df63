/**
 * `analyze --format json --detail full`: per member, what a checker needs to recompute or plot the
 * results outside Hingeline — every section's key points and curve points in both bending
 * directions, the load–deflection points and events, the hinges, the ductility figures and the
 * service deflections of both methods. Every dimensioned value is `{ value, unit }` in the chosen
 * unit system, as in the summary (format.ts); strains and ratios have unit "1". Pure: no I/O.
 * Keys are listed in docs/cli.md.
 */
import type { MemberResult } from '../../core/assessment/results.ts';
import type { SectionResult } from '../../core/member/results.ts';
import type { UnitSystem } from '../../core/project/types.ts';
import type { CurvePoint, MomentCurvatureResult } from '../../core/section/results.ts';
import { say } from '../../core/units/index.ts';
import { measured, pure } from './format.ts';

/** The state of a section at one point of its curve: curvature, moment, neutral axis, strains. */
function curveState(p: CurvePoint, system: UnitSystem) {
  return {
    curvature: measured('curvature', p.curvature, system),
    moment: measured('moment', p.moment, system),
    neutralAxisDepth: measured('sectionLength', p.neutralAxisDepth, system),
    compressionFaceStrain: pure(p.compressionFaceStrain),
    tensionFaceStrain: pure(p.tensionFaceStrain),
    maxSteelTensileStrain: pure(p.maxSteelTensileStrain),
  };
}

/** One bending direction of a section: status, strain limits, key points, idealisation, curve points. */
function curveDetail(c: MomentCurvatureResult, system: UnitSystem) {
  const limits = c.concreteLimits;
  return {
    status: c.status.kind,
    ultimateCause: c.status.kind === 'complete' ? c.status.ultimateCause : null,
    statusMessage: say(c.status.message, system),
    concreteLimits: {
      codeCrushingStrain: pure(limits.codeCrushingStrain),
      codeCrushingSource: limits.codeCrushingSource,
      ultimateStrain: limits.ultimateStrain ? { ...pure(limits.ultimateStrain.value)!, source: limits.ultimateStrain.source } : null,
    },
    keyPoints: (['cracking', 'firstYield', 'codeCrushing', 'nominal', 'peak', 'ultimate'] as const).flatMap((name) => {
      const k = c.keyPoints[name];
      return k ? [{ name, description: k.description, ...curveState(k, system) }] : [];
    }),
    bilinear: c.bilinear
      ? {
          method: c.bilinear.method,
          yieldCurvature: measured('curvature', c.bilinear.yieldCurvature, system),
          yieldMoment: measured('moment', c.bilinear.yieldMoment, system),
          ultimateCurvature: measured('curvature', c.bilinear.ultimateCurvature, system),
          ultimateMoment: measured('moment', c.bilinear.ultimateMoment, system),
        }
      : null,
    curvatureDuctility: pure(c.curvatureDuctility),
    points: c.points.map((p) => curveState(p, system)),
  };
}

function sectionDetail(s: SectionResult, system: UnitSystem) {
  return {
    id: s.sectionId,
    name: s.sectionName,
    sagging: s.sagging ? curveDetail(s.sagging, system) : null,
    hogging: s.hogging ? curveDetail(s.hogging, system) : null,
    warnings: s.warnings.map((w) => say(w, system)),
  };
}

/** The full detail of one analysed member (the design beam, or the as-found beam of an existing one). */
export function memberDetail(r: MemberResult, system: UnitSystem): unknown {
  const d = (v: number | null | undefined) => measured('deflection', v, system);
  const ld = r.loadDeflection;
  const sv = r.service;
  return {
    // An as-found concrete from cores carries two strengths: the mean for the behaviour, the lower fractile for the code checks.
    asFoundConcrete: (r.retrofit?.asFound?.concrete ?? []).map((c) => ({
      concreteId: c.concreteId,
      derivedId: c.derivedId,
      cores: { count: c.cores.count, coefficientOfVariation: pure(c.cores.coefficientOfVariation) },
      meanStrength: measured('concreteStress', c.cores.meanStrength, system),
      codeStrength: measured('concreteStress', c.inPlace.strength, system),
      specifiedStrength: measured('concreteStress', c.specifiedStrength, system),
      method: c.inPlace.method,
    })),
    sections: r.sections.map((s) => sectionDetail(s, system)),
    loadDeflection: {
      pattern: ld.pattern,
      controlPosition: measured('spanLength', ld.controlPosition, system),
      status: ld.status,
      points: ld.points.map((p) => ({ loadFactor: pure(p.loadFactor), totalLoad: measured('force', p.totalLoad, system), deflection: d(p.deflection), stage: p.stage })),
      events: ld.events.map((e) => ({ kind: e.kind, loadFactor: pure(e.loadFactor), deflection: d(e.deflection), position: measured('spanLength', e.position, system), together: (e.together ?? []).map((x) => measured('spanLength', x, system)), description: e.description })),
    },
    ductility: {
      firstYieldDeflection: d(r.ductility.firstYieldDeflection),
      yieldDeflection: d(r.ductility.yieldDeflection),
      ultimateDeflection: d(r.ductility.ultimateDeflection),
      displacementDuctility: pure(r.ductility.displacementDuctility),
      ultimateOutsideRange: r.ultimateOutsideRange ? say(r.ultimateOutsideRange, system) : null,
      failureCause: r.ductility.failureCause,
    },
    hinges: r.ductility.hinges.map((h) => ({
      order: h.order,
      position: measured('spanLength', h.position, system),
      together: (h.together ?? []).map((x) => measured('spanLength', x, system)),
      direction: h.direction,
      sectionId: h.sectionId,
      length: measured('sectionLength', h.length, system),
      lengthMethod: h.lengthMethod,
      lengthFormula: say(h.lengthFormula, system),
      shearSpan: measured('spanLength', h.shearSpan, system),
      rotationCapacity: measured('rotation', h.rotationCapacity, system),
      rotationAtUltimate: measured('rotation', h.rotationAtUltimate, system),
      curvatureDuctility: pure(h.curvatureDuctility),
    })),
    service: sv
      ? {
          immediate: Object.fromEntries((['integration', 'code'] as const).map((m) => [m, {
            dead: d(sv.immediate[m].dead),
            deadPlusLive: d(sv.immediate[m].deadPlusLive),
            live: d(sv.immediate[m].live),
            sustained: d(sv.immediate[m].sustained),
          }])),
          longTerm: {
            method: sv.longTerm.method,
            multiplier: pure(sv.longTerm.multiplier),
            integrationAdditional: d(sv.longTerm.integrationAdditional),
            codeAdditional: d(sv.longTerm.codeAdditional),
            integrationTotal: d(sv.longTerm.integrationTotal),
            codeTotal: d(sv.longTerm.codeTotal),
          },
          codeMethod: {
            name: sv.codeMethod.name,
            notes: sv.codeMethod.notes,
            effectiveInertia: sv.codeMethod.effectiveInertia
              ? { dead: measured('secondMoment', sv.codeMethod.effectiveInertia.dead, system), deadPlusLive: measured('secondMoment', sv.codeMethod.effectiveInertia.deadPlusLive, system), sustained: measured('secondMoment', sv.codeMethod.effectiveInertia.sustained, system) }
              : null,
          },
          methodDifferences: (sv.methodDifferences ?? []).map((t) => say(t, system)),
          checks: sv.checks.map((c) => ({
            limitCase: c.limitCase,
            description: c.description,
            quantity: c.quantity,
            spanRatio: c.ratio,
            limit: d(c.limit),
            byIntegration: d(c.byIntegration),
            byCode: d(c.byCode),
            governing: d(c.governing),
            utilisation: pure(c.utilisation),
            pass: c.pass,
          })),
        }
      : null,
  };
}
