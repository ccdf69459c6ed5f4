import { useMutation } from '@tanstack/react-query';
import type { DecimalMark, DisplayUnits, StoreyImportResponse } from '@tiermode/shared-types';
import { AxiosError } from 'axios';
import { api } from '@/lib/api-client';

/** A read table, or the server's refusal: the preview rows and problems come with a 400 too. */
export type ImportOutcome = StoreyImportResponse & { messages: string[] };

export function useImportStoreys(onProgress: (fraction: number) => void) {
  return useMutation({
    mutationFn: async ({
      file,
      units,
      decimal,
    }: {
      file: File;
      units: DisplayUnits;
      /** Unset: as the file's cells settle it. */
      decimal?: DecimalMark;
    }) => {
      const form = new FormData();
      form.append('units', units);
      if (decimal) form.append('decimal', decimal);
      form.append('file', file);
      try {
        const { data } = await api.post<StoreyImportResponse>('/imports/storeys', form, {
          onUploadProgress: (e) => e.total && onProgress(e.loaded / e.total),
        });
        return { ...data, messages: [] } satisfies ImportOutcome;
      } catch (error) {
        const body: unknown = error instanceof AxiosError ? error.response?.data : undefined;
        if (error instanceof AxiosError && error.response?.status === 400 && body) {
          const refused = body as Partial<StoreyImportResponse> & { message?: string[] };
          return {
            storeys: refused.storeys ?? [],
            errors: refused.errors ?? [],
            readAs: refused.readAs ?? { delimiter: null, decimal: null },
            messages: refused.message ?? [],
          } satisfies ImportOutcome;
        }
        throw error;
      }
    },
  });
}

export const templateUrl = (format: 'csv' | 'xlsx', units: DisplayUnits) =>
  `/imports/storeys/template.${format}?units=${units}`;
