import { queryOptions, useMutation } from '@tanstack/react-query';
import type { BundleDto, CorrectLayInput, CreateCutPlanInput, CutPlanDto, LayDto, RecordLayInput, RollDto, RollInput, ShortageDto } from '@shared/schemas/cutting';
import type { StyleDto } from '@shared/schemas/styles';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { fabricQueries } from '@/lib/queries';

export interface LayDetail {
  lay: LayDto;
  fabric: { id: number; name: string; composition: string; widthMm: number; isDirectional: boolean; maxPlies: number } | null;
  bundles: BundleDto[];
  /** The style's materials (self first); each has a cut ticket of its own. */
  materials: string[];
}

export { fabricQueries };

/** A batch's style as the cutting screens need it (its materials); the same cache entry as the style page's. */
export const batchStyleQueries = {
  ofStyle: (styleId: number) =>
    queryOptions({ queryKey: ['styles', 'detail', styleId], queryFn: async () => (await api.get<{ style: StyleDto }>(`/styles/${styleId}`)).style }),
};

export const cutPlanQueries = {
  all: () => ({ queryKey: ['cut-plans'] as const }),
  /** The batch's plan on `fabricId` (a lining's…), or without it the main plan. */
  ofBatch: (batchId: number, fabricId?: number) =>
    queryOptions({
      queryKey: ['cut-plans', 'batch', batchId, fabricId ?? 'main'],
      queryFn: async () => (await api.get<{ cutPlan: CutPlanDto | null }>(`/batches/${batchId}/cut-plan${fabricId ? `?fabricId=${fabricId}` : ''}`)).cutPlan,
    }),
};

export const layQueries = {
  all: () => ({ queryKey: ['lays'] as const }),
  list: () => queryOptions({ queryKey: ['lays', 'list'], queryFn: async () => (await api.get<{ lays: LayDto[] }>('/lays')).lays }),
  detail: (id: number) => queryOptions({ queryKey: ['lays', 'detail', id], queryFn: async () => api.get<LayDetail>(`/lays/${id}`) }),
  /** Planned lays that stock cannot cover, for the owner's Today. */
  shortages: () => queryOptions({ queryKey: ['lays', 'shortages'], queryFn: async () => (await api.get<{ shortages: ShortageDto[] }>('/lays/shortages')).shortages }),
};

const invalidateCutting = () =>
  Promise.all([
    // A plan or a cut changes consumption: the batch's costing and materials to order follow it.
    queryClient.invalidateQueries({ queryKey: ['costing'] }),
    queryClient.invalidateQueries({ queryKey: ['purchasing'] }),
    queryClient.invalidateQueries({ queryKey: fabricQueries.all().queryKey }),
    queryClient.invalidateQueries({ queryKey: cutPlanQueries.all().queryKey }),
    queryClient.invalidateQueries({ queryKey: layQueries.all().queryKey }),
  ]);

export const useAddRolls = (fabricId: number) =>
  useMutation({
    mutationFn: async (rolls: RollInput[]) => (await api.post<{ rolls: RollDto[] }>(`/fabrics/${fabricId}/rolls`, { rolls })).rolls,
    onSuccess: invalidateCutting,
  });

export const useImportRolls = (fabricId: number) =>
  useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return (await api.post<{ rolls: RollDto[] }>(`/fabrics/${fabricId}/rolls/import`, form)).rolls;
    },
    onSuccess: invalidateCutting,
  });

export const usePlanCut = (batchId: number) =>
  useMutation({
    mutationFn: async (v: CreateCutPlanInput) => (await api.post<{ cutPlan: CutPlanDto }>(`/batches/${batchId}/cut-plan`, v)).cutPlan,
    onSuccess: invalidateCutting,
  });

export const useRecordLay = (id: number) =>
  useMutation({
    mutationFn: async (v: RecordLayInput) => (await api.put<{ lay: LayDto }>(`/lays/${id}`, v)).lay,
    onSuccess: invalidateCutting,
  });

export const useCutLay = (id: number) =>
  useMutation({
    mutationFn: async (v: RecordLayInput) => api.post<{ lay: LayDto; bundles: BundleDto[] }>(`/lays/${id}/cut`, v),
    onSuccess: invalidateCutting,
  });

/** Correct the record of a cut lay; the server keeps the old figures in the audit log. */
export const useCorrectLay = (id: number) =>
  useMutation({
    mutationFn: async (v: CorrectLayInput) => (await api.post<{ lay: LayDto }>(`/lays/${id}/correction`, v)).lay,
    onSuccess: invalidateCutting,
  });
