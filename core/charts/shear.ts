/**
 * Shear along the span: the demand under the factored combination and at the flexural mechanism
 * against the member's shear capacity (nominal and design) station by station, the stirrup zones
 * shaded and named, the stretches near the supports the check skips (ACI 318-19 9.4.3.2, EN
 * 1992-1-1 6.2.1(8)) marked, and the governing points. Everything comes from core/assessment's
 * ShearResult (`diagram`).
 *
 * Units: x mm → span unit (m / ft); shears N → force unit (kN / kip).
 */
import type { ShearResult } from '../assessment/shear.ts';
import { barDesignation } from '../section/bar-designations.ts';
import { formatQuantity } from '../units/format.ts';
import type { BandSpec, ChartPoint, ChartSpec, MarkerSpec, SeriesSpec, UnitsInput } from './types.ts';
import { axisFor, axisScale, display, finite, resolveUnits, unitFor, unitText } from './units.ts';

/** The code method of the capacity, in words. */
export function shearMethodText(code: ShearResult['code']): string {
  return code === 'ACI 318-19'
    ? 'ACI 318-19 22.5: Vn = Vc + Vs (Table 22.5.5.1, Eq. 22.5.8.5.3), φ = 0.75'
    : 'EN 1992-1-1 6.2: VRd,c (Eq. 6.2), VRd,s and VRd,max (Eqs. 6.8, 6.9), 1 ≤ cot θ ≤ 2.5';
}

/**
 * Chart spec of a member's shear diagram.
 * Degenerate cases: no diagram (shear not assessed) → `emptyMessage` with the reason.
 */
export function shearDiagramChart(shear: ShearResult | null | undefined, unitsInput: UnitsInput): ChartSpec {
  const units = resolveUnits(unitsInput);
  const aci = shear?.code !== 'EN 1992-1-1';
  const base: ChartSpec = {
    kind: 'shear-diagram',
    title: 'Shear along the span',
    subtitle: shear ? shearMethodText(shear.code) : '',
    x: axisFor('Position x', unitText('spanLength', units), 1, { includeZero: true }),
    y: axisFor('Shear |V|', unitText('force', units), 1, { includeZero: true }),
    series: [],
    markers: [],
    bands: [],
    referenceLines: [],
    notes: [],
  };
  const d = shear?.diagram;
  if (!shear || !d || d.x.length === 0) return { ...base, emptyMessage: `No shear diagram: ${shear ? 'the shear was not assessed' : 'no shear result'}.` };

  const xs = d.x.map((x) => display('spanLength', x, units));
  const forces = [...d.factored, ...(d.mechanism ?? []), ...d.nominal, ...d.design].map((v) => display('force', v, units));
  const xScale = axisScale(xs);
  const yScale = axisScale(forces);
  const X = (mm: number) => display('spanLength', mm, units) / xScale;
  const Y = (n: number) => display('force', n, units) / yScale;
  const line = (values: readonly number[], keep: (i: number) => boolean = () => true): ChartPoint[] => values.map((v, i) => (keep(i) && finite(X(d.x[i]!)) && finite(Y(v)) ? { x: X(d.x[i]!), y: Y(v) } : null));

  const designName = aci ? 'φVn' : 'VRd';
  const nominalName = aci ? 'Vn' : 'VRk (γ = 1)';
  const series: SeriesSpec[] = [
    { id: 'design', label: `design capacity ${designName}`, points: line(d.design), colour: 'green', style: 'solid', width: 1.8 },
    { id: 'nominal', label: `nominal capacity ${nominalName}`, points: line(d.nominal), colour: 'green', style: 'dotted', width: 1.4 },
    { id: 'factored', label: `factored demand (${shear.factored?.combination ?? 'strength combination'})`, points: line(d.factored), colour: 'blue', style: 'solid', width: 1.8 },
  ];
  if (d.mechanism) series.push({ id: 'mechanism', label: 'demand at the flexural mechanism', points: line(d.mechanism), colour: 'orange', style: 'dashed', width: 1.6 });

  // Stirrup zones: a band per run of one section, named by its stirrups.
  const bands: BandSpec[] = [];
  const spanText = (mm: number) => formatQuantity('sectionLength', mm, units.system, { unit: unitFor('sectionLength', units) });
  let start = 0;
  for (let i = 1; i <= d.x.length; i++) {
    if (i < d.x.length && d.sectionIds[i] === d.sectionIds[start]) continue;
    const cap = shear.capacities.find((c) => c.sectionId === d.sectionIds[start]);
    const s = cap?.stirrups;
    const size = s ? barDesignation(s.diameter, units.system) ?? spanText(s.diameter) : null;
    const label = s ? `${s.legs}-leg ${size} at ${spanText(s.spacing)}` : 'no stirrups';
    const k = bands.length;
    bands.push({ axis: 'x', from: X(d.x[start]!), to: X(d.x[i - 1]!), label, colour: k % 2 === 0 ? 'teal' : 'gold' });
    start = i;
  }
  // Near the supports: not checked (the shear at d governs there).
  let from: number | null = null;
  for (let i = 0; i <= d.x.length; i++) {
    const skipped = i < d.x.length && !d.checked[i];
    if (skipped && from === null) from = i;
    if (!skipped && from !== null) {
      bands.push({ axis: 'x', from: X(d.x[from]!), to: X(d.x[Math.min(i, d.x.length - 1)]!), label: 'within d: not checked', colour: 'grey' });
      from = null;
    }
  }

  const markers: MarkerSpec[] = [];
  const mark = (point: { position: number; shear: number } | undefined, text: string, colour: MarkerSpec['colour']) => {
    if (!point) return;
    const x = X(point.position);
    const y = Y(point.shear);
    if (finite(x) && finite(y)) markers.push({ x, y, label: text, shape: 'star', colour });
  };
  if (shear.factored) mark(shear.factored.governing, `governing, factored: V/${designName} = ${shear.factored.utilisation.toFixed(2)}`, shear.factored.pass ? 'blue' : 'red');
  if (shear.mechanism) mark(shear.mechanism.governing, `governing at the mechanism: V/${aci ? 'Vn' : 'VRk'} = ${shear.mechanism.nominalRatio.toFixed(2)}`, shear.governs === 'shear' ? 'red' : 'orange');

  return {
    ...base,
    // The axis ends at the span (the diagram's last station), as the member charts do.
    x: axisFor('Position x', unitText('spanLength', units), xScale, { min: 0, max: Math.max(...d.x.map((x) => X(x))) }),
    y: axisFor('Shear |V|', unitText('force', units), yScale, { includeZero: true }),
    series,
    markers,
    bands,
    notes: shear.governs === 'shear' ? ['Shear governs: the nominal shear strength is reached before the flexural mechanism.'] : [],
  };
}
