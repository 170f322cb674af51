import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'petro@poreline.demo' })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'petro-demo-2026' })
  @IsString()
  @MinLength(1, { message: 'password must not be empty' })
  @MaxLength(200)
  password: string;
}
