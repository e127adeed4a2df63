/**
 * Starting inputs for existing beams made in the editor: a set of cores, tested steel, a defect, a
 * strengthening scheme of each kind, and the edits that add, copy and remove schemes. Starting
 * values are ordinary inputs an engineer types (round numbers in the display units), never
 * results; a material a scheme needs and the project lacks is added to the library with values
 * the engineer is told to confirm. No engineering number is computed here.
 */
import type { ConcreteSpec, FrpSpec, MaterialSpec, SteelSpec } from '../../../core/materials/specs.ts';
import type { Project, MemberDefinition, UnitSystem } from '../../../core/project/types.ts';
import { faceOf } from '../../../core/retrofit/schemes.ts';
import type { CoreTestSet, Defect, StrengtheningScheme, SteelTestData } from '../../../core/retrofit/types.ts';
import type { SectionDefinition } from '../../../core/section/definition.ts';
import { fromDisplay } from '../../../core/units/index.ts';
import { setMemberField } from './edits.ts';
import { copyName, uniqueId } from './factories.ts';

const tidy = (x: number): number => Number(x.toPrecision(9));
/** A value typed in the display unit of `system`, stored in internal units. */
const typed = (quantity: 'sectionLength' | 'stress' | 'concreteStress' | 'modulus', si: number, us: number, system: UnitSystem) =>
  (system === 'us' ? tidy(fromDisplay(quantity, us, 'US')) : tidy(fromDisplay(quantity, si, 'SI')));

/** The first section of the member's zones (the one schemes and defects start on). */
export function firstSection(project: Project, member: MemberDefinition): SectionDefinition | undefined {
  return project.sections.find((s) => s.id === member.zones[0]?.sectionId);
}

const materialsOf = <K extends MaterialSpec['kind']>(project: Project, kind: K) => project.materials.filter((m): m is Extract<MaterialSpec, { kind: K }> => m.kind === kind);

/** A set of cores of the member's concrete: its specified strength as the mean, three cores, V = 0.10 (to be replaced by the test results). */
export function newCoreSet(project: Project, member: MemberDefinition): CoreTestSet {
  const section = firstSection(project, member);
  const concrete = project.materials.find((m) => m.id === section?.concreteId && m.kind === 'concrete') as ConcreteSpec | undefined;
  return { ...(concrete ? { concreteId: concrete.id } : {}), meanStrength: concrete?.strength ?? typed('concreteStress', 25, 3000, project.info.unitSystem), count: 3, coefficientOfVariation: 0.1 };
}

/** Tested steel for the member's main bars: the library values to start from, from coupons. */
export function newSteelData(project: Project, member: MemberDefinition): SteelTestData | null {
  const section = firstSection(project, member);
  const steel = project.materials.find((m) => m.id === section?.bars[0]?.steelId && m.kind === 'steel') as SteelSpec | undefined;
  return steel ? { steelId: steel.id, source: 'coupons', yieldStress: steel.yieldStress, ultimateStress: steel.ultimateStress } : null;
}

/** A defect of the kind asked: 10 % section loss of the first bar layer, or 20 mm (¾ in) of cover lost from the soffit. */
export function newDefect(kind: Defect['kind'], system: UnitSystem): Defect {
  return kind === 'section-loss'
    ? { kind: 'section-loss', layer: 0, lossPercent: 10 }
    : { kind: 'cover-loss', face: 'bottom', depth: typed('sectionLength', 20, 0.75, system) };
}

/** FRP laminate values commonly published for a carbon sheet, to be confirmed against the product sheet (ACI 440.2R-17 Table 9.4: CE = 0.95, carbon, interior exposure — from memory). */
function starterFrp(project: Project): FrpSpec {
  const us = project.info.unitSystem === 'us';
  return {
    kind: 'frp', id: uniqueId('frp-', project.materials.map((m) => m.id)),
    name: `CFRP sheet (Ef ${us ? '33 000 ksi' : '230 GPa'}, ε*fu 1.67 %) — confirm with the product data`,
    tensileModulus: typed('modulus', 230_000, 33_000, project.info.unitSystem), ruptureStrain: 0.0167, environmentalFactor: 0.95,
  };
}

/** Structural plate steel: S355 under EN (EN 10025-2, fy 355, fu 490 MPa — from memory), ASTM A572 Grade 50 otherwise (fy 50, fu 65 ksi — from memory). */
function starterPlateSteel(project: Project): SteelSpec {
  const en = project.info.codeBasis === 'EN 1992-1-1';
  const system = project.info.unitSystem;
  return {
    kind: 'steel', id: uniqueId('plate-steel-', project.materials.map((m) => m.id)),
    name: en ? 'Plate steel S355' : 'Plate steel ASTM A572 Grade 50',
    model: 'bilinear',
    yieldStress: en ? 355 : typed('stress', 345, 50, system),
    ultimateStress: en ? 490 : typed('stress', 450, 65, system),
    ruptureStrain: 0.15,
  };
}

/** An id for a new scheme of the member: `frp-1`, `plate-1`, `layer-1`, … */
function schemeId(member: MemberDefinition, kind: StrengtheningScheme['kind']): string {
  const prefix = kind === 'frp' ? 'frp-' : kind === 'steel-plate' ? 'plate-' : 'layer-';
  return uniqueId(prefix, (member.schemes ?? []).map((s) => s.id));
}

/**
 * Adds a scheme of `kind` to a member, with a material added to the library when the project has
 * none of the kind the scheme needs. Returns the project, the scheme and the material added (if any).
 */
export function addScheme(project: Project, memberId: string, kind: StrengtheningScheme['kind']): { project: Project; scheme: StrengtheningScheme; addedMaterial: MaterialSpec | null } {
  const member = project.members.find((m) => m.id === memberId)!;
  const system = project.info.unitSystem;
  const section = firstSection(project, member);
  const mm = (si: number, us: number) => typed('sectionLength', si, us, system);
  /** A width that fits the face: the typical width, or the face's width less 10 %, whichever is less. */
  const fitted = (face: 'top' | 'bottom', typical: number) => {
    if (!section) return typical;
    try {
      return tidy(Math.min(typical, faceOf(section, face).width * 0.9));
    } catch {
      return typical;
    }
  };
  let next = project;
  let addedMaterial: MaterialSpec | null = null;
  const id = schemeId(member, kind);
  const n = (member.schemes ?? []).length + 1;
  let scheme: StrengtheningScheme;
  if (kind === 'frp') {
    let frp = materialsOf(project, 'frp')[0];
    if (!frp) {
      frp = starterFrp(project);
      addedMaterial = frp;
      next = { ...next, materials: [...next.materials, frp] };
    }
    scheme = { kind: 'frp', id, name: `Scheme ${n}: FRP, 2 plies`, frpId: frp.id, plies: 2, plyThickness: mm(0.165, 0.0065), width: fitted('bottom', mm(250, 10)), face: 'bottom' };
  } else if (kind === 'steel-plate') {
    let steel = materialsOf(project, 'steel').find((m) => /plate/i.test(m.name));
    if (!steel) {
      steel = starterPlateSteel(project);
      addedMaterial = steel;
      next = { ...next, materials: [...next.materials, steel] };
    }
    scheme = { kind: 'steel-plate', id, name: `Scheme ${n}: steel plate`, steelId: steel.id, thickness: mm(6, 0.25), width: fitted('bottom', mm(200, 8)), face: 'bottom' };
  } else {
    const concreteId = section?.concreteId ?? materialsOf(project, 'concrete')[0]?.id ?? '';
    const steelId = section?.bars[0]?.steelId ?? materialsOf(project, 'steel')[0]?.id ?? '';
    scheme = {
      kind: 'concrete-layer', id, name: `Scheme ${n}: concrete overlay`, face: 'top', thickness: mm(75, 3), concreteId,
      bars: [{ steelId, distanceFromFace: mm(40, 1.5), count: 4, diameter: mm(12, 0.5) }],
    };
  }
  return { project: setMemberField(next, memberId, ['schemes'], [...(member.schemes ?? []), scheme]), scheme, addedMaterial };
}

/** A copy of a member's scheme right after it, with a new id and name. */
export function duplicateScheme(project: Project, memberId: string, index: number): Project {
  const member = project.members.find((m) => m.id === memberId)!;
  const schemes = member.schemes ?? [];
  const original = schemes[index];
  if (!original) return project;
  const copy: StrengtheningScheme = { ...original, id: schemeId(member, original.kind), name: copyName(original.name, schemes.map((s) => s.name)) };
  return setMemberField(project, memberId, ['schemes'], [...schemes.slice(0, index + 1), copy, ...schemes.slice(index + 1)]);
}

/** Removes a member's scheme; a preference for it goes with it (and the list, when it was the last). */
export function removeScheme(project: Project, memberId: string, index: number): Project {
  const member = project.members.find((m) => m.id === memberId)!;
  const schemes = member.schemes ?? [];
  const removed = schemes[index];
  if (!removed) return project;
  const rest = schemes.filter((_, i) => i !== index);
  let next = setMemberField(project, memberId, ['schemes'], rest.length > 0 ? rest : undefined);
  if (member.preferredSchemeId === removed.id) next = setMemberField(next, memberId, ['preferredSchemeId'], undefined);
  return next;
}
