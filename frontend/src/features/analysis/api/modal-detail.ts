import { useQuery } from '@tanstack/react-query';
import {
  joinAnalysis,
  modalDetailOf,
  type AnalysisRequest,
  type AnalysisResponse,
  type AnalysisSummary,
  type ModalDetail,
} from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

/**
 * Where the per-mode storey responses and the correlation matrix of a summary come from: the
 * analysis answers carry neither (they are most of the bytes of a tall building's answer), so the
 * screens that show them fetch them, and only when shown.
 */
export interface ModalDetailSource {
  /** Names the analysis the detail belongs to (a query key). */
  key: readonly unknown[];
  load: () => Promise<ModalDetail>;
}

/** For a stateless analysis: the same request again, whole this time. */
export function statelessModalDetail(request: AnalysisRequest): ModalDetailSource {
  return {
    key: ['analysis', request],
    load: async () =>
      modalDetailOf(
        (await api.post<AnalysisResponse>('/analysis', request, { params: { detail: 'full' } }))
          .data,
      ),
  };
}

/** The detail once `enabled` (the screen that shows it is on view); kept for the session. */
export function useModalDetail(source: ModalDetailSource, enabled: boolean) {
  return useQuery({
    queryKey: ['modal-detail', ...source.key],
    queryFn: source.load,
    enabled,
    staleTime: Infinity,
  });
}

/**
 * The whole analysis, once its detail has come: the summary and the detail put back together,
 * or an error when the detail is of another analysis than the summary shown (never drawn).
 */
export function useWholeAnalysis(
  summary: AnalysisSummary,
  source: ModalDetailSource,
  enabled: boolean,
) {
  const query = useModalDetail(source, enabled);
  const whole = query.data ? joinAnalysis(summary, query.data) : undefined;
  return {
    whole: whole ?? undefined,
    loading: enabled && query.isPending,
    error: query.isError
      ? query.error
      : whole === null
        ? new Error(
            'The per-mode values fetched are of another analysis than the one shown; reload the page',
          )
        : null,
  };
}
