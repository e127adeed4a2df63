/**
 * The material laws a member's sections use, as the report lists them: the law's name (its
 * `label`), the parameters it was built from (the user's values with the code-basis defaults filled
 * in) and its published sources (`references`). Nothing is computed here beyond resolving the
 * inputs exactly as the analysis did (core/materials/library.ts, core/section/build.ts).
 */
import { resolveConcrete, ultimateStrainWords } from '../materials/build/concrete-defaults.ts';
import type { CodeBasis, ConcreteSpec, SteelSpec } from '../materials/specs.ts';
import type { ConcreteMaterial, SteelMaterial } from '../materials/types.ts';
import { DEFAULT_TENSION_STIFFENING_END_STRAIN } from '../materials/concrete/tension.ts';
import { materialLibrary } from '../materials/library.ts';
import type { Project } from '../project/types.ts';
import { buildSectionModel } from '../section/build.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { SectionModel } from '../section/model.ts';
import type { ReportFormatter } from './format.ts';

export interface MaterialLine {
  /** What the row describes, e.g. `C30 (concrete)` or `C30, confined core of section S-1`. */
  readonly name: string;
  /** Name of the law with its source, from the law's `label`. */
  readonly law: string;
  /** Parameters with units, e.g. `f′c = 30.0 MPa`. */
  readonly parameters: readonly string[];
  /** Source strings of the law (full citations or clause references). */
  readonly references: readonly string[];
}

/** Resolved section models by section id (null when the section cannot be built). */
export function sectionModels(project: Project): (id: string) => SectionModel | null {
  const materials = materialLibrary(project.materials, project.info.codeBasis, project.settings);
  const cache = new Map<string, SectionModel | null>();
  return (id) => {
    if (cache.has(id)) return cache.get(id)!;
    const index = project.sections.findIndex((s) => s.id === id);
    let model: SectionModel | null = null;
    if (index >= 0) {
      try {
        model = buildSectionModel(project.sections[index]!, materials, `sections[${index}]`).model;
      } catch {
        model = null;
      }
    }
    cache.set(id, model);
    return model;
  };
}

function concreteParameters(spec: ConcreteSpec, law: ConcreteMaterial, code: CodeBasis, f: ReportFormatter, settings: Project['settings']): string[] {
  const r = resolveConcrete(spec, code, settings.concreteUltimateStrain);
  const out: string[] = [];
  const mean = spec.meanStrength !== undefined ? ', measured mean: used for behaviour, the strength above for the code checks' : '';
  if (code === 'EN 1992-1-1') out.push(`fck = ${f.concreteStress(spec.strength)} (fcm = ${f.concreteStress(r.modelStrength)}${mean})`);
  else out.push(`f′c = ${f.concreteStress(spec.strength)}${spec.meanStrength !== undefined ? ` (mean ${f.concreteStress(spec.meanStrength)}${mean})` : ''}`);
  out.push(`peak stress of the law ${f.concreteStress(law.peakStress)} at ε = ${f.strain(law.peakStrain)}`);
  out.push(`Ec = ${f.modulus(r.elasticModulus)}${spec.elasticModulus === undefined ? ' (code value)' : ' (given)'}`);
  const lawStrength = spec.tensileStrength !== undefined ? ' (given)'
    : code === 'EN 1992-1-1' ? ' (fctm, EN 1992-1-1 Table 3.1)'
    : spec.tensionModel === 'tension-stiffening' ? ' (direct cracking stress 0.33λ√f′c the law was calibrated on, Vecchio & Collins 1986)' : ' (modulus of rupture fr, ACI 318-19 19.2.3.1)';
  out.push(`tensile strength of the law ${f.concreteStress(r.tensileStrength)}${lawStrength}`);
  if (r.codeTensileStrength !== r.tensileStrength) out.push(`code deflection method: fr = ${f.concreteStress(r.codeTensileStrength)} (ACI 318-19 19.2.3.1)`);
  if (spec.tensionModel === 'tension-stiffening') out.push(`tension stiffening acts in ${spec.tensionStiffeningZone === 'tension-zone' ? 'the whole tension zone' : 'the effective tension area around the bars (EN 1992-1-1 7.3.2(3))'}, no more than the bars can still take at a crack, so it ends when they yield (the law's own end: εt = ${f.strain(DEFAULT_TENSION_STIFFENING_END_STRAIN)})`);
  out.push(`ultimate strain of unconfined concrete εcu = ${f.strain(law.crushingStrain)}${law.ultimateStrain ? ` (${ultimateStrainWords(law.ultimateStrain)})` : ''}`);
  out.push(`density ${f.density(spec.density ?? 2400)}`);
  out.push(`creep coefficient φ = ${f.number(spec.creepCoefficient ?? 2.0)}, free shrinkage εcs = ${f.strain(spec.shrinkageStrain ?? 0.0004)}`);
  return out;
}

function steelParameters(spec: SteelSpec, law: SteelMaterial, f: ReportFormatter): string[] {
  return [
    `fy = ${f.stress(law.yieldStress)}, fu = ${f.stress(law.ultimateStress)}`,
    `Es = ${f.modulus(law.initialModulus)}${spec.elasticModulus === undefined ? ' (default)' : ''}`,
    `εy = ${f.strain(law.yieldStrain)}, hardening from εsh = ${f.strain(law.hardeningStrain)}, rupture at εsu = ${f.strain(law.ruptureStrain)}`,
  ];
}

/**
 * Material lines for the given sections: each concrete and steel once, then the confined-core law
 * of each section that has one. Units of the parameters: the formatter's.
 */
export function materialLines(project: Project, sections: readonly SectionDefinition[], f: ReportFormatter): MaterialLine[] {
  const code = project.info.codeBasis;
  const materials = materialLibrary(project.materials, code, project.settings);
  const models = sectionModels(project);
  const lines: MaterialLine[] = [];
  const seen = new Set<string>();
  for (const section of sections) {
    const spec = materials.concreteSpec(section.concreteId);
    const cover = spec ? materials.concrete(section.concreteId)?.cover : undefined;
    if (spec && cover && !seen.has(`concrete:${spec.id}`)) {
      seen.add(`concrete:${spec.id}`);
      lines.push({ name: `${spec.name} (concrete)`, law: cover.label, parameters: concreteParameters(spec, cover, code, f, project.settings), references: cover.references });
    }
  }
  const steelIds = [...new Set(sections.flatMap((s) => [...s.bars.map((b) => b.steelId), ...(s.hoops ? [s.hoops.steelId] : [])]))];
  for (const id of steelIds) {
    const spec = materials.steelSpec(id);
    const law = materials.steel(id);
    if (!spec || !law || seen.has(`steel:${id}`)) continue;
    seen.add(`steel:${id}`);
    lines.push({ name: `${spec.name} (reinforcement)`, law: law.label, parameters: steelParameters(spec, law, f), references: law.references });
  }
  for (const section of sections) {
    const model = models(section.id);
    const core = model?.concreteParts.find((p) => p.role === 'core');
    if (!core) continue;
    const m = core.material;
    lines.push({
      name: `${materials.concreteSpec(section.concreteId)?.name ?? section.concreteId}, confined core of section ${section.name}`,
      law: m.label,
      parameters: [`f′cc = ${f.concreteStress(m.peakStress)} at εcc = ${f.strain(m.peakStrain)}`, `core crushing strain εcu = ${f.strain(m.crushingStrain)}${m.ultimateStrain ? ` (${m.ultimateStrain.source})` : ''}`],
      references: m.references,
    });
  }
  return lines;
}

/** Where the tension-stiffening concrete of these sections acts (empty when none uses the law). */
export function tensionStiffeningZones(project: Project, sections: readonly SectionDefinition[]): Set<'effective-area' | 'tension-zone'> {
  const zones = new Set<'effective-area' | 'tension-zone'>();
  for (const s of sections) {
    for (const m of project.materials) {
      if (m.kind === 'concrete' && m.id === s.concreteId && m.tensionModel === 'tension-stiffening') zones.add(m.tensionStiffeningZone ?? 'effective-area');
    }
  }
  return zones;
}
