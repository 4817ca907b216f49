import { queryOptions, useMutation } from '@tanstack/react-query';
import type { ApprovePayPeriodInput, PayModeDto, PayoutDto, PayPeriodDto, PayPreviewDto, PayRulesDto, PayRulesInput } from '@shared/schemas/pay';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

export const payQueries = {
  all: () => ({ queryKey: ['pay'] as const }),
  mode: () => queryOptions({ queryKey: ['pay', 'mode'], queryFn: () => api.get<PayModeDto>('/pay/mode'), staleTime: Infinity }),
  preview: (from: string, to: string) =>
    queryOptions({ queryKey: ['pay', 'preview', from, to], queryFn: async () => (await api.get<{ preview: PayPreviewDto }>(`/pay/preview?from=${from}&to=${to}`)).preview }),
  rules: () => queryOptions({ queryKey: ['pay', 'rules'], queryFn: async () => (await api.get<{ rules: PayRulesDto }>('/pay/rules')).rules }),
  periods: () => queryOptions({ queryKey: ['pay', 'periods'], queryFn: async () => (await api.get<{ periods: PayPeriodDto[] }>('/pay/periods')).periods }),
};

export const useApprovePayPeriod = () =>
  useMutation({
    mutationFn: async (v: ApprovePayPeriodInput) => (await api.post<{ period: PayPeriodDto }>('/pay/periods', v)).period,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payQueries.all().queryKey }),
  });

export const usePayPerson = () =>
  useMutation({
    mutationFn: async (v: { periodId: number; userId: number }) =>
      (await api.post<{ payout: PayoutDto }>(`/pay/periods/${v.periodId}/payouts`, { userId: v.userId })).payout,
    onSettled: () => queryClient.invalidateQueries({ queryKey: payQueries.all().queryKey }),
  });

export const useSavePayRules = () =>
  useMutation({
    mutationFn: async (v: PayRulesInput) => (await api.put<{ rules: PayRulesDto }>('/pay/rules', v)).rules,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payQueries.all().queryKey }),
  });
