import type { DynamicModule, Type } from '@nestjs/common';
import { AuthModule } from './auth/auth.module.js';
import { HealthModule } from './health/health.module.js';
import { UsersModule } from './users/users.module.js';
import { PrintModule } from './print/print.module.js';
import { FieldRecordsModule } from './field-records/field-records.module.js';
import { SheetFeatureModules } from './sheets/sheet-features.js';

/**
 * Every feature module of the API. Add a new feature by appending its module here (one line);
 * its controllers must declare a policy on each route (see auth/policy.ts).
 */
export const featureModules: Array<Type<unknown> | DynamicModule> = [
  AuthModule,
  UsersModule,
  HealthModule,
  ...SheetFeatureModules,
  PrintModule,
  FieldRecordsModule,
];
