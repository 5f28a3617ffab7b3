export * from './database.js';
export * from './connection.js';
export {
  migrateToLatest,
  migrateDownToEmpty,
  listMigrations,
  migrationFolder,
  MigrationError,
} from './migrate.js';
export { seed, listSeeds, seedFolder } from './seed.js';
export { hashPassword, verifyPassword } from './passwords.js';
export { demoUsers, DEMO_PASSWORD, type DemoUser } from './demo-users.js';
export { seedDemoUsers } from './seed-demo-users.js';
export {
  isPostgresError,
  isConnectionError,
  PG_UNIQUE_VIOLATION,
  PG_FOREIGN_KEY_VIOLATION,
  PG_CHECK_VIOLATION,
} from './pg-errors.js';
export type * from './sheet-tables.js';
export type * from './review-tables.js';
export type * from './account-tables.js';
export type * from './field-record-tables.js';
export { checkPasswordStrength, type PasswordVerdict } from './password-strength.js';
export { demoRequested } from './demo-flag.js';
export { createAdmin, type NewAdmin } from './create-admin.js';
