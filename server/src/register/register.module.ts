import { Module } from '@nestjs/common';
import { RegisterEditsService } from './register-edits.service.js';
import { RegisterController } from './register.controller.js';
import { RegisterService } from './register.service.js';

@Module({ controllers: [RegisterController], providers: [RegisterService, RegisterEditsService] })
export class RegisterModule {}
