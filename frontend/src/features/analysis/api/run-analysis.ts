import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { AnalysisRequest, AnalysisResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export async function runAnalysis(body: AnalysisRequest): Promise<AnalysisResponse> {
  const { data } = await api.post<AnalysisResponse>('/analysis', body);
  return data;
}

/** Results together with the inputs they were computed from. */
export interface AnalysedInputs {
  inputs: AnalysisRequest;
  result: AnalysisResponse;
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
