import { DISPLAY_UNITS, type DisplayUnits } from '@tiermode/shared-types';
import { Transform, Type } from 'class-transformer';
import {
  Allow,
  IsDefined,
  IsIn,
  IsNotEmpty,
  IsObject,
  IsOptional,
  IsString,
  MaxLength,
  ValidateNested,
} from 'class-validator';
import { AnalysisRequestDto } from '../../analysis/dto/analysis-request.dto';
import { trim } from '../../common/validation/trim';

/** The `calculation` part of an export: what a new draft takes, and the record it ignores. */
class ExportedCalculationDto {
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

  @IsOptional()
  @IsIn(DISPLAY_UNITS, { message: 'displayUnits must be "SI" or "US"' })
  displayUnits?: DisplayUnits;

  // Kept in the file for the record; a new draft starts without them.
  @Allow() revision?: unknown;
  @Allow() status?: unknown;
  @Allow() projectName?: unknown;
  @Allow() author?: unknown;
  @Allow() reviewer?: unknown;
  @Allow() analysis?: unknown;
  @Allow() engineVersion?: unknown;
  @Allow() analysedAt?: unknown;
  @Allow() seal?: unknown;
  @Allow() comments?: unknown;
}

/** `POST /api/projects/:id/calculations/import`: a document from `GET .../export.json`. */
export class ImportCalculationDto {
  @IsIn(['tiermode-calculation'], {
    message: 'format must be "tiermode-calculation" (a file from Export as JSON)',
  })
  format!: string;

  @IsIn([1], { message: 'formatVersion must be 1' })
  formatVersion!: number;

  @Allow()
  exportedAt?: unknown;

  @IsDefined({ message: 'calculation must be given' })
  @IsObject({ message: 'calculation must be an object' })
  @ValidateNested()
  @Type(() => ExportedCalculationDto)
  calculation!: ExportedCalculationDto;
}
