import type { SpectrumGeneratorKind } from '@tiermode/shared-types';
import { plainToInstance } from 'class-transformer';
import { registerDecorator, validateSync } from 'class-validator';
import { SpectrumGenerateDto } from './spectrum-generate.dto';

const GENERATORS: readonly SpectrumGeneratorKind[] = [
  'asce7-two-period',
  'en1998-elastic',
  'en1998-design',
];

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * What is wrong with a spectrum's `source`, or null: `{ kind: "user" }`, or a generator's kind
 * with the parameters its generate request takes, checked by that request's own rules (so a
 * source the generator would refuse is refused here too, naming the parameter).
 */
export function spectrumSourceProblem(value: unknown): string | null {
  if (!isPlainObject(value)) {
    return 'must be { "kind": "user" } or a generator\'s { "kind", "parameters" }';
  }
  const { kind, parameters, ...rest } = value;
  const unknown = Object.keys(rest)[0];
  if (unknown !== undefined) return `${unknown} is not a field of a spectrum source`;
  if (kind === 'user') {
    return parameters === undefined ? null : 'parameters must be left out for a user table';
  }
  if (!GENERATORS.includes(kind as SpectrumGeneratorKind)) {
    return `kind must be one of: user, ${GENERATORS.join(', ')}`;
  }
  if (!isPlainObject(parameters)) {
    return "parameters must be an object of the generator's parameters";
  }
  if ('kind' in parameters) return 'parameters.kind is not a parameter (kind is beside it)';
  const request = plainToInstance(SpectrumGenerateDto, { ...parameters, kind });
  const [error] = validateSync(request, { whitelist: true, forbidNonWhitelisted: true });
  if (!error) return null;
  // The generator's messages start with the parameter's name: "tl must be at most 50 (s)".
  const message = Object.values(error.constraints ?? {})[0] ?? `${error.property} is not valid`;
  return `parameters.${message}`;
}

/** A spectrum's `source` as spectrumSourceProblem reads it. */
export function IsSpectrumSource(): PropertyDecorator {
  return (target, propertyName) =>
    registerDecorator({
      name: 'isSpectrumSource',
      target: target.constructor,
      propertyName: propertyName as string,
      validator: {
        validate: (value: unknown) => spectrumSourceProblem(value) === null,
        defaultMessage: (args) => spectrumSourceProblem(args?.value) ?? 'is not valid',
      },
    });
}
