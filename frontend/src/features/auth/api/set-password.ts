import { useMutation } from '@tanstack/react-query';
import type { SetPasswordRequest } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export async function setPassword(body: SetPasswordRequest): Promise<void> {
  await api.post('/auth/set-password', body);
}

export function useSetPassword() {
  return useMutation({ mutationFn: setPassword });
}
