import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AnalysisSummary,
  ModalDetail,
  AuditEventDto,
  CalculationChanges,
  CalculationDto,
  CalculationInputs,
  CalculationListQuery,
  CalculationSummaryDto,
  CreateCalculationRequest,
  CreateCommentRequest,
  DisplayUnits,
  SealCheckResponse,
  UpdateCalculationRequest,
} from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export const calculationKeys = {
  all: ['calculations'] as const,
  list: (query: CalculationListQuery) => ['calculations', 'list', query] as const,
  one: (id: string) => ['calculations', id] as const,
  seal: (id: string) => ['calculations', id, 'seal'] as const,
  history: (id: string) => ['calculations', id, 'history'] as const,
};

export function useCalculations(query: CalculationListQuery) {
  return useQuery({
    queryKey: calculationKeys.list(query),
    queryFn: async () =>
      (await api.get<CalculationSummaryDto[]>('/calculations', { params: query })).data,
    placeholderData: keepPreviousData,
  });
}

export function useCalculation(id: string) {
  return useQuery({
    queryKey: calculationKeys.one(id),
    queryFn: async () => (await api.get<CalculationDto>(`/calculations/${id}`)).data,
    retry: false,
  });
}

export function useSeal(id: string, enabled: boolean) {
  return useQuery({
    queryKey: calculationKeys.seal(id),
    queryFn: async () => (await api.get<SealCheckResponse>(`/calculations/${id}/seal`)).data,
    enabled,
  });
}

/** What changed since the last submission or the previous revision (null: not asked). */
export function useChanges(id: string, since: 'submission' | 'revision' | null) {
  return useQuery({
    queryKey: [...calculationKeys.one(id), 'changes', since] as const,
    queryFn: async () =>
      (await api.get<CalculationChanges>(`/calculations/${id}/changes`, { params: { since } }))
        .data,
    enabled: since !== null,
  });
}

export function useHistory(id: string) {
  return useQuery({
    queryKey: calculationKeys.history(id),
    queryFn: async () => (await api.get<AuditEventDto[]>(`/calculations/${id}/history`)).data,
  });
}

/** After any change: the calc, its history and every list are refetched. */
function useRefresh() {
  const client = useQueryClient();
  return (calc?: CalculationDto) => {
    if (calc) client.setQueryData(calculationKeys.one(calc.id), calc);
    return client.invalidateQueries({ queryKey: calculationKeys.all });
  };
}

export function useCreateCalculation(projectId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (body: CreateCalculationRequest) =>
      (await api.post<CalculationDto>(`/projects/${projectId}/calculations`, body)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

/** A document from "Whole calc (JSON)" becomes a new draft in the project. */
export function useImportCalculation(projectId: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (document: unknown) =>
      (await api.post<CalculationDto>(`/projects/${projectId}/calculations/import`, document)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

/** Keeps a file with a draft calc, reporting the upload's progress. */
export function useAttach(id: string, onProgress: (fraction: number) => void) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return (
        await api.post<CalculationDto>(`/calculations/${id}/attachments`, form, {
          onUploadProgress: (e) => e.total && onProgress(e.loaded / e.total),
        })
      ).data;
    },
    onSuccess: (calc) => refresh(calc),
  });
}

/** The calc's author takes a file back from a draft. */
export function useRemoveAttachment() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (attachmentId: string) =>
      (await api.delete<CalculationDto>(`/attachments/${attachmentId}`)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

/** The author throws away a draft that never went to review. */
export function useDeleteDraft(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      await api.delete(`/calculations/${id}`);
    },
    onSuccess: () => {
      client.removeQueries({ queryKey: calculationKeys.one(id) });
      return client.invalidateQueries({ queryKey: calculationKeys.all });
    },
  });
}

export function useSaveCalculation(id: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (body: UpdateCalculationRequest) =>
      (await api.patch<CalculationDto>(`/calculations/${id}`, body)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

/**
 * Where the stored analysis's per-mode storey responses and rho come from (the calc carries its
 * summary): named by the calc and the time it was analysed, so a new analysis fetches anew.
 */
export function storedModalDetail(id: string, analysedAt: string | null) {
  return {
    key: ['calculation', id, 'modal-responses', analysedAt] as const,
    load: async () => (await api.get<ModalDetail>(`/calculations/${id}/modal-responses`)).data,
  };
}

/** Saves the inputs when they changed, then analyses what is stored. */
export function useSaveAndAnalyse(id: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (change: {
      version: number;
      inputs?: CalculationInputs;
      displayUnits?: DisplayUnits;
    }) => {
      if (change.inputs || change.displayUnits) {
        await api.patch<CalculationDto>(`/calculations/${id}`, change);
      }
      await api.post<AnalysisSummary>(`/calculations/${id}/analyse`, undefined, {
        params: { detail: 'summary' },
      });
      return (await api.get<CalculationDto>(`/calculations/${id}`)).data;
    },
    onSuccess: (calc) => refresh(calc),
    onError: () => refresh(),
  });
}

type Step = 'submit' | 'return' | 'lock' | 'revise';

/** submit, return { comment }, lock { statement } or revise (which answers with the new draft). */
export function useReviewStep(id: string, step: Step) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (body: object = {}) =>
      (await api.post<CalculationDto>(`/calculations/${id}/${step}`, body)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

export function useAddComment(id: string) {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async (body: CreateCommentRequest) =>
      (await api.post<CalculationDto>(`/calculations/${id}/comments`, body)).data,
    onSuccess: (calc) => refresh(calc),
  });
}

export function useResolveComment() {
  const refresh = useRefresh();
  return useMutation({
    mutationFn: async ({ commentId, resolved }: { commentId: string; resolved: boolean }) =>
      (await api.patch<CalculationDto>(`/comments/${commentId}`, { resolved })).data,
    onSuccess: (calc) => refresh(calc),
  });
}
