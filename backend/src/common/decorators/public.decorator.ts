import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'tiermode:isPublic';

/** Marks a route that needs no sign-in (health, login). Every other route needs a valid token. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
