export * from './nist-constants';
export * from './unit-table';
export * from './angles';
