import type {
  ColumnFixity,
  ColumnGroupInput,
  ColumnStiffnessRequest,
} from '@tiermode/shared-types';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsInt,
  IsNumber,
  IsPositive,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';

const FINITE = { allowNaN: false, allowInfinity: false };

export class ColumnGroupDto implements ColumnGroupInput {
  @IsNumber(FINITE, { message: 'elasticModulus must be a number (Pa)' })
  @IsPositive({ message: 'elasticModulus must be a positive number (Pa)' })
  elasticModulus!: number;

  @IsNumber(FINITE, { message: 'secondMoment must be a number (m^4)' })
  @IsPositive({ message: 'secondMoment must be a positive number (m^4)' })
  secondMoment!: number;

  @IsInt({ message: 'count must be a whole number' })
  @Min(1, { message: 'count must be at least 1' })
  @Max(10_000, { message: 'count must be at most 10000' })
  count!: number;

  @IsIn(['fixed-fixed', 'fixed-pinned'], {
    message: 'fixity must be "fixed-fixed" or "fixed-pinned"',
  })
  fixity!: ColumnFixity;
}

export class ColumnStiffnessDto implements ColumnStiffnessRequest {
  @IsNumber(FINITE, { message: 'height must be a number (m)' })
  @IsPositive({ message: 'height must be a positive number (m)' })
  height!: number;

  @IsArray({ message: 'columns must be a list of column groups' })
  @ArrayMinSize(1, { message: 'columns must list at least one column group' })
  @ArrayMaxSize(100, { message: 'columns must list at most 100 column groups' })
  @ValidateNested({ each: true })
  @Type(() => ColumnGroupDto)
  columns!: ColumnGroupDto[];
}
