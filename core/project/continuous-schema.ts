/**
 * The continuous members of a version-3 project file as zod schemas (`continuousMembers`), mirroring
 * core/continuous/definition.ts field for field. Built from the member schemas they share (zones,
 * load factors, service settings), which schema.ts passes in, so that each rule is written once.
 * Units: internal (mm, N, N/mm, N·mm²).
 */
import { z } from 'zod';
import { COLUMN_FAR_ENDS, CONTINUOUS_SUPPORT_KINDS } from '../continuous/definition.ts';
import { HINGE_LENGTH_METHODS, LOAD_CASES, LOAD_PATTERNS } from '../member/definition.ts';

const number = z.number();
const text = z.string();
const list = <T extends z.ZodType>(item: T) => z.array(item).readonly();

/** ColumnStiffness: EI N·mm², height mm. */
export const columnStiffnessSchema = z.looseObject({ stiffness: number, height: number, farEnd: z.enum(COLUMN_FAR_ENDS) });
export const continuousSupportSchema = z.looseObject({ kind: z.enum(CONTINUOUS_SUPPORT_KINDS), above: columnStiffnessSchema.optional(), below: columnStiffnessSchema.optional() });

/** SpanRef: span number 1…n or a cantilever. */
const spanRef = z.union([number, z.literal('left-cantilever'), z.literal('right-cantilever')]);
const loadCase = z.enum(LOAD_CASES);
export const continuousUniformLoadSchema = z.looseObject({ kind: z.literal('uniform'), loadCase, span: spanRef, magnitude: number, from: number.optional(), to: number.optional(), label: text.optional() });
export const continuousPointLoadSchema = z.looseObject({ kind: z.literal('point'), loadCase, span: spanRef, magnitude: number, position: number, label: text.optional() });
export const continuousLoadSchema = z.discriminatedUnion('kind', [continuousUniformLoadSchema, continuousPointLoadSchema]);

export const allSpansSchema = z.looseObject({ kind: z.literal('all-spans') });
export const governingSpanSchema = z.looseObject({ kind: z.literal('governing-span'), span: number });
export const failureArrangementSchema = z.discriminatedUnion('kind', [allSpansSchema, governingSpanSchema]);

export const continuousCapacitySchema = z.looseObject({
  pattern: z.enum(LOAD_PATTERNS),
  arrangement: failureArrangementSchema,
  hingeLengthMethod: z.enum(HINGE_LENGTH_METHODS),
  userHingeLength: number.optional(),
  controlPosition: number.optional(),
});

/** The continuous member schema from the member schemas it shares. */
export function continuousMemberSchemaOf<Zone extends z.ZodType, Factors extends z.ZodType, Service extends z.ZodType>(parts: { zone: Zone; factors: Factors; service: Service }) {
  return z.looseObject({
    id: text,
    name: text,
    spans: list(number),
    leftCantilever: number.optional(),
    rightCantilever: number.optional(),
    supports: list(continuousSupportSchema),
    zones: list(parts.zone),
    loads: list(continuousLoadSchema),
    includeSelfWeight: z.boolean().optional(),
    strengthFactors: parts.factors.optional(),
    service: parts.service,
    capacity: continuousCapacitySchema,
    notes: text.optional(),
  });
}
