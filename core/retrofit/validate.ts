/**
 * Checks of a member's as-found condition and strengthening schemes that need their meaning:
 * ranges, references to the library, layer indices. Every problem is reported with its path, the
 * value and the allowed range (core/diagnostics.ts); nothing stops at the first.
 */
import { checkNumber, diagnostic, type Diagnostic } from '../diagnostics.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import type { BeamDefinition } from '../member/definition.ts';
import type { SectionDefinition } from '../section/definition.ts';
import { MINIMUM_CORE_COUNT } from './in-place-strength.ts';
import { COVER_LOSS_FACES, DEFECT_KINDS, SCHEME_KINDS, type AsFoundCondition, type InstallationLoad, type Library, type StrengtheningScheme } from './types.ts';

/** Most strengthening schemes one member may have: alternatives compared side by side (no real comparison needs more). */
export const MAX_SCHEMES = 20;

function error(out: Diagnostic[], code: Diagnostic['code'], path: string, message: Text): void {
  out.push(diagnostic(code, path, 'error', message));
}

/** Sections used by the member's zones, in zone order without repeats. */
export function memberSections(member: BeamDefinition, library: Library): SectionDefinition[] {
  const ids = [...new Set((member.zones ?? []).map((z) => z.sectionId))];
  return ids.map((id) => library.sections.find((s) => s.id === id)).filter((s): s is SectionDefinition => s !== undefined);
}

function kindOf(library: Library, id: unknown): string | undefined {
  return library.materials.find((m) => m.id === id)?.kind;
}

function checkText(out: Diagnostic[], path: string, value: unknown, required: boolean): void {
  if (value === undefined && !required) return;
  if (typeof value !== 'string' || (required && value.trim() === '')) error(out, 'required', path, `must be ${required ? 'a non-empty' : 'a'} text, got ${JSON.stringify(value)}`);
}

/**
 * Checks an as-found condition.
 * @param path e.g. `members[3] "B-12".asFound`
 */
export function validateAsFound(condition: AsFoundCondition, member: BeamDefinition, library: Library, path: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  const sections = memberSections(member, library);
  const concreteIds = new Set(sections.map((s) => s.concreteId));
  const targeted = new Map<string, number>();
  (condition.cores ?? []).forEach((c, i) => {
    const at = `${path}.cores[${i}]`;
    checkNumber(out, `${at}.meanStrength`, c.meanStrength, { min: 5, max: 150, quantity: 'concreteStress' });
    if (checkNumber(out, `${at}.count`, c.count, { min: 1, max: 1000 })) {
      if (!Number.isInteger(c.count)) error(out, 'must-be-integer', `${at}.count`, `must be a whole number of cores, got ${c.count}`);
      else if (c.count < MINIMUM_CORE_COUNT) {
        error(out, 'out-of-range', `${at}.count`, `must be at least ${MINIMUM_CORE_COUNT} cores, got ${c.count}: the in-place strength statistics (a standard deviation and its tolerance factor) need at least ${MINIMUM_CORE_COUNT} results (ACI 214.4R-10; EN 1990 Table D1)`);
      }
    }
    checkNumber(out, `${at}.coefficientOfVariation`, c.coefficientOfVariation, { min: 0, max: 0.5 });
    if (c.concreteId !== undefined && !concreteIds.has(c.concreteId)) {
      error(out, 'unknown-reference', `${at}.concreteId`, `must be a concrete used by the member's sections (${[...concreteIds].map((id) => `"${id}"`).join(', ')}), got ${JSON.stringify(c.concreteId)}`);
    }
    for (const id of c.concreteId !== undefined ? [c.concreteId] : [...concreteIds]) {
      const previous = targeted.get(id);
      if (previous !== undefined) error(out, 'duplicate-id', `${at}.concreteId`, `concrete "${id}" already has cores in cores[${previous}]: give one core set per concrete`);
      else targeted.set(id, i);
    }
    checkText(out, `${at}.note`, c.note, false);
  });
  const steelSeen = new Set<string>();
  (condition.steel ?? []).forEach((s, i) => {
    const at = `${path}.steel[${i}]`;
    if (kindOf(library, s.steelId) !== 'steel') error(out, 'unknown-reference', `${at}.steelId`, `no steel material with id ${JSON.stringify(s.steelId)} in the library`);
    else if (steelSeen.has(s.steelId)) error(out, 'duplicate-id', `${at}.steelId`, `steel "${s.steelId}" already has test data: give one entry per steel`);
    steelSeen.add(s.steelId);
    if (s.source !== 'coupons' && s.source !== 'era-default') error(out, 'unknown-option', `${at}.source`, `must be "coupons" or "era-default", got ${JSON.stringify(s.source)}`);
    if (s.yieldStress === undefined && s.ultimateStress === undefined && s.ruptureStrain === undefined && s.elasticModulus === undefined) {
      error(out, 'required', at, 'gives no value: enter at least one of yieldStress, ultimateStress, ruptureStrain, elasticModulus');
    }
    checkText(out, `${at}.note`, s.note, false);
  });
  (condition.defects ?? []).forEach((d, i) => {
    const at = `${path}.defects[${i}]`;
    if (!DEFECT_KINDS.includes(d.kind)) {
      error(out, 'unknown-option', `${at}.kind`, `must be "section-loss" or "cover-loss", got ${JSON.stringify((d as { kind: unknown }).kind)}`);
      return;
    }
    let targets = sections;
    if (d.sectionId !== undefined) {
      targets = sections.filter((s) => s.id === d.sectionId);
      if (targets.length === 0) error(out, 'unknown-reference', `${at}.sectionId`, `must be a section of the member (${sections.map((s) => `"${s.id}"`).join(', ')}), got ${JSON.stringify(d.sectionId)}`);
    }
    checkText(out, `${at}.note`, d.note, false);
    if (d.kind === 'section-loss') {
      checkNumber(out, `${at}.lossPercent`, d.lossPercent, { min: 0, max: 100, unit: '%' });
      if (d.layer === 'hoops') {
        for (const s of targets) if (!s.hoops) error(out, 'inconsistent', `${at}.layer`, `section "${s.id}" has no stirrups (hoops) to lose section`);
      } else if (typeof d.layer !== 'number' || !Number.isInteger(d.layer) || d.layer < 0) {
        error(out, 'out-of-range', `${at}.layer`, `must be "hoops" or a bar layer index (a whole number from 0), got ${JSON.stringify(d.layer)}`);
      } else {
        for (const s of targets) {
          if (d.layer >= s.bars.length) error(out, 'out-of-range', `${at}.layer`, `must be a bar layer index of section "${s.id}" (0 to ${s.bars.length - 1}), got ${d.layer}`);
        }
      }
    } else {
      if (!COVER_LOSS_FACES.includes(d.face)) error(out, 'unknown-option', `${at}.face`, `must be one of ${COVER_LOSS_FACES.map((f) => `"${f}"`).join(', ')}, got ${JSON.stringify(d.face)}`);
      checkNumber(out, `${at}.depth`, d.depth, { min: 0, exclusiveMin: true, max: 1000, quantity: 'sectionLength' });
      if (d.face === 'top' || d.face === 'bottom') {
        if (d.from !== undefined || d.to !== undefined) error(out, 'inconsistent', `${at}.from`, 'a depth range (from, to) applies to the left and right faces only');
      } else {
        const fromOk = d.from === undefined || checkNumber(out, `${at}.from`, d.from, { min: 0, max: 20000, quantity: 'sectionLength' });
        const toOk = d.to === undefined || checkNumber(out, `${at}.to`, d.to, { min: 0, max: 20000, quantity: 'sectionLength' });
        if (fromOk && toOk && d.from !== undefined && d.to !== undefined && !(d.to > d.from)) error(out, 'geometry', `${at}.to`, phrase`must be deeper than from (${q('sectionLength', d.from, { compact: true })}), got ${q('sectionLength', d.to, { compact: true })}`);
      }
    }
  });
  checkText(out, `${path}.notes`, condition.notes, false);
  return out;
}

function checkInstallation(out: Diagnostic[], at: string, load: InstallationLoad | undefined, method: unknown): void {
  if (load !== undefined) {
    for (const k of ['dead', 'superimposed', 'live'] as const) if (load[k] !== undefined) checkNumber(out, `${at}.installation.${k}`, load[k], { min: 0, max: 2 });
  }
  if (method !== undefined && method !== 'cracked-elastic' && method !== 'moment-curvature') {
    error(out, 'unknown-option', `${at}.installationStrainMethod`, `must be "cracked-elastic" or "moment-curvature", got ${JSON.stringify(method)}`);
  }
}

/**
 * Checks the strengthening schemes of a member (geometry that needs the section — widths against
 * the face, bars inside a new layer — is checked when the scheme is built).
 * @param path e.g. `members[3] "B-12".schemes`
 */
export function validateSchemes(schemes: readonly StrengtheningScheme[], member: BeamDefinition, library: Library, path: string): Diagnostic[] {
  const out: Diagnostic[] = [];
  if (!Array.isArray(schemes)) {
    error(out, 'schema', path, 'must be a list of strengthening schemes');
    return out;
  }
  if (schemes.length > MAX_SCHEMES) {
    error(out, 'out-of-range', path, `a member may have at most ${MAX_SCHEMES} strengthening schemes, got ${schemes.length}; each is a full analysis of the beam`);
    return out;
  }
  const sectionIds = new Set(memberSections(member, library).map((s) => s.id));
  const ids = new Set<string>();
  schemes.forEach((s, i) => {
    out.push(...validateScheme(s, library, `${path}[${i}]`, sectionIds));
    if (typeof s.id === 'string') {
      if (ids.has(s.id)) error(out, 'duplicate-id', `${path}[${i}].id`, `another scheme of the member already has the id "${s.id}"`);
      ids.add(s.id);
    }
  });
  return out;
}

/** Checks one scheme (see validateSchemes). */
export function validateScheme(s: StrengtheningScheme, library: Library, at: string, sectionIds: ReadonlySet<string>): Diagnostic[] {
  const out: Diagnostic[] = [];
  if (typeof s.id !== 'string' || !/^[A-Za-z0-9_.-]{1,40}$/.test(s.id)) error(out, 'required', `${at}.id`, `must be 1–40 letters, digits, '-', '_' or '.', got ${JSON.stringify(s.id)}`);
  checkText(out, `${at}.name`, s.name, true);
  checkText(out, `${at}.note`, s.note, false);
  if (!SCHEME_KINDS.includes(s.kind)) {
    error(out, 'unknown-option', `${at}.kind`, `must be one of ${SCHEME_KINDS.map((k) => `"${k}"`).join(', ')}, got ${JSON.stringify((s as { kind: unknown }).kind)}`);
    return out;
  }
  (s.sectionIds ?? []).forEach((id, j) => {
    if (!sectionIds.has(id)) error(out, 'unknown-reference', `${at}.sectionIds[${j}]`, `must be a section of the member (${[...sectionIds].map((x) => `"${x}"`).join(', ')}), got ${JSON.stringify(id)}`);
  });
  if (s.repairSpalls !== undefined && typeof s.repairSpalls !== 'boolean') error(out, 'schema', `${at}.repairSpalls`, `must be true or false, got ${JSON.stringify(s.repairSpalls)}`);
  const face = (value: unknown, allowed: string[]) => {
    if (value !== undefined && !allowed.includes(value as string)) error(out, 'unknown-option', `${at}.face`, `must be ${allowed.map((f) => `"${f}"`).join(' or ')}, got ${JSON.stringify(value)}`);
  };
  switch (s.kind) {
    case 'frp':
      if (kindOf(library, s.frpId) !== 'frp') error(out, 'unknown-reference', `${at}.frpId`, `no FRP material with id ${JSON.stringify(s.frpId)} in the library`);
      checkNumber(out, `${at}.plyThickness`, s.plyThickness, { min: 0, exclusiveMin: true, max: 10, quantity: 'sectionLength' });
      if (checkNumber(out, `${at}.plies`, s.plies, { min: 1, max: 10 }) && !Number.isInteger(s.plies)) error(out, 'must-be-integer', `${at}.plies`, `must be a whole number of plies, got ${s.plies}`);
      checkNumber(out, `${at}.width`, s.width, { min: 0, exclusiveMin: true, max: 5000, quantity: 'sectionLength' });
      face(s.face, ['bottom', 'top']);
      checkInstallation(out, at, s.installation, s.installationStrainMethod);
      break;
    case 'steel-plate':
      if (kindOf(library, s.steelId) !== 'steel') error(out, 'unknown-reference', `${at}.steelId`, `no steel material with id ${JSON.stringify(s.steelId)} in the library`);
      checkNumber(out, `${at}.thickness`, s.thickness, { min: 0, exclusiveMin: true, max: 100, quantity: 'sectionLength' });
      checkNumber(out, `${at}.width`, s.width, { min: 0, exclusiveMin: true, max: 5000, quantity: 'sectionLength' });
      face(s.face, ['bottom', 'top']);
      checkInstallation(out, at, s.installation, s.installationStrainMethod);
      break;
    case 'concrete-layer':
      if (s.face !== 'top' && s.face !== 'bottom') error(out, 'unknown-option', `${at}.face`, `must be "top" or "bottom", got ${JSON.stringify(s.face)}`);
      checkNumber(out, `${at}.thickness`, s.thickness, { min: 0, exclusiveMin: true, max: 1000, quantity: 'sectionLength' });
      if (s.width !== undefined) checkNumber(out, `${at}.width`, s.width, { min: 0, exclusiveMin: true, max: 20000, quantity: 'sectionLength' });
      if (kindOf(library, s.concreteId) !== 'concrete') error(out, 'unknown-reference', `${at}.concreteId`, `no concrete material with id ${JSON.stringify(s.concreteId)} in the library`);
      if (!Array.isArray(s.bars)) error(out, 'required', `${at}.bars`, 'a list of bar layers is required (it may be empty)');
      else {
        s.bars.forEach((b, j) => {
          const bt = `${at}.bars[${j}]`;
          if (kindOf(library, b.steelId) !== 'steel') error(out, 'unknown-reference', `${bt}.steelId`, `no steel material with id ${JSON.stringify(b.steelId)} in the library`);
          checkNumber(out, `${bt}.distanceFromFace`, b.distanceFromFace, { min: 0, exclusiveMin: true, max: 1000, quantity: 'sectionLength' });
          if (b.count !== undefined || b.diameter !== undefined) {
            if (checkNumber(out, `${bt}.count`, b.count, { min: 1, max: 100 }) && !Number.isInteger(b.count)) error(out, 'must-be-integer', `${bt}.count`, `must be a whole number of bars, got ${b.count}`);
            checkNumber(out, `${bt}.diameter`, b.diameter, { min: 3, max: 60, quantity: 'sectionLength' });
          } else {
            checkNumber(out, `${bt}.area`, b.area, { min: 0, exclusiveMin: true, max: 1e6, quantity: 'area' });
          }
        });
      }
      break;
  }
  return out;
}
