/**
 * What a member's results depend on, by identity. Edits replace only the objects on their path
 * (immutable.ts), so a member must be re-analysed exactly when one of these objects is no longer
 * the same: the member itself, a section one of its zones uses, a material those sections use or
 * the member's as-found data and schemes name, the code basis or the analysis settings. The display unit system is not among them: results are
 * held in internal units.
 */
import type { MaterialSpec } from '../../../core/materials/specs.ts';
import type { Project, MemberDefinition } from '../../../core/project/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';

/** Ids of the materials a section uses (concrete, bar steels, hoop steel), in that order, without repeats. */
export function sectionMaterialIds(section: SectionDefinition): string[] {
  const ids = [section.concreteId, ...section.bars.map((bar) => bar.steelId)];
  if (section.hoops) ids.push(section.hoops.steelId);
  return [...new Set(ids)];
}

/**
 * Ids of the materials a member names itself, beyond its sections': the as-found condition's
 * concretes and steels, and each strengthening scheme's FRP, plate steel, layer concrete and bar
 * steels — without repeats.
 */
export function memberOwnMaterialIds(member: MemberDefinition): string[] {
  const ids: string[] = [];
  for (const c of member.asFound?.cores ?? []) if (c.concreteId) ids.push(c.concreteId);
  for (const s of member.asFound?.steel ?? []) ids.push(s.steelId);
  for (const scheme of member.schemes ?? []) {
    if (scheme.kind === 'frp') ids.push(scheme.frpId);
    else if (scheme.kind === 'steel-plate') ids.push(scheme.steelId);
    else {
      ids.push(scheme.concreteId);
      for (const b of scheme.bars) ids.push(b.steelId);
    }
  }
  return [...new Set(ids)];
}

/** The sections a member's zones use, in zone order, without repeats (missing ids are skipped). */
export function memberSections(project: Project, member: Pick<MemberDefinition, 'zones'>): SectionDefinition[] {
  const ids = [...new Set(member.zones.map((zone) => zone.sectionId))];
  return ids.map((id) => project.sections.find((section) => section.id === id)).filter((s): s is SectionDefinition => s !== undefined);
}

/** The materials the given sections use, without repeats (missing ids are skipped). */
export function sectionsMaterials(project: Project, sections: readonly SectionDefinition[]): MaterialSpec[] {
  const ids = [...new Set(sections.flatMap(sectionMaterialIds))];
  return ids.map((id) => project.materials.find((material) => material.id === id)).filter((m): m is MaterialSpec => m !== undefined);
}

/**
 * The inputs of a member's analysis as a list of values compared by identity (see the file comment).
 * Null when the project has no member with that id.
 */
export function memberInputs(project: Project, memberId: string): readonly unknown[] | null {
  const member = project.members.find((m) => m.id === memberId);
  if (!member) return null;
  const sections = memberSections(project, member);
  const own = memberOwnMaterialIds(member).map((id) => project.materials.find((m) => m.id === id)).filter((m) => m !== undefined);
  // Zone section ids are part of the member; a section id that later appears must count as a change.
  return [member, project.info.codeBasis, project.settings, ...sections, ...sectionsMaterials(project, sections), ...own];
}

/**
 * The inputs of a continuous member's analysis, compared by identity like `memberInputs`: the
 * member, the code basis and settings, the sections of its zones and their materials. Null when
 * the project has no continuous member with that id.
 */
export function continuousInputs(project: Project, memberId: string): readonly unknown[] | null {
  const member = project.continuousMembers?.find((m) => m.id === memberId);
  if (!member) return null;
  const sections = memberSections(project, member);
  return [member, project.info.codeBasis, project.settings, ...sections, ...sectionsMaterials(project, sections)];
}

/**
 * The project a worker needs to analyse some continuous members: the whole list of continuous
 * members (so that result paths keep their index in the file), no single-span members, and only
 * the sections and materials of the members asked for.
 */
export function continuousSubproject(project: Project, memberIds: readonly string[]): Project {
  const wanted = (project.continuousMembers ?? []).filter((m) => memberIds.includes(m.id));
  const sectionIds = new Set(wanted.flatMap((m) => m.zones.map((z) => z.sectionId)));
  const sections = project.sections.filter((s) => sectionIds.has(s.id));
  const materialIds = new Set(sections.flatMap(sectionMaterialIds));
  return { ...project, members: [], sections, materials: project.materials.filter((m) => materialIds.has(m.id)) };
}

/** True when two input lists hold the same objects in the same order. */
export function sameInputs(a: readonly unknown[] | null | undefined, b: readonly unknown[] | null | undefined): boolean {
  if (!a || !b || a.length !== b.length) return false;
  return a.every((value, i) => value === b[i]);
}

/** Ids of the members that use a section. */
export function membersUsingSection(project: Project, sectionId: string): string[] {
  return project.members.filter((m) => m.zones.some((z) => z.sectionId === sectionId)).map((m) => m.id);
}

/** Ids of the sections that use a material. */
export function sectionsUsingMaterial(project: Project, materialId: string): string[] {
  return project.sections.filter((s) => sectionMaterialIds(s).includes(materialId)).map((s) => s.id);
}

/**
 * The smallest project that analyses the given members the same way as the whole project: the
 * same info and settings, those members (in project order), the sections they use and the
 * materials of those sections and of the members' as-found data and schemes. Sent to the worker
 * instead of the whole project.
 */
export function subproject(project: Project, memberIds: readonly string[]): Project {
  const wanted = new Set(memberIds);
  const members = project.members.filter((m) => wanted.has(m.id));
  const sectionIds = new Set(members.flatMap((m) => m.zones.map((z) => z.sectionId)));
  const sections = project.sections.filter((s) => sectionIds.has(s.id));
  const materialIds = new Set([...sections.flatMap(sectionMaterialIds), ...members.flatMap(memberOwnMaterialIds)]);
  const materials = project.materials.filter((m) => materialIds.has(m.id));
  // Continuous members are analysed on their own (stores/continuous.ts).
  return { ...project, members, sections, materials, continuousMembers: [] };
}

/**
 * True when the member's sections are the library's own, so that their curves can be sent ahead
 * of the member result; false when an as-found condition or a scheme derives others from them
 * (those come with the member result only).
 */
export function sectionsGoAhead(member: MemberDefinition): boolean {
  return !member.asFound && (member.schemes?.length ?? 0) === 0;
}
