import { Module } from '@nestjs/common';
import { UsersController } from './users.controller.js';
import { UsersRepository } from './users.repository.js';
import { UsersService } from './users.service.js';
import { SignedInUsers } from './signed-in-users.js';

@Module({
  controllers: [UsersController],
  providers: [UsersRepository, UsersService, SignedInUsers],
  exports: [UsersService, UsersRepository, SignedInUsers],
})
export class UsersModule {}
