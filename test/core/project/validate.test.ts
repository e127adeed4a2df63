/* eslint-disable @typescript-eslint/no-explicit-any -- the tests edit project JSON freely to build malformed files */
import { describe, expect, it } from 'vitest';
import type { Diagnostic } from '../../../core/diagnostics.ts';
import { analysisBlockers, formatDiagnostic, hasErrors, sortDiagnostics, validateProject, validateProjectData } from '../../../core/project/validate.ts';
import { checkNumber, diagnosticText, type AllowedRange } from '../../../core/diagnostics.ts';
import { demoProject, demoProjectSI } from '../../../core/project/demo.ts';
import type { Project } from '../../../core/project/types.ts';
import { member, smallProject } from '../../fixtures/projects.ts';

/** A mutable deep copy of a small valid project with three members. */
function editable(unitSystem: 'si' | 'us' = 'si'): any {
  const p = structuredClone(smallProject('ACI 318-19', [
    member('A', 'simply-supported', 6000, 'r1'),
    member('B', 'cantilever', 2500, 't1'),
    member('C', 'propped-cantilever', 7000, 'r1'),
    member('D', 'fixed-fixed', 8000, 't1', { name: 'B-12' }),
  ])) as any;
  p.info.unitSystem = unitSystem;
  return p;
}

const find = (list: readonly Diagnostic[], path: string) => list.filter((d) => d.path === path);

/** Validation's warning of steel below the minimum (core/assessment/brittle.ts minimumSteelWarnings). */
const belowMinimum = (d: Diagnostic) => d.severity === 'warning' && /is less than the minimum/.test(d.message);

describe('a valid project', () => {
  it('the SI demo has no diagnostics at all', () => {
    expect(validateProject(demoProjectSI())).toEqual([]);
  });

  it('the US demo has one: L-102, reinforced below the minimum on purpose (the demo\'s beam that fails as it cracks)', () => {
    const list = validateProject(demoProject());
    expect(list.map((d) => d.path)).toEqual(['members[7] "L-102".zones[0].sectionId']);
    expect(list[0]!.message).toMatch(/sagging: tension steel 0\.614 in² is less than the minimum 2\.23 in² \(ACI 318-19 9\.6\.1\.2/);
  });

  it('an engine fixture has none but the minimum-steel warnings of its light top bars, where its supports give hogging', () => {
    const list = validateProject(editable() as Project);
    expect(list.filter((d) => !belowMinimum(d))).toEqual([]);
    // A (simply supported, 3-T20 bottom) has none; the cantilever's and the propped member's tops are named
    expect(list.map((d) => `${d.path}: ${/section "[^"]+", \w+/.exec(d.message)?.[0]}`)).toEqual([
      'members[1] "B".zones[0].sectionId: section "T 1200 × 600", hogging',
      'members[2] "C".zones[0].sectionId: section "300 × 600", hogging',
    ]);
    // the fixed–fixed T-beam's 603 mm² top is enough: indeterminate, so bw = 300 mm, not min(bf, 2bw) (ACI 318-19 9.6.1.2, from memory)
  });
});

describe('messages name the member by index and name and give values in display units', () => {
  it('reports a negative span in metres under SI (1 m = 1000 mm)', () => {
    const p = editable('si');
    p.members[3].span = -2000;
    const d = find(validateProject(p), 'members[3] "B-12".span');
    expect(d).toHaveLength(1);
    expect(d[0]).toMatchObject({ code: 'must-be-positive', severity: 'error' });
    expect(d[0]!.message).toBe('must be greater than 0 m and at most 60 m, got -2 m');
    expect(formatDiagnostic(d[0]!)).toBe('members[3] "B-12" span: must be greater than 0 m and at most 60 m, got -2 m');
  });

  it('reports the same span in feet under US units (1 ft = 304.8 mm exactly, NIST SP 811 B.8)', () => {
    const p = editable('us');
    p.members[3].span = -2000;
    const d = find(validateProject(p), 'members[3] "B-12".span')[0]!;
    // 60 000 mm = 196.85 ft; -2000 mm = -6.5617 ft (four significant figures)
    expect(d.message).toBe('must be greater than 0 ft and at most 196.9 ft, got -6.562 ft');
  });

  it('gives section dimensions in inches and concrete strength in psi under US units (1 psi = 0.006 894 757 MPa, NIST SP 811 B.8)', () => {
    const p = editable('us');
    p.sections[0].bars[0].depth = 700; // in a 600 mm deep section
    p.materials[0].strength = 5; // MPa, below the 10 MPa minimum
    const list = validateProject(p);
    expect(find(list, 'sections[0] "300 × 600".bars[0].depth')[0]!.message).toBe('must be greater than 0 in and less than 23.62 in, got 27.56 in');
    expect(find(list, 'materials[0] "c30".strength')[0]!.message).toBe('concrete compressive strength must be at least 1450 psi and at most 17400 psi, got 725.2 psi');
  });

  it('leaves values in internal units when the display unit is the same (SI section depths in mm)', () => {
    const p = editable('si');
    p.sections[0].bars[0].depth = 700;
    expect(find(validateProject(p), 'sections[0] "300 × 600".bars[0].depth')[0]!.message).toBe('must be greater than 0 mm and less than 600 mm, got 700 mm');
  });

  it('names an item by index alone when it has no name', () => {
    const p = editable();
    p.members[0].name = '';
    p.members[0].span = 0;
    expect(validateProject(p).map((d) => d.path)).toContain('members[0].span');
  });
});

describe('all problems at once', () => {
  it('reports problems of the structure and of the meaning, in different items, together and in file order', () => {
    const p = editable('si');
    p.members[0].span = 'long';                       // structure
    p.members[1].loads.push({ kind: 'point', loadCase: 'live', magnitude: 5000, position: 9000 }); // off the cantilever
    p.members[2].zones[0].sectionId = 'missing';      // dangling reference
    p.members[3].id = 'A';                            // duplicate id
    p.sections[1].concreteId = 'b500';                // a steel used as concrete
    p.materials[2].yieldStress = 50;                  // below range
    p.settings.stations = 5;                          // below range
    p.info.date = '2026-02-30';                       // not a calendar date
    const { project, diagnostics } = validateProjectData(p);
    expect(project).toBeNull();
    expect(diagnostics.map((d) => [d.code, d.path])).toEqual([
      ['schema', 'info.date'],
      ['out-of-range', 'settings.stations'],
      ['out-of-range', 'materials[2] "b500".yieldStress'],
      ['unknown-reference', 'sections[1] "T 1200 × 600".concreteId'],
      ['not-a-number', 'members[0] "A".span'],
      ['out-of-range', 'members[1] "B".loads[2].position'],
      ['unknown-reference', 'members[2] "C".zones[0].sectionId'],
      ['duplicate-id', 'members[3] "B-12".id'],
    ]);
    expect(diagnostics.find((d) => d.path.endsWith('loads[2].position'))!.message).toBe('must lie on the span (0 to 2.5 m), got 9 m');
    expect(diagnostics.find((d) => d.code === 'duplicate-id')!.message).toBe('"A" is already the id of members[0] "A"; ids must be unique');
    expect(diagnostics.find((d) => d.path.endsWith('concreteId'))!.message).toBe('"b500" is a steel material; the section concrete must be a concrete material');
  });

  it('returns the project when only the meaning is wrong, so that it can be opened and repaired', () => {
    const p = editable();
    p.members[0].span = -1;
    const { project, diagnostics } = validateProjectData(p);
    expect(project).not.toBeNull();
    expect(hasErrors(diagnostics)).toBe(true);
  });
});

describe('missing parts', () => {
  it('reports each missing top-level part once', () => {
    const { project, diagnostics } = validateProjectData({ format: 'hingeline-project', version: 3 });
    expect(project).toBeNull();
    expect(diagnostics.map((d) => [d.code, d.path])).toEqual([['required', 'info'], ['required', 'settings'], ['required', 'materials'], ['required', 'sections'], ['required', 'members']]);
  });

  it('names the missing field of an item', () => {
    const p = editable();
    delete p.members[2].service;
    expect(validateProjectData(p).diagnostics.filter((d) => !belowMinimum(d))).toEqual([{ code: 'required', path: 'members[2] "C".service', severity: 'error', message: 'is required (an object)' }]);
  });
});

describe('analysisBlockers', () => {
  it('lets member errors through but blocks on shared parts and duplicate ids', () => {
    const p = editable();
    p.members[0].span = -5;
    expect(analysisBlockers(validateProject(p))).toEqual([]);
    p.members[1].id = 'A';
    expect(analysisBlockers(validateProject(p)).map((d) => d.code)).toEqual(['duplicate-id']);
    p.sections[0].bars[0].count = 1e9; // would exhaust memory in the section builder
    expect(analysisBlockers(validateProject(p)).map((d) => d.path)).toContain('sections[0] "300 × 600".bars[0].count');
  });
});

describe('section checks through the section builder and the material resolver', () => {
  it('reports bars that do not fit inside the web', () => {
    const p = editable();
    p.sections[0].bars[0].count = 12;
    const d = validateProject(p).find((x) => x.code === 'outside-section');
    expect(d?.path).toBe('sections[0] "300 × 600".bars[0]');
  });

  it('reports a dangling steel reference of bars and hoops by kind', () => {
    const p = editable();
    p.sections[0].bars[1].steelId = 'nope';
    p.sections[0].hoops.steelId = 'c30';
    const list = validateProject(p);
    expect(find(list, 'sections[0] "300 × 600".bars[1].steelId')[0]!.message).toMatch(/no material with id "nope"/);
    expect(find(list, 'sections[0] "300 × 600".hoops.steelId')[0]!.message).toBe('"c30" is a concrete material; the hoop steel must be a steel material');
  });

  it('places confinement problems on the hoops of the section that causes them', () => {
    const p = editable();
    p.sections.push({
      id: 'x', name: 'crowded', shape: { kind: 'rectangle', width: 300, height: 400 }, concreteId: 'c30m',
      bars: [{ steelId: 'b500', depth: 62, count: 4, diameter: 32 }, { steelId: 'b500', depth: 338, count: 4, diameter: 32 }],
      hoops: { steelId: 'b500', diameter: 10, spacing: 100, verticalLegs: 2, clearCover: 30, confineCore: true, closedAndAnchored: true },
    });
    // ρcc = 8 × 804.2 mm² / (230 × 330 mm²) = 0.0848 > 0.08
    const d = find(validateProject(p), 'sections[2] "crowded".hoops');
    expect(d).toHaveLength(1);
    expect(d[0]!.message).toMatch(/^confinement of the core \(longitudinalRatio\): longitudinal steel ratio of the core ρcc must be at least 0 and at most 0\.08/);
  });

  it('reports one bad value of a material once, not again at every section that uses it (issue 15 item 10)', () => {
    const p = editable();
    p.materials[2].yieldStress = 'five hundred'; // b500: every section's bars and hoops use it
    const errors = validateProject(p).filter((d) => d.severity === 'error');
    expect(errors.map((d) => d.path)).toEqual(['materials[2] "b500".yieldStress']);
    // the same for a section with a bad value: the members using it are not told it does not exist
    const q = editable();
    q.sections[0].shape.width = 'wide';
    const sectionErrors = validateProject(q).filter((d) => d.severity === 'error');
    expect(sectionErrors.map((d) => d.path)).toEqual(['sections[0] "300 × 600".shape.width']);
  });

  it('still checks the shape when a reference is wrong', () => {
    const p = editable();
    p.sections[0].concreteId = 'nope';
    p.sections[0].shape.height = -600;
    const paths = validateProject(p).map((d) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['sections[0] "300 × 600".concreteId', 'sections[0] "300 × 600".shape.height']));
  });

  it('refuses a polygon with more points than allowed, before building it', () => {
    const p = editable();
    const outline = Array.from({ length: 1200 }, (_, i) => ({ x: 300 * Math.cos((2 * Math.PI * i) / 1200) + 300, y: 300 * Math.sin((2 * Math.PI * i) / 1200) + 300 }));
    p.sections[0].shape = { kind: 'polygon', outline };
    expect(find(validateProject(p), 'sections[0] "300 × 600".shape')[0]!.message).toMatch(/at most 1000 points/);
  });
});

describe('as-found condition and strengthening schemes (core/retrofit/validate.ts)', () => {
  it('checks them with the retrofit validators and gives section dimensions in inches under US units', () => {
    const p = structuredClone(demoProject()) as any;
    const b = p.members[1];
    b.asFound.defects.push({ kind: 'cover-loss', face: 'bottom', depth: -25.4 });
    b.asFound.cores[0].count = 2;
    b.schemes[0].frpId = 'g60';
    b.schemes[0].anchorage = 'U-wraps';
    const list = validateProject(p);
    expect(find(list, `members[1] "B-204".asFound.defects[${b.asFound.defects.length - 1}].depth`)[0]!.message).toMatch(/got -1 in$/);
    expect(find(list, 'members[1] "B-204".asFound.cores[0].count')[0]!.code).toBe('out-of-range');
    expect(find(list, 'members[1] "B-204".schemes[0].frpId')[0]!.code).toBe('unknown-reference');
    expect(find(list, 'members[1] "B-204".schemes[0].anchorage')[0]!.code).toBe('unknown-field');
    expect(analysisBlockers(list)).toEqual([]); // member-level: the other members can still be analysed
  });

  it('reports a scheme of an unknown kind as a structural error on that member', () => {
    const p = structuredClone(demoProject()) as any;
    p.members[1].schemes[0].kind = 'carbon-rods';
    const { project, diagnostics } = validateProjectData(p);
    expect(project).toBeNull();
    expect(diagnostics[0]).toMatchObject({ code: 'unknown-option', path: 'members[1] "B-204".schemes[0].kind' });
  });
});

describe('project-level checks', () => {
  it('checks the analysis settings against their ranges', () => {
    const p = editable();
    p.settings.momentDropFraction = 0.2;
    p.settings.stations = 200.5;
    const list = validateProject(p);
    expect(find(list, 'settings.momentDropFraction')[0]!.code).toBe('out-of-range');
    expect(find(list, 'settings.stations')[0]!.code).toBe('must-be-integer');
  });

  it.each([['2024-02-29', true], ['2023-02-29', false], ['2026-13-01', false], ['14/03/2026', false], ['', true]])('accepts the date %j: %s (Gregorian calendar)', (date, ok) => {
    const p = editable();
    p.info.date = date;
    expect(find(validateProject(p), 'info.date')).toHaveLength(ok ? 0 : 1);
  });

  it('warns when a member uses a deflection limit of the other code', () => {
    const p = editable();
    p.members[0].service.limitCases = ['en-appearance'];
    const d = find(validateProject(p), 'members[0] "A".service.limitCases')[0]!;
    expect(d.severity).toBe('warning');
  });

  it('warns about a point load placed on a support, but not at the free end of a cantilever', () => {
    const p = editable();
    p.members[0].loads.push({ kind: 'point', loadCase: 'live', magnitude: 1000, position: 6000 });
    p.members[1].loads.push({ kind: 'point', loadCase: 'live', magnitude: 1000, position: 2500 });
    const list = validateProject(p);
    expect(find(list, 'members[0] "A".loads[2].position')[0]).toMatchObject({ severity: 'warning', message: 'a point load at a support (6 m) goes straight into the support and does not bend the beam' });
    expect(find(list, 'members[1] "B".loads[2].position')).toEqual([]);
  });
});

describe('diagnostics carry their quantities as data and are said in the display units', () => {
  const said = (range: AllowedRange, value: number, units: 'si' | 'us') => {
    const out: Diagnostic[] = [];
    checkNumber(out, 'x', value, range);
    return diagnosticText(out[0]!, units);
  };

  it('says a span in m or ft and a section dimension in mm or in (1 ft = 304.8 mm exactly, NIST SP 811)', () => {
    expect(said({ min: 0, max: 60000, quantity: 'spanLength' }, 70000, 'us')).toBe('must be at least 0 ft and at most 196.9 ft, got 229.7 ft');
    expect(said({ min: 0, max: 60000, quantity: 'spanLength' }, 70000, 'si')).toBe('must be at least 0 m and at most 60 m, got 70 m');
    expect(said({ min: 12.5, max: 587.5, quantity: 'sectionLength' }, 600, 'us')).toBe('must be at least 0.4921 in and at most 23.13 in, got 23.62 in');
  });

  it('gives steel stresses and moduli in ksi, concrete stresses in psi (1 ksi = 6.894 757 MPa)', () => {
    expect(said({ min: 200, max: 1000, quantity: 'stress' }, 1100, 'us')).toBe('must be at least 29.01 ksi and at most 145 ksi, got 159.5 ksi');
    expect(said({ min: 100_000, max: 250_000, quantity: 'modulus' }, 300_000, 'us')).toBe('must be at least 14500 ksi and at most 36260 ksi, got 43510 ksi');
    expect(said({ min: 10, max: 120, quantity: 'concreteStress' }, 150, 'us')).toBe('must be at least 1450 psi and at most 17400 psi, got 21760 psi');
  });

  it('gives line loads in kip/ft and forces in kip (1 kip/ft = 14.593 903 N/mm; 1 kip = 4448.222 N)', () => {
    expect(said({ min: -1e4, max: 1e4, quantity: 'lineLoad' }, 2e4, 'us')).toBe('must be at least -685.2 kip/ft and at most 685.2 kip/ft, got 1370 kip/ft');
    expect(said({ min: -1e9, max: 1e9, quantity: 'force' }, 2e9, 'us')).toBe('must be at least -224800 kip and at most 224800 kip, got 449600 kip');
  });

  it('leaves counts and units that are the same in both systems alone', () => {
    expect(said({ min: 1, max: 100 }, 101, 'us')).toBe('must be at least 1 and at most 100, got 101');
    expect(said({ min: 0, max: 1200, unit: 'months' }, 1300, 'us')).toBe('must be at least 0 months and at most 1200 months, got 1300 months');
  });

  it('validates a US project with its messages in US units, and the same project in SI with SI units', () => {
    const us = editable('us');
    us.members[0].span = 70000;
    us.materials[2].yieldStress = 1100;
    const m = (p: unknown, path: string) => validateProjectData(p).diagnostics.find((d) => d.path === path)!.message;
    expect(m(us, 'members[0] "A".span')).toBe('must be greater than 0 ft and at most 196.9 ft, got 229.7 ft');
    expect(m(us, 'materials[2] "b500".yieldStress')).toBe('steel yield stress fy must be at least 29.01 ksi and at most 145 ksi, got 159.5 ksi');
    const si = { ...us, info: { ...us.info, unitSystem: 'si' } };
    expect(m(si, 'members[0] "A".span')).toBe('must be greater than 0 m and at most 60 m, got 70 m');
    expect(m(si, 'materials[2] "b500".yieldStress')).toBe('steel yield stress fy must be at least 200 MPa and at most 1000 MPa, got 1100 MPa');
  });
});

describe('sortDiagnostics', () => {
  it('orders by group then by item index, keeping the order within an item', () => {
    const d = (path: string): Diagnostic => ({ code: 'schema', path, message: path, severity: 'error' });
    const sorted = sortDiagnostics([d('members[10].a'), d('members[2].b'), d('sections[0]'), d('info.name'), d('members[2].a'), d('(file)')]);
    expect(sorted.map((x) => x.path)).toEqual(['(file)', 'info.name', 'sections[0]', 'members[2].b', 'members[2].a', 'members[10].a']);
  });
});

describe('the preferred strengthening scheme', () => {
  it('must name one of the member\'s schemes', () => {
    const base = demoProject();
    const withPreferred = (id: string) => ({ ...base, members: base.members.map((m) => (m.id === 'B-204' ? { ...m, preferredSchemeId: id } : m)) });
    expect(validateProjectData(JSON.parse(JSON.stringify(withPreferred('cfrp-2')))).diagnostics.filter((d) => d.path.includes('preferredSchemeId'))).toEqual([]);
    const wrong = validateProjectData(JSON.parse(JSON.stringify(withPreferred('frp-9')))).diagnostics.filter((d) => d.path.includes('preferredSchemeId'));
    expect(wrong).toEqual([{ code: 'unknown-reference', path: 'members[1] "B-204".preferredSchemeId', severity: 'error', message: 'must be the id of one of the member\'s schemes ("cfrp-2", "overlay-3"), got "frp-9"' }]);
  });
});
