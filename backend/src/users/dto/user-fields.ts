import { ROLES } from '@tiermode/shared-types';
import { trim } from '../../common/validation/trim';
import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import {
  IsEmail,
  IsIn,
  IsISO8601,
  IsNotEmpty,
  IsString,
  MaxLength,
  ValidateIf,
} from 'class-validator';
import { IsOmittable } from '../../common/validation/is-omittable';

/** Field rules shared by the create and update bodies, with messages that name the field. */
export const EmailField = () =>
  applyDecorators(
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim().toLowerCase() : value,
    ),
    IsEmail({}, { message: 'email must be an email address' }),
    MaxLength(254, { message: 'email must be at most 254 characters' }),
  );

export const NameField = () =>
  applyDecorators(
    Transform(trim),
    IsString({ message: 'name must be a string' }),
    IsNotEmpty({ message: 'name must not be empty' }),
    MaxLength(200, { message: 'name must be at most 200 characters' }),
  );

export const RoleField = () =>
  IsIn([...ROLES], { message: `role must be one of: ${ROLES.join(', ')}` });

/** An optional licence text; null (on update) clears it. */
export const LicenceTextField = (field: string) =>
  applyDecorators(
    IsOmittable(),
    Transform(({ value }: { value: unknown }) =>
      typeof value === 'string' ? value.trim() || null : value,
    ),
    ValidateIf((_, value) => value !== null),
    IsString({ message: `${field} must be a string` }),
    MaxLength(100, { message: `${field} must be at most 100 characters` }),
  );

export const LicenceExpiryField = () =>
  applyDecorators(
    IsOmittable(),
    Transform(({ value }: { value: unknown }) => (value === '' ? null : value)),
    ValidateIf((_, value) => value !== null),
    IsISO8601(
      { strict: true, strictSeparator: true },
      { message: 'licenseExpiresOn must be a date written YYYY-MM-DD' },
    ),
    MaxLength(10, { message: 'licenseExpiresOn must be a date written YYYY-MM-DD' }),
  );
