/**
 * Edits of a continuous beam's geometry keep the zones tiling the whole beam and the loads on the
 * spans the engineer put them on; add, duplicate and delete keep the other members as they were.
 */
import { describe, expect, it } from 'vitest';
import type { ContinuousBeamDefinition } from '../../../core/continuous/definition.ts';
import { validateContinuousBeam } from '../../../core/continuous/validate.ts';
import { demoProjectSI } from '../../../core/project/demo.ts';
import {
  addContinuousMember, beamLength, deleteContinuousMember, duplicateContinuousMember, newContinuousMember, spanStarts,
  withCantilever, withSpanAdded, withSpanLength, withSpanMoved, withSpanRemoved, withSupportKind,
} from '../../../renderer/src/project/continuous-edits.ts';

const project = demoProjectSI();
const cb1 = project.continuousMembers!.find((m) => m.id === 'CB-1')!;
const cb2 = project.continuousMembers!.find((m) => m.id === 'CB-2')!;
const sectionIds = new Set(project.sections.map((s) => s.id));

/** Core's own checks find nothing wrong with the edited beam (zones tile it, loads lie on their spans). */
function valid(def: ContinuousBeamDefinition): void {
  expect(validateContinuousBeam(def, 'continuousMembers[0] "T"', sectionIds).filter((d) => d.severity === 'error').map((d) => `${d.path}: ${String(d.message)}`)).toEqual([]);
  expect(def.zones[0]!.from).toBe(0);
  expect(def.zones[def.zones.length - 1]!.to).toBeCloseTo(beamLength(def), 6);
  def.zones.slice(1).forEach((z, i) => expect(z.from).toBeCloseTo(def.zones[i]!.to, 6));
}

describe('continuous beam edits', () => {
  it('a longer middle span moves the zones beyond it and keeps the support zones their length', () => {
    const next = withSpanLength(cb1, 1, 8000);
    expect(next.spans).toEqual([6000, 8000, 6000]);
    valid(next);
    // The support zones at both ends of span 2 keep their 1.4 m inside it; the rest moves by 1 m.
    expect(next.zones.map((z) => [z.from, z.to])).toEqual([[0, 4800], [4800, 7400], [7400, 12600], [12600, 15200], [15200, 20000]]);
    expect(next.loads).toBe(cb1.loads);
  });

  it('a much shorter span pulls in the zone boundaries inside it', () => {
    const next = withSpanLength(cb1, 1, 2000);
    valid(next);
    expect(next.zones.every((z) => z.to > z.from)).toBe(true);
  });

  it('adds a span after another with its loads and support copied, up to eight', () => {
    const next = withSpanAdded(cb1, 0);
    expect(next.spans).toEqual([6000, 6000, 7000, 6000]);
    expect(next.supports).toHaveLength(5);
    expect(next.loads.filter((l) => l.span === 2)).toHaveLength(cb1.loads.filter((l) => l.span === 1).length);
    expect(next.loads.filter((l) => l.span === 4)).toHaveLength(cb1.loads.filter((l) => l.span === 3).length);
    valid(next);
    let many: ContinuousBeamDefinition = cb1;
    for (let i = 0; i < 10; i++) many = withSpanAdded(many, 0);
    expect(many.spans).toHaveLength(8);
  });

  it('removes a span with its loads, never below two spans', () => {
    const next = withSpanRemoved(cb1, 1);
    expect(next.spans).toEqual([6000, 6000]);
    expect(next.supports).toHaveLength(3);
    expect(next.loads.some((l) => l.span === 3)).toBe(false);
    valid(next);
    expect(withSpanRemoved(next, 0)).toBe(next);
  });

  it('swaps a span with its neighbour, zones and loads with it', () => {
    const next = withSpanMoved(cb2, 0, 1);
    expect(next.spans).toEqual([4200, 8400]);
    expect(next.loads.filter((l) => l.span === 2).map((l) => l.magnitude)).toEqual(cb2.loads.filter((l) => l.span === 1).map((l) => l.magnitude));
    valid(next);
    // The 8.4 m span's own section now starts at the second span and the cantilever keeps its section.
    expect(next.zones.find((z) => z.from <= 5000 && z.to > 5000)!.sectionId).toBe(cb2.zones[0]!.sectionId);
    expect(next.zones[next.zones.length - 1]!.sectionId).toBe(cb2.zones[cb2.zones.length - 1]!.sectionId);
    expect(withSpanMoved(cb2, 0, -1)).toBe(cb2);
  });

  it('adds and removes a cantilever with its zones and loads', () => {
    const gone = withCantilever(cb2, 'right', 0);
    expect(gone.rightCantilever).toBeUndefined();
    expect(gone.loads.some((l) => l.span === 'right-cantilever')).toBe(false);
    valid(gone);
    const left = withCantilever(cb1, 'left', 1200);
    expect(spanStarts(left)[0]).toBe(1200);
    valid(left);
  });

  it('a column support starts with a column below; a pin drops it', () => {
    const column = { stiffness: 1e13, height: 3500, farEnd: 'fixed' as const };
    const next = withSupportKind(cb2, 1, 'column', column);
    expect(next.supports[1]).toEqual({ kind: 'column', below: column });
    expect(withSupportKind(next, 1, 'pinned', column).supports[1]).toEqual({ kind: 'pinned' });
  });

  it('adds, duplicates and deletes members, leaving the others as they were', () => {
    const member = newContinuousMember(project, project.sections[0]!.id);
    valid(member);
    expect(member.spans).toHaveLength(2);
    const added = addContinuousMember(project, member, 'CB-1');
    expect(added.continuousMembers!.map((m) => m.id)).toEqual(['CB-1', member.id, 'CB-2']);
    expect(added.members).toBe(project.members);
    const { project: copied, memberId } = duplicateContinuousMember(added, 'CB-2');
    const copy = copied.continuousMembers!.find((m) => m.id === memberId)!;
    expect(copy.name).toBe('CB-2 (copy)');
    expect(copy.spans).toEqual(cb2.spans);
    expect(deleteContinuousMember(copied, memberId).continuousMembers).toEqual(added.continuousMembers);
  });
});
