import { Body, Controller, Delete, Get, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser, Roles } from '../auth/decorators.js';
import { MemberDto, PutMemberDto } from './dto/member.dto.js';
import { MembersService } from './members.service.js';

@ApiTags('asset members')
@ApiBearerAuth()
@Controller('assets/:assetId/members')
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  list(@Param('assetId') assetId: string): Promise<MemberDto[]> {
    return this.members.list(assetId);
  }

  @Roles('admin')
  @Put()
  put(@Param('assetId') assetId: string, @Body() body: PutMemberDto, @CurrentUser() user: AuthUser): Promise<MemberDto[]> {
    return this.members.put(assetId, body, user);
  }

  @Roles('admin')
  @Delete(':userId')
  remove(@Param('assetId') assetId: string, @Param('userId') userId: string, @CurrentUser() user: AuthUser): Promise<MemberDto[]> {
    return this.members.remove(assetId, userId, user);
  }
}
