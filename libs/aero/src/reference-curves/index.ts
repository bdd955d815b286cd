export type { ReynoldsRange } from './reynolds-range';
export * from './sphere-drag-morrison';
export * from './sphere-drag-morrison-book';
export * from './sphere-drag-clift-gauvin';
export * from './sphere-drag-white';
export * from './cylinder-drag-white';
export * from './critical-reynolds-number';
export * from './reference-curves';
export * from './sample-reference-curve';
