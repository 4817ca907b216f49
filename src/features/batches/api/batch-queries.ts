import { useMutation } from '@tanstack/react-query';
import type { BatchDto, CreateBatchInput } from '@shared/schemas/batches';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { batchQueries } from '@/lib/queries';

export { batchQueries };

export const useCreateBatch = () =>
  useMutation({
    mutationFn: async (v: CreateBatchInput) => (await api.post<{ batch: BatchDto }>('/batches', v)).batch,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: batchQueries.all().queryKey }),
  });
