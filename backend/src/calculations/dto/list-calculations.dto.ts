import {
  CALCULATION_STATUSES,
  type CalculationListQuery,
  type CalculationStatus,
} from '@tiermode/shared-types';
import { Transform, Type } from 'class-transformer';
import { IsIn, IsInt, IsUUID, Max, Min } from 'class-validator';
import { IsOmittable } from '../../common/validation/is-omittable';

/** `GET /api/calculations` query: every part optional (CalculationListQuery). */
export class ListCalculationsDto implements Omit<CalculationListQuery, 'status'> {
  /** Parsed from `status=draft,submitted`. */
  @IsOmittable()
  @Transform(({ value }: { value: unknown }) =>
    typeof value === 'string' ? value.split(',').map((s) => s.trim()) : value,
  )
  @IsIn(CALCULATION_STATUSES, {
    each: true,
    message: `status must be a comma-separated list of ${CALCULATION_STATUSES.join(', ')}`,
  })
  status?: CalculationStatus[];

  @IsOmittable()
  @IsIn(['me'], { message: 'author must be "me"' })
  author?: 'me';

  @IsOmittable()
  @IsIn(['me'], { message: 'notAuthor must be "me"' })
  notAuthor?: 'me';

  @IsOmittable()
  @IsUUID('all', { message: 'projectId must be a project id (UUID)' })
  projectId?: string;

  @IsOmittable()
  @Type(() => Number)
  @IsInt({ message: 'limit must be a whole number from 1 to 200' })
  @Min(1, { message: 'limit must be a whole number from 1 to 200' })
  @Max(200, { message: 'limit must be a whole number from 1 to 200' })
  limit?: number;
}
