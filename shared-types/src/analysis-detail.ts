import type { AnalysisResponse, ModalResponse, ModeResult } from './analysis';

/**
 * How much of an analysis an answer carries (the `detail` query parameter):
 * - `summary`: the modes with their shapes, participation and modal base shear, the combined
 *   responses, warnings and flags; no per-mode storey vectors and no correlation matrix. These two
 *   are N x 5N and N x N numbers, over 80% of the answer for a tall building.
 * - `full`: everything, as `POST /api/analysis` has always answered (api-contract.md).
 */
export const ANALYSIS_DETAILS = ['summary', 'full'] as const;
export type AnalysisDetail = (typeof ANALYSIS_DETAILS)[number];

/** A mode without its per-storey responses. */
export type ModeSummary = Omit<ModeResult, 'response'> & {
  /** N, this mode's base shear (signed as its shape). */
  baseShear: number;
};

/** The lean answer: see `AnalysisDetail`. */
export type AnalysisSummary = Omit<AnalysisResponse, 'modes' | 'correlation'> & {
  modes: ModeSummary[];
  detail: 'summary';
};

/** The part a summary leaves out: each mode's storey responses, and the correlation matrix. */
export interface ModalDetail {
  modes: { number: number; response: ModalResponse }[];
  /** rho_ij of the modes used. */
  correlation: number[][];
  engineVersion: string;
}

/** The summary of a whole analysis (pure; the input is not changed). */
export function summariseAnalysis(full: AnalysisResponse): AnalysisSummary {
  const { modes, correlation, ...rest } = full;
  return {
    ...rest,
    modes: modes.map(({ response, ...mode }) => ({ ...mode, baseShear: response.baseShear })),
    detail: 'summary',
  };
}

/** What `summariseAnalysis` leaves out. */
export function modalDetailOf(full: AnalysisResponse): ModalDetail {
  return {
    modes: full.modes.map((m) => ({ number: m.number, response: m.response })),
    correlation: full.correlation,
    engineVersion: full.engineVersion,
  };
}

/**
 * A summary and its detail put back together, as the whole analysis; null when the detail is of
 * other modes than the summary (a detail fetched for an older analysis, say).
 */
export function joinAnalysis(
  summary: AnalysisSummary,
  detail: ModalDetail,
): AnalysisResponse | null {
  if (
    detail.engineVersion !== summary.engineVersion ||
    detail.modes.length !== summary.modes.length ||
    detail.modes.some((m, i) => m.number !== summary.modes[i].number) ||
    detail.modes.some((m, i) => m.response.baseShear !== summary.modes[i].baseShear)
  ) {
    return null;
  }
  const { detail: level, ...rest } = summary;
  return {
    ...rest,
    modes: summary.modes.map(({ baseShear, ...mode }, i) => ({
      ...mode,
      response: detail.modes[i].response,
    })),
    correlation: detail.correlation,
  };
}

/** The query of the routes that answer with an analysis. */
export interface AnalysisDetailQuery {
  /** `summary` or `full`; each route says which is its default. */
  detail?: AnalysisDetail;
}

/** An analysis as a route answers it: whole, or its summary when `detail=summary`. */
export type AnalysisAnswer = AnalysisResponse | AnalysisSummary;
