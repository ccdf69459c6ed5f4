import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { LoginRequest, LoginResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';
import { writeSession } from '@/lib/session';

export async function login(body: LoginRequest): Promise<LoginResponse> {
  const { data } = await api.post<LoginResponse>('/auth/login', body);
  return data;
}

/** Signs in, keeps the token and drops whatever another user's session had cached. */
export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (response) => {
      queryClient.clear();
      writeSession({ accessToken: response.accessToken, expiresAt: response.expiresAt });
    },
  });
}
