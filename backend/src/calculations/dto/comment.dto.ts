import type { CreateCommentRequest, UpdateCommentRequest } from '@tiermode/shared-types';
import { Transform } from 'class-transformer';
import { IsBoolean, IsInt, IsNotEmpty, IsString, IsUUID, MaxLength, Min } from 'class-validator';
import { trim } from '../../common/validation/trim';
import { IsOmittable } from '../../common/validation/is-omittable';

export class CreateCommentDto implements CreateCommentRequest {
  @Transform(trim)
  @IsString({ message: 'body must be a string' })
  @IsNotEmpty({ message: 'body must not be empty' })
  @MaxLength(10_000, { message: 'body must be at most 10000 characters' })
  body!: string;

  @IsOmittable()
  @Transform(trim)
  @IsString({ message: 'target must be a string, e.g. "storey 3"' })
  @MaxLength(200, { message: 'target must be at most 200 characters' })
  target?: string;

  @IsOmittable()
  @IsInt({ message: 'storey must be a whole number (1 = the base)' })
  @Min(1, { message: 'storey must be 1 or more (1 = the base)' })
  storey?: number;

  @IsOmittable()
  @IsUUID('all', { message: 'parentId must be the id of a comment on this calculation' })
  parentId?: string;
}

export class UpdateCommentDto implements UpdateCommentRequest {
  @IsBoolean({ message: 'resolved must be true or false' })
  resolved!: boolean;
}
