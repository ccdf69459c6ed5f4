import type { ChangePasswordRequest } from '@tiermode/shared-types';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { IsAcceptablePassword } from '../../users/password-policy';

export class ChangePasswordDto implements ChangePasswordRequest {
  @IsString({ message: 'currentPassword must be a string' })
  @IsNotEmpty({ message: 'currentPassword must not be empty' })
  @MaxLength(1024, { message: 'currentPassword must be at most 1024 characters' })
  currentPassword!: string;

  @IsAcceptablePassword()
  newPassword!: string;
}
