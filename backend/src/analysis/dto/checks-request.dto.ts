import {
  DRIFT_LIMIT_CLASSES,
  GROUND_TYPES,
  RISK_CATEGORIES,
  type ChecksRequest,
  type CodeBasisParameters,
} from '@tiermode/shared-types';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  IsArray,
  IsDefined,
  IsIn,
  IsNumber,
  IsObject,
  IsPositive,
  Max,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { AnalysisRequestDto } from './analysis-request.dto';
import { IsOmittable } from '../../common/validation/is-omittable';

const FINITE = { allowNaN: false, allowInfinity: false };
const CODES = ['ASCE7-22', 'EN1998-1', 'USER'] as const;
type Code = (typeof CODES)[number];

/** A positive number required when the basis is `code`, with the unit in the message. */
function positive(code: Code, field: string, unit: string, optional = false) {
  return (target: object, key: string) => {
    ValidateIf(
      (o: { code?: string }, value) => o.code === code && (!optional || value !== undefined),
    )(target, key);
    IsNumber(FINITE, { message: `${field} must be a positive number (${unit})` })(target, key);
    IsPositive({ message: `${field} must be a positive number (${unit})` })(target, key);
  };
}

const asce = (o: { code?: string }) => o.code === 'ASCE7-22';
const en = (o: { code?: string }) => o.code === 'EN1998-1';

/** The parameters of one code basis; only those of the chosen `code` are checked. */
export class CodeBasisDto {
  @IsIn(CODES, { message: `code must be one of ${CODES.join(', ')}` })
  code!: Code;

  @positive('ASCE7-22', 'sds', 'g') sds?: number;
  @positive('ASCE7-22', 'sd1', 'g') sd1?: number;
  @ValidateIf(asce)
  @IsNumber(FINITE, { message: 's1 must be a number >= 0 (g)' })
  @Min(0, { message: 's1 must be a number >= 0 (g)' })
  s1?: number;
  @positive('ASCE7-22', 'tl', 's') tl?: number;
  @positive('ASCE7-22', 'r', 'the response modification coefficient') r?: number;
  @positive('ASCE7-22', 'cd', 'the deflection amplification factor') cd?: number;
  @positive('ASCE7-22', 'ie', 'the importance factor') ie?: number;
  @positive('ASCE7-22', 'omega0', 'the overstrength factor', true) omega0?: number;
  @positive('ASCE7-22', 'ct', 'Table 12.8-2, SI') ct?: number;
  @positive('ASCE7-22', 'x', 'Table 12.8-2') x?: number;
  @ValidateIf(asce)
  @IsIn(RISK_CATEGORIES, { message: 'riskCategory must be one of I, II, III, IV' })
  riskCategory?: (typeof RISK_CATEGORIES)[number];
  @ValidateIf(
    (o: { code?: string; seismicWeights?: unknown }) => asce(o) && o.seismicWeights !== undefined,
  )
  @IsArray({ message: 'seismicWeights must be a list of positive numbers (N), one per storey' })
  @ArrayMaxSize(500, { message: 'seismicWeights must have at most 500 values' })
  @IsNumber(FINITE, {
    each: true,
    message: 'seismicWeights must be a list of positive numbers (N)',
  })
  @IsPositive({ each: true, message: 'seismicWeights must be a list of positive numbers (N)' })
  seismicWeights?: number[];
  @positive('ASCE7-22', 'hn', 'm', true) hn?: number;

  @positive('EN1998-1', 'ag', 'g') ag?: number;
  @ValidateIf(en)
  @IsIn(GROUND_TYPES, { message: `groundType must be one of ${GROUND_TYPES.join(', ')}` })
  groundType?: (typeof GROUND_TYPES)[number];
  @ValidateIf(en)
  @IsIn([1, 2], { message: 'spectrumType must be 1 or 2' })
  spectrumType?: 1 | 2;
  @positive('EN1998-1', 'importanceFactor', 'gamma_I') importanceFactor?: number;
  @positive('EN1998-1', 'q', 'the behaviour factor') q?: number;
  @positive('EN1998-1', 'nu', 'the reduction factor of 4.4.3.2')
  @ValidateIf(en)
  @Max(1, { message: 'nu must be at most 1' })
  nu?: number;
  @ValidateIf(en)
  @IsIn(DRIFT_LIMIT_CLASSES, {
    message: `driftLimitClass must be one of ${DRIFT_LIMIT_CLASSES.join(', ')}`,
  })
  driftLimitClass?: (typeof DRIFT_LIMIT_CLASSES)[number];

  @ValidateIf(
    (o: { code?: string; seismicMasses?: unknown }) => en(o) && o.seismicMasses !== undefined,
  )
  @IsArray({ message: 'seismicMasses must be a list of positive numbers (kg), one per storey' })
  @ArrayMaxSize(500, { message: 'seismicMasses must have at most 500 values' })
  @IsNumber(FINITE, {
    each: true,
    message: 'seismicMasses must be a list of positive numbers (kg)',
  })
  @IsPositive({ each: true, message: 'seismicMasses must be a list of positive numbers (kg)' })
  seismicMasses?: number[];

  @positive('USER', 'scaleFactor', 'a multiplier') scaleFactor?: number;
  @positive('USER', 'driftLimitRatio', 'storey drift over height') driftLimitRatio?: number;
  @positive('USER', 'deflectionAmplification', 'a multiplier') deflectionAmplification?: number;
  @positive('USER', 'stabilityLimit', 'the largest theta allowed') stabilityLimit?: number;
}

/** `POST /api/checks`: the analysis request plus the code basis. */
export class ChecksRequestDto extends AnalysisRequestDto implements ChecksRequest {
  @IsDefined({ message: 'basis must be given' })
  @IsObject({ message: 'basis must be an object { code, ... }' })
  @ValidateNested()
  @Type(() => CodeBasisDto)
  basis!: CodeBasisParameters & CodeBasisDto;

  @IsOmittable()
  @IsIn(['cqc', 'srss'], { message: 'combination must be "cqc" or "srss"' })
  combination?: 'cqc' | 'srss';
}
