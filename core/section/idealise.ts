/**
 * Bilinear idealisation of a moment–curvature curve (elastic branch through first yield, a yield
 * point and the ultimate point), by the method the project chooses.
 * Units: curvature 1/mm, moment N·mm.
 */
import type { BilinearIdealisation, BilinearMethod, CurvePoint, KeyPoint, KeyPointName } from './results.ts';

/** Area under the curve from 0 to φu by the trapezoid rule, N·mm/mm. */
function areaUnder(points: readonly CurvePoint[], upTo: number): number {
  let area = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    if (a.curvature >= upTo) break;
    const k1 = Math.min(b.curvature, upTo);
    const m1 = b.curvature > upTo ? a.moment + ((b.moment - a.moment) * (upTo - a.curvature)) / (b.curvature - a.curvature) : b.moment;
    area += 0.5 * (a.moment + m1) * (k1 - a.curvature);
  }
  return area;
}

/**
 * Bilinear idealisation of the curve.
 * - 'priestley-2007': elastic branch through first yield (φ′y, M′y) extended to the nominal moment
 *   Mn (at εc = 0.004 or εs = 0.015, or at ultimate if that comes first): φy = φ′y·Mn/M′y.
 *   @see Priestley, Calvi & Kowalsky (2007), Displacement-Based Seismic Design of Structures, §4.2 (from memory).
 * - 'equal-energy': same elastic slope, yield point chosen so that the bilinear curve encloses the
 *   same area as the computed curve up to φu (common practice, no source).
 */
export function idealise(points: readonly CurvePoint[], keyPoints: Partial<Record<KeyPointName, KeyPoint>>, method: BilinearMethod): BilinearIdealisation | undefined {
  const fy = keyPoints.firstYield;
  const u = keyPoints.ultimate;
  if (!fy || !u || !(fy.curvature > 0) || !(fy.moment > 0)) return undefined;
  const stiffness = fy.moment / fy.curvature;
  if (method === 'priestley-2007') {
    const nominal = keyPoints.nominal && keyPoints.nominal.curvature <= u.curvature ? keyPoints.nominal : u;
    const mn = nominal.moment;
    const phiY = fy.curvature * (mn / fy.moment);
    return {
      method,
      yieldCurvature: phiY,
      yieldMoment: mn,
      ultimateCurvature: u.curvature,
      ultimateMoment: u.moment,
      effectiveStiffness: stiffness,
      description: `Elastic branch through first yield extended to the nominal moment Mn${nominal === u ? ' (taken at ultimate, reached before εc = 0.004 or εs = 0.015)' : ''} (Priestley, Calvi & Kowalsky 2007).`,
    };
  }
  const area = areaUnder(points, u.curvature);
  const denominator = 0.5 * (stiffness * u.curvature - u.moment);
  if (!(denominator > 0)) return undefined;
  const phiY = Math.min((area - 0.5 * u.moment * u.curvature) / denominator, u.curvature);
  if (!(phiY > 0)) return undefined;
  return {
    method,
    yieldCurvature: phiY,
    yieldMoment: stiffness * phiY,
    ultimateCurvature: u.curvature,
    ultimateMoment: u.moment,
    effectiveStiffness: stiffness,
    description: 'Elastic branch through first yield; yield point chosen so that the bilinear curve encloses the same area as the computed curve up to ultimate.',
  };
}
