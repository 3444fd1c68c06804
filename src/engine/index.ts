// The engine's public surface: each module adds its own export line.
export * from './poly';
