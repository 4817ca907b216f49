import { queryOptions, useMutation } from '@tanstack/react-query';
import type { LinePlanDto, OperationDto, TimeStudyInput, WorkingCalendarDto, WorkingCalendarInput } from '@shared/schemas/line';
import { api, ApiError } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

/** Plan settings the owner picks on the page. */
export interface PlanParams {
  mode: 'due' | 'people';
  /** Machinists at the line in people mode; undefined: everyone active on the People page. */
  people?: number;
  efficiency: number;
  /** The owner's pins: this person stays on this operation. */
  pins?: { personId: number; code: string }[];
  /** People mode: most operations one person works on; undefined: no limit. */
  maxOps?: number;
}

const planQuery = (p: PlanParams) => {
  const q = new URLSearchParams({ mode: p.mode, efficiency: String(p.efficiency) });
  if (p.mode === 'people' && p.people) q.set('people', String(p.people));
  if (p.mode === 'people' && p.maxOps) q.set('maxOps', String(p.maxOps));
  if (p.pins?.length) q.set('pins', p.pins.map((x) => `${x.personId}:${x.code}`).join(','));
  return q.toString();
};

/** Operations tables per style. */
export const operationQueries = {
  all: () => ({ queryKey: ['operations'] as const }),
  list: (styleId: number) =>
    queryOptions({ queryKey: ['operations', 'list', styleId], queryFn: async () => (await api.get<{ operations: OperationDto[] }>(`/styles/${styleId}/operations`)).operations }),
};

/** Line plans per batch and settings. */
export const linePlanQueries = {
  all: () => ({ queryKey: ['line-plan'] as const }),
  detail: (batchId: number, p: PlanParams) =>
    queryOptions({ queryKey: ['line-plan', 'detail', batchId, p], queryFn: async () => (await api.get<{ plan: LinePlanDto }>(`/line/batches/${batchId}/plan?${planQuery(p)}`)).plan, retry: false }),
};

/** Actual garments per day from the floor area, when it offers them; null when it does not (404). */
export const actualOutputQueries = {
  detail: (batchId: number) =>
    queryOptions({
      queryKey: ['floor-progress', 'daily', batchId],
      queryFn: async () => {
        try {
          return (await api.get<{ days: { day: string; pieces: number }[] }>(`/floor/progress/${batchId}/daily`)).days;
        } catch (e) {
          if (e instanceof ApiError && (e.status === 404 || e.status === 403)) return null;
          throw e;
        }
      },
      retry: false,
    }),
};

const refresh = () => Promise.all([
  queryClient.invalidateQueries({ queryKey: operationQueries.all().queryKey }),
  queryClient.invalidateQueries({ queryKey: linePlanQueries.all().queryKey }),
]);

export const useImportOperations = (styleId: number) =>
  useMutation({
    mutationFn: async (file: File) => {
      const form = new FormData();
      form.append('file', file);
      return (await api.post<{ operations: OperationDto[] }>(`/styles/${styleId}/operations/import`, form)).operations;
    },
    onSuccess: refresh,
  });

export const useCopyOperations = (styleId: number) =>
  useMutation({
    mutationFn: async (fromStyleId: number) => (await api.post<{ operations: OperationDto[] }>(`/styles/${styleId}/operations/copy`, { fromStyleId })).operations,
    onSuccess: refresh,
  });

export const useSaveOperations = (styleId: number) =>
  useMutation({
    mutationFn: async (operations: Omit<OperationDto, 'id' | 'seq'>[]) => (await api.put<{ operations: OperationDto[] }>(`/styles/${styleId}/operations`, { operations })).operations,
    onSuccess: refresh,
  });

/** Owner: set an operation's standard minutes from a time-study sheet. */
export const useTimeStudy = (styleId: number, operationId: number) =>
  useMutation({
    mutationFn: async (sheet: TimeStudyInput) => (await api.put<{ operation: OperationDto }>(`/styles/${styleId}/operations/${operationId}/time-study`, sheet)).operation,
    onSuccess: refresh,
  });

/** The studio's working calendar (owner). */
export const calendarQueries = {
  all: () => ({ queryKey: ['working-calendar'] as const }),
  detail: () => queryOptions({ queryKey: ['working-calendar', 'detail'], queryFn: async () => (await api.get<{ calendar: WorkingCalendarDto }>('/line/calendar')).calendar }),
};

export const useSaveCalendar = () =>
  useMutation({
    mutationFn: async (v: WorkingCalendarInput) => (await api.put<{ calendar: WorkingCalendarDto }>('/line/calendar', v)).calendar,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: calendarQueries.all().queryKey }), queryClient.invalidateQueries({ queryKey: linePlanQueries.all().queryKey })]),
  });
