import type { Role, UpdateUserRequest } from '@tiermode/shared-types';
import { IsBoolean, IsInt, IsOptional, Min } from 'class-validator';
import { IsAcceptablePassword } from '../password-policy';
import {
  EmailField,
  LicenceExpiryField,
  LicenceTextField,
  NameField,
  RoleField,
} from './user-fields';

export class UpdateUserDto implements UpdateUserRequest {
  @IsOptional()
  @IsInt({ message: 'version must be an integer' })
  @Min(1, { message: 'version must be at least 1' })
  version?: number;

  @IsOptional()
  @EmailField()
  email?: string;

  @IsOptional()
  @NameField()
  name?: string;

  @IsOptional()
  @RoleField()
  role?: Role;

  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;

  @IsOptional()
  @IsAcceptablePassword()
  password?: string;

  @LicenceTextField('licenseNumber')
  licenseNumber?: string | null;

  @LicenceTextField('licenseJurisdiction')
  licenseJurisdiction?: string | null;

  @LicenceExpiryField()
  licenseExpiresOn?: string | null;
}
