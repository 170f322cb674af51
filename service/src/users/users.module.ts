import { Module } from '@nestjs/common';
import { UserAccountsRepository } from './user-accounts.repository.js';
import { UsersController } from './users.controller.js';
import { UsersService } from './users.service.js';

@Module({ controllers: [UsersController], providers: [UsersService, UserAccountsRepository] })
export class UsersModule {}
