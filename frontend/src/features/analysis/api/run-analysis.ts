import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { AnalysisRequest, AnalysisSummary } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

/** The summary: the screens that show per-mode responses or rho fetch them (modal-detail.ts). */
export async function runAnalysis(body: AnalysisRequest): Promise<AnalysisSummary> {
  const { data } = await api.post<AnalysisSummary>('/analysis', body, {
    params: { detail: 'summary' },
  });
  return data;
}

/** Results together with the inputs they were computed from. */
export interface AnalysedInputs {
  inputs: AnalysisRequest;
  result: AnalysisSummary;
}

/**
 * The analysis of the given inputs; null while they are not valid. Keeps the last results shown
 * while new ones are computed, each with its own inputs, so nothing is drawn against inputs it
 * was not computed from.
 */
export function useAnalysis(request: AnalysisRequest | null) {
  return useQuery({
    queryKey: ['analysis', request],
    queryFn: async (): Promise<AnalysedInputs> => {
      const inputs = request as AnalysisRequest;
      return { inputs, result: await runAnalysis(inputs) };
    },
    enabled: request !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}
