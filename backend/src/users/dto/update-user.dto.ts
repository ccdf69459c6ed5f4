import type { Role, UpdateUserRequest } from '@tiermode/shared-types';
import { IsBoolean, IsInt, Min } from 'class-validator';
import { IsAcceptablePassword } from '../password-policy';
import {
  EmailField,
  LicenceExpiryField,
  LicenceTextField,
  NameField,
  RoleField,
} from './user-fields';
import { IsOmittable } from '../../common/validation/is-omittable';

export class UpdateUserDto implements UpdateUserRequest {
  @IsOmittable()
  @IsInt({ message: 'version must be an integer' })
  @Min(1, { message: 'version must be at least 1' })
  version?: number;

  @IsOmittable()
  @EmailField()
  email?: string;

  @IsOmittable()
  @NameField()
  name?: string;

  @IsOmittable()
  @RoleField()
  role?: Role;

  @IsOmittable()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;

  @IsOmittable()
  @IsAcceptablePassword()
  password?: string;

  @LicenceTextField('licenseNumber')
  licenseNumber?: string | null;

  @LicenceTextField('licenseJurisdiction')
  licenseJurisdiction?: string | null;

  @LicenceExpiryField()
  licenseExpiresOn?: string | null;
}
