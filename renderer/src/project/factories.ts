/**
 * New projects, members, sections and materials made in the editor. The starting values are
 * ordinary, editable inputs (a typical rectangular beam), never results; the user is expected to
 * change them. Values are written in the display units an engineer would type (m, mm, kN/m; ft,
 * in, kip/ft) and stored in internal units through core/units.
 */
import type { CodeBasis, ConcreteSpec, MaterialSpec, SteelSpec } from '../../../core/materials/specs.ts';
import { defaultImportService } from '../../../core/project/csv.ts';
import { DEFAULT_SETTINGS, PROJECT_FORMAT, PROJECT_VERSION, type Project, type UnitSystem, type MemberDefinition } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { fromDisplay } from '../../../core/units/index.ts';

const tidy = (x: number): number => Number(x.toPrecision(9));

/** A value typed in the display unit of `system` (SI: m/mm/kN; US: ft/in/kip), stored in internal units. */
function typed(quantity: 'spanLength' | 'sectionLength' | 'lineLoad' | 'concreteStress' | 'stress', si: number, us: number, system: UnitSystem): number {
  return system === 'us' ? tidy(fromDisplay(quantity, us, 'US')) : tidy(fromDisplay(quantity, si, 'SI'));
}

/** An id not used by any of `existing`: `prefix` followed by the first free number from 1. */
export function uniqueId(prefix: string, existing: Iterable<string>): string {
  const taken = new Set(existing);
  for (let n = 1; ; n++) {
    const id = `${prefix}${n}`;
    if (!taken.has(id)) return id;
  }
}

/** A copy's name: `B-3 (copy)`, `B-3 (copy 2)`, … not used by any of `existing`. */
export function copyName(name: string, existing: Iterable<string>): string {
  const taken = new Set(existing);
  const base = name.replace(/ \(copy(?: \d+)?\)$/, '');
  for (let n = 1; ; n++) {
    const candidate = n === 1 ? `${base} (copy)` : `${base} (copy ${n})`;
    if (!taken.has(candidate)) return candidate;
  }
}

function starterMaterials(code: CodeBasis, system: UnitSystem): MaterialSpec[] {
  const concrete: ConcreteSpec = code === 'EN 1992-1-1'
    ? { kind: 'concrete', id: 'concrete-1', name: 'C30/37', strength: 30, compressionModel: 'en1992-nonlinear', tensionModel: 'tension-stiffening' }
    : { kind: 'concrete', id: 'concrete-1', name: system === 'us' ? 'f′c 4000 psi' : 'f′c 28 MPa', strength: typed('concreteStress', 28, 4000, system), compressionModel: 'hognestad', tensionModel: 'tension-stiffening' };
  const steel: SteelSpec = code === 'EN 1992-1-1'
    ? { kind: 'steel', id: 'steel-1', name: 'B500B', model: 'park-paulay', yieldStress: 500, ultimateStress: 540, hardeningStrain: 0.01, ruptureStrain: 0.05 }
    : { kind: 'steel', id: 'steel-1', name: system === 'us' ? 'Grade 60' : 'Grade 420', model: 'park-paulay', yieldStress: typed('stress', 420, 60, system), ultimateStress: typed('stress', 620, 90, system), hardeningStrain: 0.008, ruptureStrain: 0.09 };
  return [concrete, steel];
}

function starterSection(system: UnitSystem): SectionDefinition {
  const mm = (si: number, us: number) => typed('sectionLength', si, us, system);
  const width = mm(300, 12);
  const height = mm(600, 24);
  return {
    id: 'section-1',
    name: system === 'us' ? 'Rectangle 12 × 24 in' : 'Rectangle 300 × 600',
    shape: { kind: 'rectangle', width, height },
    concreteId: 'concrete-1',
    bars: [
      { steelId: 'steel-1', depth: tidy(height - mm(55, 2.2)), count: 3, diameter: mm(20, 0.75), label: 'bottom bars' },
      { steelId: 'steel-1', depth: mm(50, 2), count: 2, diameter: mm(16, 0.625), label: 'top bars' },
    ],
    hoops: { steelId: 'steel-1', diameter: mm(10, 0.375), spacing: mm(200, 8), verticalLegs: 2, horizontalLegs: 2, clearCover: mm(30, 1.5), confineCore: false, closedAndAnchored: false },
  };
}

/** A simply supported member over one zone of `sectionId`, with typical floor loads. */
export function newMember(project: Project, sectionId: string, name?: string): MemberDefinition {
  const system = project.info.unitSystem;
  const span = typed('spanLength', 6, 20, system);
  const id = uniqueId('member-', project.members.map((m) => m.id));
  const names = project.members.map((m) => m.name);
  return {
    id,
    name: name ?? uniqueId('B-', names),
    supports: 'simply-supported',
    span,
    zones: [{ from: 0, to: span, sectionId }],
    loads: [
      { kind: 'uniform', loadCase: 'superimposed', magnitude: typed('lineLoad', 5, 0.3, system), label: 'finishes and partitions' },
      { kind: 'uniform', loadCase: 'live', magnitude: typed('lineLoad', 8, 0.5, system), label: 'live load' },
    ],
    includeSelfWeight: true,
    service: defaultImportService(project.info.codeBasis),
    capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' },
  };
}

/** An empty project with one concrete, one steel, one rectangular section and one member. */
export function newProject(system: UnitSystem, code: CodeBasis, date: string): Project {
  const base: Project = {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    info: { name: 'Untitled project', number: '', description: '', engineer: '', checker: '', revision: '', date, codeBasis: code, unitSystem: system },
    materials: starterMaterials(code, system),
    sections: [starterSection(system)],
    members: [],
    settings: { ...DEFAULT_SETTINGS },
  };
  return { ...base, members: [newMember(base, 'section-1', 'B-1')] };
}

/** A copy of a member under a new id and name (`B-3 (copy)`). */
export function duplicateOf(project: Project, member: MemberDefinition): MemberDefinition {
  return {
    ...structuredClone(member),
    id: uniqueId('member-', project.members.map((m) => m.id)),
    name: copyName(member.name, project.members.map((m) => m.name)),
  };
}

/** A copy of a section under a new id, for giving one member its own section. */
export function sectionCopy(project: Project, section: SectionDefinition): SectionDefinition {
  return {
    ...structuredClone(section),
    id: uniqueId(`${section.id}-`, project.sections.map((s) => s.id)),
    name: copyName(section.name, project.sections.map((s) => s.name)),
  };
}

/** A copy of a material under a new id. */
export function materialCopy(project: Project, material: MaterialSpec): MaterialSpec {
  return {
    ...structuredClone(material),
    id: uniqueId(`${material.id}-`, project.materials.map((m) => m.id)),
    name: copyName(material.name, project.materials.map((m) => m.name)),
  };
}

/** Today's date as ISO yyyy-mm-dd in local time (for a new project's date). */
export function isoDate(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}
