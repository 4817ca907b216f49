import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { can, type Permission } from '@shared/auth/permissions';
import type { LoginInput, UserDto } from '@shared/schemas/auth';
import { api, ApiError } from './api-client';
import { queryClient } from './query-client';

export const meQueries = {
  me: () =>
    queryOptions({
      queryKey: ['auth', 'me'],
      queryFn: async () => {
        try {
          return (await api.get<{ user: UserDto }>('/auth/me')).user;
        } catch (e) {
          if (e instanceof ApiError && e.status === 401) return null;
          throw e;
        }
      },
      staleTime: 60_000,
    }),
};

export const useMe = () => useQuery(meQueries.me());

export function useCan(permission: Permission) {
  const me = useMe().data;
  return can(me?.role, permission);
}

const afterSignIn = (user: UserDto) => {
  queryClient.clear();
  queryClient.setQueryData(meQueries.me().queryKey, user);
};

export const useLogin = () =>
  useMutation({
    mutationFn: (input: LoginInput) => api.post<{ user: UserDto }>('/auth/login', input),
    onSuccess: (d) => afterSignIn(d.user),
  });

export const usePinLogin = () =>
  useMutation({
    mutationFn: (input: { email: string; pin: string }) => api.post<{ user: UserDto }>('/auth/pin', input),
    onSuccess: (d) => afterSignIn(d.user),
  });

export const useLogout = () =>
  useMutation({
    mutationFn: () => api.post('/auth/logout'),
    onSettled: () => {
      queryClient.clear();
      queryClient.setQueryData(meQueries.me().queryKey, null);
    },
  });

export { afterSignIn };
