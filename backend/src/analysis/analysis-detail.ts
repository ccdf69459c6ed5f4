import { BadRequestException } from '@nestjs/common';
import {
  ANALYSIS_DETAILS,
  summariseAnalysis,
  type AnalysisAnswer,
  type AnalysisDetail,
  type AnalysisResponse,
} from '@tiermode/shared-types';

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

/** The analysis as much as the caller asked for. */
export function analysisAnswer(full: AnalysisResponse, detail: AnalysisDetail): AnalysisAnswer {
  return detail === 'full' ? full : summariseAnalysis(full);
}
