import { useQuery } from '@tanstack/react-query';
import type { MailMessageDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export function useOutbox() {
  return useQuery({
    queryKey: ['outbox'],
    queryFn: async () => (await api.get<MailMessageDto[]>('/mail/outbox')).data,
    refetchInterval: 10_000,
  });
}
