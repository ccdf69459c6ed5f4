import { useQuery } from '@tanstack/react-query';
import type { MeResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export const meQueryKey = ['auth', 'me'] as const;

export async function getMe(): Promise<MeResponse> {
  const { data } = await api.get<MeResponse>('/auth/me');
  return data;
}

/** The signed-in user and its rules; refetched when the window regains focus. */
export function useMe(enabled: boolean) {
  return useQuery({ queryKey: meQueryKey, queryFn: getMe, enabled, staleTime: 60_000 });
}
