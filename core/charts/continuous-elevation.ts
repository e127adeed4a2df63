/**
 * The report's elevation of a continuous member (core/assessment/continuous-verdict.ts results):
 * spans and cantilevers to scale, supports by kind and numbered, zones of sections, plastic hinges
 * numbered in order of formation (above the beam hogging, below sagging) — an SVG drawing. The
 * report's envelopes are continuous.ts `continuousEnvelopeChart` with the code's design option.
 * Units: x mm → span unit (m / ft).
 */
import type { ContinuousMemberResult } from '../assessment/continuous-verdict.ts';
import type { ContinuousSupport } from '../continuous/definition.ts';
import { formatQuantity } from '../units/format.ts';
import { PALETTE } from './palette.ts';
import type { UnitsInput } from './types.ts';
import { resolveUnits, unitFor } from './units.ts';

export interface ElevationDrawing {
  readonly svg: string;
  readonly width: number;
  readonly height: number;
  /** What the drawing shows, in words (caption and text alternative). */
  readonly caption: string;
}

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/**
 * The elevation of a continuous member as an SVG drawing `width` points wide: the beam to scale
 * along its length (not in depth), zones shaded by section, supports drawn by kind (pinned: a
 * triangle; fixed: a hatched block; column: the column above and/or below) and numbered, spans
 * and cantilevers dimensioned, hinges numbered in order of formation.
 */
export function continuousElevationSvg(result: ContinuousMemberResult, supports: readonly ContinuousSupport[], zones: readonly { readonly from: number; readonly to: number; readonly sectionId: string }[], unitsInput: UnitsInput, options: { width: number; fontFamily?: string; fontSize?: number }): ElevationDrawing {
  const units = resolveUnits(unitsInput);
  const font = options.fontFamily ?? 'Roboto';
  const fs = options.fontSize ?? 7.5;
  const width = options.width;
  const height = 150;
  const length = result.parts.length > 0 ? result.parts[result.parts.length - 1]!.to : 0;
  const margin = 24;
  const X = (mm: number) => margin + (length > 0 ? ((width - 2 * margin) * mm) / length : 0);
  const beamTop = 62;
  const beamBottom = 72;
  const out: string[] = [];
  const text = (x: number, y: number, s: string, anchor: 'start' | 'middle' | 'end' = 'middle', colour = PALETTE.ink, size = fs, bold = false) =>
    out.push(`<text x="${x.toFixed(2)}" y="${y.toFixed(2)}" font-family="${esc(font)}" font-size="${size}" text-anchor="${anchor}" fill="${colour}"${bold ? ' font-weight="bold"' : ''}>${esc(s)}</text>`);
  const spanText = (mm: number) => formatQuantity('spanLength', mm, units.system, { unit: unitFor('spanLength', units) });

  // Zones: shaded alternately, the section named under the beam when there is room.
  const ids = [...new Set(zones.map((z) => z.sectionId))];
  const fills = ['#dfe6ee', '#c5d3e2', '#eef1f4', '#b8c7d8'];
  zones.forEach((z) => {
    const k = ids.indexOf(z.sectionId) % fills.length;
    out.push(`<rect x="${X(z.from).toFixed(2)}" y="${beamTop}" width="${Math.max(0, X(z.to) - X(z.from)).toFixed(2)}" height="${beamBottom - beamTop}" fill="${fills[k]}" stroke="${PALETTE.ink}" stroke-width="0.4"/>`);
    const w = X(z.to) - X(z.from);
    if (w > fs * 0.55 * z.sectionId.length + 4) text((X(z.from) + X(z.to)) / 2, beamBottom + 42, z.sectionId, 'middle', PALETTE.grey, fs - 1);
  });
  out.push(`<rect x="${X(0).toFixed(2)}" y="${beamTop}" width="${(X(length) - X(0)).toFixed(2)}" height="${beamBottom - beamTop}" fill="none" stroke="${PALETTE.ink}" stroke-width="1"/>`);

  // Supports.
  result.supportX.forEach((xs, i) => {
    const x = X(xs);
    const s = supports[i];
    if (s?.kind === 'fixed') {
      out.push(`<rect x="${(x - 5).toFixed(2)}" y="${beamBottom}" width="10" height="9" fill="${PALETTE.grey}" stroke="${PALETTE.ink}" stroke-width="0.6"/>`);
      for (let k = 0; k < 4; k++) out.push(`<line x1="${(x - 5 + 2.5 * k).toFixed(2)}" y1="${beamBottom + 9}" x2="${(x - 2.5 + 2.5 * k).toFixed(2)}" y2="${beamBottom + 13}" stroke="${PALETTE.ink}" stroke-width="0.5"/>`);
    } else if (s?.kind === 'column') {
      if (s.below) out.push(`<rect x="${(x - 3).toFixed(2)}" y="${beamBottom}" width="6" height="16" fill="#eef1f4" stroke="${PALETTE.ink}" stroke-width="0.6"/>`);
      if (s.above) out.push(`<rect x="${(x - 3).toFixed(2)}" y="${beamTop - 16}" width="6" height="16" fill="#eef1f4" stroke="${PALETTE.ink}" stroke-width="0.6"/>`);
      if (!s.below) out.push(`<path d="M ${x.toFixed(2)} ${beamBottom} l -5 9 l 10 0 z" fill="none" stroke="${PALETTE.ink}" stroke-width="0.8"/>`);
    } else {
      out.push(`<path d="M ${x.toFixed(2)} ${beamBottom} l -5 9 l 10 0 z" fill="none" stroke="${PALETTE.ink}" stroke-width="0.8"/>`);
    }
    out.push(`<circle cx="${x.toFixed(2)}" cy="${beamBottom + 21}" r="${(fs * 0.75).toFixed(2)}" fill="white" stroke="${PALETTE.grey}" stroke-width="0.6"/>`);
    text(x, beamBottom + 21 + fs * 0.35, String(i + 1), 'middle', PALETTE.grey, fs - 1);
  });

  // Spans and cantilevers dimensioned above the beam.
  const dimY = 24;
  for (const p of result.parts) {
    const a = X(p.from);
    const b = X(p.to);
    out.push(`<line x1="${a.toFixed(2)}" y1="${dimY}" x2="${b.toFixed(2)}" y2="${dimY}" stroke="${PALETTE.grey}" stroke-width="0.5"/>`);
    for (const e of [a, b]) out.push(`<line x1="${e.toFixed(2)}" y1="${dimY - 3}" x2="${e.toFixed(2)}" y2="${dimY + 3}" stroke="${PALETTE.grey}" stroke-width="0.5"/>`);
    const label = `${p.name}: ${spanText(p.to - p.from)}`;
    text((a + b) / 2, dimY - 4, b - a > fs * 0.5 * label.length ? label : spanText(p.to - p.from), 'middle', PALETTE.ink, fs);
  }

  // Hinges in order of formation: hogging above the beam, sagging below.
  const hinges = result.capacity?.hinges ?? [];
  const r = fs * 0.8;
  for (const h of hinges) {
    // Two hinges at one support (one each side at a column or fixed support) sit side by side.
    const part = result.parts.find((p) => p.name === h.part);
    const atSupport = result.supportX.some((xs) => Math.abs(xs - h.position) < 1e-6);
    const shift = !atSupport || !part ? 0 : Math.abs(part.to - h.position) < 1e-6 ? -1.1 * r : Math.abs(part.from - h.position) < 1e-6 ? 1.1 * r : 0;
    const x = X(h.position) + shift;
    const y = h.direction === 'hogging' ? beamTop - 9 : beamBottom + 9;
    const colour = h.direction === 'hogging' ? PALETTE.red : PALETTE.blue;
    out.push(`<circle cx="${x.toFixed(2)}" cy="${y}" r="${r.toFixed(2)}" fill="${colour}" stroke="white" stroke-width="0.6"/>`);
    text(x, y + fs * 0.35, String(h.order), 'middle', 'white', fs - 0.5, true);
  }
  text(margin, height - 8, hinges.length > 0 ? 'Hinges (filled circles) numbered in order of formation: above the beam hogging, below sagging. Supports numbered in circles; shading: sections.' : 'No plastic hinge formed. Supports numbered in circles; shading: sections.', 'start', PALETTE.grey, fs - 1);
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">${out.join('')}</svg>`;
  const caption = `Elevation of ${result.memberName} (lengths to scale, depth not): ${result.parts.map((p) => `${p.name} ${spanText(p.to - p.from)}`).join(', ')}; ${hinges.length} hinge${hinges.length === 1 ? '' : 's'} in order of formation.`;
  return { svg, width, height, caption };
}
