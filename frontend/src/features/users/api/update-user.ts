import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { UpdateUserRequest, UserDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';
import { usersQueryKey } from './get-users';

export async function updateUser(id: string, body: UpdateUserRequest): Promise<UserDto> {
  const { data } = await api.patch<UserDto>(`/users/${id}`, body);
  return data;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: { id: string; body: UpdateUserRequest }) => updateUser(id, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
