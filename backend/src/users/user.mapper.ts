import type { UserDto } from '@tiermode/shared-types';
import { isLicensed } from '../authorization/licence';
import type { User } from './user.entity';

/** The only way a user leaves the server: no password hash, ever. */
export function toUserDto(user: User, today: Date = new Date()): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    licenseNumber: user.licenseNumber,
    licenseJurisdiction: user.licenseJurisdiction,
    licenseExpiresOn: user.licenseExpiresOn,
    licensed: isLicensed(user, today),
    createdAt: user.createdAt.toISOString(),
    updatedAt: user.updatedAt.toISOString(),
    version: user.version,
  };
}
