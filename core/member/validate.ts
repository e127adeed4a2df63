/**
 * Checks of a member definition that need its meaning (zones tile the span, loads lie on it,
 * sections exist). Every problem is reported with its path, value and allowed range.
 */
import { checkNumber, diagnostic, type Diagnostic } from '../diagnostics.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import { DEFLECTION_LIMIT_CASES, HINGE_LENGTH_METHODS, LOAD_CASES, LOAD_PATTERNS, SHEAR_DEFORMATION_MODELS, SPAN_HINGE_RULES, STRAIN_PENETRATION_MODELS, SUPPORT_TYPES, type BeamDefinition } from './definition.ts';

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
  if (!Array.isArray(member.zones) || member.zones.length === 0) {
    error('required', 'zones', 'at least one zone with a section is required');
  } else if (member.zones.length > MEMBER_LIMITS.zones) {
    error('out-of-range', 'zones', `a member may have at most ${MEMBER_LIMITS.zones} zones, got ${member.zones.length}`);
  } else {
    const zones = [...member.zones].map((z, i) => ({ z, i })).sort((a, b) => a.z.from - b.z.from);
    member.zones.forEach((z, i) => {
      checkNumber(out, `${path}.zones[${i}].from`, z.from, { min: 0, quantity: 'spanLength' });
      checkNumber(out, `${path}.zones[${i}].to`, z.to, { min: 0, quantity: 'spanLength' });
      if (!sectionIds.has(z.sectionId)) error('unknown-reference', `zones[${i}].sectionId`, `no section with id "${z.sectionId}" in the project`);
      if (Number.isFinite(z.from) && Number.isFinite(z.to) && !(z.to > z.from)) error('geometry', `zones[${i}]`, phrase`must end after it starts, got from ${m(z.from)} to ${m(z.to)}`);
    });
    if (spanOk && out.length === 0) {
      let cursor = 0;
      for (const { z, i } of zones) {
        if (Math.abs(z.from - cursor) > 1e-6) {
          error('geometry', `zones[${i}].from`, z.from > cursor ? phrase`leaves a gap from ${m(cursor)} to ${m(z.from)}: zones must cover the span without gaps` : phrase`overlaps the previous zone (starts at ${m(z.from)}, previous ends at ${m(cursor)})`);
        }
        cursor = z.to;
      }
      if (Math.abs(cursor - span) > 1e-6) error('geometry', 'zones', phrase`must end at the span, ${m(span)}; the last zone ends at ${m(cursor)}`);
    }
  }

  // Loads lie on the span.
  const tooManyLoads = (member.loads?.length ?? 0) > MEMBER_LIMITS.loads;
  if (tooManyLoads) error('out-of-range', 'loads', `a member may have at most ${MEMBER_LIMITS.loads} loads, got ${member.loads.length}`);
  (tooManyLoads ? [] : member.loads ?? []).forEach((load, i) => {
    const at = `loads[${i}]`;
    if (!isOneOf(LOAD_CASES, load.loadCase)) error('unknown-option', `${at}.loadCase`, `must be ${oneOf(LOAD_CASES)}, got ${JSON.stringify(load.loadCase)}`);
    if (load.kind === 'point') {
      checkNumber(out, `${path}.${at}.magnitude`, load.magnitude, { min: -1e9, max: 1e9, quantity: 'force' });
      if (checkNumber(out, `${path}.${at}.position`, load.position, { min: 0, quantity: 'spanLength' }) && spanOk && load.position > span) {
        error('out-of-range', `${at}.position`, phrase`must lie on the span (0 to ${m(span)}), got ${m(load.position)}`);
      }
    } else if (load.kind === 'uniform') {
      checkNumber(out, `${path}.${at}.magnitude`, load.magnitude, { min: -1e4, max: 1e4, quantity: 'lineLoad' });
      const from = load.from ?? 0;
      const to = load.to ?? (spanOk ? span : 0);
      if (load.from !== undefined) checkNumber(out, `${path}.${at}.from`, load.from, { min: 0, quantity: 'spanLength' });
      if (load.to !== undefined) checkNumber(out, `${path}.${at}.to`, load.to, { min: 0, quantity: 'spanLength' });
      if (spanOk && Number.isFinite(from) && Number.isFinite(to)) {
        if (!(to > from)) error('geometry', at, phrase`must end after it starts, got from ${m(from)} to ${m(to)}`);
        else if (to > span + 1e-6) error('out-of-range', `${at}.to`, phrase`must lie on the span (0 to ${m(span)}), got ${m(to)}`);
      }
    } else {
      error('unknown-option', `${at}.kind`, `must be "uniform" or "point", got ${JSON.stringify((load as { kind: unknown }).kind)}`);
    }
  });

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
