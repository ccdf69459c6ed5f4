import { useQuery } from '@tanstack/react-query';
import type { VerificationCaseResult } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export async function getVerification(): Promise<VerificationCaseResult[]> {
  const { data } = await api.get<VerificationCaseResult[]>('/verification');
  return data;
}

export function useVerification() {
  return useQuery({ queryKey: ['verification'], queryFn: getVerification });
}
