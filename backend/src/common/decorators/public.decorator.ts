import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiSecurity } from '@nestjs/swagger';

export const IS_PUBLIC_KEY = 'tiermode:isPublic';

/**
 * Marks a route that needs no sign-in (health, login). Every other route needs a valid token.
 * In the OpenAPI document the route's security is `[{}]`: no credentials (OpenAPI 3.0, 4.8.10).
 */
export const Public = () => applyDecorators(SetMetadata(IS_PUBLIC_KEY, true), ApiSecurity({}));
