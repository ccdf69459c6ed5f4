import type { LoginRequest } from '@tiermode/shared-types';
import { IsEmail, IsNotEmpty, IsString, MaxLength } from 'class-validator';

export class LoginDto implements LoginRequest {
  @IsEmail({}, { message: 'email must be an email address' })
  @MaxLength(254, { message: 'email must be at most 254 characters' })
  email!: string;

  @IsString({ message: 'password must be a string' })
  @IsNotEmpty({ message: 'password must not be empty' })
  @MaxLength(1024, { message: 'password must be at most 1024 characters' })
  password!: string;
}
