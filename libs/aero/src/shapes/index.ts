export * from './shape-entry';
export * from './rectangle-area';
export * from './circle-area';
export * from './shape-sources';
export * from './shape-library';
export * from './find-shape';
export * from './shape-area';
