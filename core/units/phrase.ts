/**
 * Sentences whose quantities stay data until they are shown. Results and diagnostics carry
 * phrases — words, and quantities in internal units — and the app, the command line and the report
 * turn them into text with `say(text, units)` in the display units of the moment, so switching the
 * unit system changes every sentence (a formula that differs between the SI and the in.-lb. form
 * of a code carries both).
 *
 * A phrase is plain JSON: an array of strings, quantities `{ quantity, value }` (value in the
 * quantity's internal unit, core/units/quantities.ts) and system choices `{ SI, US }`.
 */
import { formatFixed, formatNumber, formatQuantity } from './format.ts';
import { toDisplay, unitLabel } from './convert.ts';
import { displaySystem, QUANTITIES, type Quantity, type UnitSystem } from './quantities.ts';

/** A quantity inside a sentence, in its internal unit. */
export interface QuantityPart {
  readonly quantity: Quantity;
  readonly value: number;
  /**
   * How the number prints: engineering significant figures (default), a fixed count of decimals,
   * or `compact` — four significant figures without trailing zeros, as input messages print values.
   */
  readonly decimals?: number;
  readonly compact?: boolean;
}

/** Words that differ with the display system, e.g. a formula in the SI and the in.-lb. form of a code. */
export interface SystemPart {
  readonly SI: Phrase;
  readonly US: Phrase;
}

export type PhrasePart = string | QuantityPart | SystemPart;
export type Phrase = readonly PhrasePart[];

/**
 * A sentence as results carry it: plain words, or a phrase with at least one quantity or system
 * choice (builders return a plain string when there is none, so a list of texts never looks like a
 * phrase).
 */
export type Text = string | Phrase;

/** A quantity part (value in the quantity's internal unit). */
export function q(quantity: Quantity, value: number, format: { decimals?: number; compact?: boolean } = {}): QuantityPart {
  return { quantity, value, ...(format.decimals !== undefined ? { decimals: format.decimals } : {}), ...(format.compact ? { compact: true } : {}) };
}

/** Words that read differently in the two systems. */
export function bySystem(si: Text, us: Text): SystemPart {
  return { SI: toPhrase(si), US: toPhrase(us) };
}

const isPhrase = (v: unknown): v is Phrase => Array.isArray(v);

/** A text as a phrase. */
export function toPhrase(text: Text): Phrase {
  return isPhrase(text) ? text : [text];
}

/** Adjacent strings merged, empty strings dropped; plain words when no quantity remains. */
function normalised(parts: readonly PhrasePart[]): Text {
  const out: PhrasePart[] = [];
  for (const p of parts) {
    if (typeof p === 'string') {
      if (p === '') continue;
      const last = out[out.length - 1];
      if (typeof last === 'string') out[out.length - 1] = last + p;
      else out.push(p);
    } else out.push(p);
  }
  if (out.every((p) => typeof p === 'string')) return out.join('');
  return out;
}

/**
 * Builds a phrase from a template: `phrase\`at ${q('spanLength', x)}\``. Interpolated strings,
 * quantities, system choices and phrases join in place; numbers print as written by String().
 */
export function phrase(strings: TemplateStringsArray, ...values: readonly (PhrasePart | Phrase | number)[]): Text {
  const parts: PhrasePart[] = [];
  strings.forEach((s, i) => {
    parts.push(s);
    if (i >= values.length) return;
    const v = values[i]!;
    if (typeof v === 'number') parts.push(String(v));
    else if (isPhrase(v)) parts.push(...v);
    else parts.push(v);
  });
  return normalised(parts);
}

/** Texts joined with a separator. */
export function joinTexts(texts: readonly Text[], separator: string): Text {
  const parts: PhrasePart[] = [];
  texts.forEach((t, i) => {
    if (i > 0) parts.push(separator);
    parts.push(...toPhrase(t));
  });
  return normalised(parts);
}

/** The text with its first letter changed by `change` (when it starts with words). */
function firstLetter(text: Text, change: (c: string) => string): Text {
  const p = toPhrase(text);
  const first = p[0];
  if (typeof first !== 'string' || first === '') return text;
  return normalised([change(first.charAt(0)) + first.slice(1), ...p.slice(1)]);
}

export const capitalised = (text: Text): Text => firstLetter(text, (c) => c.toUpperCase());
export const lowerFirst = (text: Text): Text => firstLetter(text, (c) => c.toLowerCase());

/** The text without a full stop (and trailing spaces) at its end. */
export function withoutFinalStop(text: Text): Text {
  const p = toPhrase(text);
  const last = p[p.length - 1];
  if (typeof last !== 'string') return text;
  return normalised([...p.slice(0, -1), last.replace(/\.\s*$/, '')]);
}

/** The text with `change` applied to its words (not to its quantities): e.g. paths renamed. */
export function mapWords(text: Text, change: (words: string) => string): Text {
  if (typeof text === 'string') return change(text);
  return text.map((part) => (typeof part === 'string' ? change(part) : 'quantity' in part ? part : { SI: toPhrase(mapWords(part.SI, change)), US: toPhrase(mapWords(part.US, change)) }));
}

/** The texts without repeats (compared by content), in their first order. */
export function uniqueTexts(texts: readonly Text[]): Text[] {
  const seen = new Set<string>();
  return texts.filter((t) => {
    const key = JSON.stringify(t);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** True for a phrase part that is not words: a quantity or a system choice, and nothing else. */
export function isQuantityOrChoice(value: unknown): value is QuantityPart | SystemPart {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const keys = Object.keys(value);
  const v = value as Record<string, unknown>;
  if ('quantity' in v) return typeof v.quantity === 'string' && v.quantity in QUANTITIES && typeof v.value === 'number' && keys.every((k) => ['quantity', 'value', 'decimals', 'compact'].includes(k));
  return keys.length === 2 && Array.isArray(v.SI) && Array.isArray(v.US);
}

/** Four significant figures without trailing zeros: 6.706 m, 22 ft, 0.5 in. */
function compactNumber(value: number): string {
  const text = formatNumber(value, 4);
  return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
}

function formatPart(part: QuantityPart, system: UnitSystem): string {
  if (part.compact) {
    const label = unitLabel(part.quantity, system);
    const number = compactNumber(toDisplay(part.quantity, part.value, system));
    return label ? `${number} ${label}` : number;
  }
  if (part.decimals !== undefined) {
    const label = unitLabel(part.quantity, system);
    const number = formatFixed(toDisplay(part.quantity, part.value, system), part.decimals);
    return label ? `${number} ${label}` : number;
  }
  return formatQuantity(part.quantity, part.value, system);
}

/** The words of a text in a display system ('SI' / 'US', or the project file's 'si' / 'us'). */
export function say(text: Text, units: UnitSystem | 'si' | 'us'): string {
  if (typeof text === 'string') return text;
  const system = displaySystem(units);
  let out = '';
  for (const part of text) {
    if (typeof part === 'string') out += part;
    else if ('quantity' in part) out += formatPart(part, system);
    else out += say(system === 'US' ? part.US : part.SI, system);
  }
  return out;
}
