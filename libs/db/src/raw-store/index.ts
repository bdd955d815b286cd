export * from './raw-store';
export * from './raw-object-missing-error';
export * from './hash-stream';
export * from './fs-raw-store';
export * from './s3-raw-store';
export * from './create-raw-store';
