import { useQuery } from '@tanstack/react-query';
import type { UserDto } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export const usersQueryKey = ['users'] as const;

export async function getUsers(): Promise<UserDto[]> {
  const { data } = await api.get<UserDto[]>('/users');
  return data;
}

export function useUsers() {
  return useQuery({ queryKey: usersQueryKey, queryFn: getUsers });
}
