import type { SetPasswordRequest } from '@tiermode/shared-types';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { IsAcceptablePassword } from '../../users/password-policy';

export class SetPasswordDto implements SetPasswordRequest {
  @IsString({ message: 'token must be a string' })
  @IsNotEmpty({ message: 'token must not be empty' })
  @MaxLength(200, { message: 'token must be at most 200 characters' })
  token!: string;

  @IsAcceptablePassword()
  password!: string;
}
