/**
 * Cross-section shapes as the user describes them, and their outline polygons.
 * Coordinates in mm: x to the right from the left edge of the bounding box, y DOWNWARD from the
 * top fibre (so y is a depth). Polygons are listed counter-clockwise or clockwise; only their
 * area and chord widths matter.
 */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/** Every shape kind, in menu order. */
export const SHAPE_KINDS = ['rectangle', 'tee', 'inverted-tee', 'ell', 'i-shape', 'box', 'polygon'] as const;

/** The side of an ell's flange. */
export const FLANGE_SIDES = ['left', 'right'] as const;
export type FlangeSide = (typeof FLANGE_SIDES)[number];

export type SectionShape =
  | { readonly kind: 'rectangle'; readonly width: number; readonly height: number }
  /** Flange at the top (slab acting with a beam in sagging). */
  | { readonly kind: 'tee'; readonly height: number; readonly webWidth: number; readonly flangeWidth: number; readonly flangeThickness: number }
  /** Flange at the bottom. */
  | { readonly kind: 'inverted-tee'; readonly height: number; readonly webWidth: number; readonly flangeWidth: number; readonly flangeThickness: number }
  /** Flange at the top on one side of the web only (edge or spandrel beam). */
  | { readonly kind: 'ell'; readonly height: number; readonly webWidth: number; readonly flangeWidth: number; readonly flangeThickness: number; readonly flangeSide: FlangeSide }
  | {
      readonly kind: 'i-shape';
      readonly height: number;
      readonly webWidth: number;
      readonly topFlangeWidth: number;
      readonly topFlangeThickness: number;
      readonly bottomFlangeWidth: number;
      readonly bottomFlangeThickness: number;
    }
  | { readonly kind: 'box'; readonly height: number; readonly width: number; readonly topThickness: number; readonly bottomThickness: number; readonly wallThickness: number }
  /** A general outline with optional voids (holes), e.g. a haunched or chamfered section. */
  | { readonly kind: 'polygon'; readonly outline: readonly Point[]; readonly voids?: readonly (readonly Point[])[] };

export type ShapeKind = SectionShape['kind'];

// The list and the union name the same kinds: a kind added to one and not the other fails to compile.
const _shapeKindsComplete: [ShapeKind, (typeof SHAPE_KINDS)[number]] extends [(typeof SHAPE_KINDS)[number], ShapeKind] ? true : never = true;
void _shapeKindsComplete;

export interface ShapeOutline {
  readonly outline: readonly Point[];
  readonly voids: readonly (readonly Point[])[];
}

function rect(x0: number, y0: number, x1: number, y1: number): Point[] {
  return [
    { x: x0, y: y0 },
    { x: x1, y: y0 },
    { x: x1, y: y1 },
    { x: x0, y: y1 },
  ];
}

/** Outline polygon (and voids) of a shape, in mm, y downward from the top. */
export function shapeOutline(shape: SectionShape): ShapeOutline {
  switch (shape.kind) {
    case 'rectangle':
      return { outline: rect(0, 0, shape.width, shape.height), voids: [] };
    case 'tee': {
      const { height: h, webWidth: bw, flangeWidth: bf, flangeThickness: hf } = shape;
      const x0 = (bf - bw) / 2;
      return {
        outline: [
          { x: 0, y: 0 }, { x: bf, y: 0 }, { x: bf, y: hf }, { x: x0 + bw, y: hf },
          { x: x0 + bw, y: h }, { x: x0, y: h }, { x: x0, y: hf }, { x: 0, y: hf },
        ],
        voids: [],
      };
    }
    case 'inverted-tee': {
      const { height: h, webWidth: bw, flangeWidth: bf, flangeThickness: hf } = shape;
      const x0 = (bf - bw) / 2;
      return {
        outline: [
          { x: x0, y: 0 }, { x: x0 + bw, y: 0 }, { x: x0 + bw, y: h - hf }, { x: bf, y: h - hf },
          { x: bf, y: h }, { x: 0, y: h }, { x: 0, y: h - hf }, { x: x0, y: h - hf },
        ],
        voids: [],
      };
    }
    case 'ell': {
      const { height: h, webWidth: bw, flangeWidth: bf, flangeThickness: hf } = shape;
      const points: Point[] = [
        { x: 0, y: 0 }, { x: bf, y: 0 }, { x: bf, y: hf }, { x: bw, y: hf }, { x: bw, y: h }, { x: 0, y: h },
      ];
      // Mirror for a flange on the left: web at the right edge.
      return {
        outline: shape.flangeSide === 'right' ? points : points.map((p) => ({ x: bf - p.x, y: p.y })),
        voids: [],
      };
    }
    case 'i-shape': {
      const { height: h, webWidth: bw, topFlangeWidth: bt, topFlangeThickness: tt, bottomFlangeWidth: bb, bottomFlangeThickness: tb } = shape;
      const width = Math.max(bt, bb, bw);
      const xt = (width - bt) / 2;
      const xb = (width - bb) / 2;
      const xw = (width - bw) / 2;
      return {
        outline: [
          { x: xt, y: 0 }, { x: xt + bt, y: 0 }, { x: xt + bt, y: tt }, { x: xw + bw, y: tt },
          { x: xw + bw, y: h - tb }, { x: xb + bb, y: h - tb }, { x: xb + bb, y: h }, { x: xb, y: h },
          { x: xb, y: h - tb }, { x: xw, y: h - tb }, { x: xw, y: tt }, { x: xt, y: tt },
        ],
        voids: [],
      };
    }
    case 'box': {
      const { height: h, width: b, topThickness: tt, bottomThickness: tb, wallThickness: tw } = shape;
      return { outline: rect(0, 0, b, h), voids: [rect(tw, tt, b - tw, h - tb)] };
    }
    case 'polygon':
      return { outline: shape.outline.map((p) => ({ x: p.x, y: p.y })), voids: (shape.voids ?? []).map((v) => v.map((p) => ({ x: p.x, y: p.y }))) };
  }
}
