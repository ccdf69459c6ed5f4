import { useMutation } from '@tanstack/react-query';
import type { DecimalMark, SpectrumImportResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export function useImportSpectrum() {
  return useMutation({
    /** `decimal` unset: as the file's cells settle it. */
    mutationFn: async ({ file, decimal }: { file: File; decimal?: DecimalMark }) => {
      const form = new FormData();
      if (decimal) form.append('decimal', decimal);
      form.append('file', file);
      return (await api.post<SpectrumImportResponse>('/imports/spectrum', form)).data;
    },
  });
}
