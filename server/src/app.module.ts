import { Module, type DynamicModule } from '@nestjs/common';
import { APP_FILTER, DiscoveryModule } from '@nestjs/core';
import { ApiExceptionFilter } from './common/filters/api-exception.filter.js';
import { ConfigModule } from './config/config.module.js';
import type { AppSettings } from './config/env.js';
import { DatabaseModule } from './database/database.module.js';
import { featureModules } from './features.js';

@Module({})
export class AppModule {
  /** Built from validated settings so tests can start several instances with different ones. */
  static forRoot(settings: AppSettings): DynamicModule {
    return {
      module: AppModule,
      imports: [ConfigModule.forRoot(settings), DatabaseModule, DiscoveryModule, ...featureModules],
      providers: [{ provide: APP_FILTER, useClass: ApiExceptionFilter }],
    };
  }
}
