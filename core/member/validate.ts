/**
 * Checks of a member definition that need its meaning (zones tile the span, loads lie on it,
 * sections exist). Every problem is reported with its path, value and allowed range.
 */
import { checkNumber, diagnostic, type Diagnostic } from '../diagnostics.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import { DEFLECTION_LIMIT_CASES, HINGE_LENGTH_METHODS, LOAD_CASES, LOAD_PATTERNS, SHEAR_DEFORMATION_MODELS, SPAN_HINGE_RULES, STRAIN_PENETRATION_MODELS, SUPPORT_TYPES, type BeamDefinition, type MemberLoad, type MemberZone } from './definition.ts';

/** True when `value` is one of `options` (a type guard over the option lists of definition.ts). */
const isOneOf = <T extends string>(options: readonly T[], value: unknown): value is T => (options as readonly unknown[]).includes(value);
/** `one of a, b, c` for messages. */
const oneOf = (options: readonly string[]) => `one of ${options.join(', ')}`;

/** A position along the span in a message (mm, shown in the display unit of spans: m or ft). */
const m = (mm: number) => q('spanLength', mm, { compact: true });

/**
 * Most zones and loads a member may have. No real beam needs more (a zone per haunch step, a load
 * per joist every 30 mm of a 60 m span); the analysis time grows with them (n log n for loads).
 */
export const MEMBER_LIMITS = { zones: 200, loads: 2000 } as const;

/** Service settings shared by every kind of beam (single span and continuous): problems into `out`. */
export function checkServiceSettings(out: Diagnostic[], path: string, s: BeamDefinition['service'] | undefined): void {
  const error = (code: Diagnostic['code'], at: string, message: Text) => out.push(diagnostic(code, `${path}.${at}`, 'error', message));
  if (!s) {
    error('required', 'service', 'service settings are required');
    return;
  }
  checkNumber(out, `${path}.service.sustainedLiveFraction`, s.sustainedLiveFraction, { min: 0, max: 1 });
  checkNumber(out, `${path}.service.durationMonths`, s.durationMonths, { min: 0, max: 1200, unit: 'months' });
  (s.limitCases ?? []).forEach((c, i) => {
    if (!isOneOf(DEFLECTION_LIMIT_CASES, c)) error('unknown-option', `service.limitCases[${i}]`, `must be ${oneOf(DEFLECTION_LIMIT_CASES)}, got ${JSON.stringify(c)}`);
  });
  if ((s.limitCases ?? []).includes('custom')) checkNumber(out, `${path}.service.customLimitRatio`, s.customLimitRatio, { min: 50, max: 5000 });
}

/** Load pattern and hinge-length settings shared by every kind of beam: problems into `out`. */
export function checkHingeSettings(out: Diagnostic[], path: string, c: Pick<BeamDefinition['capacity'], 'pattern' | 'hingeLengthMethod' | 'userHingeLength'>): void {
  const error = (code: Diagnostic['code'], at: string, message: Text) => out.push(diagnostic(code, `${path}.${at}`, 'error', message));
  if (!isOneOf(LOAD_PATTERNS, c.pattern)) error('unknown-option', 'capacity.pattern', `must be "proportional" or "live-only", got ${JSON.stringify(c.pattern)}`);
  if (!isOneOf(HINGE_LENGTH_METHODS, c.hingeLengthMethod)) error('unknown-option', 'capacity.hingeLengthMethod', `must be ${oneOf(HINGE_LENGTH_METHODS)}, got ${JSON.stringify(c.hingeLengthMethod)}`);
  if (c.hingeLengthMethod === 'user') checkNumber(out, `${path}.capacity.userHingeLength`, c.userHingeLength, { min: 10, max: 5000, quantity: 'sectionLength' });
}

/** How a beam's zones and loads are named in messages: a single span ("the span") or a continuous beam ("the beam", "its span"). */
export interface ExtentWords {
  /** What zones must cover, e.g. "the span" or "the beam". */
  readonly extent: string;
  /** What a load must lie on, e.g. "the span" or "its span". */
  readonly loadPlace: string;
  /** The end the last zone must reach, in words: (length, mm) → e.g. "the span, 6.00 m". */
  readonly end: (length: number) => Text;
}

/**
 * Zones tile [0, length] without gaps or overlaps, each from before to, on a known section, at most
 * MEMBER_LIMITS.zones of them: problems into `out` (paths `${path}.zones…`). The tiling is checked
 * only when `length` is known (finite) and every zone's own numbers are valid.
 */
export function checkZones(out: Diagnostic[], path: string, zones: readonly MemberZone[] | undefined, length: number, sectionIds: ReadonlySet<string>, words: ExtentWords): void {
  const error = (code: Diagnostic['code'], at: string, message: Text) => out.push(diagnostic(code, `${path}.${at}`, 'error', message));
  if (!Array.isArray(zones) || zones.length === 0) {
    error('required', 'zones', 'at least one zone with a section is required');
    return;
  }
  if (zones.length > MEMBER_LIMITS.zones) {
    error('out-of-range', 'zones', `${words.extent === 'the span' ? 'a member' : 'a beam'} may have at most ${MEMBER_LIMITS.zones} zones, got ${zones.length}`);
    return;
  }
  let zonesOk = true;
  zones.forEach((z, i) => {
    if (!checkNumber(out, `${path}.zones[${i}].from`, z.from, { min: 0, quantity: 'spanLength' })) zonesOk = false;
    if (!checkNumber(out, `${path}.zones[${i}].to`, z.to, { min: 0, quantity: 'spanLength' })) zonesOk = false;
    if (!sectionIds.has(z.sectionId)) error('unknown-reference', `zones[${i}].sectionId`, `no section with id "${z.sectionId}" in the project`);
    if (Number.isFinite(z.from) && Number.isFinite(z.to) && !(z.to > z.from)) {
      zonesOk = false;
      error('geometry', `zones[${i}]`, phrase`must end after it starts, got from ${m(z.from)} to ${m(z.to)}`);
    }
  });
  if (!zonesOk || !Number.isFinite(length)) return;
  let cursor = 0;
  for (const { z, i } of zones.map((z, i) => ({ z, i })).sort((a, b) => a.z.from - b.z.from)) {
    if (Math.abs(z.from - cursor) > 1e-6) {
      error('geometry', `zones[${i}].from`, z.from > cursor ? phrase`leaves a gap from ${m(cursor)} to ${m(z.from)}: zones must cover ${words.extent} without gaps` : phrase`overlaps the previous zone (starts at ${m(z.from)}, previous ends at ${m(cursor)})`);
    }
    cursor = z.to;
  }
  if (Math.abs(cursor - length) > 1e-6) error('geometry', 'zones', phrase`must end at ${words.end(length)}; the last zone ends at ${m(cursor)}`);
}

/**
 * One load: its case, magnitude, and position or extent on a part of length `partLength` (mm; NaN
 * when not known: then only what does not need it is checked). Problems into `out` under
 * `${path}.${at}`. A position may exceed the part by 1e-6 mm (round-off of converted units).
 */
export function checkLoad(out: Diagnostic[], path: string, at: string, load: MemberLoad, partLength: number, words: ExtentWords): void {
  const error = (code: Diagnostic['code'], where: string, message: Text) => out.push(diagnostic(code, `${path}.${where}`, 'error', message));
  if (!isOneOf(LOAD_CASES, load.loadCase)) error('unknown-option', `${at}.loadCase`, `must be ${oneOf(LOAD_CASES)}, got ${JSON.stringify(load.loadCase)}`);
  if (load.kind === 'point') {
    checkNumber(out, `${path}.${at}.magnitude`, load.magnitude, { min: -1e9, max: 1e9, quantity: 'force' });
    if (checkNumber(out, `${path}.${at}.position`, load.position, { min: 0, quantity: 'spanLength' }) && load.position > partLength + 1e-6) {
      error('out-of-range', `${at}.position`, phrase`must lie on ${words.loadPlace} (0 to ${m(partLength)}), got ${m(load.position)}`);
    }
  } else if (load.kind === 'uniform') {
    checkNumber(out, `${path}.${at}.magnitude`, load.magnitude, { min: -1e4, max: 1e4, quantity: 'lineLoad' });
    const from = load.from ?? 0;
    const to = load.to ?? partLength;
    if (load.from !== undefined) checkNumber(out, `${path}.${at}.from`, load.from, { min: 0, quantity: 'spanLength' });
    if (load.to !== undefined) checkNumber(out, `${path}.${at}.to`, load.to, { min: 0, quantity: 'spanLength' });
    if (Number.isFinite(from) && Number.isFinite(to)) {
      if (!(to > from)) error('geometry', at, phrase`must end after it starts, got from ${m(from)} to ${m(to)}`);
      else if (to > partLength + 1e-6) error('out-of-range', `${at}.to`, phrase`must lie on ${words.loadPlace} (0 to ${m(partLength)}), got ${m(to)}`);
    }
  } else {
    error('unknown-option', `${at}.kind`, `must be "uniform" or "point", got ${JSON.stringify((load as { kind: unknown }).kind)}`);
  }
}

/** At most MEMBER_LIMITS.loads loads: false (with the problem in `out`) when there are more. */
export function checkLoadCount(out: Diagnostic[], path: string, loads: readonly unknown[] | undefined, what: string): boolean {
  if ((loads?.length ?? 0) <= MEMBER_LIMITS.loads) return true;
  out.push(diagnostic('out-of-range', `${path}.loads`, 'error', `${what} may have at most ${MEMBER_LIMITS.loads} loads, got ${loads!.length}`));
  return false;
}

const SPAN_WORDS: ExtentWords = { extent: 'the span', loadPlace: 'the span', end: (length) => phrase`the span, ${m(length)}` };

/**
 * @param path e.g. `members[3] "B-12"`
 * @param sectionIds ids of the project's sections
 */
export function validateMember(member: BeamDefinition, path: string, sectionIds: ReadonlySet<string>): Diagnostic[] {
  const out: Diagnostic[] = [];
  const error = (code: Diagnostic['code'], at: string, message: Text) => out.push(diagnostic(code, `${path}.${at}`, 'error', message));
  if (!isOneOf(SUPPORT_TYPES, member.supports)) error('unknown-option', 'supports', `must be ${oneOf(SUPPORT_TYPES)}, got ${JSON.stringify(member.supports)}`);
  const spanOk = checkNumber(out, `${path}.span`, member.span, { min: 0, exclusiveMin: true, max: 60000, quantity: 'spanLength' });
  const span = spanOk ? member.span : NaN;

  // Zones must tile [0, span].
  checkZones(out, path, member.zones, span, sectionIds, SPAN_WORDS);

  // Loads lie on the span.
  if (checkLoadCount(out, path, member.loads, 'a member')) (member.loads ?? []).forEach((load, i) => checkLoad(out, path, `loads[${i}]`, load, span, SPAN_WORDS));

  // Settings.
  checkServiceSettings(out, path, member.service);
  const c = member.capacity;
  if (!c) error('required', 'capacity', 'capacity settings are required');
  else {
    checkHingeSettings(out, path, c);
    if (c.spanHingeRule !== undefined && !isOneOf(SPAN_HINGE_RULES, c.spanHingeRule)) error('unknown-option', 'capacity.spanHingeRule', `must be ${oneOf(SPAN_HINGE_RULES)}, got ${JSON.stringify(c.spanHingeRule)}`);
    if (c.strainPenetration !== undefined && !isOneOf(STRAIN_PENETRATION_MODELS, c.strainPenetration)) error('unknown-option', 'capacity.strainPenetration', `must be ${oneOf(STRAIN_PENETRATION_MODELS)}, got ${JSON.stringify(c.strainPenetration)}`);
    if (c.shearDeformation !== undefined && !isOneOf(SHEAR_DEFORMATION_MODELS, c.shearDeformation)) error('unknown-option', 'capacity.shearDeformation', `must be ${oneOf(SHEAR_DEFORMATION_MODELS)}, got ${JSON.stringify(c.shearDeformation)}`);
    // The descending branch is followed to this fraction of the peak: 0.5 (far down the branch) to
    // 0.99 (at the peak); Park's 0.8 (1988, from memory) is the default.
    if (c.ultimateLoadFraction !== undefined) checkNumber(out, `${path}.capacity.ultimateLoadFraction`, c.ultimateLoadFraction, { min: 0.5, max: 0.99 });
  }
  if (member.strengthFactors) {
    for (const k of ['dead', 'superimposed', 'live'] as const) checkNumber(out, `${path}.strengthFactors.${k}`, member.strengthFactors[k], { min: 0, max: 5 });
  }
  return out;
}
