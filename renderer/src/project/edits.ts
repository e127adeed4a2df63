/**
 * Edits of the project document. Each takes a project and returns a new one that shares every
 * untouched object with the old (immutable.ts); none of them computes an engineering number.
 * Items are addressed by id, fields by a path inside the item.
 */
import type { MaterialSpec } from '../../../core/materials/specs.ts';
import type { Project, ProjectInfo, MemberDefinition } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import type { SectionShape } from '../../../core/section/shapes.ts';
import { shapeHeight, webExtent } from '../../../core/section/build.ts';
import { setIn, type PathKey } from './immutable.ts';
import { duplicateOf, materialCopy, sectionCopy } from './factories.ts';

type ListName = 'materials' | 'sections' | 'members' | 'continuousMembers';

function indexOf(project: Project, list: ListName, id: string): number {
  const index = (project[list] ?? []).findIndex((item) => item.id === id);
  if (index < 0) throw new Error(`There is no ${list.slice(0, -1)} with id "${id}" in the project.`);
  return index;
}

/** Sets a field of an item (`path` inside the item; `undefined` removes an optional field). */
export function setItemField(project: Project, list: ListName, id: string, path: readonly PathKey[], value: unknown): Project {
  return setIn(project, [list, indexOf(project, list, id), ...path], value);
}

export const setMemberField = (p: Project, id: string, path: readonly PathKey[], value: unknown) => setItemField(p, 'members', id, path, value);
export const setSectionField = (p: Project, id: string, path: readonly PathKey[], value: unknown) => setItemField(p, 'sections', id, path, value);
export const setMaterialField = (p: Project, id: string, path: readonly PathKey[], value: unknown) => setItemField(p, 'materials', id, path, value);

export function setInfoField<K extends keyof ProjectInfo>(project: Project, key: K, value: ProjectInfo[K]): Project {
  return setIn(project, ['info', key], value);
}

/** Replaces a whole item (same id). */
export function replaceItem<T extends { id: string }>(project: Project, list: ListName, item: T): Project {
  return setIn(project, [list, indexOf(project, list, item.id)], item);
}

export function addMember(project: Project, member: MemberDefinition, afterId?: string): Project {
  const at = afterId ? project.members.findIndex((m) => m.id === afterId) + 1 : project.members.length;
  const members = [...project.members];
  members.splice(at <= 0 ? members.length : at, 0, member);
  return { ...project, members };
}

/**
 * Adds a member with a section of its own: a copy of `template` (so that editing the new
 * member's section never changes the members that use the template). Returns the project and
 * the copy.
 */
export function addMemberWithOwnSection(project: Project, member: MemberDefinition, template: SectionDefinition, afterId?: string): { project: Project; section: SectionDefinition } {
  const section = sectionCopy(project, template);
  const own: MemberDefinition = { ...member, zones: member.zones.map((z) => ({ ...z, sectionId: section.id })) };
  return { project: addMember({ ...project, sections: [...project.sections, section] }, own, afterId), section };
}

export function deleteMember(project: Project, id: string): Project {
  return { ...project, members: project.members.filter((m) => m.id !== id) };
}

/** Adds a copy of the member right after it; returns the project and the copy's id. */
export function duplicateMember(project: Project, id: string): { project: Project; memberId: string } {
  const original = project.members[indexOf(project, 'members', id)]!;
  const copy = duplicateOf(project, original);
  return { project: addMember(project, copy, id), memberId: copy.id };
}

/**
 * Gives one zone of a member a copy of its section (so that edits stop affecting the other
 * members that shared it). Returns the new section's id.
 */
export function copySectionForZone(project: Project, memberId: string, zoneIndex: number): { project: Project; sectionId: string } {
  const memberIndex = indexOf(project, 'members', memberId);
  const zone = project.members[memberIndex]!.zones[zoneIndex];
  if (!zone) throw new Error(`Member "${memberId}" has no zone ${zoneIndex + 1}.`);
  const section = project.sections[indexOf(project, 'sections', zone.sectionId)]!;
  const copy = sectionCopy(project, section);
  const withSection: Project = { ...project, sections: [...project.sections, copy] };
  return { project: setIn(withSection, ['members', memberIndex, 'zones', zoneIndex, 'sectionId'], copy.id), sectionId: copy.id };
}

/** Adds a copy of a material and points one section's reference (`concreteId`, a bar layer's or the hoops' steel) at it. */
export function copyMaterialForSection(project: Project, sectionId: string, materialId: string): { project: Project; materialId: string } {
  const material = project.materials[indexOf(project, 'materials', materialId)]!;
  const copy = materialCopy(project, material);
  let next: Project = { ...project, materials: [...project.materials, copy] };
  const sectionIndex = indexOf(next, 'sections', sectionId);
  const section = next.sections[sectionIndex]!;
  if (section.concreteId === materialId) next = setIn(next, ['sections', sectionIndex, 'concreteId'], copy.id);
  section.bars.forEach((bar, i) => {
    if (bar.steelId === materialId) next = setIn(next, ['sections', sectionIndex, 'bars', i, 'steelId'], copy.id);
  });
  if (section.hoops?.steelId === materialId) next = setIn(next, ['sections', sectionIndex, 'hoops', 'steelId'], copy.id);
  return { project: next, materialId: copy.id };
}

/** Adds a material to the library. */
export function addMaterial(project: Project, material: MaterialSpec): Project {
  return { ...project, materials: [...project.materials, material] };
}

/** Adds a section to the library. */
export function addSection(project: Project, section: SectionDefinition): Project {
  return { ...project, sections: [...project.sections, section] };
}

/**
 * The same section in another shape kind, keeping what carries over: the overall height, the
 * overall width (as the flange width of flanged shapes) and the web width. Flange thickness of a
 * new flange: a fifth of the height, as a starting value the user edits.
 */
export function reshaped(shape: SectionShape, kind: SectionShape['kind']): SectionShape {
  if (shape.kind === kind) return shape;
  const height = shapeHeight(shape);
  const web = webExtent(shape);
  const overall = shape.kind === 'rectangle' ? shape.width
    : shape.kind === 'box' ? shape.width
    : shape.kind === 'i-shape' ? Math.max(shape.topFlangeWidth, shape.bottomFlangeWidth)
    : shape.kind === 'polygon' ? Math.max(...shape.outline.map((p) => p.x)) - Math.min(...shape.outline.map((p) => p.x))
    : shape.flangeWidth;
  const webWidth = web ? web.x1 - web.x0 : Math.min(overall, height) / 2;
  const flange = Math.round(height / 5);
  const flangeWidth = Math.max(overall, webWidth * 3);
  switch (kind) {
    case 'rectangle':
      return { kind, width: shape.kind === 'rectangle' ? shape.width : webWidth, height };
    case 'tee':
    case 'inverted-tee':
      return { kind, height, webWidth, flangeWidth, flangeThickness: flange };
    case 'ell':
      return { kind, height, webWidth, flangeWidth: Math.max(overall, webWidth * 2), flangeThickness: flange, flangeSide: 'right' };
    case 'i-shape':
      return { kind, height, webWidth, topFlangeWidth: flangeWidth, topFlangeThickness: flange, bottomFlangeWidth: flangeWidth, bottomFlangeThickness: flange };
    case 'box':
      return { kind, height, width: overall, topThickness: flange, bottomThickness: flange, wallThickness: Math.round(overall / 5) };
    case 'polygon': {
      const w = overall;
      return { kind, outline: [{ x: 0, y: 0 }, { x: w, y: 0 }, { x: w, y: height }, { x: 0, y: height }] };
    }
  }
}
