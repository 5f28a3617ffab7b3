import { Global, Module } from '@nestjs/common';
import { Database } from './database.js';
import { UnitOfWork } from './unit-of-work.js';

@Global()
@Module({ providers: [Database, UnitOfWork], exports: [Database, UnitOfWork] })
export class DatabaseModule {}
