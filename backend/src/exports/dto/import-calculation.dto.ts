import { Type } from 'class-transformer';
import { Allow, IsDefined, IsIn, IsObject, ValidateNested } from 'class-validator';
import { CreateCalculationDto } from '../../calculations/dto/calculation.dto';

/** The `calculation` part of an export: what a new draft takes, and the record it ignores. */
class ExportedCalculationDto extends CreateCalculationDto {
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
  @Allow() historyResults?: unknown;
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
