/**
 * Regression pin of the member engine (issue 16): a speed change must not move results. The key
 * results of a fixed set of varied members (test/core/member/pinned/members.ts: the demo projects
 * with their variants and continuous members, every support type under both code bases, a point
 * load, bars cut off) — peak load, first-yield, nominal-yield and ultimate deflections, μΔ, the
 * hinges in order of formation and every event's load factor — must equal the values the engine
 * produced before the speed work (pinned/pinned-results.json, `producedOn` names the commit; written
 * by pinned/generate.ts) to 1e-6 relative. The values themselves are checked against outside sources
 * by the other member tests (handbook statics in elastic-handbook.test.ts, Park's secant in
 * analyze.test.ts); here they are the engine's own earlier output.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { pinnedResults } from './pinned/members.ts';

const pinned = JSON.parse(readFileSync(new URL('./pinned/pinned-results.json', import.meta.url), 'utf8')) as { producedOn: string; results: Record<string, unknown> };

/** Paths where `actual` differs from `expected`: numbers beyond 1e-6 relative (1e-12 absolute near zero), anything else not equal. */
function differences(expected: unknown, actual: unknown, path: string): string[] {
  if (typeof expected === 'number' && typeof actual === 'number') {
    return Math.abs(actual - expected) <= 1e-6 * Math.abs(expected) + 1e-12 ? [] : [`${path}: ${expected} → ${actual}`];
  }
  if (Array.isArray(expected) && Array.isArray(actual)) {
    if (expected.length !== actual.length) return [`${path}: length ${expected.length} → ${actual.length}`];
    return expected.flatMap((e, i) => differences(e, actual[i], `${path}[${i}]`));
  }
  if (expected && actual && typeof expected === 'object' && typeof actual === 'object') {
    const keys = new Set([...Object.keys(expected), ...Object.keys(actual)]);
    return [...keys].flatMap((k) => differences((expected as Record<string, unknown>)[k], (actual as Record<string, unknown>)[k], `${path}.${k}`));
  }
  return Object.is(expected, actual) ? [] : [`${path}: ${JSON.stringify(expected)} → ${JSON.stringify(actual)}`];
}

describe('member engine results are pinned (a speed change must not alter them)', () => {
  const now = pinnedResults();
  it(`the pin covers many members, hinges and events (produced on ${pinned.producedOn.slice(0, 7)})`, () => {
    const values = Object.values(pinned.results) as { hinges?: unknown[]; events?: unknown[] }[];
    expect(values.length).toBeGreaterThanOrEqual(30);
    expect(values.filter((v) => (v.hinges?.length ?? 0) >= 2).length).toBeGreaterThanOrEqual(5);
    expect(Object.keys(now).sort()).toEqual(Object.keys(pinned.results).sort());
  });
  for (const name of Object.keys(pinned.results)) {
    it(name, () => {
      expect(differences(pinned.results[name], now[name], name)).toEqual([]);
    });
  }
  it('the comparison itself catches a change of 1e-5 in a deflection', () => {
    const first = Object.values(pinned.results)[0] as { ultimateDeflection: number };
    expect(differences(first, { ...first, ultimateDeflection: first.ultimateDeflection * (1 + 1e-5) }, 'x')).toHaveLength(1);
  });
});
