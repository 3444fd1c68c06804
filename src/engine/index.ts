// The engine's public surface: each module adds its own export line.
export * from './poly';
export * from './field';
export * from './rational';
export * from './errors';
export * from './factor';
