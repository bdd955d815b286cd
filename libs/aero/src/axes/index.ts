export * from './body-to-wind-axes';
export * from './sideslip-from-yaw';
