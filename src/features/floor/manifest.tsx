import type { ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { Permission } from '@shared/auth/permissions';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconChart, IconCoins } from '@/components/ui/icons';
import { useCan } from '@/lib/auth';
import { BatchProgressPanel } from './components/batch-progress-panel';
import { FloorHome } from './components/floor-home';
import { FloorProgressPage } from './components/floor-progress-page';
import { PayPage } from './components/pay-page';
import { outboxSignOutWarning } from './lib/outbox';

function Allowed({ permission, children }: { permission: Permission; children: ReactNode }) {
  return useCan(permission) ? <>{children}</> : <Navigate to="/" replace />;
}

/** The floor area's routes, menu entries and panels. */
export const floorManifest: FeatureManifest = {
  routes: [
    { path: '/floor', element: <Allowed permission="progress:read"><FloorProgressPage /></Allowed> },
    { path: '/pay', element: <Allowed permission="pay:manage"><PayPage /></Allowed> },
  ],
  nav: [
    { to: '/floor', label: 'Floor', icon: IconChart, permission: 'progress:read' },
    { to: '/pay', label: 'Pay', icon: IconCoins, permission: 'pay:manage' },
  ],
  homes: { machinist: FloorHome, finisher: FloorHome },
  batchPanels: [{ key: 'floor-progress', Panel: BatchProgressPanel }],
  beforeSignOut: outboxSignOutWarning,
};
