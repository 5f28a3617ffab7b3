import { Global, Module } from '@nestjs/common';
import { AuditRepository } from './audit.repository.js';
import { AuditService } from './audit.service.js';

@Global()
@Module({ providers: [AuditService, AuditRepository], exports: [AuditService, AuditRepository] })
export class AuditModule {}
