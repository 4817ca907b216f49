import { queryOptions, useMutation } from '@tanstack/react-query';
import type { CreatePersonInput, PersonDto, UpdatePersonInput } from '@shared/schemas/people';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';

export const peopleQueries = {
  all: () => ({ queryKey: ['people'] as const }),
  list: () => queryOptions({ queryKey: ['people', 'list'], queryFn: async () => (await api.get<{ users: PersonDto[] }>('/users')).users }),
};

const invalidate = () => queryClient.invalidateQueries({ queryKey: peopleQueries.all().queryKey });

export const useAddPerson = () =>
  useMutation({ mutationFn: (v: CreatePersonInput) => api.post<{ user: PersonDto }>('/users', v), onSuccess: invalidate });

export const useUpdatePerson = () =>
  useMutation({
    mutationFn: ({ id, ...patch }: UpdatePersonInput & { id: number }) => api.patch<{ user: PersonDto }>(`/users/${id}`, patch),
    onSuccess: invalidate,
  });
