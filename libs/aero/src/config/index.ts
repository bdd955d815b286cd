export * from './reduction-config';
export * from './reduction-config-error';
export * from './parse-reduction-config';
