import { queryOptions } from '@tanstack/react-query';
import type { BatchDto } from '@shared/schemas/batches';
import type { FabricDto, RollDto } from '@shared/schemas/cutting';
import type { StudioDto } from '@shared/schemas/studio';
import type { StyleDto } from '@shared/schemas/styles';
import { api } from './api-client';

/**
 * The resources several areas read (batches, styles, fabrics, the studio), each under one query key, so a
 * change made on one page (a new batch, a renamed style) refreshes every list that shows it. Areas import
 * these factories; nowhere else writes these keys.
 */
export const batchQueries = {
  all: () => ({ queryKey: ['batches'] as const }),
  list: () => queryOptions({ queryKey: ['batches', 'list'], queryFn: async () => (await api.get<{ batches: BatchDto[] }>('/batches')).batches }),
  detail: (id: number) =>
    queryOptions({ queryKey: ['batches', 'detail', id], queryFn: async () => (await api.get<{ batch: BatchDto }>(`/batches/${id}`)).batch }),
};

export const styleQueries = {
  all: () => ({ queryKey: ['styles'] as const }),
  list: () => queryOptions({ queryKey: ['styles', 'list'], queryFn: async () => (await api.get<{ styles: StyleDto[] }>('/styles')).styles }),
  detail: (id: number) =>
    queryOptions({ queryKey: ['styles', 'detail', id], queryFn: async () => (await api.get<{ style: StyleDto }>(`/styles/${id}`)).style }),
};

export const fabricQueries = {
  all: () => ({ queryKey: ['fabrics'] as const }),
  list: () => queryOptions({ queryKey: ['fabrics', 'list'], queryFn: async () => (await api.get<{ fabrics: FabricDto[] }>('/fabrics')).fabrics }),
  detail: (id: number) =>
    queryOptions({ queryKey: ['fabrics', 'detail', id], queryFn: async () => api.get<{ fabric: FabricDto; rolls: RollDto[] }>(`/fabrics/${id}`) }),
};

export const studioQueries = {
  detail: () => queryOptions({ queryKey: ['studio'], queryFn: async () => (await api.get<{ studio: StudioDto }>('/studio')).studio }),
};
