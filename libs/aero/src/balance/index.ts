export * from './invert-matrix';
export * from './interaction-terms';
export * from './balance-convergence-error';
export * from './balance-calibration';
export * from './transfer-moments';
export * from './bilinear-tare';
