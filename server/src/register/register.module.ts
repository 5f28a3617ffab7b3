import { Module } from '@nestjs/common';
import { RegisterEditsRepository } from './register-edits.repository.js';
import { RegisterEditsService } from './register-edits.service.js';
import { RegisterController } from './register.controller.js';
import { RegisterRepository } from './register.repository.js';
import { RegisterService } from './register.service.js';

@Module({
  controllers: [RegisterController],
  providers: [RegisterRepository, RegisterEditsRepository, RegisterService, RegisterEditsService],
})
export class RegisterModule {}
