import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';
import { PASSWORD_MAX_BYTES, PASSWORD_MIN_LENGTH } from '@tiermode/shared-types';
import { registerDecorator, type ValidationArguments } from 'class-validator';
import { DEMO_PASSWORD } from '../database/demo-accounts';

// The common-password list that ships with zxcvbn-ts (about 49,000 leaked passwords).
const COMMON_PASSWORDS: ReadonlySet<string> = new Set(
  common.dictionary['passwords-common'].map((p) => p.toLowerCase()),
);

/**
 * zxcvbn's estimate of how many guesses a password takes, as a score from 0 to 4 (Wheeler,
 * "zxcvbn: Low-Budget Password Strength Estimation", USENIX Security 2016): repeats, sequences,
 * keyboard patterns, dates, l33t and common words count for little.
 */
const strength = new ZxcvbnFactory({
  dictionary: { ...common.dictionary, ...english.dictionary },
  graphs: common.adjacencyGraphs,
  translations: english.translations,
});

/** 3: "safely unguessable: moderate protection from offline slow-hash scenario" (zxcvbn). */
export const MIN_PASSWORD_SCORE = 3;

/** Words of the product itself, which make a password easier to guess. */
const PRODUCT_WORDS = ['tiermode', 'seismic', 'modal', 'calc'];

/**
 * Why a password is refused, or null when it is acceptable: at least PASSWORD_MIN_LENGTH
 * characters, at most PASSWORD_MAX_BYTES bytes of UTF-8 (bcrypt ignores the rest), not one of
 * the common passwords nor the demo password, and a zxcvbn score of at least
 * MIN_PASSWORD_SCORE (`userInputs`, the person's name and email, count against it).
 */
export function passwordProblem(
  field: string,
  password: unknown,
  userInputs: string[] = [],
): string | null {
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
  // Published in the README with the demo accounts: never a real account's password.
  if (password === DEMO_PASSWORD) {
    return `${field} is the published demo password; choose another`;
  }
  const result = strength.check(password, [...PRODUCT_WORDS, ...userInputs]);
  if (result.score < MIN_PASSWORD_SCORE) {
    const why = [result.feedback.warning, ...result.feedback.suggestions]
      .filter((line): line is string => Boolean(line))
      .join(' ');
    return `${field} is too easy to guess${why ? `: ${why}` : ''}`;
  }
  return null;
}

/** A person's name and email as the words zxcvbn should count against their password. */
export function personalWords(...texts: (string | null | undefined)[]): string[] {
  return texts
    .filter((t): t is string => typeof t === 'string' && t.length > 0)
    .flatMap((t) => [t, ...t.toLowerCase().split(/[^\p{L}\p{N}]+/u)])
    .filter((word) => word.length >= 3);
}

/**
 * class-validator decorator over passwordProblem, for DTOs; the DTO's own `name` and `email`,
 * when it has them, count against the password.
 */
export function IsAcceptablePassword(): PropertyDecorator {
  return (target: object, propertyName: string | symbol) => {
    registerDecorator({
      name: 'isAcceptablePassword',
      target: target.constructor,
      propertyName: String(propertyName),
      validator: {
        validate: (value: unknown, args: ValidationArguments) =>
          passwordProblem(args.property, value, wordsOf(args.object)) === null,
        defaultMessage: (args: ValidationArguments) =>
          passwordProblem(args.property, args.value, wordsOf(args.object)) ??
          `${args.property} is not acceptable`,
      },
    });
  };
}

function wordsOf(dto: object): string[] {
  const { name, email } = dto as { name?: unknown; email?: unknown };
  return personalWords(
    typeof name === 'string' ? name : undefined,
    typeof email === 'string' ? email : undefined,
  );
}
