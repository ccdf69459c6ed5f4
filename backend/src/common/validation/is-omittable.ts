import { ValidateIf } from 'class-validator';

/**
 * A field that may be left out. Unlike class-validator's @IsOptional, which also skips `null`,
 * a `null` here is checked like any other value, so `"title": null` is refused with the field's
 * own message instead of reaching the database. Where null has a meaning (clear the site, remove
 * the basis), the field adds `@ValidateIf((_, value) => value !== null)`.
 */
export const IsOmittable = (): PropertyDecorator =>
  ValidateIf((_object: object, value: unknown) => value !== undefined);
