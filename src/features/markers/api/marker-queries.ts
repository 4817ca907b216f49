import { queryOptions, useMutation } from '@tanstack/react-query';
import type { CreateMarkerInput, MarkerDto } from '@shared/schemas/markers';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

const live = (m?: MarkerDto) => m?.status === 'queued' || m?.status === 'running';

export const markerQueries = {
  all: () => ({ queryKey: ['markers'] as const }),
  list: (filters: { batchId?: number } = {}) =>
    queryOptions({
      queryKey: ['markers', 'list', filters],
      queryFn: async () => (await api.get<{ markers: MarkerDto[] }>(`/markers${filters.batchId ? `?batchId=${filters.batchId}` : ''}`)).markers,
      // While any marker in the list is queued or running, keep its status and length current.
      refetchInterval: (q) => (q.state.data?.some(live) ? 2000 : false),
    }),
  detail: (id: number) =>
    queryOptions({
      queryKey: ['markers', 'detail', id],
      queryFn: async () => (await api.get<{ marker: MarkerDto }>(`/markers/${id}`)).marker,
      refetchInterval: (q) => (live(q.state.data) ? 700 : false),
    }),
};

export const useStartMarker = () =>
  useMutation({
    mutationFn: async (v: CreateMarkerInput) => (await api.post<{ marker: MarkerDto; reused: boolean }>('/markers', v)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: markerQueries.all().queryKey }),
  });

export const useCancelMarker = () =>
  useMutation({
    mutationFn: async (id: number) => (await api.post<{ marker: MarkerDto }>(`/markers/${id}/cancel`)).marker,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: markerQueries.all().queryKey }),
  });
