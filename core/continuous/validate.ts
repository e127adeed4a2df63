/**
 * Checks of a continuous beam that need its meaning: spans and supports agree, zones tile the whole
 * length, loads lie on the span or cantilever they name. Every problem names its field path, the
 * value and the allowed range; every problem is reported, not only the first.
 */
import { checkNumber, diagnostic, type Diagnostic } from '../diagnostics.ts';
import { LOAD_CASES } from '../member/definition.ts';
import { checkHingeSettings, checkLoad, checkLoadCount, checkServiceSettings, checkZones, type ExtentWords } from '../member/validate.ts';
import { phrase, q, type Text } from '../units/phrase.ts';
import { COLUMN_FAR_ENDS, CONTINUOUS_LIMITS, CONTINUOUS_SUPPORT_KINDS, type ContinuousBeamDefinition } from './definition.ts';
import { layoutOf, partIndex } from './layout.ts';

const isOneOf = <T extends string>(options: readonly T[], value: unknown): value is T => (options as readonly unknown[]).includes(value);
const oneOf = (options: readonly string[]) => `one of ${options.join(', ')}`;
const m = (mm: number) => q('spanLength', mm, { compact: true });
const BEAM_WORDS: ExtentWords = { extent: 'the beam', loadPlace: 'its span', end: (length) => phrase`the end of the beam, ${m(length)} (cantilevers and spans together)` };

/**
 * @param path e.g. `members[3] "B-3"`
 * @param sectionIds ids of the project's sections
 */
export function validateContinuousBeam(beam: ContinuousBeamDefinition, path: string, sectionIds: ReadonlySet<string>): Diagnostic[] {
  const out: Diagnostic[] = [];
  const error = (code: Diagnostic['code'], at: string, message: Text) => out.push(diagnostic(code, `${path}.${at}`, 'error', message));
  const spans = Array.isArray(beam.spans) ? beam.spans : [];
  if (spans.length < CONTINUOUS_LIMITS.minSpans || spans.length > CONTINUOUS_LIMITS.maxSpans) {
    error('out-of-range', 'spans', `must list ${CONTINUOUS_LIMITS.minSpans} to ${CONTINUOUS_LIMITS.maxSpans} spans, got ${spans.length}`);
  }
  let geometryOk = spans.length >= 1;
  spans.forEach((s, i) => {
    if (!checkNumber(out, `${path}.spans[${i}]`, s, { min: 100, max: CONTINUOUS_LIMITS.maxLength, quantity: 'spanLength' })) geometryOk = false;
  });
  for (const side of ['leftCantilever', 'rightCantilever'] as const) {
    if (beam[side] !== undefined && !checkNumber(out, `${path}.${side}`, beam[side], { min: 0, max: 15000, quantity: 'spanLength' })) geometryOk = false;
  }
  const supports = Array.isArray(beam.supports) ? beam.supports : [];
  if (supports.length !== spans.length + 1) error('geometry', 'supports', `must list one support per span end: ${spans.length + 1} for ${spans.length} span${spans.length === 1 ? '' : 's'}, got ${supports.length}`);
  supports.forEach((s, j) => {
    const at = `supports[${j}]`;
    if (!isOneOf(CONTINUOUS_SUPPORT_KINDS, s?.kind)) {
      error('unknown-option', `${at}.kind`, `must be ${oneOf(CONTINUOUS_SUPPORT_KINDS)}, got ${JSON.stringify(s?.kind)}`);
      return;
    }
    if (s.kind !== 'column') return;
    if (!s.above && !s.below) error('required', at, 'a column support needs a column above, below or both');
    for (const where of ['above', 'below'] as const) {
      const c = s[where];
      if (!c) continue;
      checkNumber(out, `${path}.${at}.${where}.stiffness`, c.stiffness, { min: 0, exclusiveMin: true, max: 1e18, quantity: 'flexuralRigidity' });
      checkNumber(out, `${path}.${at}.${where}.height`, c.height, { min: 500, max: 20000, quantity: 'spanLength' });
      if (!isOneOf(COLUMN_FAR_ENDS, c.farEnd)) error('unknown-option', `${at}.${where}.farEnd`, `must be ${oneOf(COLUMN_FAR_ENDS)}, got ${JSON.stringify(c.farEnd)}`);
    }
  });
  // A beam on pins only, with a single span and cantilevers at both ends, is still stable; one with
  // no span cannot be. Every span needs two supports, which the count above ensures.
  const layout = geometryOk ? layoutOf(beam) : null;
  const length = layout?.length ?? NaN;

  checkZones(out, path, beam.zones, length, sectionIds, BEAM_WORDS);

  if (checkLoadCount(out, path, beam.loads, 'a beam')) {
    (beam.loads ?? []).forEach((load, i) => {
      const at = `loads[${i}]`;
      // The span a load names is checked even when lengths are wrong (only the count matters).
      const refs = layoutOf({ spans: spans.map(() => 1), leftCantilever: beam.leftCantilever ? 1 : 0, rightCantilever: beam.rightCantilever ? 1 : 0 });
      const p = partIndex(refs, load.span);
      if (p < 0) {
        if (!isOneOf(LOAD_CASES, load.loadCase)) error('unknown-option', `${at}.loadCase`, `must be ${oneOf(LOAD_CASES)}, got ${JSON.stringify(load.loadCase)}`);
        error('unknown-reference', `${at}.span`, `must name a span 1 to ${spans.length}${beam.leftCantilever ? ', "left-cantilever"' : ''}${beam.rightCantilever ? ', "right-cantilever"' : ''}, got ${JSON.stringify(load.span)}`);
        return;
      }
      checkLoad(out, path, at, load, layout ? layout.parts[p]!.length : NaN, BEAM_WORDS);
    });
  }

  checkServiceSettings(out, path, beam.service);
  const c = beam.capacity;
  if (!c) error('required', 'capacity', 'capacity settings are required');
  else {
    checkHingeSettings(out, path, c);
    const a = c.arrangement;
    if (!a || (a.kind !== 'all-spans' && a.kind !== 'governing-span')) error('unknown-option', 'capacity.arrangement.kind', `must be "all-spans" or "governing-span", got ${JSON.stringify((a as { kind?: unknown } | undefined)?.kind)}`);
    else if (a.kind === 'governing-span' && !(Number.isInteger(a.span) && a.span >= 1 && a.span <= spans.length)) {
      error('out-of-range', 'capacity.arrangement.span', `must be a span number 1 to ${spans.length}, got ${JSON.stringify(a.span)}`);
    }
    if (c.controlPosition !== undefined && checkNumber(out, `${path}.capacity.controlPosition`, c.controlPosition, { min: 0, quantity: 'spanLength' }) && c.controlPosition > length + 1e-6) {
      error('out-of-range', 'capacity.controlPosition', phrase`must lie on the beam (0 to ${m(length)}), got ${m(c.controlPosition)}`);
    }
  }
  if (beam.strengthFactors) {
    for (const k of ['dead', 'superimposed', 'live'] as const) checkNumber(out, `${path}.strengthFactors.${k}`, beam.strengthFactors[k], { min: 0, max: 5 });
  }
  return out;
}
