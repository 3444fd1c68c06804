// The engine's public surface: each module adds its own export line.
export * from './poly';
export * from './field';
export * from './rational';
export * from './errors';
export * from './factor';
export * from './matrix';
export * from './matrix-domains';
export * from './matrix-elimination';
export * from './charpoly';
export * from './spectrum';
export * from './roots';
export * from './numberfield';
export * from './kpoly';
export * from './multivariate';
export * from './symbolic';
export * from './algebraic';
export * from './radical';
