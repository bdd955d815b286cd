export * from './channel-id';
export * from './run-sample';
export * from './run-file-header';
export * from './run-file-error';
export * from './read-run-file-options';
export * from './read-run-file';
export * from './preview-run-file';
export * from './import-profile';
