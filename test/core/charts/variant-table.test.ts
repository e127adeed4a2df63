/**
 * The comparison table of an existing beam (core/charts/variant-table.ts): one column per variant in
 * the order the charts draw them, each cell read from that variant's results, the strengthening
 * method's code checks as pass/fail with their numbers.
 */
import { describe, expect, it } from 'vitest';
import { analyzeProject } from '../../../core/analysis.ts';
import { shownVariants } from '../../../core/charts/retrofit.ts';
import { criticalOf, variantComparisonTable } from '../../../core/charts/variant-table.ts';
import { CORES_AND_DEFECTS, FRP_SCHEME, OVERLAY_SCHEME, retrofitProject } from '../retrofit/retrofit-project.ts';
import { formatNumber } from '../../../core/units/format.ts';

const project = retrofitProject('ACI 318-19', { asFound: CORES_AND_DEFECTS, schemes: [FRP_SCHEME, OVERLAY_SCHEME] });
const retrofit = analyzeProject(project).members[0]!.retrofit!;
const table = variantComparisonTable(retrofit, 'si', 'ACI 318-19');
const row = (id: string) => table.rows.find((r) => r.id === id)!;
const column = (key: string) => table.variants.findIndex((v) => v.key === key);

describe('the comparison table of an existing beam', () => {
  it('has a column per variant, in the order of the charts', () => {
    expect(table.variants.map((v) => v.key)).toEqual(shownVariants(retrofit).map((v) => v.key));
    for (const r of table.rows) expect(r.cells).toHaveLength(table.variants.length);
  });

  it('compares at the section and direction that govern the beam as found', () => {
    const strength = retrofit.asFound!.variant!.strength!;
    expect(table.direction).toBe(strength.direction);
    expect(criticalOf(retrofit).baseSectionId).toBe('r1');
    expect(row('resistance').label).toBe('φMn of the section');
  });

  it('prints each variant\'s own results: status, strength utilisation, and a scheme\'s gain in load capacity', () => {
    for (const v of table.variants) {
      const i = column(v.key);
      expect(row('status').cells[i]!.status).toBe(v.variant.status);
      expect(row('strength').cells[i]!.text).toBe(v.variant.strength!.utilisation.toFixed(2));
      expect(row('strength').cells[i]!.verdict).toBe(v.variant.strength!.pass ? 'pass' : 'fail');
    }
    const overlay = retrofit.schemes.find((s) => s.schemeId === 'ov75')!;
    const gain = overlay.comparison!.memberCapacity.gainPercent!;
    expect(row('capacity').cells[column('ov75')]!.detail).toBe(`${gain >= 0 ? '+' : '−'}${Math.abs(gain).toFixed(0)} %`);
    // The design and as-found beams have no gain of their own.
    expect(row('capacity').cells[column('as-found')]!.detail).toBeUndefined();
  });

  it('gives the rotation capacity of the critical hinge of every variant, the design beam too', () => {
    const cells = row('rotation').cells;
    expect(cells.every((c) => /mrad$/.test(c.text))).toBe(true);
    const frp = retrofit.schemes.find((s) => s.schemeId === 'frp2')!;
    // The same hinge the scheme comparison names: θp,u in mrad.
    // (engineering significant figures, as every quantity prints: 4 when the number starts with a 1)
    expect(cells[column('frp2')]!.text).toBe(`${formatNumber(frp.comparison!.hingeRotation.scheme! * 1000)} mrad`);
  });

  it('lists the strengthening method\'s code checks per scheme; a variant without the check shows a dash', () => {
    const checks = table.rows.filter((r) => r.group === 'checks');
    expect(checks.map((r) => r.id)).toContain('check-steel-service-stress');
    const steel = row('check-steel-service-stress');
    expect(steel.hint).toMatch(/ACI 440\.2R-17/);
    expect(steel.cells[column('as-found')]!.text).toBe('—');
    const frpCheck = retrofit.schemes.find((s) => s.schemeId === 'frp2')!.checks.find((c) => c.id === 'steel-service-stress')!;
    expect(steel.cells[column('frp2')]!.text).toBe(frpCheck.pass ? 'passes' : 'fails');
    // ACI 440.2R-17 Eq. (10.2.8.1a) (from memory): the steel stress at service is limited to 0.80 fy,
    // fy being the tested 520 MPa of the coupons.
    expect(steel.cells[column('frp2')]!.detail).toMatch(/ \/ 416 MPa$/);
  });

  it('writes the same table in US units when asked', () => {
    const us = variantComparisonTable(retrofit, 'us', 'ACI 318-19');
    expect(us.rows.find((r) => r.id === 'resistance')!.cells[0]!.text).toMatch(/kip·ft$/);
    // 416 MPa = 60.3 ksi (1 ksi = 6.894757 MPa)
    expect(us.rows.find((r) => r.id === 'check-steel-service-stress')!.cells[column('frp2')]!.detail).toMatch(/ \/ 60\.3 ksi$/);
  });
});

describe('a variant outside the small-deflection range (issue 17)', () => {
  // The fixture beam as found, but 20 m long: its service deflections pass span/50 (400 mm).
  const long = retrofitProject('ACI 318-19', { span: 20000, zones: [{ from: 0, to: 20000, sectionId: 'r1' }], asFound: { cores: [{ meanStrength: 27, count: 4, coefficientOfVariation: 0.12 }] } });
  const r = analyzeProject(long).members[0]!.retrofit!;
  const t = variantComparisonTable(r, 'si', 'ACI 318-19');
  const cell = (id: string, key: string) => t.rows.find((x) => x.id === id)!.cells[t.variants.findIndex((v) => v.key === key)]!;

  it('the deflection cell says so in words and fails, never a number', () => {
    for (const key of ['original', 'as-found']) {
      const d = cell('deflection', key);
      expect(d.text).toBe('outside the method\'s range');
      expect(d.verdict).toBe('fail');
      expect(d.note).toMatch(/^Service deflections: outside the small-deflection range of the method/);
    }
  });
});
