/** The core's public surface: build a checker, and the plain data it returns. */
export { createChecker, type CheckerParts } from './checker';
export type { Checker, CheckOptions, DecomposeResult, MatrixDescription } from './api';
export * from './types';
