import {
  ANALYSIS_LIMITS,
  type AnalysisRequest,
  type SpectrumInput,
  type SpectrumInterpolation,
  type SpectrumSource,
  type SpectrumPointInput,
  type StoreyInput,
} from '@tiermode/shared-types';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsDefined,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsPositive,
  IsString,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import { IsSpectrumSource } from './spectrum-source.dto';
import { IsOmittable } from '../../common/validation/is-omittable';

const FINITE = { allowNaN: false, allowInfinity: false };
const isNumber = (field: string, unit: string) =>
  IsNumber(FINITE, { message: `${field} must be a number (${unit})` });

export class StoreyDto implements StoreyInput {
  @IsOmittable()
  @IsString({ message: 'label must be text' })
  @MaxLength(60, { message: 'label must be at most 60 characters' })
  label?: string;

  @isNumber('mass', 'kg')
  @IsPositive({ message: 'mass must be a positive number (kg)' })
  mass!: number;

  @isNumber('stiffness', 'N/m')
  @IsPositive({ message: 'stiffness must be a positive number (N/m)' })
  stiffness!: number;

  @isNumber('height', 'm')
  @IsPositive({ message: 'height must be a positive number (m)' })
  height!: number;
}

export class SpectrumPointDto implements SpectrumPointInput {
  @isNumber('period', 's')
  @Min(0, { message: 'period must be a number >= 0 (s)' })
  period!: number;

  @isNumber('sa', 'g')
  @Min(0, { message: 'sa must be a number >= 0 (g)' })
  sa!: number;
}

export class SpectrumDto implements SpectrumInput {
  @IsArray({ message: 'points must be a list of { period, sa }' })
  @ArrayMinSize(ANALYSIS_LIMITS.minSpectrumPoints, {
    message: 'points must have at least two points',
  })
  @ArrayMaxSize(ANALYSIS_LIMITS.maxSpectrumPoints, {
    message: `points must have at most ${ANALYSIS_LIMITS.maxSpectrumPoints} points`,
  })
  @ValidateNested({ each: true })
  @Type(() => SpectrumPointDto)
  points!: SpectrumPointDto[];

  @IsOmittable()
  @IsIn(['linear', 'log-log'], { message: 'interpolation must be "linear" or "log-log"' })
  interpolation?: SpectrumInterpolation;

  @IsOmittable()
  @IsSpectrumSource()
  source?: SpectrumSource;
}

/** `POST /api/analysis`; the periods' order is checked by the engine, which names the point. */
export class AnalysisRequestDto implements AnalysisRequest {
  @IsArray({ message: 'storeys must be a list of { mass, stiffness, height }' })
  @ArrayMinSize(ANALYSIS_LIMITS.minStoreys, { message: 'storeys must have at least one storey' })
  @ArrayMaxSize(ANALYSIS_LIMITS.maxStoreys, {
    message: `storeys must have at most ${ANALYSIS_LIMITS.maxStoreys} storeys`,
  })
  @ValidateNested({ each: true })
  @Type(() => StoreyDto)
  storeys!: StoreyDto[];

  @IsDefined({ message: 'spectrum must be given' })
  @IsObject({ message: 'spectrum must be an object { points, interpolation }' })
  @ValidateNested()
  @Type(() => SpectrumDto)
  spectrum!: SpectrumDto;

  @isNumber('dampingRatio', 'a fraction of critical, e.g. 0.05')
  @IsPositive({ message: 'dampingRatio must be greater than 0' })
  @Max(0.999999, { message: 'dampingRatio must be less than 1' })
  dampingRatio!: number;

  @IsOmittable()
  @IsInt({ message: 'modeCount must be a whole number' })
  @Min(1, { message: 'modeCount must be at least 1' })
  modeCount?: number;

  @IsOmittable()
  @isNumber('targetMassRatio', 'a fraction of the total mass')
  @IsPositive({ message: 'targetMassRatio must be greater than 0' })
  @Max(1, { message: 'targetMassRatio must be at most 1' })
  targetMassRatio?: number;
}
