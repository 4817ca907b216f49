import type { ComponentType } from 'react';
import type { Role } from '@shared/auth/permissions';
import { Spinner } from '@/components/ui/page';
import { useMe } from '@/lib/auth';
import { OwnerHome } from './owner-home';

/** Each role's own home page; areas for other roles register theirs here. */
export const ROLE_HOMES: Partial<Record<Role, ComponentType<{ name: string }>>> = { owner: OwnerHome };

export function HomePage() {
  const me = useMe().data;
  if (!me) return <Spinner />;
  const Home = ROLE_HOMES[me.role];
  return Home ? <Home name={me.name} /> : <Spinner />;
}
