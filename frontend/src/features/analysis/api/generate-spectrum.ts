import { useMutation } from '@tanstack/react-query';
import type { SpectrumGenerateRequest, SpectrumGenerateResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export async function generateSpectrum(
  body: SpectrumGenerateRequest,
): Promise<SpectrumGenerateResponse> {
  const { data } = await api.post<SpectrumGenerateResponse>('/spectra/generate', body);
  return data;
}

export function useGenerateSpectrum() {
  return useMutation({ mutationFn: generateSpectrum });
}
