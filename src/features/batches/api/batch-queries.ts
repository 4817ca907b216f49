import { queryOptions, useMutation } from '@tanstack/react-query';
import type { BatchDto, CreateBatchInput } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

export const batchQueries = {
  all: () => ({ queryKey: ['batches'] as const }),
  list: () => queryOptions({ queryKey: ['batches', 'list'], queryFn: async () => (await api.get<{ batches: BatchDto[] }>('/batches')).batches }),
  detail: (id: number) =>
    queryOptions({ queryKey: ['batches', 'detail', id], queryFn: async () => (await api.get<{ batch: BatchDto }>(`/batches/${id}`)).batch }),
};

export const useCreateBatch = () =>
  useMutation({
    mutationFn: async (v: CreateBatchInput) => (await api.post<{ batch: BatchDto }>('/batches', v)).batch,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: batchQueries.all().queryKey }),
  });
