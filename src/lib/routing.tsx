import { lazy, type ComponentType } from 'react';
import { redirect, type LoaderFunction, type LoaderFunctionArgs, type RouteObject } from 'react-router';
import { can, type Permission } from '@shared/auth/permissions';
import { paths } from '@/config/paths';
import type { UserDto } from '@shared/schemas/auth';
import { ApiError } from './api-client';
import { meQueries } from './auth';
import { keepUser, keptUser } from './offline-session';
import { queryClient } from './query-client';

/**
 * Who is signed in, asked of the server once and cached. With no network the person last signed in on
 * this device is used, so the floor screen and its outbox open offline; nobody after a sign-out.
 */
export async function signedInUser(): Promise<UserDto | null> {
  try {
    const me = await queryClient.ensureQueryData(meQueries.me());
    keepUser(me);
    return me;
  } catch (e) {
    if (!(e instanceof ApiError && e.status === 0)) throw e;
    const kept = keptUser();
    if (kept) queryClient.setQueryData(meQueries.me().queryKey, kept);
    return kept;
  }
}

/** The signed-in area's loader: signed out (or offline with nobody kept) goes to sign-in. */
export async function requireSignedIn() {
  if (!(await signedInUser())) throw redirect(paths.signIn.getHref());
  return null;
}

/**
 * The one permission check for pages, run as the route's loader: signed out goes to sign-in, a role
 * without the permission goes home. It only spares a wasted screen; the server refuses the data anyway.
 */
export const requirePermission =
  (permission?: Permission): LoaderFunction =>
  async () => {
    const me = await signedInUser();
    if (!me) throw redirect(paths.signIn.getHref());
    if (permission && !can(me.role, permission)) throw redirect(paths.home.getHref());
    return null;
  };

type Load<P> = () => Promise<ComponentType<P>>;

/** Asks the one Query cache for server data a page reads (`queryClient.prefetchQuery`, which never throws). */
type Prefetch = (args: LoaderFunctionArgs) => Promise<void>;

/**
 * A page whose code is fetched the first time it is visited, behind a permission. `prefetch` names the
 * queries its component reads, so the data is asked for alongside the code rather than after it; a
 * failed fetch is left for the component to show, as before.
 */
export function lazyPage(path: string, permission: Permission | undefined, load: Load<object>, ...prefetch: Prefetch[]): RouteObject {
  const allowed = requirePermission(permission);
  return {
    path,
    loader: async (args) => {
      await allowed(args);
      await Promise.all(prefetch.map((p) => p(args)));
      return null;
    },
    lazy: { Component: load },
  };
}

/** A component (a role's home, a batch panel) whose code is fetched the first time it is shown. */
export function lazyComponent<P extends object>(load: Load<P>) {
  return lazy(async () => ({ default: await load() }));
}
