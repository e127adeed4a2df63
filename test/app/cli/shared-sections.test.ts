import { describe, expect, it } from 'vitest';
import { analyzeMembers } from '../../../core/analysis.ts';
import { resultPacker, resultUnpacker } from '../../../app/cli/shared-sections.ts';
import { generatedProject } from '../../core/project/generated-project.ts';

describe('section results sent once per worker', () => {
  const project = generatedProject(12);
  const results = analyzeMembers(project);

  it('sends each shared object once, restores the same results, shared again across chunks', () => {
    const pack = resultPacker();
    const unpack = resultUnpacker();
    // Through a structured clone, as between threads, in three chunks.
    const chunks = [results.slice(0, 4), results.slice(4, 8), results.slice(8)].map((c) => structuredClone(pack(c)));
    const sent = chunks.map((c) => c.objects.length);
    const restored = chunks.flatMap((c) => unpack(c));
    expect(JSON.stringify(restored)).toBe(JSON.stringify(results));
    // Every distinct curve travels once: later chunks send only what earlier ones did not.
    const distinct = new Set(results.flatMap((r) => r.sections.flatMap((s) => [s.elastic, s.sagging, s.hogging, s.warnings].filter((v) => v !== undefined))));
    expect(sent.reduce((a, b) => a + b, 0)).toBe(distinct.size);
    // Members of different chunks using one section hold one object again.
    const bySection = new Map<string, unknown>();
    for (const r of restored) for (const s of r.sections) {
      if (!s.sagging) continue;
      const seen = bySection.get(s.sectionId);
      if (seen) expect(s.sagging).toBe(seen);
      else bySection.set(s.sectionId, s.sagging);
    }
    expect(bySection.size).toBeGreaterThan(1);
  });

  it('names a reference to an object never sent instead of returning a hole', () => {
    const packed = resultPacker()(results.slice(0, 2));
    expect(() => resultUnpacker()({ ...packed, objects: [] })).toThrow(/never sent/);
  });
});
