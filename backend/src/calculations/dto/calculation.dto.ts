import { ResponseHistorySetupDto } from '../../analysis/dto/history.dto';
import {
  DISPLAY_UNITS,
  type CodeBasisParameters,
  type CreateCalculationRequest,
  type DisplayUnits,
  type UpdateCalculationRequest,
} from '@tiermode/shared-types';
import { Transform, Type } from 'class-transformer';
import {
  IsDefined,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsObject,
  IsString,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';
import { AnalysisRequestDto } from '../../analysis/dto/analysis-request.dto';
import { CodeBasisDto } from '../../analysis/dto/checks-request.dto';
import { trim } from '../../common/validation/trim';
import { IsOmittable } from '../../common/validation/is-omittable';

export class CreateCalculationDto implements CreateCalculationRequest {
  @Transform(trim)
  @IsString({ message: 'title must be a string' })
  @IsNotEmpty({ message: 'title must not be empty' })
  @MaxLength(200, { message: 'title must be at most 200 characters' })
  title!: string;

  @IsDefined({ message: 'inputs must be given' })
  @IsObject({ message: 'inputs must be an object { storeys, spectrum, dampingRatio }' })
  @ValidateNested()
  @Type(() => AnalysisRequestDto)
  inputs!: AnalysisRequestDto;

  @IsOmittable()
  @IsIn(DISPLAY_UNITS, { message: 'displayUnits must be "SI" or "US"' })
  displayUnits?: DisplayUnits;

  @IsOmittable()
  @ValidateIf((_, value) => value !== null)
  @IsObject({ message: 'history must be an object { record, scaling, freeVibration? } or null' })
  @ValidateNested()
  @Type(() => ResponseHistorySetupDto)
  history?: ResponseHistorySetupDto | null;
}

export class UpdateCalculationDto implements UpdateCalculationRequest {
  @IsInt({ message: 'version must be the integer version the calculation was read at' })
  @Min(1, { message: 'version must be at least 1' })
  version!: number;

  @IsOmittable()
  @Transform(trim)
  @IsString({ message: 'title must be a string' })
  @IsNotEmpty({ message: 'title must not be empty' })
  @MaxLength(200, { message: 'title must be at most 200 characters' })
  title?: string;

  @IsOmittable()
  @IsObject({ message: 'inputs must be an object { storeys, spectrum, dampingRatio }' })
  @ValidateNested()
  @Type(() => AnalysisRequestDto)
  inputs?: AnalysisRequestDto;

  @IsOmittable()
  @IsIn(DISPLAY_UNITS, { message: 'displayUnits must be "SI" or "US"' })
  displayUnits?: DisplayUnits;

  @IsOmittable()
  @ValidateIf((_, value) => value !== null)
  @IsObject({ message: 'basis must be an object { code, ... } or null' })
  @ValidateNested()
  @Type(() => CodeBasisDto)
  basis?: (CodeBasisParameters & CodeBasisDto) | null;

  @IsOmittable()
  @ValidateIf((_, value) => value !== null)
  @IsObject({ message: 'history must be an object { record, scaling, freeVibration? } or null' })
  @ValidateNested()
  @Type(() => ResponseHistorySetupDto)
  history?: ResponseHistorySetupDto | null;
}
