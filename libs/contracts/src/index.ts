export * from './roles';
export * from './problem';
export * from './auth';
export * from './users';
export * from './catalogue';
export * from './audit';
export * from './mailbox';
export * from './paging';
