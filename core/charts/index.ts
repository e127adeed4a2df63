/**
 * Chart data builders shared by the app and the report (pure; display units; no plotting library),
 * the chart.js configuration built from them, and the scaled section drawing (SVG).
 */
export * from './types.ts';
export * from './units.ts';
export * from './palette.ts';
export * from './moment-curvature.ts';
export * from './load-deflection.ts';
export * from './span-distribution.ts';
export * from './section-profile.ts';
export * from './section-drawing.ts';
export * from './chartjs-config.ts';
export * from './retrofit.ts';
export * from './shear.ts';
export * from './service.ts';
