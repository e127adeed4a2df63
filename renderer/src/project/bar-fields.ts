/**
 * Bar-size fields as engineers write them: `#8`, `3 #8`, `20M`, `Ø20`, `2T16` or a diameter. A
 * count in front comes back as `extra` (the field's owner sets the number of bars with it).
 */
import { parseBarDesignation } from '../../../core/section/bar-designations.ts';
import type { FieldReading } from '../components/NumberField.vue';

/** Reads a bar-size field's text; null when the text is no designation (the field reads it as a number). */
export function readBarField(text: string): FieldReading | null {
  const parsed = parseBarDesignation(text);
  if (!parsed) return null;
  if (!parsed.ok) return parsed;
  return { ok: true, value: parsed.diameter, ...(parsed.count !== undefined ? { extra: parsed.count } : {}) };
}
