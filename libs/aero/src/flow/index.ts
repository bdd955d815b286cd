export * from './dynamic-pressure';
export * from './speed-from-dynamic-pressure';
export * from './reynolds-number';
export * from './mach-number';
