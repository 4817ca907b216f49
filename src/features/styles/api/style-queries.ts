import { useMutation } from '@tanstack/react-query';
import type { PutCompositionInput } from '@shared/schemas/style-composition';
import type { CreateStyleInput, StyleDto } from '@shared/schemas/styles';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { styleQueries } from '@/lib/queries';

export { styleQueries };

export const useSaveStyle = (id?: number) =>
  useMutation({
    mutationFn: async (v: CreateStyleInput) =>
      (id ? await api.put<{ style: StyleDto }>(`/styles/${id}`, v) : await api.post<{ style: StyleDto }>('/styles', v)).style,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: styleQueries.all().queryKey }),
  });

/** Save the style's blocks (or preset) and the fabric of each material. */
export const useSaveComposition = (id: number) =>
  useMutation({
    mutationFn: async (v: PutCompositionInput) => (await api.put<{ style: StyleDto }>(`/styles/${id}/composition`, v)).style,
    onSuccess: (s) => {
      queryClient.setQueryData(styleQueries.detail(id).queryKey, s);
      return queryClient.invalidateQueries({ queryKey: styleQueries.all().queryKey });
    },
  });
