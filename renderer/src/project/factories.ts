/**
 * New projects, members, sections and materials made in the editor. The starting values are
 * ordinary, editable inputs (a typical rectangular beam), never results; the user is expected to
 * change them. Values are written in the display units an engineer would type (m, mm, kN/m; ft,
 * in, kip/ft) and stored in internal units through core/units.
 */
import type { CodeBasis, MaterialSpec } from '../../../core/materials/specs.ts';
import { defaultImportService } from '../../../core/project/csv.ts';
import { starterProject, typedValue as typed } from '../../../core/project/starter.ts';
import type { Project, UnitSystem, MemberDefinition } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';

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

/** An empty project with one concrete, one steel, one rectangular section (core/project/starter.ts) and one member. */
export function newProject(system: UnitSystem, code: CodeBasis, date: string): Project {
  const base = starterProject(system, code, date);
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
