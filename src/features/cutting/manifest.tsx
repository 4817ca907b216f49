import { Suspense, type ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { Permission } from '@shared/auth/permissions';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconScissors } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { useCan } from '@/lib/auth';
import { CutPlanPanel } from './components/cut-plan-panel';
import { CutterHome } from './components/cutter-home';
import { FabricsPage } from './components/fabrics-page';
import { LayPage } from './components/lay-page';

function Allowed({ permission, children }: { permission: Permission; children: ReactNode }) {
  if (!useCan(permission)) return <Navigate to="/" replace />;
  return <Suspense fallback={<Spinner />}>{children}</Suspense>;
}

/** The cutting area: fabric and rolls, the batch's cut plan, the cutter's home and lay pages. */
export const cuttingManifest: FeatureManifest = {
  routes: [
    { path: '/fabrics', element: <Allowed permission="fabric:read"><FabricsPage /></Allowed> },
    { path: '/lays/:id', element: <Allowed permission="cutting:work"><LayPage /></Allowed> },
  ],
  nav: [
    { to: '/fabrics', label: 'Fabric', icon: IconScissors, permission: 'fabric:read' },
  ],
  homes: { cutter: CutterHome },
  batchPanels: [{ key: 'cut-plan', Panel: CutPlanPanel }],
};
