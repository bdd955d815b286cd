export * from './aero-input-error';
