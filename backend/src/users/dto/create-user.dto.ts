import type { CreateUserRequest, Role } from '@tiermode/shared-types';
import { IsAcceptablePassword } from '../password-policy';
import {
  EmailField,
  LicenceExpiryField,
  LicenceTextField,
  NameField,
  RoleField,
} from './user-fields';

export class CreateUserDto implements CreateUserRequest {
  @EmailField()
  email!: string;

  @NameField()
  name!: string;

  @RoleField()
  role!: Role;

  @IsAcceptablePassword()
  password!: string;

  @LicenceTextField('licenseNumber')
  licenseNumber?: string;

  @LicenceTextField('licenseJurisdiction')
  licenseJurisdiction?: string;

  @LicenceExpiryField()
  licenseExpiresOn?: string;
}
