/** Token settings: HS256 only, 8-hour expiry, our own issuer and audience. */
export const JWT_ALGORITHM = 'HS256';
export const JWT_ISSUER = 'tiermode';
export const JWT_AUDIENCE = 'tiermode-app';
export const JWT_LIFETIME_SECONDS = 8 * 60 * 60;

/** The claims Tiermode puts in a token besides iss, aud, iat and exp. */
export interface TokenClaims {
  sub: string;
  /** The user's session version when the token was issued. */
  sv: number;
}
