import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class FirstAdminDto {
  @ApiProperty() @IsString() @MinLength(1, { message: 'organisation must not be empty' }) @MaxLength(120) organisation: string;
  @ApiProperty() @IsString() @MinLength(1, { message: 'name must not be empty' }) @MaxLength(120) name: string;
  @ApiProperty() @IsEmail({}, { message: 'email must be an e-mail address' }) email: string;
  @ApiProperty() @IsString() @MinLength(12, { message: 'password must be at least 12 characters' }) @MaxLength(200) password: string;
}
