/** Display units: quantities, conversion (exact factors, NIST SP 811) and formatting. Internal units are SI (N, mm, MPa). */
export * from './factors.ts';
export * from './units.ts';
export * from './quantities.ts';
export * from './convert.ts';
export * from './format.ts';
export * from './phrase.ts';
