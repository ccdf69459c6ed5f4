import { useMutation } from '@tanstack/react-query';
import type { UserDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

/** Mails the person a new set-password link; any link sent before stops working. */
export function useSendSetPasswordLink() {
  return useMutation({
    mutationFn: async (user: UserDto) =>
      (await api.post<UserDto>(`/users/${user.id}/set-password-link`)).data,
  });
}
