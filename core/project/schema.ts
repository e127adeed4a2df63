/**
 * The structure of a version-3 project file as zod schemas, mirroring core/project/types.ts and the
 * types it uses (MaterialSpec, SectionDefinition with every SectionShape, MemberDefinition) field for
 * field. The schema checks types and option names only; ranges and meaning (a span above zero,
 * zones that tile the span, bars inside the concrete…) are checked by core/project/validate.ts with
 * the engine's own validators, so that a rule lives in one place.
 *
 * Every object is loose: fields the program does not know are kept as they are, so that a file written
 * by a newer version survives a load → save round trip. validate.ts reports them as `unknown-field`
 * warnings (found with `unknownFields`), so nothing is dropped or ignored silently.
 *
 * Units: every number is in internal units (mm, N, MPa, N/mm); see docs/project-format.md.
 */
import { z } from 'zod';
import { CODE_BASES, CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, STEEL_MODELS, TENSION_STIFFENING_ZONES, ULTIMATE_STRAIN_CHOICES, type ConcreteSpec, type FrpSpec, type SteelSpec } from '../materials/specs.ts';
import {
  DEFLECTION_LIMIT_CASES, HINGE_LENGTH_METHODS, LOAD_CASES, LOAD_PATTERNS, SHEAR_DEFORMATION_MODELS, SPAN_HINGE_RULES, STRAIN_PENETRATION_MODELS, SUPPORT_TYPES,
  type CapacitySettings, type LoadFactors, type MemberLoad, type MemberZone, type ServiceSettings,
} from '../member/definition.ts';
import {
  BONDED_FACES, COVER_LOSS_FACES, INSTALLATION_STRAIN_METHODS, LAYER_FACES, STEEL_TEST_SOURCES,
  type AsFoundCondition, type CoreTestSet, type Defect, type InstallationLoad, type LayerBars, type SteelTestData, type StrengtheningScheme,
} from '../retrofit/types.ts';
import { BAR_SPREADS, type BarLayer, type HoopSet, type SectionDefinition } from '../section/definition.ts';
import { BILINEAR_METHODS } from '../section/results.ts';
import { EN_COMBINATION_RULES } from '../assessment/combinations.ts';
import { FLANGE_SIDES, type Point, type SectionShape } from '../section/shapes.ts';
import { PROJECT_FORMAT, PROJECT_VERSION, UNIT_SYSTEMS, type AnalysisSettings, type ContinuousMemberDefinition, type MemberDefinition, type Project, type ProjectInfo } from './types.ts';
import { continuousMemberSchemaOf } from './continuous-schema.ts';

const number = z.number();
const text = z.string();
const list = <T extends z.ZodType>(item: T) => z.array(item).readonly();

// --- materials ----------------------------------------------------------------------------------

/** ConcreteSpec: strengths and moduli in MPa, strains dimensionless, density kg/m³. */
export const concreteSpecSchema = z.looseObject({
  kind: z.literal('concrete'),
  id: text,
  name: text,
  strength: number,
  compressionModel: z.enum(CONCRETE_COMPRESSION_MODELS),
  tensionModel: z.enum(CONCRETE_TENSION_MODELS),
  elasticModulus: number.optional(),
  tensileStrength: number.optional(),
  crushingStrain: number.optional(),
  ultimateStrain: z.enum(ULTIMATE_STRAIN_CHOICES).optional(),
  peakFactor: number.optional(),
  spallingStrain: number.optional(),
  lightweightFactor: number.optional(),
  tensionStiffeningCoefficient: number.optional(),
  tensionStiffeningZone: z.enum(TENSION_STIFFENING_ZONES).optional(),
  meanStrength: number.optional(),
  density: number.optional(),
  creepCoefficient: number.optional(),
  shrinkageStrain: number.optional(),
});

/** SteelSpec: stresses and moduli in MPa, strains dimensionless. */
export const steelSpecSchema = z.looseObject({
  kind: z.literal('steel'),
  id: text,
  name: text,
  model: z.enum(STEEL_MODELS),
  yieldStress: number,
  ultimateStress: number,
  elasticModulus: number.optional(),
  hardeningStrain: number.optional(),
  ruptureStrain: number.optional(),
  hardeningModulus: number.optional(),
});

/** FrpSpec: modulus in MPa, strain and factor dimensionless. */
export const frpSpecSchema = z.looseObject({
  kind: z.literal('frp'),
  id: text,
  name: text,
  tensileModulus: number,
  ruptureStrain: number,
  environmentalFactor: number,
});

export const materialSpecSchema = z.discriminatedUnion('kind', [concreteSpecSchema, steelSpecSchema, frpSpecSchema]);

// --- sections -----------------------------------------------------------------------------------

const pointSchema = z.looseObject({ x: number, y: number });

const flanged = <K extends string>(kind: K) => z.looseObject({ kind: z.literal(kind), height: number, webWidth: number, flangeWidth: number, flangeThickness: number });

const rectangleSchema = z.looseObject({ kind: z.literal('rectangle'), width: number, height: number });
const teeSchema = flanged('tee');
const invertedTeeSchema = flanged('inverted-tee');
const ellSchema = z.looseObject({ kind: z.literal('ell'), height: number, webWidth: number, flangeWidth: number, flangeThickness: number, flangeSide: z.enum(FLANGE_SIDES) });
const iShapeSchema = z.looseObject({
  kind: z.literal('i-shape'), height: number, webWidth: number,
  topFlangeWidth: number, topFlangeThickness: number, bottomFlangeWidth: number, bottomFlangeThickness: number,
});
const boxSchema = z.looseObject({ kind: z.literal('box'), height: number, width: number, topThickness: number, bottomThickness: number, wallThickness: number });
const polygonSchema = z.looseObject({ kind: z.literal('polygon'), outline: list(pointSchema), voids: list(list(pointSchema)).optional() });

/** Every SectionShape kind (core/section/shapes.ts), dimensions in mm. */
export const sectionShapeSchema = z.discriminatedUnion('kind', [rectangleSchema, teeSchema, invertedTeeSchema, ellSchema, iShapeSchema, boxSchema, polygonSchema]);

/** BarLayer: depth and diameter mm, area mm². */
export const barLayerSchema = z.looseObject({
  steelId: text,
  depth: number,
  count: number.optional(),
  diameter: number.optional(),
  area: number.optional(),
  spread: z.enum(BAR_SPREADS).optional(),
  label: text.optional(),
});

/** HoopSet: diameter, spacing and cover mm. */
export const hoopSetSchema = z.looseObject({
  steelId: text,
  diameter: number,
  spacing: number,
  verticalLegs: number,
  horizontalLegs: number.optional(),
  clearCover: number,
  confineCore: z.boolean(),
  closedAndAnchored: z.boolean().optional(),
});

/** SectionDefinition: axial force N (compression positive). */
export const sectionDefinitionSchema = z.looseObject({
  id: text,
  name: text,
  shape: sectionShapeSchema,
  concreteId: text,
  bars: list(barLayerSchema),
  hoops: hoopSetSchema.optional(),
  axialForce: number.optional(),
  notes: text.optional(),
});

// --- members ------------------------------------------------------------------------------------

const loadCase = z.enum(LOAD_CASES);

const uniformLoadSchema = z.looseObject({ kind: z.literal('uniform'), loadCase, magnitude: number, from: number.optional(), to: number.optional(), label: text.optional() });
const pointLoadSchema = z.looseObject({ kind: z.literal('point'), loadCase, magnitude: number, position: number, label: text.optional() });

/** MemberLoad: uniform N/mm over [from, to] mm, or point N at `position` mm. */
export const memberLoadSchema = z.discriminatedUnion('kind', [uniformLoadSchema, pointLoadSchema]);

/** MemberZone: from/to mm from the left support. */
export const memberZoneSchema = z.looseObject({ from: number, to: number, sectionId: text });

export const loadFactorsSchema = z.looseObject({ dead: number, superimposed: number, live: number });

export const serviceSettingsSchema = z.looseObject({
  sustainedLiveFraction: number,
  durationMonths: number,
  limitCases: list(z.enum(DEFLECTION_LIMIT_CASES)),
  customLimitRatio: number.optional(),
  includeShrinkage: z.boolean().optional(),
});

export const capacitySettingsSchema = z.looseObject({
  pattern: z.enum(LOAD_PATTERNS),
  hingeLengthMethod: z.enum(HINGE_LENGTH_METHODS),
  userHingeLength: number.optional(),
  spanHingeRule: z.enum(SPAN_HINGE_RULES).optional(),
  tensionShift: z.boolean().optional(),
  strainPenetration: z.enum(STRAIN_PENETRATION_MODELS).optional(),
  shearDeformation: z.enum(SHEAR_DEFORMATION_MODELS).optional(),
  ultimateLoadFraction: number.optional(),
});

// --- existing beams and retrofit (core/retrofit/types.ts) ---------------------------------------

/** CoreTestSet: mean in-place strength MPa. */
export const coreTestSetSchema = z.looseObject({ concreteId: text.optional(), meanStrength: number, count: number, coefficientOfVariation: number, note: text.optional() });

/** SteelTestData: stresses and modulus MPa. */
export const steelTestDataSchema = z.looseObject({
  steelId: text,
  source: z.enum(STEEL_TEST_SOURCES),
  yieldStress: number.optional(),
  ultimateStress: number.optional(),
  ruptureStrain: number.optional(),
  elasticModulus: number.optional(),
  note: text.optional(),
});

/** Defect: section loss in percent of a bar layer (by index) or the hoops; cover loss depth, from, to mm. */
const sectionLossSchema = z.looseObject({ kind: z.literal('section-loss'), sectionId: text.optional(), layer: z.union([number, z.literal('hoops')]), lossPercent: number, note: text.optional() });
const coverLossSchema = z.looseObject({
  kind: z.literal('cover-loss'), sectionId: text.optional(), face: z.enum(COVER_LOSS_FACES), depth: number,
  from: number.optional(), to: number.optional(), note: text.optional(),
});
export const defectSchema = z.discriminatedUnion('kind', [sectionLossSchema, coverLossSchema]);

/** AsFoundCondition. */
export const asFoundConditionSchema = z.looseObject({
  cores: list(coreTestSetSchema).optional(),
  steel: list(steelTestDataSchema).optional(),
  defects: list(defectSchema).optional(),
  notes: text.optional(),
});

/** InstallationLoad: factors on the service load cases. */
export const installationLoadSchema = z.looseObject({ dead: number.optional(), superimposed: number.optional(), live: number.optional() });

const schemeBase = { id: text, name: text, sectionIds: list(text).optional(), repairSpalls: z.boolean().optional(), note: text.optional() };
const installationStrainMethod = z.enum(INSTALLATION_STRAIN_METHODS);

const frpSchemeSchema = z.looseObject({
  kind: z.literal('frp'), ...schemeBase, frpId: text, plyThickness: number, plies: number, width: number,
  face: z.enum(BONDED_FACES).optional(), installation: installationLoadSchema.optional(), installationStrainMethod: installationStrainMethod.optional(),
});
const steelPlateSchemeSchema = z.looseObject({
  kind: z.literal('steel-plate'), ...schemeBase, steelId: text, thickness: number, width: number,
  face: z.enum(BONDED_FACES).optional(), installation: installationLoadSchema.optional(), installationStrainMethod: installationStrainMethod.optional(),
});
const layerBarsSchema = z.looseObject({ steelId: text, distanceFromFace: number, count: number.optional(), diameter: number.optional(), area: number.optional(), label: text.optional() });
const concreteLayerSchemeSchema = z.looseObject({
  kind: z.literal('concrete-layer'), ...schemeBase, face: z.enum(LAYER_FACES), thickness: number, width: number.optional(), concreteId: text,
  bars: list(layerBarsSchema),
});

/** StrengtheningScheme: FRP (ply thickness, width mm), steel plate (thickness, width mm), concrete layer (thickness, width mm). */
export const strengtheningSchemeSchema = z.discriminatedUnion('kind', [frpSchemeSchema, steelPlateSchemeSchema, concreteLayerSchemeSchema]);

/** MemberDefinition: span mm. */
export const memberDefinitionSchema = z.looseObject({
  id: text,
  name: text,
  supports: z.enum(SUPPORT_TYPES),
  span: number,
  zones: list(memberZoneSchema),
  loads: list(memberLoadSchema),
  includeSelfWeight: z.boolean().optional(),
  strengthFactors: loadFactorsSchema.optional(),
  service: serviceSettingsSchema,
  capacity: capacitySettingsSchema,
  notes: text.optional(),
  asFound: asFoundConditionSchema.optional(),
  schemes: list(strengtheningSchemeSchema).optional(),
  preferredSchemeId: text.optional(),
});

/** ContinuousMemberDefinition (version 3): spans and positions mm, column EI N·mm² (core/project/continuous-schema.ts). */
export const continuousMemberSchema = continuousMemberSchemaOf({ zone: memberZoneSchema, factors: loadFactorsSchema, service: serviceSettingsSchema });

// --- project ------------------------------------------------------------------------------------

export const projectInfoSchema = z.looseObject({
  name: text,
  number: text,
  description: text,
  engineer: text,
  checker: text,
  revision: text,
  date: text,
  codeBasis: z.enum(CODE_BASES),
  unitSystem: z.enum(UNIT_SYSTEMS),
});

export const analysisSettingsSchema = z.looseObject({
  momentDropFraction: number,
  bilinearMethod: z.enum(BILINEAR_METHODS),
  stations: number,
  concreteUltimateStrain: z.enum(ULTIMATE_STRAIN_CHOICES).optional(),
  enCombination: z.enum(EN_COMBINATION_RULES).optional(),
  liveCombinationFactor: number.optional(),
});

/** A whole version-3 project file. */
export const projectSchema = z.looseObject({
  format: z.literal(PROJECT_FORMAT),
  version: z.literal(PROJECT_VERSION),
  info: projectInfoSchema,
  materials: list(materialSpecSchema),
  sections: list(sectionDefinitionSchema),
  members: list(memberDefinitionSchema),
  continuousMembers: list(continuousMemberSchema).optional(),
  settings: analysisSettingsSchema,
});

/** What the schema produces, with unknown fields riding along. */
export type ProjectFileData = z.output<typeof projectSchema>;

// The schema's output is a Project (every field the schema has, the types have, with their types).
const _schemaOutputIsAProject = (data: ProjectFileData): Project => data;
void _schemaOutputIsAProject;

// --- the schema knows every field of the types ----------------------------------------------------

/**
 * `true` when an object schema has exactly the fields of type T — a field added to a type and not to
 * its schema (or the other way round) makes the type a description of what is missing, and the
 * assignment below fails to compile (test/core/project/schema-types.test.ts proves it).
 */
export type SchemaHasFieldsOf<T, S extends { readonly shape: object }> =
  [Exclude<keyof T, keyof S['shape']>, Exclude<keyof S['shape'], keyof T>] extends [never, never]
    ? true
    : { readonly fieldsMissingFromTheSchema: Exclude<keyof T, keyof S['shape']>; readonly fieldsUnknownToTheType: Exclude<keyof S['shape'], keyof T> };

type Kind<U, K> = Extract<U, { readonly kind: K }>;

const _everyFieldHasASchema: [
  SchemaHasFieldsOf<ConcreteSpec, typeof concreteSpecSchema>,
  SchemaHasFieldsOf<SteelSpec, typeof steelSpecSchema>,
  SchemaHasFieldsOf<FrpSpec, typeof frpSpecSchema>,
  SchemaHasFieldsOf<Point, typeof pointSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'rectangle'>, typeof rectangleSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'tee'>, typeof teeSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'inverted-tee'>, typeof invertedTeeSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'ell'>, typeof ellSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'i-shape'>, typeof iShapeSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'box'>, typeof boxSchema>,
  SchemaHasFieldsOf<Kind<SectionShape, 'polygon'>, typeof polygonSchema>,
  SchemaHasFieldsOf<BarLayer, typeof barLayerSchema>,
  SchemaHasFieldsOf<HoopSet, typeof hoopSetSchema>,
  SchemaHasFieldsOf<SectionDefinition, typeof sectionDefinitionSchema>,
  SchemaHasFieldsOf<Kind<MemberLoad, 'uniform'>, typeof uniformLoadSchema>,
  SchemaHasFieldsOf<Kind<MemberLoad, 'point'>, typeof pointLoadSchema>,
  SchemaHasFieldsOf<MemberZone, typeof memberZoneSchema>,
  SchemaHasFieldsOf<LoadFactors, typeof loadFactorsSchema>,
  SchemaHasFieldsOf<ServiceSettings, typeof serviceSettingsSchema>,
  SchemaHasFieldsOf<CapacitySettings, typeof capacitySettingsSchema>,
  SchemaHasFieldsOf<CoreTestSet, typeof coreTestSetSchema>,
  SchemaHasFieldsOf<SteelTestData, typeof steelTestDataSchema>,
  SchemaHasFieldsOf<Kind<Defect, 'section-loss'>, typeof sectionLossSchema>,
  SchemaHasFieldsOf<Kind<Defect, 'cover-loss'>, typeof coverLossSchema>,
  SchemaHasFieldsOf<AsFoundCondition, typeof asFoundConditionSchema>,
  SchemaHasFieldsOf<InstallationLoad, typeof installationLoadSchema>,
  SchemaHasFieldsOf<Kind<StrengtheningScheme, 'frp'>, typeof frpSchemeSchema>,
  SchemaHasFieldsOf<Kind<StrengtheningScheme, 'steel-plate'>, typeof steelPlateSchemeSchema>,
  SchemaHasFieldsOf<Kind<StrengtheningScheme, 'concrete-layer'>, typeof concreteLayerSchemeSchema>,
  SchemaHasFieldsOf<LayerBars, typeof layerBarsSchema>,
  SchemaHasFieldsOf<MemberDefinition, typeof memberDefinitionSchema>,
  SchemaHasFieldsOf<ContinuousMemberDefinition, typeof continuousMemberSchema>,
  SchemaHasFieldsOf<ProjectInfo, typeof projectInfoSchema>,
  SchemaHasFieldsOf<AnalysisSettings, typeof analysisSettingsSchema>,
  SchemaHasFieldsOf<Project, typeof projectSchema>,
] = [true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true, true];
void _everyFieldHasASchema;

// --- walking data along the schema ---------------------------------------------------------------

/** Deepest nesting of arrays and objects a project file may have (the schema itself needs 7). */
export const MAX_NESTING = 64;

/** The known fields of an object schema, in schema order. */
export type KnownFields = readonly string[];

interface SchemaNode {
  readonly def: { readonly type: string; readonly [key: string]: unknown };
}

function unwrap(schema: SchemaNode): SchemaNode {
  let s = schema;
  while (s.def.type === 'optional' || s.def.type === 'readonly' || s.def.type === 'nullable') s = s.def.innerType as SchemaNode;
  return s;
}

function literalValues(schema: SchemaNode): unknown[] {
  const s = unwrap(schema);
  if (s.def.type === 'literal') return s.def.values as unknown[];
  if (s.def.type === 'enum') return Object.values(s.def.entries as Record<string, unknown>);
  return [];
}

const isPlainObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/**
 * The schema node that describes `value` under `schema`, resolving discriminated unions by their
 * discriminator. Returns null when the value matches no option.
 */
function resolve(schema: SchemaNode, value: unknown): SchemaNode | null {
  const s = unwrap(schema);
  if (s.def.type !== 'union') return s;
  if (!isPlainObject(value)) return null;
  const discriminator = s.def.discriminator as string | undefined;
  const options = s.def.options as SchemaNode[];
  if (!discriminator) return null;
  return options.find((o) => literalValues((unwrap(o).def.shape as Record<string, SchemaNode>)[discriminator]!).includes(value[discriminator])) ?? null;
}

/**
 * Visits every object of `value` that the schema describes, with its path (e.g.
 * `['members', 3, 'zones', 0]`) and its known fields in schema order. Unknown subtrees are not
 * entered, so the recursion is as deep as the schema (a few levels), whatever the data holds.
 */
export function walkKnownObjects(value: unknown, visit: (path: readonly (string | number)[], object: Record<string, unknown>, known: KnownFields) => void, schema: SchemaNode = projectSchema as unknown as SchemaNode): void {
  const go = (node: SchemaNode, v: unknown, path: (string | number)[]) => {
    const s = resolve(node, v);
    if (!s) return;
    if (s.def.type === 'object' && isPlainObject(v)) {
      const shape = s.def.shape as Record<string, SchemaNode>;
      visit(path, v, Object.keys(shape));
      for (const [key, child] of Object.entries(shape)) if (key in v) go(child, v[key], [...path, key]);
    } else if (s.def.type === 'array' && Array.isArray(v)) {
      v.forEach((item, i) => go(s.def.element as SchemaNode, item, [...path, i]));
    }
  };
  go(schema, value, []);
}

/** Fields of `value` (anywhere in the project) that the schema does not know, with their paths. */
export function unknownFields(value: unknown): { path: readonly (string | number)[]; field: string }[] {
  const found: { path: readonly (string | number)[]; field: string }[] = [];
  walkKnownObjects(value, (path, object, known) => {
    for (const key of Object.keys(object)) if (!known.includes(key)) found.push({ path, field: key });
  });
  return found;
}

/**
 * A copy of `value` with the keys of every object in a stable order: known fields in schema order
 * (the order docs/project-format.md lists them), then unknown fields sorted by code point, with
 * unknown subtrees sorted the same way. Used by serializeProject so that saving is deterministic.
 * Unknown subtrees deeper than MAX_NESTING levels are copied without sorting (parseProject refuses
 * files nested that deep, so this only guards objects built in code).
 */
export function canonicalOrder(value: unknown, schema: SchemaNode = projectSchema as unknown as SchemaNode): unknown {
  const sortedUnknown = (v: unknown, depth = 0): unknown => {
    if (depth > MAX_NESTING) return v;
    if (Array.isArray(v)) return v.map((item) => sortedUnknown(item, depth + 1));
    if (!isPlainObject(v)) return v;
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(v).sort()) out[key] = sortedUnknown(v[key], depth + 1);
    return out;
  };
  const go = (node: SchemaNode | null, v: unknown): unknown => {
    const s = node ? resolve(node, v) : null;
    if (!s) return sortedUnknown(v);
    if (s.def.type === 'object' && isPlainObject(v)) {
      const shape = s.def.shape as Record<string, SchemaNode>;
      const out: Record<string, unknown> = {};
      for (const key of Object.keys(shape)) if (key in v && v[key] !== undefined) out[key] = go(shape[key]!, v[key]);
      for (const key of Object.keys(v).filter((k) => !(k in shape)).sort()) out[key] = sortedUnknown(v[key]);
      return out;
    }
    if (s.def.type === 'array' && Array.isArray(v)) return v.map((item) => go(s.def.element as SchemaNode, item));
    return sortedUnknown(v);
  };
  return go(schema, value);
}
