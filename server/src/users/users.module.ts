import { Module } from '@nestjs/common';

import { UsersRepository } from './users.repository.js';
import { UsersResolver } from './users.resolver.js';
import { UsersService } from './users.service.js';

@Module({
  providers: [UsersRepository, UsersService, UsersResolver],
  exports: [UsersRepository, UsersService],
})
export class UsersModule {}
