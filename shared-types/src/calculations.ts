import type { AnalysisRequest, AnalysisResponse } from './analysis';

export const CALCULATION_STATUSES = ['draft', 'submitted', 'locked', 'superseded'] as const;
export type CalculationStatus = (typeof CALCULATION_STATUSES)[number];

/** A calculation's inputs: the same shapes as `POST /api/analysis`. */
export type CalculationInputs = AnalysisRequest;

/** `GET /api/calculations/:id` and the items of `GET /api/projects/:id/calculations`. */
export interface CalculationDto {
  id: string;
  projectId: string;
  title: string;
  revision: number;
  status: CalculationStatus;
  inputs: CalculationInputs;
  /** The stored analysis of the inputs, or null until analysed. */
  analysis: AnalysisResponse | null;
  engineVersion: string | null;
  /** ISO times. */
  inputsChangedAt: string;
  analysedAt: string | null;
  /** True when the inputs changed after the stored analysis was made. */
  analysisStale: boolean;
  author: { id: string; name: string };
  createdAt: string;
  updatedAt: string;
  /** Optimistic-lock version; a PATCH carries the version it was read at. */
  version: number;
}

/** `POST /api/projects/:id/calculations`. */
export interface CreateCalculationRequest {
  title: string;
  inputs: CalculationInputs;
}

/** `PATCH /api/calculations/:id`. */
export interface UpdateCalculationRequest {
  version: number;
  title?: string;
  inputs?: CalculationInputs;
}
