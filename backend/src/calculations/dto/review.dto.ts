import type { LockCalculationRequest, ReturnCalculationRequest } from '@tiermode/shared-types';
import { Transform } from 'class-transformer';
import { IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { trim } from '../../common/validation/trim';

export class ReturnCalculationDto implements ReturnCalculationRequest {
  @Transform(trim)
  @IsString({ message: 'comment must be a string' })
  @IsNotEmpty({ message: 'comment must say what the designer should change' })
  @MaxLength(10_000, { message: 'comment must be at most 10000 characters' })
  comment!: string;
}

export class LockCalculationDto implements LockCalculationRequest {
  @Transform(trim)
  @IsString({ message: 'statement must be a string' })
  @IsNotEmpty({ message: 'statement must state what you accept' })
  @MaxLength(5_000, { message: 'statement must be at most 5000 characters' })
  statement!: string;
}
