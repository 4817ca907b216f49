import { queryOptions, useMutation } from '@tanstack/react-query';
import type { GradingDto, PatternAcceptInput, PatternPreviewDto, PutGradeRuleInput, PutSizeChartInput, SizeMixDto } from '@shared/schemas/grading';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

/** Query options for a style's grading view. */
export const gradingQueries = {
  all: () => ({ queryKey: ['grading'] as const }),
  detail: (styleId: number) =>
    queryOptions({
      queryKey: ['grading', 'detail', styleId],
      queryFn: async () => (await api.get<{ grading: GradingDto }>(`/styles/${styleId}/grading`)).grading,
    }),
};

const settle = (styleId: number) => (g: GradingDto) => {
  queryClient.setQueryData(gradingQueries.detail(styleId).queryKey, g);
  return queryClient.invalidateQueries({ queryKey: gradingQueries.all().queryKey });
};

export const usePutGradeRule = (styleId: number) =>
  useMutation({
    mutationFn: async (v: { pieceId: string; rule: PutGradeRuleInput }) =>
      (await api.put<{ grading: GradingDto }>(`/styles/${styleId}/grading/pieces/${v.pieceId}/rules`, v.rule)).grading,
    onSuccess: settle(styleId),
  });

export const useProposeRules = (styleId: number) =>
  useMutation({
    mutationFn: async () => (await api.post<{ grading: GradingDto }>(`/styles/${styleId}/grading/propose`)).grading,
    onSuccess: settle(styleId),
  });

export const usePutChart = (styleId: number) =>
  useMutation({
    mutationFn: async (v: PutSizeChartInput) => (await api.put<{ grading: GradingDto }>(`/styles/${styleId}/grading/chart`, v)).grading,
    onSuccess: settle(styleId),
  });

export const useImportChart = (styleId: number) =>
  useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return (await api.post<{ grading: GradingDto }>(`/styles/${styleId}/grading/chart/import`, form)).grading;
    },
    onSuccess: settle(styleId),
  });

export const useSizeMix = (styleId: number) =>
  useMutation({
    mutationFn: async (v: { file: File; total: number; minPerSize: number; column?: string }) => {
      const form = new FormData();
      form.append('file', v.file);
      form.append('total', String(v.total));
      form.append('minPerSize', String(v.minPerSize));
      if (v.column) form.append('column', v.column);
      return (await api.post<{ sizeMix: SizeMixDto }>(`/styles/${styleId}/grading/size-mix`, form)).sizeMix;
    },
  });

export const usePatternPreview = (styleId: number) =>
  useMutation({
    mutationFn: async (v: { file: File; units?: string; outlineIs: string }) => {
      const form = new FormData();
      form.append('file', v.file);
      if (v.units) form.append('units', v.units);
      form.append('outlineIs', v.outlineIs);
      return (await api.post<{ preview: PatternPreviewDto }>(`/styles/${styleId}/pattern/import`, form)).preview;
    },
  });

export const useAcceptPattern = (styleId: number) =>
  useMutation({
    mutationFn: async (v: PatternAcceptInput) => (await api.post<{ grading: GradingDto }>(`/styles/${styleId}/pattern/accept`, v)).grading,
    onSuccess: settle(styleId),
  });
