import { useMutation } from '@tanstack/react-query';
import type { SpectrumImportResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export function useImportSpectrum() {
  return useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return (await api.post<SpectrumImportResponse>('/imports/spectrum', form)).data;
    },
  });
}
