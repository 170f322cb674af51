import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsEmail, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';
import { MembershipDto } from '../../auth/dto/me.dto.js';

/** Shortest password accepted for an account (the same rule as the first admin's). */
export const MIN_PASSWORD_LENGTH = 12;

/** An account of the caller's organisation, as the admin area lists it. Never carries the password hash. */
export class UserDto {
  @ApiProperty() id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ description: 'Global admin of the organisation (sees every asset of it as admin)' }) isAdmin: boolean;
  @ApiProperty() createdAt: string;
  @ApiProperty({ type: [MembershipDto], description: 'Assets the user is a member of, with the role held (explicit memberships only)' })
  memberships: MembershipDto[];
}

/** POST /api/users: a new account in the caller's organisation, with an initial password. */
export class CreateUserDto {
  @ApiProperty({ example: 'kim@example.com' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email: string;

  @ApiProperty({ example: 'Kim Larsen' })
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name: string;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH, description: 'Initial password; tell the user to change it' })
  @IsString({ message: 'password must be a string' })
  @MinLength(MIN_PASSWORD_LENGTH, { message: `password must be at least ${MIN_PASSWORD_LENGTH} characters` })
  @MaxLength(200, { message: 'password must be at most 200 characters' })
  password: string;

  @ApiPropertyOptional({ default: false })
  @IsOptional()
  @IsBoolean({ message: 'isAdmin must be true or false' })
  isAdmin?: boolean;
}

/** PATCH /api/users/:userId (global admin): only the fields sent change; `password` resets it. */
export class UpdateUserDto {
  @ApiPropertyOptional()
  @IsOptional()
  @IsString({ message: 'name must be a string' })
  @MinLength(1, { message: 'name must not be empty' })
  @MaxLength(120, { message: 'name must be at most 120 characters' })
  @Matches(/\S/, { message: 'name must not be blank' })
  name?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @IsBoolean({ message: 'isAdmin must be true or false' })
  isAdmin?: boolean;

  @ApiPropertyOptional({ minLength: MIN_PASSWORD_LENGTH })
  @IsOptional()
  @IsString({ message: 'password must be a string' })
  @MinLength(MIN_PASSWORD_LENGTH, { message: `password must be at least ${MIN_PASSWORD_LENGTH} characters` })
  @MaxLength(200, { message: 'password must be at most 200 characters' })
  password?: string;
}

/** PATCH /api/users/me/password: any signed-in user changes their own password. */
export class ChangePasswordDto {
  @ApiProperty()
  @IsString({ message: 'currentPassword must be a string' })
  @MinLength(1, { message: 'currentPassword must not be empty' })
  @MaxLength(200, { message: 'currentPassword must be at most 200 characters' })
  currentPassword: string;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH })
  @IsString({ message: 'newPassword must be a string' })
  @MinLength(MIN_PASSWORD_LENGTH, { message: `newPassword must be at least ${MIN_PASSWORD_LENGTH} characters` })
  @MaxLength(200, { message: 'newPassword must be at most 200 characters' })
  newPassword: string;
}
