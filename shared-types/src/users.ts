import type { Role } from './roles';

/** A user as every response shows it. Never carries a password or its hash. */
export interface UserDto {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  licenseNumber: string | null;
  licenseJurisdiction: string | null;
  /** ISO date, YYYY-MM-DD. */
  licenseExpiresOn: string | null;
  /** A reviewer with a licence number, a jurisdiction and an expiry date not in the past. */
  licensed: boolean;
  createdAt: string;
  updatedAt: string;
  /** Optimistic-lock version; send it back with a PATCH to refuse a stale edit. */
  version: number;
}

/** `POST /api/users` (admin only). */
export interface CreateUserRequest {
  email: string;
  name: string;
  role: Role;
  password: string;
  licenseNumber?: string;
  licenseJurisdiction?: string;
  licenseExpiresOn?: string;
}

/** `PATCH /api/users/:id` (admin only). Users are deactivated, never deleted. */
export interface UpdateUserRequest {
  version?: number;
  email?: string;
  name?: string;
  role?: Role;
  active?: boolean;
  password?: string;
  licenseNumber?: string | null;
  licenseJurisdiction?: string | null;
  licenseExpiresOn?: string | null;
}

/** Password rules, shared so the client can say them before the server refuses. */
export const PASSWORD_MIN_LENGTH = 10;
/** bcrypt reads at most 72 bytes of a password; longer ones are refused rather than cut. */
export const PASSWORD_MAX_BYTES = 72;
