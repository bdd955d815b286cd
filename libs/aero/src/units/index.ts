export * from './nist-constants';
