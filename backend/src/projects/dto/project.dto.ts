import {
  CODE_BASES,
  type CodeBasis,
  type CreateProjectRequest,
  type UpdateProjectRequest,
} from '@tiermode/shared-types';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsString,
  IsUUID,
  MaxLength,
  Min,
  ValidateIf,
} from 'class-validator';
import { trim } from '../../common/validation/trim';
import { IsOmittable } from '../../common/validation/is-omittable';

export class CreateProjectDto implements CreateProjectRequest {
  @Transform(trim)
  @IsString({ message: 'name must be a string' })
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(200, { message: 'name must be at most 200 characters' })
  name!: string;

  @IsOmittable()
  @Transform(trim)
  @IsString({ message: 'site must be a string' })
  @MaxLength(1000, { message: 'site must be at most 1000 characters' })
  site?: string;

  @IsOmittable()
  @IsIn(CODE_BASES, { message: `codeBasis must be one of ${CODE_BASES.join(', ')}` })
  codeBasis?: CodeBasis;

  @IsOmittable()
  @Transform(trim)
  @IsString({ message: 'structuralSystem must be a string' })
  @MaxLength(120, { message: 'structuralSystem must be at most 120 characters' })
  structuralSystem?: string;
}

export class UpdateProjectDto implements UpdateProjectRequest {
  @IsOmittable()
  @IsInt({ message: 'version must be an integer' })
  @Min(1, { message: 'version must be at least 1' })
  version?: number;

  @IsOmittable()
  @Transform(trim)
  @IsString({ message: 'name must be a string' })
  @IsNotEmpty({ message: 'name must not be empty' })
  @MaxLength(200, { message: 'name must be at most 200 characters' })
  name?: string;

  @IsOmittable()
  @Transform(trim)
  @ValidateIf((_, value) => value !== null)
  @IsString({ message: 'site must be a string' })
  @MaxLength(1000, { message: 'site must be at most 1000 characters' })
  site?: string | null;

  @IsOmittable()
  @IsIn(CODE_BASES, { message: `codeBasis must be one of ${CODE_BASES.join(', ')}` })
  codeBasis?: CodeBasis;

  @IsOmittable()
  @Transform(trim)
  @ValidateIf((_, value) => value !== null)
  @IsString({ message: 'structuralSystem must be a string' })
  @MaxLength(120, { message: 'structuralSystem must be at most 120 characters' })
  structuralSystem?: string | null;

  @IsOmittable()
  @IsArray({ message: 'memberIds must be a list of user ids' })
  @ArrayMinSize(1, { message: 'memberIds must list at least one designer' })
  @ArrayMaxSize(200, { message: 'memberIds must list at most 200 designers' })
  @IsUUID('all', { each: true, message: 'memberIds must hold user ids (UUIDs)' })
  memberIds?: string[];
}
