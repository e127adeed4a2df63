/**
 * From a user's section definition to the resolved `SectionModel` the solver works on:
 * outline → depth strips, hoops → confined core, layers → bar elements, materials resolved
 * from the library. All problems are collected and thrown together as one InputError.
 */
import { checkNumber, diagnostic, InputError, type Diagnostic } from '../diagnostics.ts';
import { phrase, q } from '../units/phrase.ts';
import type { ConcreteMaterial, UniaxialMaterial } from '../materials/types.ts';
import { combineConcrete } from '../materials/concrete/combine.ts';
import type { MaterialResolver } from '../materials/library.ts';
import { linearBrittleTension } from '../materials/concrete/tension.ts';
import { clipProfile } from './elastic.ts';
import type { ConfinementInput } from '../materials/specs.ts';
import type { BarLayer, SectionDefinition } from './definition.ts';
import { barArea, hoopsConfine, layerArea, layerDiameter } from './definition.ts';
import type { ConcretePart, DiscreteElement, SectionModel } from './model.ts';
import { shapeOutline, type SectionShape } from './shapes.ts';
import { barLayoutProblems, hoopLegProblems, polygonShapeProblems } from './geometry-checks.ts';
import { chordIntervals, profileMoments, subtractProfile, widthProfile, type Strip } from './width-profile.ts';

/** A section dimension in a message (mm, shown in the display unit of section lengths). */
const len = (mm: number) => q('sectionLength', mm, { compact: true });

/** Extra parts added to a section by a strengthening scheme or an as-found condition (see core/retrofit). */
export interface SectionAdditions {
  readonly parts?: readonly ConcretePart[];
  readonly elements?: readonly DiscreteElement[];
}

/** Horizontal extent of the web (the part the hoops enclose), mm from the left edge. */
export function webExtent(shape: SectionShape): { x0: number; x1: number } | undefined {
  switch (shape.kind) {
    case 'rectangle':
      return { x0: 0, x1: shape.width };
    case 'tee':
    case 'inverted-tee':
      return { x0: (shape.flangeWidth - shape.webWidth) / 2, x1: (shape.flangeWidth + shape.webWidth) / 2 };
    case 'ell':
      return shape.flangeSide === 'right' ? { x0: 0, x1: shape.webWidth } : { x0: shape.flangeWidth - shape.webWidth, x1: shape.flangeWidth };
    case 'i-shape': {
      const w = Math.max(shape.topFlangeWidth, shape.bottomFlangeWidth, shape.webWidth);
      return { x0: (w - shape.webWidth) / 2, x1: (w + shape.webWidth) / 2 };
    }
    case 'box':
    case 'polygon':
      return undefined;
  }
}

/**
 * Rectangle through the centreline of the perimeter hoop around the web, mm (x from the left edge,
 * y down from the top): the confined core of Mander et al. (1988). Undefined when the shape has no
 * single web or the cover and hoop leave nothing inside. The analysis and both drawings use it.
 */
export function hoopCentreline(shape: SectionShape, hoops: { readonly clearCover: number; readonly diameter: number }): { x0: number; x1: number; y0: number; y1: number } | undefined {
  const web = webExtent(shape);
  if (!web || !Number.isFinite(hoops.clearCover) || !Number.isFinite(hoops.diameter)) return undefined;
  const offset = hoops.clearCover + hoops.diameter / 2;
  const rect = { x0: web.x0 + offset, x1: web.x1 - offset, y0: offset, y1: shapeHeight(shape) - offset };
  return rect.x1 > rect.x0 && rect.y1 > rect.y0 ? rect : undefined;
}

/** Overall height of a shape, mm. */
export function shapeHeight(shape: SectionShape): number {
  if (shape.kind === 'polygon') return Math.max(...shape.outline.map((p) => p.y)) - Math.min(...shape.outline.map((p) => p.y));
  return shape.height;
}

/** Checks the numbers of a shape; returns diagnostics (empty when valid). */
export function validateShape(shape: SectionShape, path: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  const positive = (field: string, value: unknown, max = 20000) => checkNumber(out, `${path}.${field}`, value, { min: 0, exclusiveMin: true, max, quantity: 'sectionLength' });
  switch (shape.kind) {
    case 'rectangle':
      positive('width', shape.width);
      positive('height', shape.height);
      break;
    case 'tee':
    case 'inverted-tee':
    case 'ell':
      positive('height', shape.height);
      positive('webWidth', shape.webWidth);
      positive('flangeWidth', shape.flangeWidth);
      positive('flangeThickness', shape.flangeThickness);
      if (out.length === 0) {
        if (shape.flangeWidth < shape.webWidth) out.push(diagnostic('geometry', `${path}.flangeWidth`, 'error', phrase`must be at least the web width (${len(shape.webWidth)}), got ${len(shape.flangeWidth)}`));
        if (shape.flangeThickness >= shape.height) out.push(diagnostic('geometry', `${path}.flangeThickness`, 'error', phrase`must be less than the height (${len(shape.height)}), got ${len(shape.flangeThickness)}`));
      }
      break;
    case 'i-shape':
      positive('height', shape.height);
      positive('webWidth', shape.webWidth);
      positive('topFlangeWidth', shape.topFlangeWidth);
      positive('topFlangeThickness', shape.topFlangeThickness);
      positive('bottomFlangeWidth', shape.bottomFlangeWidth);
      positive('bottomFlangeThickness', shape.bottomFlangeThickness);
      if (out.length === 0 && shape.topFlangeThickness + shape.bottomFlangeThickness >= shape.height) {
        out.push(diagnostic('geometry', `${path}.topFlangeThickness`, 'error', phrase`top and bottom flange thicknesses (${len(shape.topFlangeThickness)} + ${len(shape.bottomFlangeThickness)}) must add up to less than the height (${len(shape.height)})`));
      }
      break;
    case 'box':
      positive('height', shape.height);
      positive('width', shape.width);
      positive('topThickness', shape.topThickness);
      positive('bottomThickness', shape.bottomThickness);
      positive('wallThickness', shape.wallThickness);
      if (out.length === 0) {
        if (2 * shape.wallThickness >= shape.width) out.push(diagnostic('geometry', `${path}.wallThickness`, 'error', phrase`two walls (2 × ${len(shape.wallThickness)}) must be narrower than the width (${len(shape.width)})`));
        if (shape.topThickness + shape.bottomThickness >= shape.height) out.push(diagnostic('geometry', `${path}.topThickness`, 'error', phrase`top and bottom slabs (${len(shape.topThickness)} + ${len(shape.bottomThickness)}) must be thinner together than the height (${len(shape.height)})`));
      }
      break;
    case 'polygon': {
      if (!Array.isArray(shape.outline) || shape.outline.length < 3) {
        out.push({ code: 'geometry', path: `${path}.outline`, severity: 'error', message: `needs at least 3 points, got ${Array.isArray(shape.outline) ? shape.outline.length : 0}` });
        break;
      }
      shape.outline.forEach((p, i) => {
        checkNumber(out, `${path}.outline[${i}].x`, p.x, { min: -20000, max: 20000, quantity: 'sectionLength' });
        checkNumber(out, `${path}.outline[${i}].y`, p.y, { min: 0, max: 20000, quantity: 'sectionLength' });
      });
      if (out.length === 0) {
        if (Math.min(...shape.outline.map((p) => p.y)) !== 0) out.push({ code: 'geometry', path: `${path}.outline`, severity: 'error', message: 'the highest point must be at depth y = 0 (depths are measured down from the top fibre)' });
        out.push(...polygonShapeProblems(shape, path));
        if (out.length === 0 && !(profileMoments(widthProfile(shapeOutline(shape))).area > 0)) out.push({ code: 'geometry', path: `${path}.outline`, severity: 'error', message: 'the outline encloses no area' });
      }
      break;
    }
  }
  return out;
}

/**
 * The numbers of a bar layer: a whole count of 1–100 bars with a diameter of 3–60 mm, or a total
 * area above 0 and up to 10⁶ mm². Appends a diagnostic per problem; true when all are in range.
 * @param at path of the layer, e.g. `sections[2] "S-3".bars[0]`
 */
export function checkBarNumbers(out: Diagnostic[], layer: BarLayer, at: string): boolean {
  if (layer.count === undefined && layer.diameter === undefined) return checkNumber(out, `${at}.area`, layer.area, { min: 0, max: 1e6, exclusiveMin: true, quantity: 'area' });
  let ok = checkNumber(out, `${at}.count`, layer.count, { min: 1, max: 100 });
  if (ok && !Number.isInteger(layer.count)) {
    out.push({ code: 'must-be-integer', path: `${at}.count`, severity: 'error', message: `must be a whole number of bars, got ${layer.count}` });
    ok = false;
  }
  return checkNumber(out, `${at}.diameter`, layer.diameter, { min: 3, max: 60, quantity: 'sectionLength' }) && ok;
}

function rectangleProfile(x0: number, x1: number, y0: number, y1: number): Strip[] {
  return [{ top: y0, bottom: y1, widthTop: x1 - x0, widthBottom: x1 - x0 }];
}

/** Horizontal positions (mm) of the bars of a layer, for drawing and containment checks. */
export function barPositions(definition: SectionDefinition, layer: BarLayer): number[] {
  const count = layer.count ?? 1;
  const diameter = layerDiameter(layer);
  const outline = shapeOutline(definition.shape);
  const web = webExtent(definition.shape);
  const cover = (definition.hoops?.clearCover ?? 40) + (definition.hoops?.diameter ?? 0);
  let range: [number, number];
  const chords = chordIntervals(outline, Math.min(Math.max(layer.depth, 1e-6), shapeHeight(definition.shape) - 1e-6));
  if (layer.spread === 'chord' || !web) {
    const widest = chords.reduce<[number, number] | undefined>((best, c) => (!best || c[1] - c[0] > best[1] - best[0] ? c : best), undefined) ?? [0, 0];
    range = [widest[0] + cover + diameter / 2, widest[1] - cover - diameter / 2];
  } else {
    range = [web.x0 + cover + diameter / 2, web.x1 - cover - diameter / 2];
  }
  if (count === 1) return [(range[0] + range[1]) / 2];
  return Array.from({ length: count }, (_, i) => range[0] + ((range[1] - range[0]) * i) / (count - 1));
}

/**
 * Resolves a section definition. Throws InputError listing every problem (dimensions, bars outside
 * the concrete, unknown materials, unsupported confinement).
 * @param path prefix for diagnostic paths, e.g. `sections[2] "S-3"`
 */
export function buildSectionModel(definition: SectionDefinition, materials: MaterialResolver, path = 'section', additions: SectionAdditions = {}): { model: SectionModel; warnings: string[] } {
  const problems: Diagnostic[] = validateShape(definition.shape, `${path}.shape`);
  const warnings: string[] = [];
  if (problems.length > 0) throw new InputError(problems);

  const outline = shapeOutline(definition.shape);
  const profile = widthProfile(outline);
  const height = shapeHeight(definition.shape);
  const gross = profileMoments(profile);
  const centroidDepth = gross.firstMoment / gross.area;
  const grossInertia = profileMoments(profile, centroidDepth).secondMoment;

  // Hoops and confinement.
  const hoops = definition.hoops;
  let core: SectionModel['core'];
  let confinement: ConfinementInput | undefined;
  if (hoops) {
    checkNumber(problems, `${path}.hoops.diameter`, hoops.diameter, { min: 4, max: 32, quantity: 'sectionLength' });
    checkNumber(problems, `${path}.hoops.spacing`, hoops.spacing, { min: 25, max: 1000, quantity: 'sectionLength' });
    checkNumber(problems, `${path}.hoops.clearCover`, hoops.clearCover, { min: 0, max: 150, quantity: 'sectionLength' });
    checkNumber(problems, `${path}.hoops.verticalLegs`, hoops.verticalLegs, { min: 2, max: 12 });
    if (hoops.horizontalLegs !== undefined) checkNumber(problems, `${path}.hoops.horizontalLegs`, hoops.horizontalLegs, { min: 2, max: 12 });
    problems.push(...hoopLegProblems(hoops, path));
    const hoopSteel = materials.steel(hoops.steelId);
    if (!hoopSteel) problems.push({ code: 'unknown-reference', path: `${path}.hoops.steelId`, severity: 'error', message: `no steel material with id "${hoops.steelId}" in the library` });
    const web = webExtent(definition.shape);
    if (hoopsConfine(hoops) && problems.length === 0 && hoopSteel) {
      if (!web) {
        problems.push({ code: 'inconsistent', path: `${path}.hoops.confineCore`, severity: 'error', message: `a confined core is supported for rectangle, tee, inverted-tee, ell and I shapes, not for a ${definition.shape.kind}` });
      } else {
        const rect = hoopCentreline(definition.shape, hoops);
        const { x0, x1, y0, y1 } = rect ?? { x0: 0, x1: 0, y0: 0, y1: 0 };
        if (!rect || !(x1 - x0 > hoops.diameter && y1 - y0 > hoops.diameter)) {
          problems.push(diagnostic('geometry', `${path}.hoops.clearCover`, 'error', phrase`cover ${len(hoops.clearCover)} leaves no core inside the hoops of a ${len(web.x1 - web.x0)} wide, ${len(height)} deep web`));
        } else {
          core = { x0, x1, y0, y1 };
          const coreArea = (x1 - x0) * (y1 - y0);
          const inside = definition.bars.filter((b) => b.depth > y0 && b.depth < y1);
          const longitudinal = inside.reduce((s, b) => s + layerArea(b), 0);
          confinement = {
            hoopYieldStress: hoopSteel.yieldStress,
            hoopDiameter: hoops.diameter,
            spacing: hoops.spacing,
            coreWidth: x1 - x0,
            coreDepth: y1 - y0,
            // specs.ts: legsX = legs crossing a cut parallel to x (the vertical legs), legsY = the horizontal legs.
            legsX: hoops.verticalLegs,
            legsY: hoops.horizontalLegs ?? 2,
            clearSpacings: clearSpacings(inside, x1 - x0, y1 - y0, hoops.verticalLegs, hoops.horizontalLegs ?? 2),
            longitudinalRatio: longitudinal / coreArea,
            hoopRuptureStrain: hoopSteel.ruptureStrain,
          };
        }
      }
    }
  }

  const concrete = materials.concrete(definition.concreteId, confinement);
  if (!concrete) problems.push({ code: 'unknown-reference', path: `${path}.concreteId`, severity: 'error', message: `no concrete material with id "${definition.concreteId}" in the library` });
  if (concrete?.warnings) warnings.push(...concrete.warnings);
  if (confinement && concrete && !concrete.core) {
    warnings.push('The chosen concrete model has no confined form (use Mander or Modified Kent–Park): the core is analysed as unconfined.');
  }

  // Bars.
  if (!Array.isArray(definition.bars)) problems.push({ code: 'required', path: `${path}.bars`, severity: 'error', message: 'a list of bar layers is required' });
  const elements: DiscreteElement[] = [];
  (definition.bars ?? []).forEach((layer, i) => {
    const at = `${path}.bars[${i}]`;
    const before = problems.length;
    checkNumber(problems, `${at}.depth`, layer.depth, { min: 0, max: height, exclusiveMin: true, exclusiveMax: true, quantity: 'sectionLength' });
    checkBarNumbers(problems, layer, at);
    const steel = materials.steel(layer.steelId);
    if (!steel) problems.push({ code: 'unknown-reference', path: `${at}.steelId`, severity: 'error', message: `no steel material with id "${layer.steelId}" in the library` });
    if (problems.length > before || !steel || !concrete) return;
    // Containment: each bar's circle must lie inside the concrete.
    const diameter = layerDiameter(layer);
    const radius = diameter / 2;
    if (layer.depth - radius < 0 || layer.depth + radius > height) {
      problems.push(diagnostic('outside-section', `${at}.depth`, 'error', phrase`a ${len(diameter)} bar at depth ${len(layer.depth)} sticks out of the ${len(height)} deep section (allowed ${len(radius)} to ${len(height - radius)})`));
      return;
    }
    const chords = [layer.depth - radius, layer.depth, layer.depth + radius].map((y) => chordIntervals(outline, Math.min(Math.max(y, 1e-9), height - 1e-9)));
    const positions = barPositions(definition, layer);
    const outside = positions.some((x) => !chords.every((cs) => cs.some(([a, b]) => x - radius >= a - 1e-6 && x + radius <= b + 1e-6)));
    if (outside || positions.some((x, k) => k > 0 && x - positions[k - 1]! < diameter - 1e-6)) {
      problems.push(diagnostic('outside-section', `${at}`, 'error', phrase`${layer.count ?? 1} bars of ${len(diameter)} at depth ${len(layer.depth)} do not fit inside the concrete${layer.spread === 'chord' ? '' : ' within the hoops of the web'} (reduce the count, or spread them across the width at that depth)`));
      return;
    }
    const inCore = core !== undefined && layer.depth > core.y0 && layer.depth < core.y1 && concrete.core !== undefined;
    elements.push({
      kind: 'bar',
      label: layer.label ?? (layer.count !== undefined && layer.diameter !== undefined ? `layer ${i + 1}: ${layer.count} × ${layer.diameter} mm` : `layer ${i + 1}: ${layerArea(layer).toFixed(0)} mm²`),
      sourceIndex: i,
      area: layerArea(layer),
      diameter,
      depth: layer.depth,
      material: steel,
      initialStrain: 0,
      limitStrain: steel.ruptureStrain,
      limitCause: 'steel-rupture',
      displacedConcrete: inCore ? concrete.core! : concrete.cover,
    });
  });
  // Bars of different layers on top of each other, bars in a void (geometry-checks.ts).
  const placed = new Set(elements.map((e) => e.sourceIndex));
  problems.push(...barLayoutProblems(definition, path, (layer) => barPositions(definition, layer), { containment: placed }).filter((d) => d.severity === 'error'));
  if (definition.axialForce !== undefined) {
    checkNumber(problems, `${path}.axialForce`, definition.axialForce, { min: -1e9, max: 1e9, quantity: 'force' });
  }
  if (problems.length > 0) throw new InputError(problems);

  const strength = concrete!.strength ?? concrete!.cover.peakStress;
  let parts: ConcretePart[] = [];
  if (core && concrete!.core) {
    const coreProfile = rectangleProfile(core.x0, core.x1, core.y0, core.y1);
    parts.push(partOf('cover', 'unconfined cover', subtractProfile(profile, coreProfile), concrete!.cover, false, strength));
    parts.push(partOf('core', 'confined core', coreProfile, concrete!.core, true, strength));
  } else {
    parts.push(partOf('cover', 'concrete', profile, concrete!.cover, true, strength));
  }
  const stiffening = concrete!.cover.tension.model === 'tension-stiffening' ? tensionStiffeningBands(parts, elements, height) : undefined;
  if (stiffening) parts = stiffening.parts;
  // Tension stiffening acts only in concrete anchored by the section's own bars: an added layer
  // (overlay, soffit layer) cracks brittly.
  for (const extra of additions.parts ?? []) parts.push(extra.material.tension.model === 'tension-stiffening' && extra.stiffeningGroup === undefined ? { ...extra, material: brittleConcrete(extra.material) } : extra);
  for (const extra of additions.elements ?? []) elements.push(extra);
  return {
    model: {
      height,
      centroidDepth,
      concreteParts: parts,
      elements,
      ...(stiffening && stiffening.groups.length > 0 ? { stiffeningGroups: stiffening.groups } : {}),
      axialForce: definition.axialForce ?? 0,
      outline,
      ...(core && concrete!.core ? { core } : {}),
      grossArea: gross.area,
      grossInertia,
    },
    warnings,
  };
}

/**
 * Where tension stiffening acts (the law's `stiffeningZone`):
 *  - 'effective-area' (default): the effective tension area of each face that has bars, of depth
 *    hc,ef = min(2.5·(h − d), h/2) (EN 1992-1-1 7.3.2(3), without the (h − x)/3 term, which depends on
 *    the neutral axis), anchored by that face's bars; elsewhere the same concrete cracks brittly
 *    (linear to its tensile strength, then zero). Applying the average-stress law to the whole tension
 *    zone overstates the cracked stiffness and strength of deep sections (common practice, no source).
 *  - 'tension-zone': all the concrete, anchored by every bar (bars in compression add nothing once the
 *    others yield: see forces.ts barReserve).
 * Each group's cracked concrete carries no more tension than its bars can still take below yield
 * (core/section/forces.ts), so stiffening ends when they yield whatever the band.
 */
function tensionStiffeningBands(parts: ConcretePart[], elements: readonly DiscreteElement[], height: number): { parts: ConcretePart[]; groups: number[][] } {
  const bars = elements.map((e, index) => ({ e, index })).filter(({ e }) => e.kind === 'bar');
  if (bars.length === 0) return { parts: parts.map((p) => ({ ...p, material: brittleConcrete(p.material) })), groups: [] };
  if (parts[0]?.material.tension.stiffeningZone === 'tension-zone') {
    return { parts: parts.map((p) => ({ ...p, label: `${p.label} (tension stiffening)`, stiffeningGroup: 0 })), groups: [bars.map((b) => b.index)] };
  }
  const bottom = bars.filter(({ e }) => e.depth > height / 2);
  const top = bars.filter(({ e }) => e.depth <= height / 2);
  const centroid = (list: typeof bars) => list.reduce((s, { e }) => s + e.area * e.depth, 0) / list.reduce((s, { e }) => s + e.area, 0);
  const groups: number[][] = [];
  const pieces: [number, number, number | undefined][] = [];
  let upper = 0;
  let lower = height;
  if (top.length > 0) {
    groups.push(top.map((b) => b.index));
    upper = Math.min(2.5 * centroid(top), height / 2);
    pieces.push([0, upper, groups.length - 1]);
  }
  if (bottom.length > 0) {
    groups.push(bottom.map((b) => b.index));
    lower = height - Math.min(2.5 * (height - centroid(bottom)), height / 2);
    pieces.push([lower, height, groups.length - 1]);
  }
  pieces.push([upper, lower, undefined]);
  const out: ConcretePart[] = [];
  for (const part of parts) {
    for (const [y0, y1, group] of pieces) {
      if (!(y1 > y0)) continue;
      const strips = clipProfile(part.strips, y0, y1);
      if (strips.length === 0) continue;
      if (group !== undefined) out.push({ ...partOf(part.role, `${part.label} (tension-stiffening band)`, strips, part.material, part.governsCrushing, part.strength), stiffeningGroup: group });
      else out.push(partOf(part.role, part.label, strips, brittleConcrete(part.material), part.governsCrushing, part.strength));
    }
  }
  return { parts: out, groups };
}

const brittleLaws = new WeakMap<ConcreteMaterial, ConcreteMaterial>();

/** The same concrete cracking brittly at its tensile strength (linear, then zero), one law per material. */
function brittleConcrete(m: ConcreteMaterial): ConcreteMaterial {
  let b = brittleLaws.get(m);
  if (!b) {
    const law = combineConcrete(m.compression, linearBrittleTension({ tensileStrength: m.tension.tensileStrength, elasticModulus: m.tension.tensileStrength / m.tension.crackingStrain }));
    b = m.ultimateStrain ? { ...law, ultimateStrain: m.ultimateStrain } : law;
    brittleLaws.set(m, b);
  }
  return b;
}

export function partOf(role: ConcretePart['role'], label: string, strips: Strip[], material: ConcreteMaterial, governsCrushing: boolean, strength: number): ConcretePart {
  return {
    role,
    label,
    strips,
    material,
    strength,
    governsCrushing,
    top: Math.min(...strips.map((s) => s.top)),
    bottom: Math.max(...strips.map((s) => s.bottom)),
  };
}

/**
 * Indices of the restrained bars among `count` evenly spaced ones held by `legs` hoop legs or ties:
 * the two end (corner) bars and one bar at each interior leg, the legs spread as evenly as the bars
 * allow. Every bar is restrained when there are at least as many legs as bars.
 */
export function restrainedBars(count: number, legs: number): number[] {
  if (count <= 2 || legs >= count) return Array.from({ length: Math.max(count, 1) }, (_, i) => i);
  const held = Math.max(2, Math.floor(legs));
  const out: number[] = [];
  for (let k = 0; k < held; k++) {
    const index = Math.round((k * (count - 1)) / (held - 1));
    if (out[out.length - 1] !== index) out.push(index);
  }
  return out;
}

/**
 * Clear spacings w′i between laterally restrained longitudinal bars around the core perimeter
 * (Mander et al. 1988): only bars at a hoop corner or held by a leg or cross-tie are restrained.
 * Along the top and bottom layers inside the core, bars are evenly spread between the corners and
 * `verticalLegs` legs hold the corner bars and as many interior ones (restrainedBars); along the sides,
 * the top and bottom layers are at the corners and an intermediate layer is restrained only where
 * it is held by a horizontal tie (`horizontalLegs` beyond the hoop's own two, spread evenly over the layers).
 */
function clearSpacings(layers: readonly BarLayer[], coreWidth: number, coreDepth: number, verticalLegs: number, horizontalLegs: number): number[] {
  if (layers.length === 0) return [coreWidth, coreWidth, coreDepth, coreDepth];
  const sorted = [...layers].sort((a, b) => a.depth - b.depth);
  const diameterOf = layerDiameter;
  const gaps: number[] = [];
  for (const layer of [sorted[0]!, sorted[sorted.length - 1]!]) {
    // Counts are validated later; keep this estimate safe for any value (1 ≤ n ≤ 100).
    const n = Number.isFinite(layer.count) ? Math.min(Math.max(Math.floor(layer.count!), 2), 100) : 2;
    const d = diameterOf(layer);
    // Bars at the core's edges and evenly between: centre-to-centre pitch (bc − d)/(n − 1).
    const pitch = (coreWidth - d) / (n - 1);
    const held = restrainedBars(n, verticalLegs);
    for (let i = 1; i < held.length; i++) gaps.push(Math.max((held[i]! - held[i - 1]!) * pitch - d, 0));
  }
  if (sorted.length === 1) {
    gaps.push(coreDepth, coreDepth);
    return gaps;
  }
  const heldLayers = restrainedBars(sorted.length, horizontalLegs);
  for (let i = 1; i < heldLayers.length; i++) {
    const upper = sorted[heldLayers[i - 1]!]!;
    const lower = sorted[heldLayers[i]!]!;
    const gap = Math.max(lower.depth - upper.depth - (diameterOf(lower) + diameterOf(upper)) / 2, 0);
    gaps.push(gap, gap);
  }
  return gaps;
}

/** Re-exported for builders of additions: area of one bar, mm². */
export { barArea };
/** A steel or FRP element material type guard used by additions. */
export type { UniaxialMaterial };
