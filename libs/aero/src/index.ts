/**
 * Tunnelwright's reduction engine: pure numerics, no framework.
 * Each folder has its own barrel; this file only gathers them.
 */
export * from './units';
export * from './errors';
export * from './air';
export * from './flow';
export * from './corrections';
export * from './reference-curves';
export * from './uncertainty';
export * from './wind';
export * from './run-file';
export * from './config';
export * from './balance';
export * from './axes';
export * from './reduction';
export * from './shapes';
export * from './planner';
