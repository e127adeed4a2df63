/**
 * Whole-result regression snapshot: the two demo projects plus a few hundred generated members that
 * between them use every support type, zone layout (one zone, support zones, bar cut-offs, two
 * zones), load kind, load pattern, hinge-length method, limit case, section shape, material model,
 * as-found condition (cores, coupons, era defaults, bar and hoop section loss, cover loss on every
 * face) and strengthening scheme (FRP on either face, steel plate, concrete overlay and soffit
 * layer, spall repair), under both code bases and both display unit systems — and the validation
 * diagnostics of those projects and of a few broken ones.
 *
 * Used while restructuring the engine: every result must stay bit-for-bit the same unless a named
 * defect fix changes it.
 *
 *   npx tsx test/regression/results-snapshot.ts write  /tmp/before.jsonl
 *   npx tsx test/regression/results-snapshot.ts compare /tmp/before.jsonl [--paths 20]
 *
 * `compare` lists every record that differs with the first differing JSON paths; it exits 1 when
 * anything differs. Not a Vitest test (it takes about a minute and its baseline is machine-local).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { analyzeProject } from '../../core/analysis.ts';
import type { CodeBasis, MaterialSpec } from '../../core/materials/specs.ts';
import type { DeflectionLimitCase, HingeLengthMethod, MemberLoad, MemberZone, SupportType } from '../../core/member/definition.ts';
import { demoProject, demoProjectSI } from '../../core/project/demo.ts';
import { DEFAULT_SETTINGS, type Project, type UnitSystem, type MemberDefinition } from '../../core/project/types.ts';
import { validateProject } from '../../core/project/validate.ts';
import type { AsFoundCondition, StrengtheningScheme } from '../../core/retrofit/types.ts';
import type { BarLayer, SectionDefinition } from '../../core/section/definition.ts';
import { isQuantityOrChoice, say, type Phrase } from '../../core/units/phrase.ts';
import type { SectionShape } from '../../core/section/shapes.ts';

// --- generated projects ---------------------------------------------------------------------------

const MATERIALS: MaterialSpec[] = [
  { kind: 'concrete', id: 'c-hog', name: 'Hognestad, tension stiffening', strength: 30, compressionModel: 'hognestad', tensionModel: 'tension-stiffening' },
  { kind: 'concrete', id: 'c-mkp', name: 'Modified Kent–Park', strength: 35, compressionModel: 'modified-kent-park', tensionModel: 'linear-brittle' },
  { kind: 'concrete', id: 'c-man', name: 'Mander', strength: 40, compressionModel: 'mander', tensionModel: 'linear-brittle' },
  { kind: 'concrete', id: 'c-pop', name: 'Popovics, no tension', strength: 28, compressionModel: 'popovics', tensionModel: 'none' },
  { kind: 'concrete', id: 'c-tc', name: 'Thorenfeldt–Collins', strength: 45, compressionModel: 'thorenfeldt-collins', tensionModel: 'linear-brittle' },
  { kind: 'concrete', id: 'c-en', name: 'EN nonlinear', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' },
  { kind: 'concrete', id: 'c-pr', name: 'EN parabola–rectangle', strength: 25, compressionModel: 'en1992-parabola-rectangle', tensionModel: 'linear-brittle' },
  { kind: 'concrete', id: 'c-top', name: 'Overlay C50', strength: 50, compressionModel: 'hognestad', tensionModel: 'linear-brittle' },
  { kind: 'steel', id: 's-ep', name: 'elastic–plastic 420', model: 'elastic-plastic', yieldStress: 420, ultimateStress: 420 },
  { kind: 'steel', id: 's-bl', name: 'bilinear 500', model: 'bilinear', yieldStress: 500, ultimateStress: 600, ruptureStrain: 0.08 },
  { kind: 'steel', id: 's-pp', name: 'Park–Paulay 500', model: 'park-paulay', yieldStress: 500, ultimateStress: 650, hardeningStrain: 0.01, ruptureStrain: 0.1 },
  { kind: 'steel', id: 's-mp', name: 'Mander power 420', model: 'mander-power', yieldStress: 420, ultimateStress: 620, hardeningStrain: 0.008, ruptureStrain: 0.12 },
  { kind: 'steel', id: 's-low', name: 'low ductility', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.006, ruptureStrain: 0.012 },
  { kind: 'steel', id: 's-plate', name: 'plate S355', model: 'bilinear', yieldStress: 355, ultimateStress: 490, ruptureStrain: 0.15 },
  { kind: 'frp', id: 'cfrp', name: 'CFRP sheet', tensileModulus: 230_000, ruptureStrain: 0.0167, environmentalFactor: 0.95 },
];

const CONCRETES = ['c-hog', 'c-mkp', 'c-man', 'c-pop', 'c-tc', 'c-en', 'c-pr'];
const STEELS = ['s-pp', 's-bl', 's-ep', 's-mp', 's-low'];

const bar = (steelId: string, depth: number, count: number, diameter: number, label?: string, spread?: BarLayer['spread']): BarLayer =>
  ({ steelId, depth, count, diameter, ...(label ? { label } : {}), ...(spread ? { spread } : {}) });
const hoops = (steelId: string, spacing: number, confineCore = false) => ({ steelId, diameter: 10, spacing, verticalLegs: 2, horizontalLegs: 2, clearCover: 30, confineCore, closedAndAnchored: confineCore });

/** Sections of a generated project: every shape, light, normal and heavy reinforcement, support and cut-off variants. */
function sections(k: number): SectionDefinition[] {
  const c = (i: number) => CONCRETES[(i + k) % CONCRETES.length]!;
  const s = (i: number) => STEELS[(i + k) % STEELS.length]!;
  const shapes: { id: string; shape: SectionShape; h: number; bars: BarLayer[]; confine?: boolean }[] = [
    { id: 'rect', shape: { kind: 'rectangle', width: 300, height: 600 }, h: 600, bars: [bar(s(0), 545, 3, 20, 'bottom'), bar(s(0), 50, 2, 16, 'top')] },
    { id: 'tee', shape: { kind: 'tee', height: 600, webWidth: 300, flangeWidth: 1200, flangeThickness: 120 }, h: 600, bars: [bar(s(1), 540, 4, 25), bar(s(1), 55, 3, 16)], confine: true },
    { id: 'ell', shape: { kind: 'ell', height: 550, webWidth: 300, flangeWidth: 700, flangeThickness: 130, flangeSide: 'left' }, h: 550, bars: [bar(s(2), 495, 3, 22), bar(s(2), 50, 2, 16)] },
    { id: 'itee', shape: { kind: 'inverted-tee', height: 650, webWidth: 300, flangeWidth: 800, flangeThickness: 150 }, h: 650, bars: [bar(s(3), 595, 4, 20, undefined, 'chord'), bar(s(3), 50, 3, 20)] },
    { id: 'ishape', shape: { kind: 'i-shape', height: 800, webWidth: 200, topFlangeWidth: 600, topFlangeThickness: 150, bottomFlangeWidth: 500, bottomFlangeThickness: 180 }, h: 800, bars: [bar(s(4), 735, 4, 25, undefined, 'chord'), bar(s(4), 60, 4, 16, undefined, 'chord')] },
    { id: 'box', shape: { kind: 'box', height: 700, width: 800, topThickness: 150, bottomThickness: 150, wallThickness: 150 }, h: 700, bars: [bar(s(0), 640, 6, 20, undefined, 'chord'), bar(s(0), 60, 4, 16, undefined, 'chord')] },
    { id: 'poly', shape: { kind: 'polygon', outline: [{ x: 0, y: 0 }, { x: 400, y: 0 }, { x: 400, y: 500 }, { x: 300, y: 600 }, { x: 100, y: 600 }, { x: 0, y: 500 }], voids: [[{ x: 150, y: 200 }, { x: 250, y: 200 }, { x: 250, y: 350 }, { x: 150, y: 350 }]] }, h: 600, bars: [bar(s(1), 540, 3, 20, undefined, 'chord'), bar(s(1), 60, 2, 16, undefined, 'chord')] },
    { id: 'light', shape: { kind: 'rectangle', width: 1000, height: 200 }, h: 200, bars: [{ steelId: s(2), depth: 165, area: 150, label: 'light mesh', spread: 'chord' }] },
    { id: 'heavy', shape: { kind: 'rectangle', width: 250, height: 500 }, h: 500, bars: [bar(s(3), 440, 4, 32), bar(s(3), 380, 3, 32), bar(s(3), 50, 2, 12)] },
    { id: 'cut2', shape: { kind: 'rectangle', width: 300, height: 600 }, h: 600, bars: [bar('s-pp', 545, 2, 20), bar('s-pp', 50, 2, 16)] },
    { id: 'cut4', shape: { kind: 'rectangle', width: 300, height: 600 }, h: 600, bars: [bar('s-pp', 545, 4, 20), bar('s-pp', 50, 2, 16)] },
    { id: 'sup', shape: { kind: 'rectangle', width: 300, height: 600 }, h: 600, bars: [bar(s(4), 55, 4, 22, 'top'), bar(s(4), 545, 3, 20, 'bottom')] },
  ];
  return shapes.map((x, i) => ({
    id: x.id,
    name: `${x.id} section`,
    shape: x.shape,
    concreteId: x.id === 'tee' ? 'c-man' : c(i),
    bars: x.bars,
    ...(x.id === 'light' ? {} : { hoops: hoops(x.id === 'tee' ? 's-pp' : s(i), x.confine ? 100 : 150, x.confine ?? false) }),
  }));
}

const SUPPORTS: readonly SupportType[] = ['simply-supported', 'cantilever', 'fixed-fixed', 'propped-cantilever'];
const HINGES: readonly HingeLengthMethod[] = ['priestley-2007', 'paulay-priestley-1992', 'mattock-1967', 'corley-1966', 'user'];
const MAIN = ['rect', 'tee', 'ell', 'itee', 'ishape', 'box', 'poly', 'light', 'heavy'];

function zonesFor(layout: number, supports: SupportType, span: number, main: string): MemberZone[] {
  switch (layout) {
    case 0:
      return [{ from: 0, to: span, sectionId: main }];
    case 1: // support zones with top bars
      if (supports === 'cantilever') return [{ from: 0, to: span * 0.4, sectionId: 'sup' }, { from: span * 0.4, to: span, sectionId: main }];
      if (supports === 'propped-cantilever') return [{ from: 0, to: span * 0.25, sectionId: 'sup' }, { from: span * 0.25, to: span, sectionId: main }];
      return [{ from: 0, to: span * 0.2, sectionId: 'sup' }, { from: span * 0.2, to: span * 0.8, sectionId: main }, { from: span * 0.8, to: span, sectionId: 'sup' }];
    case 2: // bars cut off at the thirds
      return [{ from: 0, to: span / 3, sectionId: 'cut2' }, { from: span / 3, to: (2 * span) / 3, sectionId: 'cut4' }, { from: (2 * span) / 3, to: span, sectionId: 'cut2' }];
    default: // two unequal zones
      return [{ from: 0, to: span * 0.55, sectionId: main }, { from: span * 0.55, to: span, sectionId: 'rect' }];
  }
}

function loadsFor(set: number, span: number): MemberLoad[] {
  switch (set) {
    case 0:
      return [{ kind: 'uniform', loadCase: 'superimposed', magnitude: 9, label: 'finishes' }, { kind: 'uniform', loadCase: 'live', magnitude: 14, label: 'occupancy' }];
    case 1:
      return [
        { kind: 'uniform', loadCase: 'dead', magnitude: 6 },
        { kind: 'uniform', loadCase: 'live', magnitude: 20, from: span * 0.2, to: span * 0.7 },
        { kind: 'point', loadCase: 'live', magnitude: 45_000, position: span * 0.37 },
      ];
    default:
      return [
        { kind: 'point', loadCase: 'superimposed', magnitude: 30_000, position: span / 3 },
        { kind: 'point', loadCase: 'superimposed', magnitude: 30_000, position: (2 * span) / 3 },
        { kind: 'point', loadCase: 'live', magnitude: 50_000, position: span * 0.5 },
        { kind: 'uniform', loadCase: 'live', magnitude: 4 },
      ];
  }
}

function limitsFor(code: CodeBasis, i: number): DeflectionLimitCase[] {
  const aci: DeflectionLimitCase[][] = [['aci-floor-immediate', 'aci-sensitive-after-attachment'], ['aci-roof-immediate', 'aci-insensitive-after-attachment'], ['custom']];
  const en: DeflectionLimitCase[][] = [['en-appearance', 'en-after-construction'], ['en-appearance'], ['custom', 'en-after-construction']];
  return (code === 'ACI 318-19' ? aci : en)[i % 3]!;
}

function plainMembers(code: CodeBasis): MemberDefinition[] {
  const out: MemberDefinition[] = [];
  let n = 0;
  for (const supports of SUPPORTS) {
    for (let layout = 0; layout < 4; layout++) {
      for (let set = 0; set < 3; set++) {
        for (const pattern of ['proportional', 'live-only'] as const) {
          const main = MAIN[n % MAIN.length]!;
          const span = supports === 'cantilever' ? 2400 + 100 * (n % 7) : 4800 + 300 * (n % 9);
          const hinge = HINGES[n % HINGES.length]!;
          const limits = limitsFor(code, n);
          out.push({
            id: `m${n}`,
            name: `M-${n}`,
            supports,
            span,
            zones: zonesFor(layout, supports, span, main),
            loads: loadsFor(set, span),
            ...(n % 5 === 3 ? { includeSelfWeight: false } : {}),
            ...(n % 7 === 2 ? { strengthFactors: { dead: 1.3, superimposed: 1.4, live: 1.7 } } : {}),
            service: { sustainedLiveFraction: 0.2 + 0.1 * (n % 4), durationMonths: [3, 12, 60, 120][n % 4]!, limitCases: limits, ...(limits.includes('custom') ? { customLimitRatio: 300 } : {}), ...(n % 6 === 1 ? { includeShrinkage: false } : {}) },
            capacity: { pattern, hingeLengthMethod: hinge, ...(hinge === 'user' ? { userHingeLength: 350 } : {}) },
          });
          n++;
        }
      }
    }
  }
  return out;
}

const AS_FOUND: AsFoundCondition[] = [
  { cores: [{ meanStrength: 24, count: 4, coefficientOfVariation: 0.12 }] },
  { steel: [{ steelId: 's-pp', source: 'coupons', yieldStress: 520, ultimateStress: 640 }], defects: [{ kind: 'section-loss', layer: 0, lossPercent: 15 }] },
  { steel: [{ steelId: 's-pp', source: 'era-default', yieldStress: 280, ultimateStress: 420, ruptureStrain: 0.15 }], defects: [{ kind: 'section-loss', layer: 'hoops', lossPercent: 30 }] },
  { defects: [{ kind: 'cover-loss', face: 'bottom', depth: 25 }] },
  { defects: [{ kind: 'cover-loss', face: 'top', depth: 20 }, { kind: 'cover-loss', face: 'left', depth: 15, from: 400, to: 600 }] },
  { cores: [{ meanStrength: 21, count: 5, coefficientOfVariation: 0.2 }], defects: [{ kind: 'cover-loss', face: 'right', depth: 20 }, { kind: 'section-loss', layer: 0, lossPercent: 8 }] },
];

const SCHEMES: StrengtheningScheme[][] = [
  [{ kind: 'frp', id: 'frp', name: 'CFRP 2 plies', frpId: 'cfrp', plyThickness: 0.165, plies: 2, width: 250 }],
  [{ kind: 'frp', id: 'frp-mc', name: 'CFRP by curve', frpId: 'cfrp', plyThickness: 0.165, plies: 3, width: 200, installationStrainMethod: 'moment-curvature', installation: { dead: 1, superimposed: 0.5, live: 0.2 } }],
  [{ kind: 'steel-plate', id: 'plate', name: 'Plate 6 mm', steelId: 's-plate', thickness: 6, width: 200 }],
  [{ kind: 'concrete-layer', id: 'ov', name: 'Overlay 75 mm', face: 'top', thickness: 75, concreteId: 'c-top', bars: [{ steelId: 's-pp', distanceFromFace: 40, count: 4, diameter: 12 }] }],
  [{ kind: 'concrete-layer', id: 'jk', name: 'Soffit layer 100 mm', face: 'bottom', thickness: 100, concreteId: 'c-top', bars: [{ steelId: 's-bl', distanceFromFace: 50, count: 3, diameter: 20 }], repairSpalls: true }],
  [
    { kind: 'frp', id: 'frp-top', name: 'CFRP on top', frpId: 'cfrp', plyThickness: 0.165, plies: 1, width: 250, face: 'top', sectionIds: ['sup'] },
    { kind: 'steel-plate', id: 'plate-r', name: 'Plate, spalls repaired', steelId: 's-plate', thickness: 5, width: 200, repairSpalls: true },
  ],
];

function retrofitMembers(): MemberDefinition[] {
  const out: MemberDefinition[] = [];
  let n = 0;
  for (let a = 0; a < AS_FOUND.length; a++) {
    for (let s = 0; s < SCHEMES.length; s++) {
      if ((a + s) % 2 === 1) continue;
      const supports = SUPPORTS[n % SUPPORTS.length]!;
      const span = supports === 'cantilever' ? 2500 : 5400;
      out.push({
        id: `r${n}`,
        name: `R-${n}`,
        supports,
        span,
        zones: s === 5 || n % 3 === 0 ? zonesFor(1, supports, span, 'cut4') : [{ from: 0, to: span, sectionId: 'cut4' }],
        loads: loadsFor(n % 3, span),
        service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
        capacity: { pattern: n % 2 === 0 ? 'proportional' : 'live-only', hingeLengthMethod: HINGES[n % 4]! },
        asFound: AS_FOUND[a]!,
        schemes: SCHEMES[s]!,
      });
      n++;
    }
  }
  // Schemes without an as-found condition.
  for (let s = 0; s < SCHEMES.length; s++) {
    out.push({
      id: `q${s}`, name: `Q-${s}`, supports: 'simply-supported', span: 6000,
      zones: zonesFor(s === 5 ? 1 : 0, 'simply-supported', 6000, 'cut4'), loads: loadsFor(s % 3, 6000),
      service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
      capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' }, schemes: SCHEMES[s]!,
    });
  }
  return out;
}

function generated(code: CodeBasis, unitSystem: UnitSystem, k: number, members: MemberDefinition[]): Project {
  return {
    format: 'hingeline-project',
    version: 3,
    info: { name: `Generated ${code} ${unitSystem} ${k}`, number: 'REG', description: 'regression snapshot', engineer: '', checker: '', revision: '0', date: '2026-01-01', codeBasis: code, unitSystem },
    materials: MATERIALS,
    sections: sections(k),
    members,
    settings: { ...DEFAULT_SETTINGS, ...(k === 1 ? { bilinearMethod: 'equal-energy' as const, momentDropFraction: 0.85 } : {}) },
  };
}

/** A few projects with input problems: the validation's messages are part of the snapshot. */
function brokenProjects(): [string, Project][] {
  const base = generated('ACI 318-19', 'us', 0, plainMembers('ACI 318-19').slice(0, 6));
  const badMaterial: Project = { ...base, materials: base.materials.map((m) => (m.id === 's-pp' ? { ...m, yieldStress: -5 } : m.id === 'c-hog' ? { ...m, strength: 400 } : m)) };
  const badMember: Project = {
    ...base,
    members: base.members.map((m, i) => (i === 0 ? { ...m, span: -2000 } : i === 1 ? { ...m, zones: [{ from: 0, to: 1000, sectionId: 'nope' }] } : i === 2 ? { ...m, loads: [{ kind: 'point', loadCase: 'live', magnitude: 10_000, position: 99_000 }] } : m)),
  };
  const badSection: Project = {
    ...base,
    sections: base.sections.map((s, i) => (i === 0 ? { ...s, bars: [bar('s-pp', 700, 3, 20)] } : i === 1 ? { ...s, hoops: { ...s.hoops!, clearCover: 400 } } : s)),
  };
  const si = (p: Project): Project => ({ ...p, info: { ...p.info, unitSystem: 'si' } });
  return [
    ['bad-material-us', badMaterial], ['bad-material-si', si(badMaterial)],
    ['bad-member-us', badMember], ['bad-member-si', si(badMember)],
    ['bad-section-us', badSection],
  ];
}

export function snapshotProjects(): [string, Project][] {
  const aci = plainMembers('ACI 318-19');
  const en = plainMembers('EN 1992-1-1');
  const retro = retrofitMembers();
  return [
    ['demo', demoProject()],
    ['demo-si', demoProjectSI()],
    ['demo-as-si', { ...demoProject(), info: { ...demoProject().info, unitSystem: 'si' } }],
    ['aci-us', generated('ACI 318-19', 'us', 0, aci)],
    ['en-si', generated('EN 1992-1-1', 'si', 1, en)],
    ['aci-si-k2', generated('ACI 318-19', 'si', 2, aci.filter((_, i) => i % 3 === 0))],
    ['en-us-k3', generated('EN 1992-1-1', 'us', 3, en.filter((_, i) => i % 3 === 1))],
    ['retrofit-aci-us', generated('ACI 318-19', 'us', 0, retro)],
    ['retrofit-en-si', generated('EN 1992-1-1', 'si', 1, retro)],
  ];
}

// --- records and comparison --------------------------------------------------------------------------

interface SnapshotRecord {
  readonly key: string;
  readonly value: unknown;
  /** Display units of the project the record comes from. */
  readonly units?: 'si' | 'us';
}

/**
 * The record as text a person reads: every phrase (words with quantities as data) said in the
 * project's units, diagnostics' phrase copies left out — so a change from finished text to data
 * compares equal when the words are the same.
 */
function asWords(value: unknown, units: 'si' | 'us'): unknown {
  if (Array.isArray(value)) {
    if (value.some(isQuantityOrChoice) && value.every((v) => typeof v === 'string' || isQuantityOrChoice(v))) return say(value as Phrase, units);
    return value.map((v) => asWords(v, units));
  }
  if (value && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) if (k !== 'detail') out[k] = asWords(v, units);
    return out;
  }
  return value;
}

/** Strings that show a sentence was built by plain interpolation of data (a defect). */
function garbled(value: unknown, path: string, out: string[]): void {
  if (typeof value === 'string') {
    if (value.includes('[object Object]')) out.push(`${path}: ${value.slice(0, 160)}`);
  } else if (Array.isArray(value)) value.forEach((v, i) => garbled(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) garbled(v, `${path}.${k}`, out);
}

function* records(): Generator<SnapshotRecord> {
  for (const [name, project] of snapshotProjects()) {
    const units = project.info.unitSystem;
    yield { key: `${name}/validation`, value: validateProject(project), units };
    const results = analyzeProject(project);
    yield { key: `${name}/summary`, value: { ...results, members: undefined }, units };
    for (const m of results.members) yield { key: `${name}/member/${m.memberId}`, value: m, units };
  }
  for (const [name, project] of brokenProjects()) yield { key: `${name}/validation`, value: validateProject(project), units: project.info.unitSystem };
}

/** JSON paths where a and b differ (at most `limit`). */
function differences(a: unknown, b: unknown, path: string, out: string[], limit: number): void {
  if (out.length >= limit) return;
  if (a === b) return;
  if (typeof a !== typeof b || a === null || b === null || typeof a !== 'object') {
    out.push(`${path}: ${JSON.stringify(a)?.slice(0, 160)} → ${JSON.stringify(b)?.slice(0, 160)}`);
    return;
  }
  if (Array.isArray(a) !== Array.isArray(b)) {
    out.push(`${path}: array ↔ object`);
    return;
  }
  const keys = new Set([...Object.keys(a as object), ...Object.keys(b as object)]);
  for (const k of keys) differences((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], Array.isArray(a) ? `${path}[${k}]` : `${path}.${k}`, out, limit);
}

function main(args: string[]): number {
  const [mode, file] = args;
  const pathsIndex = args.indexOf('--paths');
  const limit = pathsIndex >= 0 ? Number(args[pathsIndex + 1]) : 12;
  if ((mode !== 'write' && mode !== 'compare') || !file) {
    process.stderr.write('usage: results-snapshot.ts write|compare FILE [--paths N]\n');
    return 2;
  }
  const started = performance.now();
  if (mode === 'write') {
    const lines: string[] = [];
    for (const r of records()) lines.push(JSON.stringify({ key: r.key, value: r.value, units: r.units }));
    writeFileSync(file, `${lines.join('\n')}\n`);
    process.stdout.write(`${lines.length} records written to ${file} in ${((performance.now() - started) / 1000).toFixed(0)} s\n`);
    return 0;
  }
  const before = new Map<string, unknown>();
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    if (!line) continue;
    const r = JSON.parse(line) as SnapshotRecord;
    before.set(r.key, r.value);
  }
  let changed = 0;
  let same = 0;
  const seen = new Set<string>();
  for (const r of records()) {
    seen.add(r.key);
    const units = r.units ?? 'si';
    const now = asWords(JSON.parse(JSON.stringify(r.value)), units);
    const bad: string[] = [];
    garbled(now, '', bad);
    if (bad.length > 0) {
      process.stdout.write(`GARBLED ${r.key}\n${bad.slice(0, limit).map((d) => `   ${d}`).join('\n')}\n`);
      changed++;
    }
    if (!before.has(r.key)) {
      process.stdout.write(`NEW ${r.key}\n`);
      changed++;
      continue;
    }
    const diff: string[] = [];
    differences(asWords(before.get(r.key), units), now, '', diff, limit);
    if (diff.length === 0) same++;
    else {
      changed++;
      process.stdout.write(`DIFF ${r.key}\n${diff.map((d) => `   ${d}`).join('\n')}\n`);
    }
  }
  for (const k of before.keys()) if (!seen.has(k)) {
    process.stdout.write(`GONE ${k}\n`);
    changed++;
  }
  process.stdout.write(`${same} identical, ${changed} changed (${((performance.now() - started) / 1000).toFixed(0)} s)\n`);
  return changed === 0 ? 0 : 1;
}

process.exitCode = main(process.argv.slice(2));
