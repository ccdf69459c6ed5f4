import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CreateUserRequest, UserDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';
import { usersQueryKey } from './get-users';

export async function createUser(body: CreateUserRequest): Promise<UserDto> {
  const { data } = await api.post<UserDto>('/users', body);
  return data;
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
