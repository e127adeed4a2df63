/**
 * The chart palette: a dark ink for axes and text and eight hues that stay apart in print and for
 * the common colour-vision deficiencies (hues chosen by us; markers also differ by shape and lines
 * by dash, so no information is carried by colour alone).
 */
import type { ChartColour, LineStyle } from './types.ts';

export const PALETTE: Readonly<Record<ChartColour, string>> = {
  ink: '#1b2733',
  blue: '#2364aa',
  orange: '#d2691e',
  green: '#2e8540',
  purple: '#7b4fa6',
  red: '#c0392b',
  grey: '#7b8794',
  teal: '#12857f',
  gold: '#b08a12',
};

/** Colours given to successive series of one chart. */
export const SERIES_COLOURS: readonly ChartColour[] = ['blue', 'orange', 'green', 'purple', 'teal', 'red', 'gold', 'grey'];

/** Dash pattern of a line style, in CSS pixels (empty: solid). */
export function dashPattern(style: LineStyle): number[] {
  switch (style) {
    case 'solid':
      return [];
    case 'dashed':
      return [6, 4];
    case 'dotted':
      return [1.5, 3];
  }
}

/** Colour as `rgba(…)` with the given opacity (0–1), for fills and bands. */
export function withOpacity(colour: ChartColour, opacity: number): string {
  const hex = PALETTE[colour];
  const r = parseInt(hex.slice(1, 3), 16);
  const g = parseInt(hex.slice(3, 5), 16);
  const b = parseInt(hex.slice(5, 7), 16);
  return `rgba(${r}, ${g}, ${b}, ${Math.min(1, Math.max(0, opacity))})`;
}
