import { describe, expect, it } from 'vitest';
import { CONCRETE_COMPRESSION_MODELS, CONCRETE_TENSION_MODELS, CODE_BASES, STEEL_MODELS } from '../../../core/materials/factory.ts';
import { SUPPORT_TYPES } from '../../../core/member/definition.ts';
import {
  canonicalOrder, concreteSpecSchema, memberDefinitionSchema, projectInfoSchema, projectSchema, steelSpecSchema, unknownFields, walkKnownObjects,
} from '../../../core/project/schema.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import { locateJsonError } from '../../../core/project/file.ts';

describe('the project schema mirrors the engine', () => {
  it('takes its option names from the engine\'s lists (written once)', () => {
    expect(concreteSpecSchema.shape.compressionModel.options).toEqual([...CONCRETE_COMPRESSION_MODELS]);
    expect(concreteSpecSchema.shape.tensionModel.options).toEqual([...CONCRETE_TENSION_MODELS]);
    expect(steelSpecSchema.shape.model.options).toEqual([...STEEL_MODELS]);
    expect(projectInfoSchema.shape.codeBasis.options).toEqual([...CODE_BASES]);
    expect(memberDefinitionSchema.shape.supports.options).toEqual([...SUPPORT_TYPES]);
  });

  it('accepts both demo projects with every field known', () => {
    for (const p of [demoProject(), demoProjectSI()]) {
      expect(projectSchema.safeParse(p).success).toBe(true);
      expect(unknownFields(p)).toEqual([]);
    }
  });

  it('accepts every section shape kind with its own fields', () => {
    const shapes = [
      { kind: 'rectangle', width: 300, height: 500 },
      { kind: 'tee', height: 500, webWidth: 300, flangeWidth: 1000, flangeThickness: 120 },
      { kind: 'inverted-tee', height: 500, webWidth: 300, flangeWidth: 1000, flangeThickness: 120 },
      { kind: 'ell', height: 500, webWidth: 300, flangeWidth: 700, flangeThickness: 120, flangeSide: 'left' },
      { kind: 'i-shape', height: 900, webWidth: 200, topFlangeWidth: 600, topFlangeThickness: 150, bottomFlangeWidth: 500, bottomFlangeThickness: 200 },
      { kind: 'box', height: 900, width: 1200, topThickness: 200, bottomThickness: 180, wallThickness: 150 },
      { kind: 'polygon', outline: [{ x: 0, y: 0 }, { x: 400, y: 0 }, { x: 300, y: 600 }, { x: 100, y: 600 }], voids: [[{ x: 180, y: 100 }, { x: 220, y: 100 }, { x: 200, y: 200 }]] },
    ];
    const p = demoProjectSI();
    for (const shape of shapes) {
      const data = { ...p, sections: [{ ...p.sections[0]!, shape }] };
      expect(projectSchema.safeParse(data).success).toBe(true);
      expect(unknownFields(data)).toEqual([]);
    }
  });

  it('finds unknown fields inside the option of a union that the discriminator selects', () => {
    const p = demoProjectSI();
    const data = { ...p, sections: [{ ...p.sections[0]!, shape: { kind: 'rectangle', width: 300, height: 500, flangeWidth: 900 } }] };
    expect(unknownFields(data)).toEqual([{ path: ['sections', 0, 'shape'], field: 'flangeWidth' }]);
  });

  it('walks only the objects the schema describes (an unknown subtree is not entered)', () => {
    const seen: string[] = [];
    walkKnownObjects({ format: 'hingeline-project', extra: { deep: { deeper: {} } }, info: {} }, (path) => seen.push(path.join('.')));
    expect(seen).toEqual(['', 'info']);
  });
});

describe('canonicalOrder', () => {
  it('orders the fields of a tee section as the schema lists them', () => {
    const ordered = canonicalOrder({ format: 'hingeline-project', sections: [{ shape: { flangeThickness: 1, flangeWidth: 2, webWidth: 3, height: 4, kind: 'tee' }, id: 's' }] }) as { sections: { shape: object }[] };
    expect(Object.keys(ordered.sections[0]!)).toEqual(['id', 'shape']);
    expect(Object.keys(ordered.sections[0]!.shape)).toEqual(['kind', 'height', 'webWidth', 'flangeWidth', 'flangeThickness']);
  });

  it('keeps the order of list items', () => {
    const ordered = canonicalOrder({ members: [{ id: 'b' }, { id: 'a' }] }) as { members: { id: string }[] };
    expect(ordered.members.map((m) => m.id)).toEqual(['b', 'a']);
  });
});

describe('locateJsonError (RFC 8259 grammar)', () => {
  it.each([
    ['{"a": NaN}', 6, /"NaN" is not a JSON value/],
    ['{"a": 1,}', 8, /comma before \}/],
    ['[1, 2,]', 6, /comma before \]/],
    ["{'a': 1}", 1, /not single quotes/],
    ['{"a" 1}', 5, /expected ':'/],
    ['{"a": 1', 7, /ends too early/],
    ['{"a": "x\ny"}', 8, /line break/],
    ['{"a": 01}', 7, /expected ',' or '\}'/],
    ['{} x', 3, /after the end/],
    ['{"a": "\\q"}', 7, /backslash/],
  ])('finds the error in %j at offset %d', (text, offset, reason) => {
    const found = locateJsonError(text);
    expect(found?.offset).toBe(offset);
    expect(found?.reason).toMatch(reason);
  });

  it.each([['{}'], ['[]'], ['{"a": [1, -2.5e3, true, false, null, "x\\u00e9"]}'], ['  "text"  ']])('finds nothing wrong in valid JSON %j', (text) => {
    expect(() => JSON.parse(text)).not.toThrow();
    expect(locateJsonError(text)).toBeNull();
  });

  it('handles very deep nesting without recursion', () => {
    expect(locateJsonError('['.repeat(100000))?.reason).toMatch(/ends too early/);
  });
});
