import { ApiProperty } from '@nestjs/swagger';
import { ROLES } from '../auth-user.js';

export class MembershipDto {
  @ApiProperty() assetId: string;
  @ApiProperty() assetName: string;
  @ApiProperty({ enum: ROLES }) role: (typeof ROLES)[number];
}

export class MeDto {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty() isAdmin: boolean;
  @ApiProperty({ type: [MembershipDto] }) memberships: MembershipDto[];
}

export class LoginResultDto {
  @ApiProperty() token: string;
  @ApiProperty({ type: MeDto }) user: MeDto;
}
