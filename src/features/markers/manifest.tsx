import { Suspense, type ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconMarker } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { MarkersPage } from './components/markers-page';

function OwnerOnly({ children }: { children: ReactNode }) {
  if (!useCan('markers:write')) return <Navigate to="/" replace />;
  return <Suspense fallback={<Spinner />}>{children}</Suspense>;
}

/** The markers area: build a marker for a batch's size ratio and watch it shorten. */
export const markersManifest: FeatureManifest = {
  routes: [{ path: '/markers', element: <OwnerOnly><MarkersPage /></OwnerOnly> }],
  nav: [{ to: '/markers', label: 'Markers', icon: IconMarker, permission: 'markers:write' }],
};
