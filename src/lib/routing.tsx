import { lazy, type ComponentType } from 'react';
import { redirect, type LoaderFunction, type RouteObject } from 'react-router';
import { can, type Permission } from '@shared/auth/permissions';
import { paths } from '@/config/paths';
import { meQueries } from './auth';
import { queryClient } from './query-client';

/**
 * The one permission check for pages, run as the route's loader: signed out goes to sign-in, a role
 * without the permission goes home. It only spares a wasted screen; the server refuses the data anyway.
 */
export const requirePermission =
  (permission?: Permission): LoaderFunction =>
  async () => {
    const me = await queryClient.ensureQueryData(meQueries.me());
    if (!me) throw redirect(paths.signIn.getHref());
    if (permission && !can(me.role, permission)) throw redirect(paths.home.getHref());
    return null;
  };

type Load<P> = () => Promise<ComponentType<P>>;

/** A page whose code is fetched the first time it is visited, behind a permission. */
export function lazyPage(path: string, permission: Permission | undefined, load: Load<object>): RouteObject {
  return { path, loader: requirePermission(permission), lazy: { Component: load } };
}

/** A component (a role's home, a batch panel) whose code is fetched the first time it is shown. */
export function lazyComponent<P extends object>(load: Load<P>) {
  return lazy(async () => ({ default: await load() }));
}
