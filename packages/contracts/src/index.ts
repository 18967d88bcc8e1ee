export * from './roles.schema';
export * from './errors.schema';
export * from './list.schema';
export * from './users.schema';
export * from './auth.schema';
export * from './health.schema';
