/**
 * Chart specifications: what a chart shows, independent of any plotting library.
 *
 * Builders in core/charts turn analysis results (internal units: N, mm, N·mm, 1/mm) into a
 * `ChartSpec` whose every number is already in DISPLAY units (core/units), with axis labels that
 * name the unit. `toChartJsConfig` (chartjs-config.ts) turns a spec into a chart.js configuration;
 * the desktop app (DOM canvas) and the report (Node canvas) both draw from that one function, so
 * the same chart looks the same everywhere.
 *
 * Specs are plain, serialisable data (no functions, no NaN or Infinity: builders drop points that
 * are not finite).
 */
import type { Quantity, UnitSystem } from '../units/quantities.ts';
import type { StrainStyle } from '../units/format.ts';
import type { UnitId } from '../units/units.ts';

/** One point in display units; `null` marks a gap in a line (the line is broken there). */
export type ChartPoint = { readonly x: number; readonly y: number } | null;

/** Named colours of the chart palette (palette.ts gives the values). */
export type ChartColour = 'ink' | 'blue' | 'orange' | 'green' | 'purple' | 'red' | 'grey' | 'teal' | 'gold';

export type LineStyle = 'solid' | 'dashed' | 'dotted';

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'star';

export interface AxisSpec {
  /** Full label with its unit, e.g. `Curvature φ (1/m)`. */
  readonly label: string;
  /** Display unit label alone, e.g. `1/m` (empty for pure numbers). */
  readonly unit: string;
  /** Factor the plotted numbers were divided by (a power of ten, shown in the label), 1 when none. */
  readonly scale: number;
  /** Draw the axis reversed (depth downward, deflection downward). */
  readonly reverse?: boolean;
  /** Include zero in the range. */
  readonly includeZero?: boolean;
  /** Optional fixed range, display units (after `scale`). */
  readonly min?: number;
  readonly max?: number;
  /** Axis placement; a secondary x axis goes on top, a secondary y axis on the right. */
  readonly position?: 'bottom' | 'top' | 'left' | 'right';
  /**
   * Panel of a chart with stacked y axes (e.g. moment above curvature along the span): axes with
   * the same `stack` share the height, in proportion to `stackWeight` (default 1).
   */
  readonly stack?: string;
  readonly stackWeight?: number;
  /**
   * Empty margin inside each end of a panel of stacked x axes, as a fraction of its data range
   * (display units), so that the end tick labels of neighbouring panels do not meet. Ticks stay
   * at round values.
   */
  readonly panelMargin?: number;
  /**
   * Named steps instead of numbers: the axis runs over 0 … n − 1 (with half a step beyond each
   * end) and each whole value is labelled by its name (lines of one label as an array).
   */
  readonly categories?: readonly (string | readonly string[])[];
}

export interface SeriesSpec {
  readonly id: string;
  /** Legend text. */
  readonly label: string;
  readonly points: readonly ChartPoint[];
  readonly colour: ChartColour;
  readonly style: LineStyle;
  /** Line width in CSS pixels (points in the report). Default 1.6. */
  readonly width?: number;
  /** Axes the series is plotted against (default 'x' and 'y'). */
  readonly xAxis?: 'x' | 'x2';
  readonly yAxis?: 'y' | 'y2';
  /** Fill between the line and zero (used for stress blocks). */
  readonly fill?: boolean;
  /** Leave the series out of the legend. */
  readonly hideInLegend?: boolean;
}

export interface MarkerSpec {
  readonly x: number;
  readonly y: number;
  /** Short text drawn beside the marker (empty: no text). */
  readonly label: string;
  readonly shape: MarkerShape;
  readonly colour: ChartColour;
  readonly xAxis?: 'x' | 'x2';
  readonly yAxis?: 'y' | 'y2';
}

/** A shaded range of one axis (e.g. a plastic hinge zone along the span). */
export interface BandSpec {
  readonly axis: 'x' | 'y';
  readonly from: number;
  readonly to: number;
  readonly label: string;
  readonly colour: ChartColour;
}

/** A straight reference line across the plot at a fixed value of one axis. */
export interface ReferenceLineSpec {
  readonly axis: 'x' | 'y';
  readonly value: number;
  readonly label: string;
  readonly colour: ChartColour;
  readonly style: LineStyle;
}

export type ChartKind = 'moment-curvature' | 'load-deflection' | 'span-distribution' | 'span-panels' | 'strain-profile' | 'stress-profile' | 'shear-diagram' | 'service-deflection';

export interface ChartSpec {
  readonly kind: ChartKind;
  readonly title: string;
  /** One short line under the title (load level, section, direction), or empty. */
  readonly subtitle: string;
  readonly x: AxisSpec;
  readonly y: AxisSpec;
  /** Secondary axes (steel stress on top of a stress profile). */
  readonly x2?: AxisSpec;
  readonly y2?: AxisSpec;
  readonly series: readonly SeriesSpec[];
  readonly markers: readonly MarkerSpec[];
  readonly bands: readonly BandSpec[];
  readonly referenceLines: readonly ReferenceLineSpec[];
  /** Set when there is nothing to plot: the reason, drawn in place of the plot. */
  readonly emptyMessage?: string;
  /** Short notes printed with the chart (e.g. "the analysis did not converge beyond λ = 4.75"). */
  readonly notes: readonly string[];
}

/**
 * The display units a chart is drawn in: a unit system and optional per-quantity choices
 * (e.g. moments in kip·in instead of kip·ft). Strains are shown per mille unless told otherwise.
 */
export interface DisplayUnits {
  readonly system: UnitSystem;
  readonly overrides?: Partial<Record<Quantity, UnitId>>;
  readonly strainStyle?: StrainStyle;
}

/** What chart builders accept for units: a system name ('SI' / 'US', or the project file's 'si' / 'us') or full display units. */
export type UnitsInput = UnitSystem | 'si' | 'us' | DisplayUnits;
