import { Suspense, type ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { Permission } from '@shared/auth/permissions';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconBatch, IconMail } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { NeedsPanel } from './components/needs-panel';
import { OutboxPage } from './components/outbox-page';
import { PurchasingPage } from './components/purchasing-page';

function Allowed({ permission, children }: { permission: Permission; children: ReactNode }) {
  if (!useCan(permission)) return <Navigate to="/" replace />;
  return <Suspense fallback={<Spinner />}>{children}</Suspense>;
}

/** The purchasing area's routes, menu entries and panels. */
export const purchasingManifest: FeatureManifest = {
  routes: [
    { path: '/purchasing', element: <Allowed key="purchasing" permission="suppliers:manage"><PurchasingPage /></Allowed> },
    { path: '/outbox', element: <Allowed key="outbox" permission="suppliers:manage"><OutboxPage /></Allowed> },
  ],
  nav: [
    { to: '/purchasing', label: 'Suppliers', icon: IconBatch, permission: 'suppliers:manage' },
    { to: '/outbox', label: 'Outbox', icon: IconMail, permission: 'suppliers:manage' },
  ],
  batchPanels: [{ key: 'needs', Panel: NeedsPanel }],
};
