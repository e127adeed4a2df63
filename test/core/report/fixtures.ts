/**
 * Invented projects for the report tests and the report benchmark (SI internal units: mm, N, MPa).
 * Not the demo: small, fast to analyse, and covering every support type, both code bases, both
 * unit systems, a confined core, a member with an input error, and a large generated project.
 */
import type { CodeBasis } from '../../../core/materials/specs.ts';
import type { SupportType } from '../../../core/member/definition.ts';
import type { Project, UnitSystem, MemberDefinition } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';

const MATERIALS: Project['materials'] = [
  { kind: 'concrete', id: 'c35', name: 'C35 in situ', strength: 35, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' },
  { kind: 'concrete', id: 'c35m', name: 'C35 confined', strength: 35, compressionModel: 'mander', tensionModel: 'linear-brittle' },
  { kind: 'steel', id: 'b500', name: 'B500 bars', model: 'park-paulay', yieldStress: 500, ultimateStress: 600, hardeningStrain: 0.01, ruptureStrain: 0.1 },
];

function rectangle(id: string, name: string, width: number, height: number, bottom: [number, number], top: [number, number], concreteId = 'c35', confine = false): SectionDefinition {
  return {
    id,
    name,
    shape: { kind: 'rectangle', width, height },
    concreteId,
    bars: [
      { steelId: 'b500', depth: height - 50, count: bottom[0], diameter: bottom[1], label: 'bottom bars' },
      { steelId: 'b500', depth: 50, count: top[0], diameter: top[1], label: 'top bars' },
    ],
    hoops: { steelId: 'b500', diameter: 10, spacing: confine ? 100 : 150, verticalLegs: 2, clearCover: 30, confineCore: confine, closedAndAnchored: confine },
  };
}

function member(id: string, supports: SupportType, span: number, zones: MemberDefinition['zones'], dead: number, live: number, extra: Partial<MemberDefinition> = {}): MemberDefinition {
  return {
    id,
    name: id,
    supports,
    span,
    zones,
    loads: [
      { kind: 'uniform', loadCase: 'superimposed', magnitude: dead, label: 'finishes and services' },
      { kind: 'uniform', loadCase: 'live', magnitude: live, label: 'occupancy' },
    ],
    service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: ['aci-floor-immediate', 'aci-sensitive-after-attachment'] },
    capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' },
    ...extra,
  };
}

/**
 * A small project of four members: simply supported (R1), cantilever (R1), fixed-ended with
 * support zones (R2 at the ends, R1 in the span, confined T-free rectangle), and a member whose
 * zones do not reach the end of the span (an input error).
 */
export function reportTestProject(code: CodeBasis = 'ACI 318-19', unitSystem: UnitSystem = 'si'): Project {
  const limits = code === 'ACI 318-19' ? (['aci-floor-immediate', 'aci-sensitive-after-attachment'] as const) : (['en-appearance', 'en-after-construction'] as const);
  const service = { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [...limits] };
  return {
    format: 'hingeline-project',
    version: 3,
    info: { name: 'Harbour shed annex', number: 'HS-204', description: 'Assessment of existing floor beams for a change of use (invented test project)', engineer: 'R. Okafor', checker: 'L. Brandt', revision: 'B', date: '2026-02-20', codeBasis: code, unitSystem },
    materials: MATERIALS,
    sections: [
      rectangle('r1', 'R1 300 × 550', 300, 550, [3, 20], [2, 16]),
      rectangle('r2', 'R2 300 × 550 support', 300, 550, [2, 16], [4, 20], 'c35m', true),
    ],
    members: [
      member('B-1', 'simply-supported', 6000, [{ from: 0, to: 6000, sectionId: 'r1' }], 8, 10, { service }),
      member('C-1', 'cantilever', 2200, [{ from: 0, to: 2200, sectionId: 'r2' }], 6, 5, { service, capacity: { pattern: 'live-only', hingeLengthMethod: 'paulay-priestley-1992' } }),
      member('F-1', 'fixed-fixed', 7200, [{ from: 0, to: 1400, sectionId: 'r2' }, { from: 1400, to: 5800, sectionId: 'r1' }, { from: 5800, to: 7200, sectionId: 'r2' }], 7, 9, { service, capacity: { pattern: 'proportional', hingeLengthMethod: 'mattock-1967' } }),
      member('X-1', 'simply-supported', 5000, [{ from: 0, to: 4000, sectionId: 'r1' }], 6, 8, { service }),
    ],
    settings: { momentDropFraction: 0.8, bilinearMethod: 'priestley-2007', stations: 200 },
  };
}

/**
 * A generated project of `count` members over ten sections, every member different (span, loads,
 * supports, hinge-length method), for the report benchmark.
 */
export function generatedProject(count: number): Project {
  const sections: SectionDefinition[] = [];
  for (let k = 0; k < 10; k++) {
    const width = 250 + 25 * (k % 4);
    const height = 450 + 50 * k;
    sections.push(rectangle(`s${k}`, `S${k + 1} ${width} × ${height}`, width, height, [3 + (k % 2), 16 + 2 * (k % 3)], [2, 12 + 2 * (k % 2)], k === 4 ? 'c35m' : 'c35', k === 4));
  }
  const supports: SupportType[] = ['simply-supported', 'simply-supported', 'fixed-fixed', 'propped-cantilever', 'cantilever'];
  const hinges: MemberDefinition['capacity']['hingeLengthMethod'][] = ['priestley-2007', 'paulay-priestley-1992', 'mattock-1967', 'corley-1966'];
  const members: MemberDefinition[] = [];
  for (let i = 0; i < count; i++) {
    const s = supports[i % supports.length]!;
    const section = sections[i % sections.length]!;
    const span = s === 'cantilever' ? 1800 + 37 * (i % 13) : 4500 + 61 * (i % 29);
    members.push(member(`M-${String(i + 1).padStart(3, '0')}`, s, span, [{ from: 0, to: span, sectionId: section.id }], 5 + (i % 7), 6 + (i % 5), {
      capacity: { pattern: i % 3 === 0 ? 'live-only' : 'proportional', hingeLengthMethod: hinges[i % hinges.length]! },
    }));
  }
  return {
    format: 'hingeline-project',
    version: 3,
    info: { name: 'Generated warehouse', number: 'GEN-100', description: 'Generated project for the report benchmark', engineer: 'Bench', checker: 'Bench', revision: '0', date: '2026-01-01', codeBasis: 'ACI 318-19', unitSystem: 'si' },
    materials: MATERIALS,
    sections,
    members,
    settings: { momentDropFraction: 0.8, bilinearMethod: 'priestley-2007', stations: 200 },
  };
}
