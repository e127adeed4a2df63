/**
 * Validation of a (migrated) project file: every problem at once, each as a Diagnostic
 * `{ code, path, message, severity }` naming the item by index and name, with values in the
 * project's display unit system, e.g. `members[3] "B-12".span: must be greater than 0 m …, got -2 m`.
 *
 * Three layers, all run on every item that can be checked:
 *  1. structure (core/project/schema.ts, zod): types, required fields, option names; unknown fields
 *     are warnings (`unknown-field`), never errors, and are kept;
 *  2. the engine's own checks: validateConcreteSpec / validateSteelSpec / validateFrpSpec, the
 *     section builder (shape dimensions, bars inside the concrete, hoops and confinement) through
 *     the project's material resolver, validateMember (zones tile the span, loads on the span…);
 *  3. project-level checks: duplicate ids, references between items (by kind), settings, the date.
 * An item whose structure is wrong is not passed to layer 2 (its semantic checks would only repeat
 * the structural problem); the other items are.
 *
 * Values in messages: every check writes its quantities as data (Diagnostic.detail, core/units
 * phrases, each with its quantity: a span, a bar depth, a concrete stress…); the diagnostics come
 * back with their words in the project's display units (`inUnits`), and `diagnosticText` gives them
 * in any other.
 */
import { z } from 'zod';
import { checkNumber, diagnostic, inUnits, InputError, reworded, type Diagnostic } from '../diagnostics.ts';
import { validateConcreteSpec, validateFrpSpec, validateSteelSpec } from '../materials/factory.ts';
import type { CodeBasis, ConcreteSpec, FrpSpec, MaterialSpec, SteelSpec } from '../materials/specs.ts';
import { validateMember } from '../member/validate.ts';
import { validateContinuousBeam } from '../continuous/validate.ts';
import { validateAsFound, validateSchemes } from '../retrofit/validate.ts';
import { retrofitInputProblems } from '../assessment/retrofit-input.ts';
import { minimumSteelWarnings, type BuiltSection } from '../assessment/brittle.ts';
import { buildSectionModel, checkBarNumbers, validateShape } from '../section/build.ts';
import { memberGeometryDiagnostics, sectionGeometryDiagnostics } from './validate-geometry.ts';
import type { SectionDefinition } from '../section/definition.ts';
import type { SectionModel } from '../section/model.ts';
import { phrase, q } from '../units/phrase.ts';
import { materialLibrary, type MaterialSettings } from '../materials/library.ts';
import {
  analysisSettingsSchema, continuousMemberSchema, materialSpecSchema, memberDefinitionSchema, projectInfoSchema, projectSchema, sectionDefinitionSchema,
  unknownFields, MAX_NESTING,
} from './schema.ts';
import type { ContinuousMemberDefinition, Project, UnitSystem, MemberDefinition } from './types.ts';

/** Most points a polygon section (outline and voids together) may have. */
export const MAX_POLYGON_POINTS = 1000;
/** Allowed number of integration segments along a span (AnalysisSettings.stations). */
export const STATIONS_RANGE = { min: 20, max: 2000 } as const;
/** Allowed fraction of the peak moment that ends a moment–curvature curve (AnalysisSettings.momentDropFraction). */
export const MOMENT_DROP_RANGE = { min: 0.5, max: 0.99 } as const;

const ACI_LIMITS = ['aci-roof-immediate', 'aci-floor-immediate', 'aci-sensitive-after-attachment', 'aci-insensitive-after-attachment'];
const EN_LIMITS = ['en-appearance', 'en-after-construction'];

type Data = Record<string, unknown>;
type PathPart = string | number;
const isObject = (v: unknown): v is Data => typeof v === 'object' && v !== null && !Array.isArray(v);

// --- paths ----------------------------------------------------------------------------------------

/**
 * Path of an item in the file as messages show it: `members[3] "B-12"`, `sections[0] "S-1"`,
 * `materials[2] "grade60"` (materials by id, like core/materials/library.ts).
 */
export function itemPath(list: ItemList, index: number, item: unknown): string {
  const label = isObject(item) ? (list === 'materials' ? item.id : item.name) : undefined;
  return typeof label === 'string' && label !== '' ? `${list}[${index}] ${JSON.stringify(label)}` : `${list}[${index}]`;
}

/** `['members', 3, 'zones', 0, 'to']` → `members[3] "B-12".zones[0].to`, naming items from `root`. */
export function pathText(path: readonly PathPart[], root: unknown): string {
  if (path.length === 0) return '(file)';
  let text = '';
  let rest = path;
  const [head, index] = path;
  if ((head === 'materials' || head === 'sections' || head === 'members' || head === 'continuousMembers') && typeof index === 'number' && isObject(root) && Array.isArray(root[head])) {
    text = itemPath(head, index, (root[head] as unknown[])[index]);
    rest = path.slice(2);
  }
  for (const part of rest) text += typeof part === 'number' ? `[${part}]` : text === '' ? part : `.${part}`;
  return text;
}

/** A diagnostic as one line: `members[3] "B-12" span: must be …` (a space after the quoted name). */
export function formatDiagnostic(d: Diagnostic): string {
  const path = d.path.replace(/^(\w+\[\d+\] "(?:[^"\\]|\\.)*")\./, '$1 ');
  return `${d.severity === 'warning' ? 'warning: ' : ''}${path}: ${d.message}`;
}

// --- structural issues ------------------------------------------------------------------------------

function describeInput(input: unknown): string {
  if (input === undefined) return 'nothing';
  if (input === null) return 'null';
  if (typeof input === 'string') return input.length > 40 ? `the text ${JSON.stringify(input.slice(0, 40))}…` : `the text ${JSON.stringify(input)}`;
  if (typeof input === 'number') return Number.isFinite(input) ? String(input) : 'a number too large to store';
  if (typeof input === 'boolean') return String(input);
  if (Array.isArray(input)) return `a list of ${input.length} item${input.length === 1 ? '' : 's'}`;
  return 'an object';
}

const EXPECTED: Readonly<Record<string, string>> = {
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
};

/** Plain words for one zod issue. */
function issueDiagnostic(issue: z.core.$ZodIssue, root: unknown, base: readonly PathPart[]): Diagnostic {
  const fullPath = [...base, ...issue.path.filter((p): p is PathPart => typeof p === 'string' || typeof p === 'number')];
  const path = pathText(fullPath, root);
  const input = (issue as { input?: unknown }).input;
  switch (issue.code) {
    case 'invalid_type': {
      const expected = EXPECTED[issue.expected] ?? issue.expected;
      if (input === undefined) return { code: 'required', path, severity: 'error', message: `is required (${expected})` };
      const code = issue.expected === 'number' ? 'not-a-number' : 'schema';
      // A NaN or infinity in the data (not possible in JSON, but possible in code) is named as such.
      const got = typeof input === 'number' && !Number.isFinite(input) ? 'a value that is not a finite number' : describeInput(input);
      return { code, path, severity: 'error', message: `must be ${expected}${issue.expected === 'number' ? ' (written without quotes)' : ''}, got ${got}` };
    }
    case 'invalid_value':
      return { code: 'unknown-option', path, severity: 'error', message: `must be ${issue.values.length === 1 ? JSON.stringify(issue.values[0]) : `one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}`}, got ${describeInput(input)}` };
    case 'invalid_union': {
      const options = (issue as { options?: unknown[] }).options;
      const discriminator = (issue as { discriminator?: string }).discriminator;
      if (options && discriminator) {
        const value = isObject(input) ? input[discriminator] : undefined;
        const where = fullPath[fullPath.length - 1] === discriminator ? path : pathText([...fullPath, discriminator], root);
        if (!isObject(input)) return { code: 'schema', path: pathText(fullPath.filter((p) => p !== discriminator), root), severity: 'error', message: `must be an object with a "${discriminator}" field, got ${describeInput(input)}` };
        return {
          code: value === undefined ? 'required' : 'unknown-option', path: where, severity: 'error',
          message: `must be one of ${options.map((o) => JSON.stringify(o)).join(', ')}, got ${describeInput(value)}`,
        };
      }
      return { code: 'schema', path, severity: 'error', message: 'does not match any allowed form' };
    }
    default:
      return { code: 'schema', path, severity: 'error', message: issue.message };
  }
}

function structuralIssues(schema: z.ZodType, value: unknown, root: unknown, base: readonly PathPart[]): { ok: boolean; diagnostics: Diagnostic[] } {
  const result = schema.safeParse(value, { reportInput: true });
  if (result.success) return { ok: true, diagnostics: [] };
  return { ok: false, diagnostics: result.error.issues.map((issue) => issueDiagnostic(issue, root, base)) };
}

// --- semantic checks ----------------------------------------------------------------------------------

function isIsoDate(text: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (!m) return false;
  const year = Number(m[1]);
  const month = Number(m[2]);
  const day = Number(m[3]);
  if (month < 1 || month > 12 || day < 1) return false;
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  const days = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31][month - 1]!;
  return day <= days;
}

function duplicateIds(out: Diagnostic[], list: ItemList, items: readonly unknown[], taken = new Map<string, string>()): void {
  const first = new Map<string, number>();
  items.forEach((item, i) => {
    if (!isObject(item) || typeof item.id !== 'string') return;
    if (item.id.trim() === '') {
      out.push({ code: 'required', path: `${itemPath(list, i, item)}.id`, severity: 'error', message: 'must not be empty: other items refer to it by its id' });
      return;
    }
    const earlier = first.get(item.id);
    if (earlier === undefined && taken.has(item.id)) out.push({ code: 'duplicate-id', path: `${itemPath(list, i, item)}.id`, severity: 'error', message: `"${item.id}" is already the id of ${taken.get(item.id)}; ids must be unique` });
    else if (earlier === undefined) first.set(item.id, i);
    else out.push({ code: 'duplicate-id', path: `${itemPath(list, i, item)}.id`, severity: 'error', message: `"${item.id}" is already the id of ${itemPath(list, earlier, items[earlier])}; ids must be unique` });
  });
}

function polygonPoints(section: SectionDefinition): number {
  if (section.shape.kind !== 'polygon') return 0;
  return section.shape.outline.length + (section.shape.voids ?? []).reduce((s, v) => s + v.length, 0);
}

/**
 * Ids of the items of a list that are there but failed their structural check: their own errors are
 * the root cause, so a reference to one of them is not reported again (one bad value in a material
 * would otherwise add a "no material with id" error for every section using it).
 */
function brokenIds(raw: readonly unknown[], sound: readonly { readonly value: { readonly id: string } }[]): Set<string> {
  const good = new Set(sound.map((s) => s.value.id));
  return new Set(raw.flatMap((item) => (isObject(item) && typeof item.id === 'string' && !good.has(item.id) ? [item.id] : [])));
}

/** Checks a reference to a material; false when the section cannot be built with it (reported here, or at the material). */
function materialReference(out: Diagnostic[], path: string, id: string, kind: MaterialSpec['kind'], byId: ReadonlyMap<string, MaterialSpec>, broken: ReadonlySet<string>, role: string): boolean {
  const found = byId.get(id);
  if (!found && broken.has(id)) return false;
  if (!found) out.push({ code: 'unknown-reference', path, severity: 'error', message: `no material with id "${id}" in the project's material list (the ${role} must be a ${kind} material)` });
  else if (found.kind !== kind) out.push({ code: 'unknown-reference', path, severity: 'error', message: `"${id}" is a ${found.kind} material; the ${role} must be a ${kind} material` });
  return found?.kind === kind;
}

/**
 * The numbers of each bar layer against the section builder's own ranges (core/section/build.ts
 * checkBarNumbers).
 * @returns true when every layer can be handed to the builder safely
 */
function barLayerPrecheck(out: Diagnostic[], section: SectionDefinition, path: string): boolean {
  return section.bars.map((layer, i) => checkBarNumbers(out, layer, `${path}.bars[${i}]`)).every(Boolean);
}

/** Path of a member's own id (`members[3] "B-12".id`): a duplicate there makes results ambiguous. */
const MEMBER_ID_PATH = /^members\[\d+\](?: "(?:[^"\\]|\\.)*")?\.id$/;

/**
 * The errors that keep a project from being analysed as a whole: every error outside the members
 * (project information, settings, materials and sections, which many members share) and errors on a
 * member's id (duplicates). Other errors inside a member stop only that member (the analysis reports
 * it as an input error).
 */
export function analysisBlockers(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  return diagnostics.filter((d) => d.severity === 'error' && (!/^members\[\d+\]/.test(d.path) || MEMBER_ID_PATH.test(d.path)));
}

/** Fields of the confinement input (ConfinementInput) that come straight from a field of the hoops. */
const CONFINEMENT_TO_HOOPS: Readonly<Record<string, string>> = { legsX: 'verticalLegs', legsY: 'horizontalLegs', hoopDiameter: 'diameter', spacing: 'spacing' };

/** Section checks of the section builder, with confinement problems placed on the section's hoops. */
function sectionBuildDiagnostics(section: SectionDefinition, path: string, materials: readonly MaterialSpec[], code: CodeBasis, settings: MaterialSettings, built?: (model: SectionModel) => void): Diagnostic[] {
  const resolver = materialLibrary(materials, code, settings);
  const out: Diagnostic[] = [];
  try {
    const { model, warnings } = buildSectionModel(section, resolver, path);
    built?.(model);
    for (const w of warnings) out.push({ code: 'inconsistent', path, severity: 'warning', message: w });
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    // Unknown references are reported by the project's own reference checks, by material kind.
    out.push(...error.diagnostics.filter((d) => d.code !== 'unknown-reference'));
  }
  for (const p of resolver.problems) {
    if (p.path.startsWith('confinement')) {
      const field = p.path.replace(/^confinement\.?/, '').replace(/\[\d+\]$/, '');
      const hoopField = CONFINEMENT_TO_HOOPS[field];
      out.push({ ...reworded(p, `confinement of the core${hoopField ? '' : ` (${field || 'input'})`}: `), path: hoopField ? `${path}.hoops.${hoopField}` : `${path}.hoops` });
    } else if (!p.path.startsWith('materials[')) {
      out.push(p);
    }
    // Problems of the material itself are reported once, on the material.
  }
  return out;
}

/**
 * Runs one of the engine's checks; a check that throws on strange input (a defect, not the user's
 * fault) becomes one error on the item instead of stopping the validation of everything else.
 */
function guarded(path: string, check: () => Diagnostic[]): Diagnostic[] {
  try {
    return check();
  } catch (error) {
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    return [{ code: 'inconsistent', path, severity: 'error', message: `could not be checked (${reason}); please report this file to the Hingeline developers` }];
  }
}

interface Checked<T> {
  readonly value: T;
  readonly index: number;
}

/**
 * Validates parsed (and migrated) JSON as a version-2 project. Never throws; every problem comes back.
 * @returns the typed project (unknown fields kept) when the structure is sound, else null; the
 *          project is returned even when semantic errors remain, so an editor can open it for repair
 *          (`hasErrors(diagnostics)` tells whether it may be analysed as it is).
 */
export function validateProjectData(data: unknown): { project: Project | null; diagnostics: Diagnostic[] } {
  const out: Diagnostic[] = [];
  if (!isObject(data)) {
    return { project: null, diagnostics: [{ code: 'schema', path: '(file)', severity: 'error', message: `must be a JSON object holding a Hingeline project, got ${describeInput(data)}` }] };
  }
  const whole = projectSchema.safeParse(data);

  // Top-level structure: the fixed fields and the lists themselves (items are checked one by one below).
  const { ok: _topOk, diagnostics: top } = structuralIssues(
    projectSchema.extend({ materials: z.array(z.unknown()), sections: z.array(z.unknown()), members: z.array(z.unknown()), continuousMembers: z.array(z.unknown()).optional(), info: z.unknown().optional(), settings: z.unknown().optional() }),
    data, data, [],
  );
  out.push(...top);
  const info = structuralIssues(projectInfoSchema, data.info, data, ['info']);
  const settings = structuralIssues(analysisSettingsSchema, data.settings, data, ['settings']);
  out.push(...info.diagnostics, ...settings.diagnostics);

  const listOf = (key: string): unknown[] => (Array.isArray(data[key]) ? (data[key] as unknown[]) : []);
  const checkItems = <T>(key: ItemList, schema: z.ZodType): Checked<T>[] => {
    const good: Checked<T>[] = [];
    listOf(key).forEach((item, index) => {
      const r = structuralIssues(schema, item, data, [key, index]);
      out.push(...r.diagnostics);
      if (r.ok) good.push({ value: item as T, index });
    });
    return good;
  };
  const materials = checkItems<MaterialSpec>('materials', materialSpecSchema);
  const sections = checkItems<SectionDefinition>('sections', sectionDefinitionSchema);
  const members = checkItems<MemberDefinition>('members', memberDefinitionSchema);
  const continuousMembers = checkItems<ContinuousMemberDefinition>('continuousMembers', continuousMemberSchema);

  for (const { path, field } of unknownFields(data)) {
    out.push({ code: 'unknown-field', path: pathText([...path, field], data), severity: 'warning', message: 'is not a field this version of Hingeline knows; it is kept as it is when the project is saved, but it has no effect' });
  }

  const infoData = info.ok ? (data.info as Project['info']) : undefined;
  const system: UnitSystem = infoData?.unitSystem ?? 'si';
  const code = infoData?.codeBasis;
  const semantic: Diagnostic[] = [];
  const ultimateStrain = settings.ok ? (data.settings as Project['settings']).concreteUltimateStrain : undefined;

  // Project information and settings.
  if (infoData) {
    if (infoData.name.trim() === '') semantic.push({ code: 'required', path: 'info.name', severity: 'warning', message: 'the project has no name; reports and file names use it' });
    if (infoData.date !== '' && !isIsoDate(infoData.date)) semantic.push({ code: 'schema', path: 'info.date', severity: 'error', message: `must be a calendar date written yyyy-mm-dd (e.g. 2026-03-14), got ${describeInput(infoData.date)}` });
  }
  if (settings.ok) {
    const s = data.settings as Project['settings'];
    checkNumber(semantic, 'settings.momentDropFraction', s.momentDropFraction, MOMENT_DROP_RANGE);
    if (s.liveCombinationFactor !== undefined) checkNumber(semantic, 'settings.liveCombinationFactor', s.liveCombinationFactor, { min: 0, max: 1 });
    if (checkNumber(semantic, 'settings.stations', s.stations, STATIONS_RANGE) && !Number.isInteger(s.stations)) {
      semantic.push({ code: 'must-be-integer', path: 'settings.stations', severity: 'error', message: `must be a whole number of segments, got ${s.stations}` });
    }
  }

  // Ids.
  duplicateIds(semantic, 'materials', listOf('materials'));
  duplicateIds(semantic, 'sections', listOf('sections'));
  duplicateIds(semantic, 'members', listOf('members'));
  // Continuous members share the members' ids: results and reports name both by id.
  const memberIds = new Map(listOf('members').flatMap((m, i) => (isObject(m) && typeof m.id === 'string' ? [[m.id, itemPath('members', i, m)] as [string, string]] : [])));
  duplicateIds(semantic, 'continuousMembers', listOf('continuousMembers'), memberIds);

  // Materials: the engine's validators (code-dependent checks only when the code basis is known).
  const materialSpecs = materials.map((m) => m.value);
  const materialById = new Map<string, MaterialSpec>();
  for (const m of materialSpecs) if (!materialById.has(m.id)) materialById.set(m.id, m);
  const brokenMaterials = brokenIds(listOf('materials'), materials);
  for (const { value: spec, index } of materials) {
    const path = itemPath('materials', index, spec);
    if (spec.kind === 'concrete') semantic.push(...guarded(path, () => validateConcreteSpec(spec as ConcreteSpec, path, code ? { code, ...(ultimateStrain ? { ultimateStrain } : {}) } : {})));
    else if (spec.kind === 'steel') semantic.push(...guarded(path, () => validateSteelSpec(spec as SteelSpec, path)));
    else semantic.push(...guarded(path, () => validateFrpSpec(spec as FrpSpec, path)));
  }

  // Sections: references by kind, then the section builder (dimensions, bars inside the concrete, hoops).
  const builtSections = new Map<string, BuiltSection>();
  for (const { value: section, index } of sections) {
    const path = itemPath('sections', index, section);
    const references = [
      materialReference(semantic, `${path}.concreteId`, section.concreteId, 'concrete', materialById, brokenMaterials, 'section concrete'),
      ...section.bars.map((bar, i) => materialReference(semantic, `${path}.bars[${i}].steelId`, bar.steelId, 'steel', materialById, brokenMaterials, 'bar steel')),
      ...(section.hoops ? [materialReference(semantic, `${path}.hoops.steelId`, section.hoops.steelId, 'steel', materialById, brokenMaterials, 'hoop steel')] : []),
    ];
    if (section.hoops?.confineCore && section.hoops.closedAndAnchored !== true) {
      semantic.push({ code: 'inconsistent', path: `${path}.hoops.closedAndAnchored`, severity: 'warning',
        message: `the core is analysed unconfined: a confined core needs the hoops confirmed closed and anchored in the core (135° hooks or welded)${section.hoops.closedAndAnchored === undefined ? '; projects saved before this confirmation existed modelled the core confined on "confine core" alone' : ''}` });
    }
    const points = polygonPoints(section);
    if (points > MAX_POLYGON_POINTS) {
      semantic.push({ code: 'geometry', path: `${path}.shape`, severity: 'error', message: `a polygon may have at most ${MAX_POLYGON_POINTS} points (outline and voids together), got ${points}` });
      continue;
    }
    // The section builder uses bar counts before it checks them (clearSpacings of a confined core):
    // a count of 1e9 would exhaust memory, so the bars' numbers are checked here first.
    const barsOk = barLayerPrecheck(semantic, section, path);
    const referencesOk = references.every(Boolean);
    const concrete = materialById.get(section.concreteId);
    const keep = (model: SectionModel) => {
      if (concrete?.kind === 'concrete') builtSections.set(section.id, { model, concrete, name: section.name });
    };
    if (code && referencesOk && barsOk) semantic.push(...guarded(path, () => sectionBuildDiagnostics(section, path, materialSpecs, code, { ...(ultimateStrain ? { concreteUltimateStrain: ultimateStrain } : {}) }, keep)));
    else semantic.push(...guarded(path, () => validateShape(section.shape, `${path}.shape`))); // the shape is still checked
    semantic.push(...guarded(path, () => sectionGeometryDiagnostics(section, path, code, Boolean(code && referencesOk && barsOk))));
  }

  // Members: the engine's member checks, the as-found condition and strengthening schemes
  // (core/retrofit/validate.ts, against the items that are structurally sound), then the limit cases
  // against the code basis.
  // A section with errors of its own is known to the members that use it (its errors are the root cause).
  const sectionIds = new Set([...sections.map((s) => s.value.id), ...brokenIds(listOf('sections'), sections)]);
  const soundProject = { ...(data as unknown as Project), materials: materialSpecs, sections: sections.map((s) => s.value), members: members.map((m) => m.value) };
  for (const { value: member, index } of members) {
    const path = itemPath('members', index, member);
    semantic.push(...guarded(path, () => validateMember(member, path, sectionIds)));
    semantic.push(...guarded(path, () => memberGeometryDiagnostics(member, path, code, soundProject.sections)));
    // Steel below the minimum: the verdicts' own rule (core/assessment/brittle.ts), as a warning before the analysis.
    if (code) semantic.push(...guarded(path, () => minimumSteelWarnings(code, member, path, (id) => builtSections.get(id))));
    // The as-found condition and schemes: the assessment's own input checks (derivations and the
    // sections they make), so validate reports every error analyze would; the field checks alone
    // while the code basis is unknown.
    if (code && (member.asFound || member.schemes)) {
      semantic.push(...guarded(path, () => retrofitInputProblems(member, soundProject, { path, code, ...(ultimateStrain ? { concreteUltimateStrain: ultimateStrain } : {}) })));
    } else {
      if (member.asFound) semantic.push(...guarded(`${path}.asFound`, () => validateAsFound(member.asFound!, member, soundProject, `${path}.asFound`)));
      if (member.schemes) semantic.push(...guarded(`${path}.schemes`, () => validateSchemes(member.schemes!, member, soundProject, `${path}.schemes`)));
    }
    if (member.preferredSchemeId !== undefined && !(member.schemes ?? []).some((s) => s.id === member.preferredSchemeId)) {
      const ids = (member.schemes ?? []).map((s) => `"${s.id}"`);
      semantic.push({ code: 'unknown-reference', path: `${path}.preferredSchemeId`, severity: 'error', message: `must be the id of one of the member's schemes (${ids.length > 0 ? ids.join(', ') : 'it has none'}), got ${JSON.stringify(member.preferredSchemeId)}` });
    }
    if (code) {
      const foreign = member.service.limitCases.filter((c) => (code === 'ACI 318-19' ? EN_LIMITS : ACI_LIMITS).includes(c));
      for (const c of foreign) {
        semantic.push({ code: 'inconsistent', path: `${path}.service.limitCases`, severity: 'warning', message: `"${c}" is a limit of ${code === 'ACI 318-19' ? 'EN 1992-1-1' : 'ACI 318-19'}, while the project's code basis is ${code}; the check is made as written` });
      }
    }
    if (Number.isFinite(member.span) && member.span > 0) {
      member.loads.forEach((load, i) => {
        const atSupport = load.kind === 'point' && (load.position === 0 || (load.position === member.span && member.supports !== 'cantilever'));
        if (load.kind === 'point' && atSupport) {
          semantic.push(diagnostic('inconsistent', `${path}.loads[${i}].position`, 'warning', phrase`a point load at a support (${q('spanLength', load.position, { compact: true })}) goes straight into the support and does not bend the beam`));
        }
      });
    }
  }

  for (const { value: member, index } of continuousMembers) {
    const path = itemPath('continuousMembers', index, member);
    semantic.push(...guarded(path, () => validateContinuousBeam(member, path, sectionIds)));
  }

  out.push(...inUnits(semantic, system));
  const diagnostics = sortDiagnostics(dedupe(out));
  return { project: whole.success ? (whole.data as unknown as Project) : null, diagnostics };
}

/** Semantic and structural checks of a project held in memory (e.g. built in code or edited in the UI). */
export function validateProject(project: Project): Diagnostic[] {
  return validateProjectData(project).diagnostics;
}

/** True when any diagnostic is an error. */
export function hasErrors(diagnostics: readonly Diagnostic[]): boolean {
  return diagnostics.some((d) => d.severity === 'error');
}

function dedupe(list: readonly Diagnostic[]): Diagnostic[] {
  const seen = new Set<string>();
  return list.filter((d) => {
    const key = `${d.severity}|${d.path}|${d.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

const GROUP_ORDER = ['(file)', 'format', 'version', 'info', 'settings', 'materials', 'sections', 'members', 'continuousMembers'];

/** The lists of items in a project file. */
type ItemList = 'materials' | 'sections' | 'members' | 'continuousMembers';

/** File order: file-level problems, info, settings, then materials, sections and members by index. */
export function sortDiagnostics(list: readonly Diagnostic[]): Diagnostic[] {
  const key = (d: Diagnostic): [number, number] => {
    const m = /^([\w()]+)(?:\[(\d+)\])?/.exec(d.path);
    const group = m ? GROUP_ORDER.indexOf(m[1]!) : -1;
    return [group < 0 ? GROUP_ORDER.length : group, m?.[2] !== undefined ? Number(m[2]) : -1];
  };
  return list
    .map((d, i) => ({ d, i, k: key(d) }))
    .sort((a, b) => a.k[0] - b.k[0] || a.k[1] - b.k[1] || a.i - b.i)
    .map((x) => x.d);
}

/** Deepest nesting of arrays and objects in `value`, counted without recursion (safe on any input). */
export function nestingDepth(value: unknown, stopAt = MAX_NESTING + 1): number {
  let deepest = 0;
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length > 0) {
    const [v, depth] = stack.pop()!;
    if (typeof v !== 'object' || v === null) continue;
    const d = depth + 1;
    if (d > deepest) deepest = d;
    if (deepest >= stopAt) return deepest;
    for (const child of Array.isArray(v) ? v : Object.values(v)) stack.push([child, d]);
  }
  return deepest;
}
