export * from './nist-constants';
export * from './unit-table';
