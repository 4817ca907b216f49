import { queryOptions } from '@tanstack/react-query';
import type { BundleChoiceDto, BundleDto, DailyOutput, ProgressDto, TodayDto } from '@shared/schemas/floor';
import { api } from '@/lib/api-client';
import { batchQueries } from '@/lib/queries';

export const floorQueries = {
  all: () => ({ queryKey: ['floor'] as const }),
  today: () => queryOptions({ queryKey: ['floor', 'today'], queryFn: () => api.get<TodayDto>('/floor/me/today'), refetchInterval: 60_000 }),
  bundle: (number: number, batchId?: number) =>
    queryOptions({
      queryKey: ['floor', 'bundle', number, batchId ?? null],
      queryFn: async () => (await api.get<{ bundle: BundleDto }>(`/floor/bundles/lookup?number=${number}${batchId ? `&batchId=${batchId}` : ''}`)).bundle,
      retry: false,
    }),
  /** Every bundle with a typed number: more than one only for bundles cut before numbers were studio-wide. */
  matches: (number: number) =>
    queryOptions({
      queryKey: ['floor', 'bundle-matches', number],
      queryFn: async () => (await api.get<{ bundles: BundleChoiceDto[] }>(`/floor/bundles?number=${number}`)).bundles,
    }),
  batches: batchQueries.list,
  progress: (batchId: number) =>
    queryOptions({ queryKey: ['floor', 'progress', batchId], queryFn: async () => (await api.get<{ progress: ProgressDto }>(`/floor/progress/${batchId}`)).progress, refetchInterval: 30_000 }),
  daily: (batchId: number) =>
    queryOptions({ queryKey: ['floor', 'progress', batchId, 'daily'], queryFn: () => api.get<{ days: DailyOutput[] }>(`/floor/progress/${batchId}/daily`) }),
};
