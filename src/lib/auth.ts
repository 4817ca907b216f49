import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { can, type Permission } from '@shared/auth/permissions';
import type { FloorListDto, FloorPinLoginInput, LoginInput, UserDto } from '@shared/schemas/auth';
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

/** This device as a studio floor tablet: the studio's floor list, or null when the device is not bound. */
export const floorDeviceQueries = {
  all: () => ({ queryKey: ['floor-device'] as const }),
  list: () =>
    queryOptions({
      queryKey: ['floor-device', 'list'],
      queryFn: async () => {
        return await api.get<FloorListDto | null>('/auth/floor');
      },
      staleTime: 60_000,
    }),
};

/** The owner makes this device the studio's floor tablet (an httpOnly cookie the server sets), or stops it. */
export const useBindFloorDevice = () =>
  useMutation({
    mutationFn: (label: string) => api.post<{ device: { id: number; label: string } }>('/auth/floor-device', { label }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: floorDeviceQueries.all().queryKey }),
  });

export const useUnbindFloorDevice = () =>
  useMutation({
    mutationFn: () => api.del('/auth/floor-device'),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: floorDeviceQueries.all().queryKey }),
  });

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

/** On a bound tablet: the person picked from the floor list, then only their PIN. */
export const useFloorPinLogin = () =>
  useMutation({
    mutationFn: (input: FloorPinLoginInput) => api.post<{ user: UserDto }>('/auth/floor/pin', input),
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
