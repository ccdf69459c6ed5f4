import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  CreateProjectRequest,
  ProjectDto,
  ProjectMemberDto,
  UpdateProjectRequest,
} from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export const projectKeys = {
  all: ['projects'] as const,
  one: (id: string) => ['projects', id] as const,
  designers: ['projects', 'designers'] as const,
};

export function useProjects() {
  return useQuery({
    queryKey: projectKeys.all,
    queryFn: async () => (await api.get<ProjectDto[]>('/projects')).data,
  });
}

export function useProject(id: string) {
  return useQuery({
    queryKey: projectKeys.one(id),
    queryFn: async () => (await api.get<ProjectDto>(`/projects/${id}`)).data,
    retry: false,
  });
}

export function useDesigners(enabled: boolean) {
  return useQuery({
    queryKey: projectKeys.designers,
    queryFn: async () => (await api.get<ProjectMemberDto[]>('/projects/designers')).data,
    enabled,
  });
}

export function useCreateProject() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (body: CreateProjectRequest) =>
      (await api.post<ProjectDto>('/projects', body)).data,
    onSuccess: () => client.invalidateQueries({ queryKey: projectKeys.all }),
  });
}

export function useUpdateProject(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (body: UpdateProjectRequest) =>
      (await api.patch<ProjectDto>(`/projects/${id}`, body)).data,
    onSuccess: (project) => {
      client.setQueryData(projectKeys.one(id), project);
      return client.invalidateQueries({ queryKey: projectKeys.all });
    },
  });
}
