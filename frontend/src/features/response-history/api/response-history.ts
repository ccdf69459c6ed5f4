import { keepPreviousData, useMutation, useQuery } from '@tanstack/react-query';
import type {
  AccelerationUnits,
  DecimalMark,
  DemoRecordResponse,
  FreeVibrationRequest,
  FreeVibrationResponse,
  RecordImportResponse,
  RecordSpectrumRequest,
  RecordSpectrumResponse,
  ResponseHistoryRequest,
  ResponseHistoryResponse,
  ResponseHistoryResult,
} from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

/**
 * The response history a calc keeps (its own route: the histories are most of a calc's size),
 * named by the time it was analysed, so a new analysis fetches anew.
 */
export function useStoredHistoryResults(id: string, kept: boolean, analysedAt: string | null) {
  return useQuery({
    queryKey: ['calculation', id, 'history-results', analysedAt],
    queryFn: async () =>
      (await api.get<ResponseHistoryResult>(`/calculations/${id}/history-results`)).data,
    enabled: kept,
    staleTime: Infinity,
  });
}

/** The built-in invented demo record. */
export function useDemoRecord(enabled: boolean) {
  return useQuery({
    queryKey: ['records', 'demo'],
    queryFn: async () => (await api.get<DemoRecordResponse>('/records/demo')).data,
    enabled,
    staleTime: Infinity,
  });
}

/** Reads an uploaded record file on the server; nothing is stored. */
export function useImportRecord() {
  return useMutation({
    mutationFn: async (upload: {
      file: File;
      units: AccelerationUnits;
      timeStep?: number;
      decimal?: DecimalMark;
    }) => {
      const form = new FormData();
      form.append('units', upload.units);
      if (upload.timeStep !== undefined) form.append('timeStep', String(upload.timeStep));
      if (upload.decimal) form.append('decimal', upload.decimal);
      form.append('file', upload.file);
      return (await api.post<RecordImportResponse>('/imports/record', form)).data;
    },
  });
}

/** A POST whose answer depends only on its body, kept while the next is fetched. */
function usePosted<Req, Res>(path: string, request: Req | null) {
  return useQuery({
    queryKey: [path, request],
    queryFn: async () => (await api.post<Res>(path, request)).data,
    enabled: request !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    retry: false,
  });
}

export const useFreeVibration = (request: FreeVibrationRequest | null) =>
  usePosted<FreeVibrationRequest, FreeVibrationResponse>('/free-vibration', request);

export const useRecordSpectrum = (request: RecordSpectrumRequest | null) =>
  usePosted<RecordSpectrumRequest, RecordSpectrumResponse>('/record-spectrum', request);

export const useResponseHistory = (request: ResponseHistoryRequest | null) =>
  usePosted<ResponseHistoryRequest, ResponseHistoryResponse>('/response-history', request);
