import {
  ACCELERATION_UNITS,
  ANALYSIS_LIMITS,
  HISTORY_LIMITS,
  type AccelerationUnits,
  type FreeVibrationRequest,
  type FreeVibrationSetup,
  type FreeVibrationStart,
  type GroundMotionRecord,
  type RecordScaling,
  type RecordSpectrumRequest,
  type ResponseHistoryRequest,
  type ResponseHistorySetup,
  type StoredGroundMotionRecord,
} from '@tiermode/shared-types';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsDefined,
  IsIn,
  IsInt,
  IsNumber,
  IsObject,
  IsString,
  MaxLength,
  Min,
  registerDecorator,
  ValidateNested,
} from 'class-validator';
import { IsOmittable } from '../../common/validation/is-omittable';
import { StoreyDto } from './analysis-request.dto';

// The DTOs check shapes and sizes; the engine checks every value and names the sample or level
// (record.accelerations[12] (sample 13, t = 0.12 s) must be a finite number (g)).

const FINITE = { allowNaN: false, allowInfinity: false };
const isNumber = (field: string, unit: string) =>
  IsNumber(FINITE, { message: `${field} must be a number (${unit})` });

const storeysList = () => [
  IsArray({ message: 'storeys must be a list of { mass, stiffness, height }' }),
  ArrayMinSize(ANALYSIS_LIMITS.minStoreys, { message: 'storeys must have at least one storey' }),
  ArrayMaxSize(ANALYSIS_LIMITS.maxStoreys, {
    message: `storeys must have at most ${ANALYSIS_LIMITS.maxStoreys} storeys`,
  }),
  ValidateNested({ each: true }),
  Type(() => StoreyDto),
];

/** Several property decorators as one. */
const all =
  (decorators: PropertyDecorator[]): PropertyDecorator =>
  (target, key) =>
    decorators.forEach((decorate) => decorate(target, key));

export class GroundMotionRecordDto implements GroundMotionRecord {
  @isNumber('timeStep', 's')
  timeStep!: number;

  @IsArray({ message: 'accelerations must be a list of numbers, one per step' })
  @ArrayMinSize(HISTORY_LIMITS.minRecordSteps, {
    message: `accelerations must have at least ${HISTORY_LIMITS.minRecordSteps} values`,
  })
  @ArrayMaxSize(HISTORY_LIMITS.maxRecordSteps, {
    message: `accelerations must have at most ${HISTORY_LIMITS.maxRecordSteps} values`,
  })
  accelerations!: number[];

  @IsIn(ACCELERATION_UNITS, { message: `units must be one of ${ACCELERATION_UNITS.join(', ')}` })
  units!: AccelerationUnits;
}

const recordField = () => [
  IsDefined({ message: 'record must be given' }),
  IsObject({ message: 'record must be an object { timeStep, accelerations, units }' }),
  ValidateNested(),
  Type(() => GroundMotionRecordDto),
];

const dampingField = () =>
  isNumber('dampingRatio', 'a fraction of critical, from 0 to less than 1, e.g. 0.05');

const scaleField = () => [IsOmittable(), isNumber('scale', 'a multiplier of the record')];

/** `POST /api/free-vibration`. */
export class FreeVibrationDto implements FreeVibrationRequest {
  @all(storeysList())
  storeys!: StoreyDto[];

  @dampingField()
  dampingRatio!: number;

  @IsOmittable()
  @IsArray({ message: 'initialDisplacements must be a list of numbers (m), one per level' })
  initialDisplacements?: number[];

  @IsOmittable()
  @IsArray({ message: 'initialVelocities must be a list of numbers (m/s), one per level' })
  initialVelocities?: number[];

  @isNumber('duration', 's')
  duration!: number;

  @isNumber('timeStep', 's')
  timeStep!: number;
}

/** `POST /api/response-history`. */
export class ResponseHistoryDto implements ResponseHistoryRequest {
  @all(storeysList())
  storeys!: StoreyDto[];

  @dampingField()
  dampingRatio!: number;

  @all(recordField())
  record!: GroundMotionRecordDto;

  @all(scaleField())
  scale?: number;

  @IsOmittable()
  @IsInt({ message: 'modeCount must be a whole number' })
  @Min(1, { message: 'modeCount must be at least 1' })
  modeCount?: number;

  @IsOmittable()
  @IsBoolean({ message: 'full must be true or false' })
  full?: boolean;

  @IsOmittable()
  @IsInt({ message: 'animationFrames must be a whole number' })
  animationFrames?: number;
}

/** `POST /api/record-spectrum`. */
export class RecordSpectrumDto implements RecordSpectrumRequest {
  @all(recordField())
  record!: GroundMotionRecordDto;

  @dampingField()
  dampingRatio!: number;

  @IsArray({ message: 'periods must be a list of periods (s)' })
  @ArrayMinSize(1, { message: 'periods must have at least one period' })
  @ArrayMaxSize(HISTORY_LIMITS.maxSpectrumPeriods, {
    message: `periods must have at most ${HISTORY_LIMITS.maxSpectrumPeriods} periods`,
  })
  periods!: number[];

  @all(scaleField())
  scale?: number;
}

export class StoredGroundMotionRecordDto
  extends GroundMotionRecordDto
  implements StoredGroundMotionRecord
{
  @IsString({ message: 'name must be text' })
  @MaxLength(200, { message: 'name must be at most 200 characters' })
  name!: string;

  @IsIn(['upload', 'demo'], { message: 'origin must be "upload" or "demo"' })
  origin!: 'upload' | 'demo';
}

export class FreeVibrationSetupDto implements FreeVibrationSetup {
  @IsFreeVibrationStart()
  start!: FreeVibrationStart;

  @isNumber('duration', 's')
  duration!: number;

  @isNumber('timeStep', 's')
  timeStep!: number;
}

/** What is wrong with a free vibration's start, or null. */
export function startProblem(value: unknown): string | null {
  if (typeof value !== 'object' || value === null) {
    return 'must be { "kind": "mode", "mode", "amplitude" } or { "kind": "shape", "displacements" }';
  }
  const start = value as Record<string, unknown>;
  const keys = Object.keys(start).sort().join(',');
  if (start.kind === 'mode') {
    if (keys !== 'amplitude,kind,mode')
      return 'a mode start has exactly "kind", "mode" and "amplitude"';
    if (!Number.isInteger(start.mode) || (start.mode as number) < 1) {
      return 'mode must be a whole number from 1';
    }
    const amplitude = start.amplitude;
    return typeof amplitude === 'number' && Number.isFinite(amplitude) && amplitude !== 0
      ? null
      : 'amplitude must be a number other than 0 (m)';
  }
  if (start.kind === 'shape') {
    if (keys !== 'displacements,kind')
      return 'a shape start has exactly "kind" and "displacements"';
    const values = start.displacements;
    if (!Array.isArray(values) || values.length < 1 || values.length > ANALYSIS_LIMITS.maxStoreys) {
      return 'displacements must be a list of numbers (m), one per level';
    }
    const bad = values.findIndex((v) => typeof v !== 'number' || !Number.isFinite(v));
    if (bad >= 0) return `displacements[${bad}] (level ${bad + 1}) must be a number (m)`;
    return values.some((v) => v !== 0) ? null : 'displacements must not all be 0';
  }
  return 'kind must be "mode" or "shape"';
}

function IsFreeVibrationStart(): PropertyDecorator {
  return (target, propertyName) =>
    registerDecorator({
      name: 'isFreeVibrationStart',
      target: target.constructor,
      propertyName: propertyName as string,
      validator: {
        validate: (value: unknown) => startProblem(value) === null,
        defaultMessage: (args) => startProblem(args?.value) ?? 'is not valid',
      },
    });
}

/** What is wrong with a record's scaling, or null. */
export function scalingProblem(value: unknown): string | null {
  if (typeof value !== 'object' || value === null) {
    return 'must be { "method": "factor", "factor" } or { "method": "spectrum", "rule", "periodRange" }';
  }
  const scaling = value as Record<string, unknown>;
  const keys = Object.keys(scaling).sort().join(',');
  if (scaling.method === 'factor') {
    if (keys !== 'factor,method') return 'a factor scaling has exactly "method" and "factor"';
    const factor = scaling.factor;
    return typeof factor === 'number' && factor > 0 && factor <= HISTORY_LIMITS.maxScale
      ? null
      : `factor must be a number greater than 0 and at most ${HISTORY_LIMITS.maxScale}`;
  }
  if (scaling.method === 'spectrum') {
    if (keys !== 'method,periodRange,rule') {
      return 'a spectrum scaling has exactly "method", "rule" and "periodRange"';
    }
    if (scaling.rule !== 'mean' && scaling.rule !== 'not-below-90') {
      return 'rule must be "mean" or "not-below-90"';
    }
    const range = scaling.periodRange;
    const ok =
      Array.isArray(range) &&
      range.length === 2 &&
      range.every((t) => typeof t === 'number' && Number.isFinite(t)) &&
      (range[0] as number) > 0 &&
      (range[1] as number) > (range[0] as number) &&
      (range[1] as number) <= HISTORY_LIMITS.maxSpectrumPeriod;
    return ok
      ? null
      : `periodRange must be two periods in s, 0 < from < to <= ${HISTORY_LIMITS.maxSpectrumPeriod}`;
  }
  return 'method must be "factor" or "spectrum"';
}

function IsRecordScaling(): PropertyDecorator {
  return (target, propertyName) =>
    registerDecorator({
      name: 'isRecordScaling',
      target: target.constructor,
      propertyName: propertyName as string,
      validator: {
        validate: (value: unknown) => scalingProblem(value) === null,
        defaultMessage: (args) => scalingProblem(args?.value) ?? 'is not valid',
      },
    });
}

/** A calc's `history` (PATCH /api/calculations/:id). */
export class ResponseHistorySetupDto implements ResponseHistorySetup {
  @IsDefined({ message: 'record must be given' })
  @IsObject({
    message: 'record must be an object { name, origin, timeStep, accelerations, units }',
  })
  @ValidateNested()
  @Type(() => StoredGroundMotionRecordDto)
  record!: StoredGroundMotionRecordDto;

  @IsRecordScaling()
  scaling!: RecordScaling;

  @IsOmittable()
  @IsObject({ message: 'freeVibration must be an object { start, duration, timeStep }' })
  @ValidateNested()
  @Type(() => FreeVibrationSetupDto)
  freeVibration?: FreeVibrationSetupDto;
}
