/**
 * Section builders of the strengthening schemes: from the section being strengthened (as found,
 * or the design section) to a derived definition plus the parts and elements added through
 * `SectionAdditions` (core/section/build.ts).
 *
 *  - FRP laminate and steel plate: the outline is unchanged; the laminate (kind 'frp', at the face)
 *    or plate (kind 'plate', its centroid half its thickness outside the face) is a discrete element
 *    with the substrate strain at installation as its initial strain. The plate is assumed anchored
 *    (e.g. bolted ends): plate-end debonding is not checked. It ends the curve at its rupture strain.
 *  - New concrete layer (overlay on top, or a layer under the soffit): the outline gains the layer's
 *    depth (outline.ts) and the layer's concrete is a part of role 'overlay' with its own law, its
 *    bars elements displacing that concrete. The layer is assumed cast with the beam propped — the
 *    engine's concrete parts carry no installation strain — and fully composite (interface shear is
 *    not checked). A confined core is not modelled in the deepened (polygon) section.
 *
 * Units: mm, N/mm (added self-weight), MPa.
 */
import { diagnostic, type Diagnostic } from '../diagnostics.ts';
import { phrase, q } from '../units/phrase.ts';
import type { MaterialLibrary } from '../materials/library.ts';
import { STANDARD_GRAVITY } from '../section/analyze.ts';
import { partOf, shapeHeight } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { barArea, layerDiameter } from '../section/definition.ts';
import type { ConcretePart, DiscreteElement } from '../section/model.ts';
import { shapeOutline } from '../section/shapes.ts';
import { chordIntervals } from '../section/width-profile.ts';
import type { ExposedBars } from './as-found.ts';
import { changeOutline, NO_CHANGE } from './outline.ts';
import type { AddedItem, ConcreteLayerScheme } from './types.ts';

/** A section dimension in a message (mm, shown in the display unit of section lengths). */
const len = (mm: number) => q('sectionLength', mm, { compact: true });

/** Density of structural steel for the added self-weight of a plate, kg/m³. // common practice, no source */
export const STEEL_DENSITY = 7850;

/** The section a scheme strengthens. */
export interface ReferenceSection {
  /** Id the reference variant analysed (library id or as-found derived id). */
  readonly id: string;
  readonly baseSectionId: string;
  readonly definition: SectionDefinition;
  readonly exposedBars: readonly ExposedBars[];
}

/** A strengthened section: derived definition, the parts and elements added through SectionAdditions, drawing items, added self-weight (N/mm). */
export interface SchemeSection {
  readonly id: string;
  readonly baseSectionId: string;
  readonly definition: SectionDefinition;
  readonly parts: readonly ConcretePart[];
  readonly elements: readonly DiscreteElement[];
  readonly added: readonly AddedItem[];
  /** Self-weight of what the scheme adds, N/mm. */
  readonly addedWeight: number;
  readonly warnings: readonly string[];
}

/** Width (mm) and depth (mm) of the concrete face a laminate, plate or layer goes on. */
export function faceOf(definition: SectionDefinition, face: 'top' | 'bottom'): { depth: number; width: number; x0: number; x1: number } {
  const outline = shapeOutline(definition.shape);
  const h = shapeHeight(definition.shape);
  const y = face === 'top' ? Math.min(1e-6 * h, 1e-3) : h - Math.min(1e-6 * h, 1e-3);
  const chords = chordIntervals(outline, y);
  const width = chords.reduce((s, [a, b]) => s + (b - a), 0);
  return { depth: face === 'top' ? 0 : h, width, x0: chords[0]?.[0] ?? 0, x1: chords[chords.length - 1]?.[1] ?? 0 };
}

/** Bars left outside the concrete by spalling, as elements that displace no concrete (and their drawing items). */
export function exposedElements(exposed: readonly ExposedBars[], materials: MaterialLibrary, shift = 0): { elements: DiscreteElement[]; added: AddedItem[] } {
  const elements: DiscreteElement[] = [];
  const added: AddedItem[] = [];
  for (const b of exposed) {
    const steel = materials.steel(b.steelId);
    if (!steel) continue;
    const depth = b.depth - shift;
    elements.push({ kind: 'bar', label: b.label, sourceIndex: b.sourceIndex, area: b.area, diameter: b.diameter, depth, material: steel, initialStrain: 0, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', displacedConcrete: null });
    added.push({ kind: 'bar', label: b.label, depth, area: b.area, initialStrain: 0, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', materialId: b.steelId, exposed: true, diameter: b.diameter, ...(b.count !== undefined ? { count: b.count } : {}), positions: b.positions });
  }
  return { elements, added };
}

/**
 * A bonded element (FRP or plate) on the reference section: same outline, new id, the element
 * added (with the reference's exposed bars).
 */
export function bondedSection(ref: ReferenceSection, id: string, name: string, materials: MaterialLibrary, element: DiscreteElement, item: AddedItem, addedWeight: number): SchemeSection {
  const exposed = exposedElements(ref.exposedBars, materials);
  return {
    id,
    baseSectionId: ref.baseSectionId,
    definition: { ...ref.definition, id, name },
    parts: [],
    elements: [...exposed.elements, element],
    added: [...exposed.added, item],
    addedWeight,
    warnings: [],
  };
}

/**
 * A new concrete layer with bars on the reference section.
 * @param at path of the scheme for diagnostics, e.g. `members[0] "B1".schemes[2]`
 * @returns the section, or the problems found (bars outside the layer, unknown materials, shapes
 *          that cannot take a layer)
 */
export function concreteLayerSection(ref: ReferenceSection, scheme: ConcreteLayerScheme, id: string, materials: MaterialLibrary, at: string): SchemeSection | Diagnostic[] {
  const problems: Diagnostic[] = [];
  const warnings: string[] = [];
  const t = scheme.thickness;
  const outcome = changeOutline(ref.definition.shape, { ...NO_CHANGE, addTop: scheme.face === 'top' ? t : 0, addBottom: scheme.face === 'bottom' ? t : 0 });
  if (!outcome.ok) return [diagnostic('geometry', `${at}.face`, 'error', phrase`section "${ref.baseSectionId}": ${outcome.message}`)];
  const shift = outcome.shift;
  const chord = scheme.face === 'top' ? outcome.topChord : outcome.bottomChord;
  const chordWidth = chord[1] - chord[0];
  const width = scheme.width ?? chordWidth;
  if (width > chordWidth + 1e-6) warnings.push(`the ${width} mm wide layer overhangs the ${chordWidth.toFixed(0)} mm wide ${scheme.face} face of section "${ref.baseSectionId}"`);
  const concrete = materials.concrete(scheme.concreteId);
  const concreteSpec = materials.concreteSpec(scheme.concreteId);
  if (!concrete || !concreteSpec) {
    const cause = materials.problems.filter((p) => p.severity === 'error').map((p) => `${p.path}: ${p.message}`).join('; ');
    return [{ code: 'unknown-reference', path: `${at}.concreteId`, severity: 'error', message: `the layer's concrete "${scheme.concreteId}" could not be built${cause ? ` (${cause})` : ''}` }];
  }
  const top = scheme.face === 'top' ? 0 : outcome.concreteBottom;
  const bottom = top + t;
  const part = partOf('overlay', `${scheme.name}: ${t} mm ${scheme.face === 'top' ? 'overlay' : 'soffit layer'} (${concreteSpec.name})`, [{ top, bottom, widthTop: width, widthBottom: width }], concrete.cover, true, concreteSpec.strength);
  const elements: DiscreteElement[] = [];
  const added: AddedItem[] = [{ kind: 'overlay', label: part.label, depth: (top + bottom) / 2, top, bottom, width, area: width * t, initialStrain: 0, materialId: scheme.concreteId }];
  scheme.bars.forEach((b, j) => {
    const bt = `${at}.bars[${j}]`;
    const steel = materials.steel(b.steelId);
    if (!steel) {
      problems.push({ code: 'unknown-reference', path: `${bt}.steelId`, severity: 'error', message: `the steel "${b.steelId}" could not be built` });
      return;
    }
    const diameter = layerDiameter(b);
    const area = b.count !== undefined && b.diameter !== undefined ? b.count * barArea(b.diameter) : b.area ?? 0;
    const r = diameter / 2;
    if (b.distanceFromFace - r < 0 || b.distanceFromFace + r > t) {
      problems.push(diagnostic('outside-section', `${bt}.distanceFromFace`, 'error', phrase`a ${len(diameter)} bar ${len(b.distanceFromFace)} from the face sticks out of the ${len(t)} layer (allowed ${len(r)} to ${len(t - r)})`));
      return;
    }
    if ((b.count ?? 1) * diameter > width) {
      problems.push(diagnostic('outside-section', `${bt}.count`, 'error', phrase`${b.count ?? 1} bars of ${len(diameter)} do not fit across the ${len(width)} wide layer`));
      return;
    }
    const depth = scheme.face === 'top' ? b.distanceFromFace : bottom - b.distanceFromFace;
    const label = b.label ?? `${scheme.name} bars ${j + 1}: ${b.count !== undefined && b.diameter !== undefined ? `${b.count} × ${b.diameter} mm` : `${area.toFixed(0)} mm²`}`;
    elements.push({ kind: 'bar', label, sourceIndex: j, area, diameter, depth, material: steel, initialStrain: 0, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', displacedConcrete: concrete.cover });
    added.push({ kind: 'bar', label, depth, area, initialStrain: 0, limitStrain: steel.ruptureStrain, limitCause: 'steel-rupture', materialId: b.steelId, diameter, ...(b.count !== undefined ? { count: b.count } : {}) });
  });
  if (problems.length > 0) return problems;
  const exposed = exposedElements(ref.exposedBars, materials, shift);
  let hoops = ref.definition.hoops;
  if (hoops?.confineCore) {
    warnings.push(`section "${ref.baseSectionId}": the confined core is not modelled in the deepened section (unconfined concrete throughout, conservative for ductility)`);
    hoops = { ...hoops, confineCore: false };
  }
  const { hoops: _h, ...rest } = ref.definition;
  const definition: SectionDefinition = {
    ...rest,
    id,
    name: `${ref.definition.name} + ${scheme.name}`,
    shape: outcome.shape,
    bars: ref.definition.bars.map((b) => ({ ...b, depth: b.depth - shift })),
    ...(hoops ? { hoops } : {}),
  };
  const density = concreteSpec.density ?? 2400;
  return {
    id,
    baseSectionId: ref.baseSectionId,
    definition,
    parts: [part],
    elements: [...exposed.elements, ...elements],
    added: [...exposed.added, ...added],
    // ρ (kg/m³) · g · A (mm²) · 1e-9 = N/mm
    addedWeight: density * STANDARD_GRAVITY * width * t * 1e-9,
    warnings,
  };
}
