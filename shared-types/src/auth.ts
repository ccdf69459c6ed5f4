import type { AbilityRule } from './abilities';
import type { UserDto } from './users';

/** `POST /api/auth/login`. */
export interface LoginRequest {
  email: string;
  password: string;
}

export interface LoginResponse {
  accessToken: string;
  /** ISO time the token stops working. */
  expiresAt: string;
  user: UserDto;
}

/** `GET /api/auth/me`: the user and the CASL rules the client builds its ability from. */
export interface MeResponse {
  user: UserDto;
  rules: AbilityRule[];
}

/** `POST /api/auth/password`: a signed-in user changes its own password. */
export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}

/** `POST /api/auth/set-password`: a new person chooses a password with the mailed one-time link. */
export interface SetPasswordRequest {
  token: string;
  password: string;
}
