import type { ComponentType } from 'react';
import type { Role } from '@shared/auth/permissions';
import { Spinner } from '@/components/ui/page';
import { useMe } from '@/lib/auth';
import { lazyComponent } from '@/lib/routing';

const OwnerHome = lazyComponent(async () => (await import('./owner-home')).OwnerHome);

/** Each role's own home page; other roles' homes come from their feature areas. */
export function HomePage({ homes = {} }: { homes?: Partial<Record<Role, ComponentType<{ name: string }>>> }) {
  const me = useMe().data;
  if (!me) return <Spinner />;
  const Home = me.role === 'owner' ? OwnerHome : homes[me.role];
  return Home ? <Home name={me.name} /> : <Spinner />;
}
