import { useMutation } from '@tanstack/react-query';
import type { ColumnStiffnessRequest, ColumnStiffnessResponse } from '@tiermode/shared-types';
import { api } from '@/lib/api-client';

export async function columnStiffness(
  body: ColumnStiffnessRequest,
): Promise<ColumnStiffnessResponse> {
  const { data } = await api.post<ColumnStiffnessResponse>('/analysis/column-stiffness', body);
  return data;
}

export function useColumnStiffness() {
  return useMutation({ mutationFn: columnStiffness });
}
