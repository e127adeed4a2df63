/**
 * Continuous members in the command line's outputs: a table (one row per member, the governing span
 * named) and their JSON summary. Pure functions from results to text; units converted for display.
 */
import type { StationCheck } from '../../core/assessment/continuous.ts';
import { deflectionSense, governingDeflection, type ContinuousMemberResult } from '../../core/assessment/continuous-verdict.ts';
import type { UnitSystem } from '../../core/project/types.ts';
import { displaySystem, NOT_A_VALUE, say, toDisplay, unitLabel } from '../../core/units/index.ts';
import { fixedQuantityText, ratioText, renderTable, wrap, type Style } from './format.ts';

/** Words for a continuous member's status (never a plain OK: see core/assessment/continuous-verdict.ts). */
const STATUS: Readonly<Record<ContinuousMemberResult['verdict']['status'], string>> = {
  'check-fails': 'check fails',
  'not-converged': 'not converged',
  'input-error': 'input error',
  review: 'review',
  brittle: 'brittle',
  ok: 'ok',
};

/** The continuous members' table with each member's governing mode below it. */
export function continuousTable(results: readonly ContinuousMemberResult[], system: UnitSystem, width: number, style: Style = { enabled: false }): string {
  if (results.length === 0) return '';
  const s = displaySystem(system);
  const columns = [
    { header: 'Continuous member', unit: '', align: 'left' as const },
    { header: 'Spans', unit: unitLabel('spanLength', s), align: 'left' as const },
    { header: 'Governing', unit: '', align: 'left' as const },
    { header: 'M/φMn', unit: '', align: 'right' as const },
    { header: 'V/φVn', unit: '', align: 'right' as const },
    { header: 'Hinges', unit: '', align: 'right' as const },
    { header: 'Pu/Pfactored', unit: '', align: 'right' as const },
    { header: 'μΔ', unit: '', align: 'right' as const },
    { header: 'Δ', unit: unitLabel('deflection', s), align: 'right' as const },
    { header: 'Δ/limit', unit: '', align: 'right' as const },
    { header: 'Status', unit: '', align: 'left' as const },
  ];
  const rows = results.map((r) => {
    const g = governingDeflection(r);
    const spans = r.parts.map((p) => `${p.kind === 'span' ? '' : 'c'}${toDisplay('spanLength', p.to - p.from, s).toFixed(s === 'US' ? 1 : 2)}`).join(' + ');
    return [
      r.memberName === r.memberId || r.memberName === '' ? r.memberId : `${r.memberName} (${r.memberId})`,
      spans || NOT_A_VALUE,
      r.verdict.governingSpan ?? NOT_A_VALUE,
      ratioText(r.verdict.strengthUtilisation, 2),
      ratioText(r.verdict.shearUtilisation, 2),
      String(r.capacity?.hinges.length ?? 0),
      ratioText(r.verdict.collapseRatio, 2),
      ratioText(r.verdict.ductilityAvailable ? r.capacity?.displacementDuctility : null),
      g ? `${fixedQuantityText('deflection', deflectionSense(g.check.governing).magnitude, system)}${deflectionSense(g.check.governing).sense}` : NOT_A_VALUE,
      g ? ratioText(g.check.utilisation, 2) : NOT_A_VALUE,
      STATUS[r.verdict.status],
    ];
  });
  const notes = results.map((r) => {
    const label = `${r.memberName}: `;
    const lines = [wrap(`${label}${say(r.verdict.governingMode, system)}`, width, label.length)];
    for (const w of r.warnings) lines.push(wrap(`  warning: ${say(w, system)}`, width, 11));
    for (const e of r.errors) lines.push(wrap(`  error: ${e.path}: ${say(e.message, system)}`, width, 9));
    return lines.join('\n');
  });
  return `\n${renderTable(columns, rows, style)}\n(c = cantilever; M/φMn, V/φVn: largest utilisation of the code checks at the stations (M/M_Rd, V/VRd under EN 1992-1-1); Pu/Pfactored: largest load of the analysis to failure over the factored loads of the same arrangement)\n\n${notes.join('\n')}\n`;
}

/** A station of the code checks in the JSON summary (internal SI units, named). */
function stationJson(p: StationCheck): unknown {
  return { part: p.part, positionInPartMm: p.s, positionMm: p.x, sectionId: p.sectionId, direction: p.direction, demand: p.demand, resistance: p.resistance, utilisation: p.utilisation, combination: p.combination, arrangement: p.arrangement };
}

/** JSON summary of the continuous members (internal SI units, named). */
export function continuousJson(results: readonly ContinuousMemberResult[], system: UnitSystem): unknown[] {
  return results.map((r) => {
    const g = governingDeflection(r);
    return {
      id: r.memberId,
      name: r.memberName,
      status: r.verdict.status,
      governingSpan: r.verdict.governingSpan,
      governingMode: say(r.verdict.governingMode, system),
      strength: r.checks ? { utilisation: r.checks.flexure.utilisation, pass: r.checks.flexure.pass, governing: stationJson(r.checks.flexureGoverning) } : null,
      shear: r.checks ? { utilisation: r.checks.shear.utilisation, pass: r.checks.shear.pass, governing: stationJson(r.checks.shear.governing), governs: r.checks.shear.governs } : null,
      brittle: (r.checks?.brittle ?? []).map((b) => ({ cause: b.cause, text: say(b.text, system) })),
      parts: r.parts.map((p) => ({ name: p.name, lengthMm: p.to - p.from })),
      collapseOverFactored: r.verdict.collapseRatio,
      displacementDuctility: r.verdict.ductilityAvailable ? r.capacity?.displacementDuctility ?? null : null,
      hinges: (r.capacity?.hinges ?? []).map((h) => ({ order: h.order, part: h.part, positionMm: h.position, direction: h.direction, loadFactor: h.loadFactor, rotationRad: h.rotation, capacityRad: h.rotationCapacity })),
      // valueMm signed, downward positive; direction names it (the limit applies to the magnitude).
      deflection: g ? { part: g.part, limitCase: g.check.limitCase, valueMm: g.check.governing, direction: g.check.governing < 0 ? 'upward' : 'downward', limitMm: g.check.limit, utilisation: g.check.utilisation, arrangement: g.check.arrangement } : null,
      // Every span's and cantilever's service deflections, mm, signed (downward positive): by integration and by the code method.
      serviceDeflections: (r.service?.parts ?? []).map((p) => ({ part: p.name, arrangement: p.arrangement, integrationMm: p.integration, codeMm: p.code, checks: p.checks.map((c) => ({ limitCase: c.limitCase, valueMm: c.governing, direction: c.governing < 0 ? 'upward' : 'downward', limitMm: c.limit, utilisation: c.utilisation, pass: c.pass, arrangement: c.arrangement })) })),
      redistribution: r.redistribution.map((x) => ({ support: x.support, usedPercent: x.usedPercent, permittedPercent: x.permitted.percent, clause: x.permitted.clause })),
      warnings: r.warnings.map((w) => say(w, system)),
      errors: r.errors.map((e) => ({ path: e.path, message: say(e.message, system) })),
    };
  });
}
