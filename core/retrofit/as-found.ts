/**
 * The member as found: from core tests, steel tests and recorded defects to derived material specs
 * and section definitions (new ids, `<id>~<member>~as-found`) that the unchanged section and member
 * engines analyse.
 *
 *  - Concrete: the in-place strength of in-place-strength.ts (the lower fractile: ACI 214.4R f′c,eq,
 *    EN 1990 Annex D fck,is) replaces the specified strength for the code checks, and the measured
 *    mean of the cores becomes the spec's `meanStrength`, which the laws of behaviour use (curves,
 *    Ec, tensile strength, deflections, the shear demand at the mechanism; under EN fcm is the
 *    mean, never fck,is + 8). Other properties of the spec — model, overrides — are kept.
 *  - Steel: coupon or era values replace the library values.
 *  - Section loss (corrosion, corrosion.ts): a layer keeps (1 − δs) of its area, as bars of the
 *    residual diameter d·√(1 − δs), and a derived steel with the reduced rupture strain; a layer
 *    with 100 % loss is removed; stirrups likewise (for confinement and shear).
 *  - Cover loss: the concrete is cut from the outline (outline.ts). Bars stay where they are; a bar
 *    no longer wholly inside the remaining concrete is "exposed": it is modelled as a discrete
 *    element that displaces no concrete and keeps plane-section strain compatibility, i.e. it is
 *    assumed anchored beyond the spalled length (its bond along the spall is lost; the engineer
 *    must confirm the anchorage). A confined core is no longer modelled for a spalled section (the
 *    engine derives cores for the standard shapes only); the cover concrete of such a section is
 *    unconfined.
 *
 * Units: mm, MPa.
 */
import { diagnostic, reworded, type Diagnostic } from '../diagnostics.ts';
import { joinTexts, phrase, q, type Text } from '../units/phrase.ts';
import { DEFAULT_HARDENING_STRAIN, defaultRuptureStrain, validateSteelSpec } from '../materials/build/steel.ts';
import type { CodeBasis, ConcreteSpec, MaterialSpec, SteelSpec } from '../materials/specs.ts';
import type { BeamDefinition } from '../member/definition.ts';
import { barPositions } from '../section/build.ts';
import type { BarLayer, SectionDefinition } from '../section/definition.ts';
import { barArea, layerArea, layerDiameter } from '../section/definition.ts';
import { shapeOutline } from '../section/shapes.ts';
import { chordIntervals } from '../section/width-profile.ts';
import { corrodedRuptureStrainFactor } from './corrosion.ts';
import { inPlaceStrength } from './in-place-strength.ts';
import { changeOutline, type OutlineChange, type SideCut } from './outline.ts';
import type { AsFoundCondition, AsFoundSummary, CoverLossDefect, Library } from './types.ts';
import { memberSections, validateAsFound } from './validate.ts';

/** Smallest rupture strain a steel spec may have (core/materials/build/steel.ts validation). */
const SPEC_MIN_RUPTURE_STRAIN = 0.01;

/** Id of a derived item: `<base>~<member>~<variant>`. */
export function derivedId(base: string, memberId: string, variant: string): string {
  return `${base}~${memberId}~${variant}`;
}

/** A bar layer left outside the concrete by spalling: added to the section as a discrete element. */
export interface ExposedBars {
  readonly steelId: string;
  /** Depth in the derived section, mm. */
  readonly depth: number;
  readonly area: number;
  readonly diameter: number;
  readonly label: string;
  readonly sourceIndex: number;
  /** Number of bars and their horizontal positions in the section, mm (as drawn; the engine needs only the area). */
  readonly count?: number;
  readonly positions: readonly number[];
}

/** A library section as found: its derived definition (depths in mm of the derived section) and the bars spalling left outside the concrete. */
export interface DerivedSection {
  readonly id: string;
  readonly baseSectionId: string;
  readonly definition: SectionDefinition;
  readonly exposedBars: readonly ExposedBars[];
  /** New depth = original depth − shift (top cover removed), mm. */
  readonly shift: number;
  readonly changes: readonly Text[];
}

/** Everything deriveAsFound produces: derived specs (MPa), derived sections, the summary for the report and the diagnostics. */
export interface AsFoundDerivation {
  /** Derived material specs (concrete with in-place strength, tested and corroded steels). */
  readonly materials: readonly MaterialSpec[];
  /** Derived sections by library section id. */
  readonly sections: ReadonlyMap<string, DerivedSection>;
  readonly summary: Omit<AsFoundSummary, 'sections'> & { readonly sections: AsFoundSummary['sections'] };
  /** Errors (nothing derived when any) and warnings. */
  readonly diagnostics: readonly Diagnostic[];
  /** True when the condition changes nothing (no cores, steel data or defects). */
  readonly unchanged: boolean;
}

/** Options of deriveAsFound. */
export interface AsFoundOptions {
  /** Leave out cover-loss defects (spalls repaired before strengthening). */
  readonly repairSpalls?: boolean;
  /** Variant name in derived ids (default 'as-found'). */
  readonly variant?: string;
}

/** Lengths and strengths in messages (mm, MPa; shown in the display units). */
const len = (mm: number) => q('sectionLength', mm, { compact: true });
const fc = (mpa: number) => q('concreteStress', mpa, { compact: true });

const pct = (x: number) => `${(x * 100).toFixed(1).replace(/\.0$/, '')} %`;

/**
 * Reinforcing steel after corrosion: the rupture strain reduced by corrodedRuptureStrainFactor.
 * When the reduced strain is at or below the start of strain hardening the law becomes bilinear
 * (fy to fu between εy and the new εsu); below 0.01 — the least the steel laws accept — it is held
 * at 0.01 with a warning (unconservative for ductility).
 */
export function corrodedSteelSpec(base: SteelSpec, lossFraction: number, id: string): { spec: SteelSpec; ruptureStrain: number; computed: number; warnings: string[] } {
  const warnings: string[] = [];
  const original = base.ruptureStrain ?? defaultRuptureStrain(base.model);
  const computed = original * corrodedRuptureStrainFactor(lossFraction);
  let rupture = computed;
  if (rupture < SPEC_MIN_RUPTURE_STRAIN) {
    warnings.push(`the reduced rupture strain ${computed.toFixed(4)} is below 0.01, the least the steel laws accept: 0.01 is used, which overstates the ductility of these bars`);
    rupture = SPEC_MIN_RUPTURE_STRAIN;
  }
  let spec: SteelSpec = { ...base, id, name: `${base.name} (corroded ${pct(lossFraction)})`, ruptureStrain: rupture };
  const hardening = base.model === 'park-paulay' || base.model === 'mander-power' ? base.hardeningStrain ?? DEFAULT_HARDENING_STRAIN : base.model === 'bilinear' ? base.hardeningStrain : undefined;
  if (hardening !== undefined && rupture <= hardening + 1e-4) {
    const { hardeningStrain: _h, hardeningModulus: _m, ...rest } = spec;
    spec = { ...rest, model: 'bilinear' };
    warnings.push(`the reduced rupture strain ${rupture.toFixed(4)} is within the yield plateau (hardening from ${hardening}): the bars are modelled bilinear from fy at εy to fu at εsu`);
  } else if (base.model === 'bilinear' && base.hardeningModulus !== undefined) {
    const { hardeningModulus: _m, ...rest } = spec;
    spec = rest;
  }
  return { spec, ruptureStrain: rupture, computed, warnings };
}

/** Whether every bar of a layer lies wholly inside an outline, given x positions (mm) and the depth in the outline's coordinates. */
function layerInside(outline: ReturnType<typeof shapeOutline>, height: number, xs: readonly number[], depth: number, diameter: number): boolean {
  const r = diameter / 2;
  if (depth - r < 0 || depth + r > height) return false;
  const chords = [depth - r, depth, depth + r].map((y) => chordIntervals(outline, Math.min(Math.max(y, 1e-9), height - 1e-9)));
  return xs.every((x) => chords.every((cs) => cs.some(([a, b]) => x - r >= a - 1e-6 && x + r <= b + 1e-6)));
}

/**
 * Derives the as-found materials and sections of a member. Reports every input problem; derives
 * nothing when there is an error.
 * @param path the member's path, e.g. `members[3] "B-12"`
 */
export function deriveAsFound(member: BeamDefinition, condition: AsFoundCondition, library: Library, code: CodeBasis, path: string, options: AsFoundOptions = {}): AsFoundDerivation {
  const at = `${path}.asFound`;
  const variant = options.variant ?? 'as-found';
  const diagnostics: Diagnostic[] = validateAsFound(condition, member, library, at);
  const empty = (): AsFoundDerivation => ({
    materials: [], sections: new Map(), diagnostics, unchanged: false,
    summary: { concrete: [], steel: [], defects: [], sections: [], notes: condition.notes ?? '' },
  });
  if (diagnostics.some((d) => d.severity === 'error')) return empty();
  const sections = memberSections(member, library);
  const specs: MaterialSpec[] = [];
  const warn = (p: string, message: Text) => diagnostics.push(diagnostic('inconsistent', p, 'warning', message));
  const fail = (p: string, message: Text) => diagnostics.push(diagnostic('out-of-range', p, 'error', message));

  // --- concrete ----------------------------------------------------------------------------------------
  const concreteMap = new Map<string, string>();
  const concreteSummary: AsFoundSummary['concrete'][number][] = [];
  const usedConcretes = [...new Set(sections.map((s) => s.concreteId))];
  (condition.cores ?? []).forEach((c, i) => {
    const targets = c.concreteId !== undefined ? [c.concreteId] : usedConcretes;
    const result = inPlaceStrength(code, c);
    for (const id of targets) {
      const spec = library.materials.find((m) => m.id === id && m.kind === 'concrete') as ConcreteSpec | undefined;
      if (!spec) continue;
      if (!(result.strength >= 10)) {
        fail(`${at}.cores[${i}]`, phrase`the in-place strength ${result.formula} is below ${fc(10)}, the least the concrete laws accept: the cores are too weak or too scattered for this analysis (check for outliers or test more cores)`);
        continue;
      }
      const derived = derivedId(id, member.id, variant);
      concreteMap.set(id, derived);
      // The lower fractile for the code checks, the measured mean for behaviour (issue 11 item 3).
      specs.push({ ...spec, id: derived, name: `${spec.name} (in place)`, strength: result.strength, meanStrength: Math.max(c.meanStrength, result.strength) });
      concreteSummary.push({ coreSet: i, concreteId: id, derivedId: derived, specifiedStrength: spec.strength, inPlace: result, cores: { meanStrength: c.meanStrength, count: c.count, coefficientOfVariation: c.coefficientOfVariation }, note: c.note ?? '' });
      if (result.strength < 0.75 * spec.strength) warn(`${at}.cores[${i}]`, phrase`the in-place strength (${fc(result.strength)}) is ${pct(1 - result.strength / spec.strength)} below the specified ${fc(spec.strength)}`);
    }
  });

  // --- steel overrides ---------------------------------------------------------------------------------
  const steelSpecs = new Map<string, SteelSpec>();
  const steelSummary: AsFoundSummary['steel'][number][] = [];
  (condition.steel ?? []).forEach((s, i) => {
    const base = library.materials.find((m) => m.id === s.steelId && m.kind === 'steel') as SteelSpec;
    const derived: SteelSpec = {
      ...base,
      id: derivedId(s.steelId, member.id, variant),
      name: `${base.name} (${s.source === 'coupons' ? 'coupon tests' : 'era values'})`,
      ...(s.yieldStress !== undefined ? { yieldStress: s.yieldStress } : {}),
      ...(s.ultimateStress !== undefined ? { ultimateStress: s.ultimateStress } : {}),
      ...(s.ruptureStrain !== undefined ? { ruptureStrain: s.ruptureStrain } : {}),
      ...(s.elasticModulus !== undefined ? { elasticModulus: s.elasticModulus } : {}),
    };
    const problems = validateSteelSpec(derived, `${at}.steel[${i}]`).filter((d) => d.severity === 'error');
    if (problems.length > 0) {
      diagnostics.push(...problems.map((d) => reworded(d, '', ` (the library steel "${base.id}" with the entered test values)`)));
      return;
    }
    steelSpecs.set(s.steelId, derived);
    specs.push(derived);
    steelSummary.push({ steelId: s.steelId, derivedId: derived.id, source: s.source, yieldStress: derived.yieldStress, ultimateStress: derived.ultimateStress, ruptureStrain: derived.ruptureStrain ?? null, note: s.note ?? '' });
  });
  const steelOf = (id: string): SteelSpec | undefined => steelSpecs.get(id) ?? (library.materials.find((m) => m.id === id && m.kind === 'steel') as SteelSpec | undefined);
  const steelIdOf = (id: string) => steelSpecs.get(id)?.id ?? id;

  // --- sections ----------------------------------------------------------------------------------------
  const defects = condition.defects ?? [];
  const defectSummary: AsFoundSummary['defects'][number][] = defects.map((d, i) => ({ index: i, kind: d.kind, sectionIds: d.sectionId !== undefined ? [d.sectionId] : sections.map((s) => s.id), effect: '', note: d.note ?? '' }));
  const effects: Text[][] = defects.map(() => []);
  const derivedSections = new Map<string, DerivedSection>();
  for (const s of sections) {
    const changes: Text[] = [];
    const applies = (d: { sectionId?: string }) => d.sectionId === undefined || d.sectionId === s.id;
    // Section loss per layer (defects add up).
    const loss = new Map<number | 'hoops', { total: number; from: number[] }>();
    defects.forEach((d, i) => {
      if (d.kind !== 'section-loss' || !applies(d)) return;
      const entry = loss.get(d.layer) ?? { total: 0, from: [] };
      entry.total += d.lossPercent / 100;
      entry.from.push(i);
      loss.set(d.layer, entry);
    });
    for (const [layer, entry] of loss) {
      if (entry.total > 1 + 1e-12) {
        const which = entry.from.map((i) => `defects[${i}]`).join(' and ');
        fail(`${at}.defects[${entry.from[entry.from.length - 1]}].lossPercent`, `the section losses of ${layer === 'hoops' ? 'the stirrups' : `bars[${layer}]`} of section "${s.id}" from ${which} add up to ${(entry.total * 100).toFixed(1)} %: the total must be 0 to 100 %`);
      }
    }
    const bars: (BarLayer & { sourceIndex: number })[] = [];
    s.bars.forEach((layer, i) => {
      const base = { ...layer, steelId: steelIdOf(layer.steelId), sourceIndex: i };
      const entry = loss.get(i);
      const name = layer.label ?? `layer ${i + 1}`;
      if (!entry || entry.total <= 0) {
        bars.push(base);
        return;
      }
      const delta = Math.min(entry.total, 1);
      if (delta >= 1) {
        changes.push(`${name} lost entirely (100 % section loss): removed`);
        for (const k of entry.from) effects[k]!.push(`section "${s.id}" ${name}: removed (100 % loss)`);
        return;
      }
      const steel = steelOf(layer.steelId);
      if (!steel) return;
      const corroded = corrodedSteelSpec(steel, delta, derivedId(steel.id.split('~')[0]!, member.id, `${variant}-${s.id}-L${i + 1}`));
      for (const w of corroded.warnings) warn(`${at}.defects[${entry.from[0]}]`, `section "${s.id}" ${name}: ${w}`);
      specs.push(corroded.spec);
      const area0 = layerArea(layer);
      const residualDiameter = layer.diameter !== undefined ? layer.diameter * Math.sqrt(1 - delta) : undefined;
      const reduced: BarLayer & { sourceIndex: number } = residualDiameter !== undefined && residualDiameter >= 3 && layer.count !== undefined
        ? { ...base, steelId: corroded.spec.id, diameter: residualDiameter, label: `${name} (corroded ${pct(delta)})` }
        : { steelId: corroded.spec.id, depth: layer.depth, area: area0 * (1 - delta), ...(layer.spread ? { spread: layer.spread } : {}), label: `${name} (corroded ${pct(delta)})`, sourceIndex: i };
      bars.push(reduced);
      const original = steel.ruptureStrain ?? defaultRuptureStrain(steel.model);
      const text = phrase`${name}: area ${q('area', area0, { compact: true })} → ${q('area', area0 * (1 - delta), { compact: true })}${residualDiameter !== undefined ? phrase` (bars ${len(layer.diameter!)} → ${len(residualDiameter)})` : ''}, rupture strain ${original.toFixed(3)} → ${corroded.ruptureStrain.toFixed(4)}`;
      changes.push(text);
      for (const k of entry.from) effects[k]!.push(phrase`section "${s.id}" ${text}`);
    });
    let hoops = s.hoops ? { ...s.hoops, steelId: steelIdOf(s.hoops.steelId) } : undefined;
    const hoopLoss = loss.get('hoops');
    if (hoops && hoopLoss && hoopLoss.total > 0) {
      const delta = Math.min(hoopLoss.total, 1);
      const diameter = hoops.diameter * Math.sqrt(1 - delta);
      if (delta >= 1 || diameter < 4) {
        changes.push(`stirrups lost (${pct(delta)} section loss leaves bars under 4 mm): no stirrups, no confinement`);
        for (const k of hoopLoss.from) effects[k]!.push(`section "${s.id}": stirrups treated as lost`);
        hoops = undefined;
      } else {
        const steel = steelOf(s.hoops!.steelId);
        if (steel) {
          const corroded = corrodedSteelSpec(steel, delta, derivedId(steel.id.split('~')[0]!, member.id, `${variant}-${s.id}-hoops`));
          for (const w of corroded.warnings) warn(`${at}.defects[${hoopLoss.from[0]}]`, `section "${s.id}" stirrups: ${w}`);
          specs.push(corroded.spec);
          hoops = { ...hoops, diameter, steelId: corroded.spec.id };
          const text = phrase`stirrups ${len(s.hoops!.diameter)} → ${len(diameter)} (corroded ${pct(delta)}), rupture strain ${corroded.ruptureStrain.toFixed(4)}`;
          changes.push(text);
          for (const k of hoopLoss.from) effects[k]!.push(phrase`section "${s.id}" ${text}`);
        }
      }
    }

    // Cover loss.
    const covers = defects.map((d, i) => ({ d, i })).filter((x): x is { d: CoverLossDefect; i: number } => x.d.kind === 'cover-loss' && applies(x.d));
    let shape = s.shape;
    let shift = 0;
    const exposed: ExposedBars[] = [];
    let kept = bars;
    if (covers.length > 0 && !options.repairSpalls) {
      const outline0 = shapeOutline(s.shape);
      const height0 = Math.max(...outline0.outline.map((p) => p.y));
      const side = (face: 'left' | 'right'): SideCut[] => covers.filter((c) => c.d.face === face).map((c) => ({ depth: c.d.depth, from: c.d.from ?? 0, to: c.d.to ?? height0 }));
      const change: OutlineChange = {
        top: Math.max(0, ...covers.filter((c) => c.d.face === 'top').map((c) => c.d.depth)),
        bottom: Math.max(0, ...covers.filter((c) => c.d.face === 'bottom').map((c) => c.d.depth)),
        left: side('left'),
        right: side('right'),
        addTop: 0,
        addBottom: 0,
      };
      const outcome = changeOutline(s.shape, change);
      if (!outcome.ok) {
        fail(`${at}.defects[${covers[0]!.i}]`, phrase`section "${s.id}": ${outcome.message}`);
        continue;
      }
      shape = outcome.shape;
      shift = outcome.shift;
      const outline1 = shapeOutline(shape);
      kept = [];
      for (const layer of bars) {
        const original = s.bars[layer.sourceIndex]!;
        const xs = barPositions(s, original);
        const diameter = layerDiameter(layer);
        const depth = layer.depth - shift;
        if (layerInside(outline1, outcome.height, xs, depth, diameter)) kept.push({ ...layer, depth });
        else {
          const label = `${layer.label ?? `layer ${layer.sourceIndex + 1}`} (exposed by spalling)`;
          exposed.push({ steelId: layer.steelId, depth, area: layerArea(layer), diameter, label, sourceIndex: layer.sourceIndex, ...(layer.count !== undefined ? { count: layer.count } : {}), positions: xs });
          changes.push(`${label}: no longer embedded; kept as a bar outside the concrete (no bond along the spall, anchorage assumed beyond it)`);
        }
      }
      const sideDepth = Math.max(0, ...change.left.map((c) => c.depth), ...change.right.map((c) => c.depth));
      if (hoops) {
        if (hoops.confineCore) warn(`${at}.defects[${covers[0]!.i}]`, `section "${s.id}": the confined core is not modelled for a spalled section (unconfined concrete throughout, conservative for ductility)`);
        hoops = { ...hoops, confineCore: false, clearCover: Math.max(0, hoops.clearCover - sideDepth) };
      }
      for (const c of covers) {
        const text = phrase`${len(c.d.depth)} of concrete lost from the ${c.d.face} face${c.d.face === 'left' || c.d.face === 'right' ? phrase` between depths ${len(c.d.from ?? 0)} and ${len(c.d.to ?? height0)}` : ''}`;
        effects[c.i]!.push(phrase`section "${s.id}": ${text}`);
      }
      changes.push(phrase`outline: ${joinTexts(covers.map((c) => phrase`${len(c.d.depth)} off the ${c.d.face}`), ', ')} (depth ${len(outcome.height)} remains)`);
    }
    const concreteId = concreteMap.get(s.concreteId) ?? s.concreteId;
    if (concreteMap.has(s.concreteId)) changes.unshift(`concrete: in-place strength from cores (${concreteId})`);
    const steelChanged = s.bars.some((b) => steelSpecs.has(b.steelId)) || (s.hoops && steelSpecs.has(s.hoops.steelId));
    if (steelChanged) changes.unshift('steel: tested or era values');
    const id = derivedId(s.id, member.id, variant);
    const { hoops: _hoops, ...rest } = s;
    const definition: SectionDefinition = {
      ...rest,
      id,
      name: `${s.name} (${variant === 'as-found' ? 'as found' : variant})`,
      shape,
      concreteId,
      bars: kept.map(({ sourceIndex: _i, ...layer }) => layer),
      ...(hoops ? { hoops } : {}),
    };
    derivedSections.set(s.id, { id, baseSectionId: s.id, definition, exposedBars: exposed, shift, changes });
  }
  if (diagnostics.some((d) => d.severity === 'error')) return empty();
  const unchanged = (condition.cores ?? []).length === 0 && (condition.steel ?? []).length === 0 && defects.length === 0;
  return {
    materials: specs,
    sections: derivedSections,
    diagnostics,
    unchanged,
    summary: {
      concrete: concreteSummary,
      steel: steelSummary,
      defects: defectSummary.map((d, i) => ({ ...d, effect: effects[i]!.length > 0 ? joinTexts(effects[i]!, '; ') : options.repairSpalls && defects[i]!.kind === 'cover-loss' ? 'repaired' : 'no effect' })),
      sections: [...derivedSections.values()].map((d) => ({ baseSectionId: d.baseSectionId, sectionId: d.id, shift: d.shift, changes: d.changes })),
      notes: condition.notes ?? '',
    },
  };
}

/** The area of a bar of diameter d, mm² (re-exported for scheme builders). */
export { barArea };
