import { Suspense, type ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { Permission } from '@shared/auth/permissions';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconCoins } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { CostingIndexPage } from './components/costing-index-page';
import { CostingPage } from './components/costing-page';
import { CostingPanel } from './components/costing-panel';

function Allowed({ permission, children }: { permission: Permission; children: ReactNode }) {
  if (!useCan(permission)) return <Navigate to="/" replace />;
  return <Suspense fallback={<Spinner />}>{children}</Suspense>;
}

/** The costing area's routes, menu entries and panels. */
export const costingManifest: FeatureManifest = {
  routes: [
    { path: '/costing', element: <Allowed key="costing-index" permission="costs:read"><CostingIndexPage /></Allowed> },
    { path: '/batches/:id/costing', element: <Allowed key="costing-sheet" permission="costs:read"><CostingPage /></Allowed> },
  ],
  nav: [{ to: '/costing', label: 'Costing', icon: IconCoins, permission: 'costs:read' }],
  batchPanels: [{ key: 'costing', Panel: CostingPanel }],
};
