export * from './relative-wind';
export * from './full-scale-drag-and-power';
export * from './wind-averaging-options';
export * from './wind-averaged-drag-coefficient';
export * from './maximum-yaw-angle';
export * from './yaw-sweep-interpolator';
export * from './wind-averaged-from-yaw-sweep';
