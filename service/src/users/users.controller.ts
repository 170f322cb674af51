import { Body, Controller, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { ChangePasswordDto, CreateUserDto, UpdateUserDto, UserDto } from './dto/user.dto.js';
import { UsersService } from './users.service.js';

/** Accounts of the caller's organisation. `@Roles('admin')` here (no :assetId) means a global admin. */
@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Roles('admin')
  @Get()
  list(@CurrentUser() user: AuthUser): Promise<UserDto[]> {
    return this.users.list(user);
  }

  @Roles('admin')
  @Post()
  create(@Body() body: CreateUserDto, @CurrentUser() user: AuthUser): Promise<UserDto> {
    return this.users.create(body, user);
  }

  /** Any signed-in user, for their own account: other sessions end; the answer carries a new token for this one. */
  @Patch('me/password')
  @HttpCode(200)
  changeOwnPassword(@Body() body: ChangePasswordDto, @CurrentUser() user: AuthUser): Promise<{ token: string }> {
    return this.users.changeOwnPassword(body, user);
  }

  @Roles('admin')
  @Patch(':userId')
  update(@Param('userId') userId: string, @Body() body: UpdateUserDto, @CurrentUser() user: AuthUser): Promise<UserDto> {
    return this.users.update(userId, body, user);
  }
}
