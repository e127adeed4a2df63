/**
 * The file schema (core/project/schema.ts) knows every field of the project's types: a field added
 * to a type without the schema fails to compile. The compile-time half of this test is the
 * `@ts-expect-error` lines below — `npm run typecheck` (tsconfig.test.json) fails if one of them
 * compiles, i.e. if the check let a missing field through; the runtime half checks the same
 * relation on the schema's data.
 */
import { describe, expect, it } from 'vitest';
import type { ConcreteSpec } from '../../../core/materials/specs.ts';
import type { BeamDefinition, ServiceSettings } from '../../../core/member/definition.ts';
import { memberDefinitionSchema, type concreteSpecSchema, type SchemaHasFieldsOf, type serviceSettingsSchema } from '../../../core/project/schema.ts';
import type { MemberDefinition } from '../../../core/project/types.ts';

// A member type with one field more than the schema has must not pass the check.
type MemberWithNewField = MemberDefinition & { readonly designLife?: number };
// @ts-expect-error: `designLife` is not in memberDefinitionSchema, so the check is not `true`
const missingMemberField: SchemaHasFieldsOf<MemberWithNewField, typeof memberDefinitionSchema> = true;

// The same for a field nested two levels down (the member's service settings).
type ServiceWithNewField = ServiceSettings & { readonly crackWidthLimit: number };
// @ts-expect-error: `crackWidthLimit` is not in serviceSettingsSchema
const missingServiceField: SchemaHasFieldsOf<ServiceWithNewField, typeof serviceSettingsSchema> = true;

// A type missing a field the schema has fails too (the beam alone lacks asFound and schemes).
// @ts-expect-error: the schema knows `asFound` and `schemes`, BeamDefinition does not
const extraSchemaFields: SchemaHasFieldsOf<BeamDefinition, typeof memberDefinitionSchema> = true;

// And the real types pass.
const concreteMatches: SchemaHasFieldsOf<ConcreteSpec, typeof concreteSpecSchema> = true;
const memberMatches: SchemaHasFieldsOf<MemberDefinition, typeof memberDefinitionSchema> = true;

describe('the file schema and the project types', () => {
  it('reject a field the schema lacks at compile time, and accept the real types', () => {
    // The values only exist to be type-checked; each is the literal `true` it was given.
    expect([missingMemberField, missingServiceField, extraSchemaFields, concreteMatches, memberMatches]).toEqual([true, true, true, true, true]);
  });

  it('knows, at run time too, every field a full member may have', () => {
    const member: Required<MemberDefinition> = {
      id: 'm', name: 'M', supports: 'simply-supported', span: 5000, zones: [], loads: [], includeSelfWeight: true,
      strengthFactors: { dead: 1.2, superimposed: 1.2, live: 1.6 },
      service: { sustainedLiveFraction: 0.3, durationMonths: 60, limitCases: [] },
      capacity: { pattern: 'proportional', hingeLengthMethod: 'priestley-2007' },
      notes: '', asFound: {}, schemes: [], preferredSchemeId: '',
    };
    expect(Object.keys(memberDefinitionSchema.shape).sort()).toEqual(Object.keys(member).sort());
  });
});
