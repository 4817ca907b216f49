import { queryOptions, useMutation } from '@tanstack/react-query';
import type { BatchDto } from '@shared/schemas/batches';
import type { CostingSettingsDto, CostingSheetDto, TrimDto, UpdateCostingSettingsInput, UpdateTrimInput } from '@shared/schemas/costing';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

export const costingQueries = {
  all: () => ({ queryKey: ['costing'] as const }),
  batches: () => queryOptions({ queryKey: ['costing', 'batches'], queryFn: async () => (await api.get<{ batches: BatchDto[] }>('/batches')).batches }),
  /** The sheet on the style's saved labour basis, the same figures on the batch page, costing page and workbook. */
  sheet: (batchId: number) =>
    queryOptions({
      queryKey: ['costing', 'sheet', batchId],
      queryFn: async () => (await api.get<{ costing: CostingSheetDto }>(`/batches/${batchId}/costing`)).costing,
    }),
  trims: (styleId: number) =>
    queryOptions({ queryKey: ['costing', 'trims', styleId], queryFn: async () => (await api.get<{ trims: TrimDto[] }>(`/costing/styles/${styleId}/trims`)).trims }),
};

const invalidate = () => queryClient.invalidateQueries({ queryKey: costingQueries.all().queryKey });

export const useUpdateTrim = () =>
  useMutation({
    mutationFn: ({ id, ...patch }: UpdateTrimInput & { id: number }) => api.put<{ trim: TrimDto }>(`/costing/trims/${id}`, patch),
    onSuccess: invalidate,
  });

export const useUpdateCostingSettings = () =>
  useMutation({
    mutationFn: ({ styleId, ...patch }: UpdateCostingSettingsInput & { styleId: number }) =>
      api.put<{ settings: CostingSettingsDto }>(`/costing/styles/${styleId}/settings`, patch),
    onSuccess: invalidate,
  });
