import {
  SPECTRUM_GENERATOR_LIMITS as LIMITS,
  type GroundType,
  type SpectrumGenerateRequest,
  type SpectrumGeneratorKind,
} from '@tiermode/shared-types';
import { IsIn, IsNumber, IsPositive, Max, Min, ValidateIf } from 'class-validator';
import { IsOmittable } from '../../common/validation/is-omittable';

const FINITE = { allowNaN: false, allowInfinity: false };
const asce = (o: SpectrumGenerateDto) => o.kind === 'asce7-two-period';
const en = (o: SpectrumGenerateDto) => o.kind === 'en1998-elastic' || o.kind === 'en1998-design';
const positiveNumber = (field: string, unit: string, max: number) => [
  IsNumber(FINITE, { message: `${field} must be a number (${unit})` }),
  IsPositive({ message: `${field} must be a positive number (${unit})` }),
  Max(max, { message: `${field} must be at most ${max} (${unit})` }),
];
const apply =
  (...decorators: PropertyDecorator[]): PropertyDecorator =>
  (target, key) =>
    decorators.forEach((d) => d(target, key));

export class SpectrumGenerateDto implements SpectrumGenerateRequest {
  @IsIn(['asce7-two-period', 'en1998-elastic', 'en1998-design'], {
    message: 'kind must be one of: asce7-two-period, en1998-elastic, en1998-design',
  })
  kind!: SpectrumGeneratorKind;

  @ValidateIf(asce)
  @apply(...positiveNumber('sds', 'g', LIMITS.acceleration))
  sds?: number;

  @ValidateIf(asce)
  @apply(...positiveNumber('sd1', 'g', LIMITS.acceleration))
  sd1?: number;

  @ValidateIf(asce)
  @apply(...positiveNumber('tl', 's', LIMITS.tl))
  tl?: number;

  @IsOmittable()
  @ValidateIf(asce)
  @IsNumber(FINITE, { message: 's1 must be a number (g)' })
  @Min(0, { message: 's1 must be a number >= 0 (g)' })
  @Max(LIMITS.acceleration, { message: `s1 must be at most ${LIMITS.acceleration} (g)` })
  s1?: number;

  @ValidateIf(en)
  @apply(...positiveNumber('agR', 'g', LIMITS.acceleration))
  agR?: number;

  @IsOmittable()
  @apply(...positiveNumber('importanceFactor', 'gamma_I', LIMITS.importanceFactor))
  importanceFactor?: number;

  @ValidateIf(en)
  @IsIn(['A', 'B', 'C', 'D', 'E'], { message: 'groundType must be one of A, B, C, D, E' })
  groundType?: GroundType;

  @ValidateIf(en)
  @IsIn([1, 2], { message: 'spectrumType must be 1 or 2' })
  spectrumType?: 1 | 2;

  @IsOmittable()
  @IsNumber(FINITE, { message: 'dampingPercent must be a number (%)' })
  @Min(0, { message: 'dampingPercent must be a number >= 0 (%)' })
  @Max(LIMITS.dampingPercent, {
    message: `dampingPercent must be at most ${LIMITS.dampingPercent} (%)`,
  })
  dampingPercent?: number;

  @ValidateIf((o: SpectrumGenerateDto) => o.kind === 'en1998-design')
  @apply(...positiveNumber('q', 'behaviour factor', LIMITS.q))
  q?: number;

  @IsOmittable()
  @apply(...positiveNumber('beta', 'lower-bound factor', LIMITS.beta))
  beta?: number;

  @IsOmittable()
  @apply(...positiveNumber('maxPeriod', 's', LIMITS.maxPeriod))
  maxPeriod?: number;
}
