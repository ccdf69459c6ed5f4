import { useQuery } from '@tanstack/react-query';
import type { LibraryEntryDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export function useLibrary() {
  return useQuery({
    queryKey: ['library'],
    queryFn: async () => (await api.get<LibraryEntryDto[]>('/library')).data,
  });
}
