/**
 * Section names that follow their dimensions. Engineers name sections after their sizes
 * ("T 24 × 12 in web, 54 in flange (Level 2 floor)", "Rectangle 300 × 600"); when a dimension is
 * edited, the number in the name that stood for it changes with it, so that the name never
 * contradicts the drawing. Only the descriptive head of the name is touched (before the first
 * `:` or `(`), never counts of bars (`4 #8`), marks (`B-12`) or remarks in brackets, and only a
 * number equal to the old dimension in the display unit. When two dimensions have the same value
 * (`Rectangle 24 × 24`), the numbers are matched to the dimensions in the order the shape's fields
 * are listed (width before height for a rectangle, as in `b × h`). A name that does not mention
 * the dimension is left alone.
 */
import type { SectionShape, ShapeKind } from '../../../core/section/shapes.ts';
import { toDisplay } from '../../../core/units/index.ts';
import type { UnitSystem } from '../../../core/project/types.ts';
import { barMentions } from '../../../core/charts/section-geometry.ts';
import { displaySystem } from './units.ts';

/** The dimension fields of each shape kind, in the order names and the editor list them: [field, label]. */
export const SHAPE_FIELDS: Readonly<Record<Exclude<ShapeKind, 'polygon'>, readonly (readonly [string, string])[]>> = {
  rectangle: [['width', 'Width b'], ['height', 'Height h']],
  tee: [['height', 'Height h'], ['webWidth', 'Web width bw'], ['flangeWidth', 'Flange width bf'], ['flangeThickness', 'Flange thickness hf']],
  'inverted-tee': [['height', 'Height h'], ['webWidth', 'Web width bw'], ['flangeWidth', 'Flange width bf'], ['flangeThickness', 'Flange thickness hf']],
  ell: [['height', 'Height h'], ['webWidth', 'Web width bw'], ['flangeWidth', 'Overall width (web + flange)'], ['flangeThickness', 'Flange thickness hf']],
  'i-shape': [['height', 'Height h'], ['webWidth', 'Web width bw'], ['topFlangeWidth', 'Top flange width'], ['topFlangeThickness', 'Top flange thickness'], ['bottomFlangeWidth', 'Bottom flange width'], ['bottomFlangeThickness', 'Bottom flange thickness']],
  box: [['height', 'Height h'], ['width', 'Width b'], ['topThickness', 'Top slab thickness'], ['bottomThickness', 'Bottom slab thickness'], ['wallThickness', 'Wall thickness']],
};

/** A number standing alone (not part of a mark like `B-12` or `T20`, not a bar count before `#`/`Ø`). */
const TOKEN = /(?<![\p{L}\d#Øø.,\-])\d+(?:\.\d+)?(?![\d.]|\s*[#Øø⌀]|\s?M\b)/gu;

/** The display value of a stored length, to 8 significant figures (as the fields show it). */
const shown = (value: number, system: UnitSystem) => Number(toDisplay('sectionLength', value, displaySystem(system)).toPrecision(8));

/** True when the number written as `token` stands for `value` (to the precision it is written with). */
function stands(token: string, value: number): boolean {
  const decimals = token.includes('.') ? token.length - token.indexOf('.') - 1 : 0;
  const written = Number(token);
  return Math.abs(written - value) <= 0.5 * 10 ** -decimals + 1e-9 && Math.abs(written - value) <= 0.01 * Math.abs(value) + 1e-9;
}

/**
 * The section's name after dimension `field` of `shape` changes from `oldValue` to `newValue`
 * (internal units, mm), in the project's `system`. Returns `name` itself when nothing in it stands
 * for that dimension.
 */
export function nameAfterDimensionChange(name: string, shape: SectionShape, field: string, oldValue: number, newValue: number, system: UnitSystem): string {
  if (shape.kind === 'polygon' || !Number.isFinite(oldValue) || !Number.isFinite(newValue)) return name;
  const fields = SHAPE_FIELDS[shape.kind].map(([f]) => f);
  if (!fields.includes(field)) return name;
  const before = shown(oldValue, system);
  const after = shown(newValue, system);
  if (before === after) return name;
  const headEnd = [name.indexOf(':'), name.indexOf('(')].filter((i) => i >= 0).reduce((a, b) => Math.min(a, b), name.length);
  const head = name.slice(0, headEnd);
  const matches = [...head.matchAll(TOKEN)].filter((m) => stands(m[0], before));
  if (matches.length === 0) return name;
  // Dimensions with the same value as the edited one, in field order: the n-th of them is the n-th number.
  const values = shape as unknown as Record<string, number>;
  const sameValued = fields.filter((f) => f === field || (Number.isFinite(values[f]) && shown(values[f]!, system) === before));
  const position = sameValued.indexOf(field);
  const match = matches.length === 1 ? matches[0]! : matches.length === sameValued.length ? matches[position] : undefined;
  if (!match || match.index === undefined) return name;
  return `${name.slice(0, match.index)}${String(after)}${name.slice(match.index + match[0].length)}`;
}

/**
 * A label or name after a layer's bars change from `before` to `after` (both as drawings write
 * them, `3 #8` → `4 #9`): the text that named the old bars names the new ones. Only when the old
 * bars appear once, standing alone (not inside `13 #8` or `3 #80`); otherwise the text stays.
 */
export function textAfterBarsChange(text: string, before: string | null, after: string | null): string {
  if (!before || !after || before === after) return text;
  const found = barMentions(text, before);
  if (found.length !== 1) return text;
  const { index, length } = found[0]!;
  return `${text.slice(0, index)}${after}${text.slice(index + length)}`;
}
