import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsIn } from 'class-validator';
import { ROLES } from '../../auth/auth-user.js';

export class MemberDto {
  @ApiProperty() userId: string;
  @ApiProperty() name: string;
  @ApiProperty() email: string;
  @ApiProperty({ enum: ROLES }) role: (typeof ROLES)[number];
  @ApiProperty({ description: 'Global admin of the organisation (sees every asset as admin)' }) isAdmin: boolean;
}

export class PutMemberDto {
  @ApiProperty({ description: 'E-mail of a user of the same organisation' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role: (typeof ROLES)[number];
}
