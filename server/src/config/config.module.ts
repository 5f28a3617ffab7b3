import { Global, Module, type DynamicModule } from '@nestjs/common';
import { AppConfig } from './app-config.js';
import type { AppSettings } from './env.js';

@Global()
@Module({})
export class ConfigModule {
  static forRoot(settings: AppSettings): DynamicModule {
    const config = new AppConfig(settings);
    return {
      module: ConfigModule,
      providers: [{ provide: AppConfig, useValue: config }],
      exports: [AppConfig],
    };
  }
}
