import { queryOptions, useMutation } from '@tanstack/react-query';
import type { CreatePersonInput, PersonDto, UpdatePersonInput } from '@shared/schemas/people';
import type { AttendanceDayDto, PutAttendanceInput } from '@shared/schemas/floor';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

export const peopleQueries = {
  all: () => ({ queryKey: ['people'] as const }),
  list: () => queryOptions({ queryKey: ['people', 'list'], queryFn: async () => (await api.get<{ users: PersonDto[] }>('/users')).users }),
};

// Attendance lists the active floor staff and the line plan balances them, so a person added, changed or
// deactivated shows there at once, not after a reload.
const invalidate = () =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: peopleQueries.all().queryKey }),
    queryClient.invalidateQueries({ queryKey: attendanceQueries.all().queryKey }),
    queryClient.invalidateQueries({ queryKey: ['line-plan'] }),
  ]);

export const useAddPerson = () =>
  useMutation({ mutationFn: (v: CreatePersonInput) => api.post<{ user: PersonDto }>('/users', v), onSuccess: invalidate });

export const useUpdatePerson = () =>
  useMutation({
    mutationFn: ({ id, ...patch }: UpdatePersonInput & { id: number }) => api.patch<{ user: PersonDto }>(`/users/${id}`, patch),
    onSuccess: invalidate,
  });

/** The owner gives a new floor PIN (a forgotten or locked one); the server checks it is not an obvious one. */
export const useSetPin = () =>
  useMutation({ mutationFn: ({ id, pin }: { id: number; pin: string }) => api.post<{ user: PersonDto }>(`/users/${id}/pin`, { pin }), onSuccess: invalidate });

/** The owner lifts a sign-in lock (PIN and password) without changing either secret. */
export const useUnlockPerson = () =>
  useMutation({ mutationFn: (id: number) => api.post<{ user: PersonDto }>(`/users/${id}/unlock`, {}), onSuccess: invalidate });

/** Attendance per day (who is in and for how long); the owner records it. */
export const attendanceQueries = {
  all: () => ({ queryKey: ['attendance'] as const }),
  day: (day: string | null) =>
    queryOptions({ queryKey: ['attendance', 'day', day], queryFn: () => api.get<AttendanceDayDto>(`/floor/attendance${day ? `?day=${day}` : ''}`) }),
};

export const useSaveAttendance = () =>
  useMutation({
    mutationFn: (v: PutAttendanceInput) => api.put<AttendanceDayDto>('/floor/attendance', v),
    // The line plan's people present and pay previews read attendance too.
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: attendanceQueries.all().queryKey }), queryClient.invalidateQueries({ queryKey: ['line-plan'] }), queryClient.invalidateQueries({ queryKey: ['pay'] })]),
  });
