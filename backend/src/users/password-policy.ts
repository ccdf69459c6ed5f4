import { dictionary } from '@zxcvbn-ts/language-common';
import { PASSWORD_MAX_BYTES, PASSWORD_MIN_LENGTH } from '@tiermode/shared-types';
import { registerDecorator, type ValidationArguments } from 'class-validator';

// The common-password list that ships with zxcvbn-ts (about 49,000 leaked passwords).
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  dictionary['passwords-common'].map((p) => p.toLowerCase()),
);

/**
 * Why a password is refused, or null when it is acceptable: at least PASSWORD_MIN_LENGTH
 * characters, at most PASSWORD_MAX_BYTES bytes of UTF-8 (bcrypt ignores the rest), and not one of
 * the common passwords.
 */
export function passwordProblem(field: string, password: unknown): string | null {
  if (typeof password !== 'string') return `${field} must be a string`;
  if ([...password].length < PASSWORD_MIN_LENGTH) {
    return `${field} must be at least ${PASSWORD_MIN_LENGTH} characters long`;
  }
  if (Buffer.byteLength(password, 'utf8') > PASSWORD_MAX_BYTES) {
    return `${field} must be at most ${PASSWORD_MAX_BYTES} bytes long`;
  }
  if (COMMON_PASSWORDS.has(password.toLowerCase())) {
    return `${field} is one of the most common passwords; choose another`;
  }
  return null;
}

/** class-validator decorator over passwordProblem, for DTOs. */
export function IsAcceptablePassword(): PropertyDecorator {
  return (target: object, propertyName: string | symbol) => {
    registerDecorator({
      name: 'isAcceptablePassword',
      target: target.constructor,
      propertyName: String(propertyName),
      validator: {
        validate: (value: unknown, args: ValidationArguments) =>
          passwordProblem(args.property, value) === null,
        defaultMessage: (args: ValidationArguments) =>
          passwordProblem(args.property, args.value) ?? `${args.property} is not acceptable`,
      },
    });
  };
}
