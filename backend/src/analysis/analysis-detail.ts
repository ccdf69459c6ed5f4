import { BadRequestException } from '@nestjs/common';
import { ANALYSIS_DETAILS, type AnalysisDetail } from '@tiermode/shared-types';

/**
 * The `detail` query parameter of a route that answers with an analysis, or the route's default
 * when it is absent; anything else is the caller's 400, naming the parameter.
 */
export function parseAnalysisDetail(value: unknown, fallback: AnalysisDetail): AnalysisDetail {
  if (value === undefined || value === '') return fallback;
  if (typeof value === 'string' && (ANALYSIS_DETAILS as readonly string[]).includes(value)) {
    return value as AnalysisDetail;
  }
  throw new BadRequestException([`detail must be one of ${ANALYSIS_DETAILS.join(', ')}`]);
}
