export * from './api-error.js';
export * from './users/user.schema.js';
export * from './auth/auth.schema.js';
