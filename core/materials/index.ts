/**
 * Material laws for section analysis. Sign convention (types.ts): strain and stress positive in
 * compression for every material. Units: MPa, strain dimensionless, mm.
 */
export type * from './types.ts';
export * from './specs.ts';
export * from './factory.ts';
export * from './checks.ts';
export * from './code/aci318.ts';
export * from './code/en1992.ts';
export * from './concrete/combine.ts';
export * from './concrete/hognestad.ts';
export * from './concrete/modified-kent-park.ts';
export * from './concrete/mander.ts';
export * from './concrete/mander-confinement.ts';
export * from './concrete/popovics.ts';
export * from './concrete/thorenfeldt-collins.ts';
export * from './concrete/en1992-nonlinear.ts';
export * from './concrete/en1992-parabola-rectangle.ts';
export * from './concrete/tension.ts';
export * from './steel/elastic-plastic.ts';
export * from './steel/bilinear.ts';
export * from './steel/park-paulay.ts';
export * from './steel/mander-power.ts';
export * from './steel/symmetric-steel.ts';
export * from './frp/linear-frp.ts';
