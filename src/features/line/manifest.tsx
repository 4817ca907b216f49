import type { ReactNode } from 'react';
import { Navigate } from 'react-router';
import type { FeatureManifest } from '@/app/feature-manifest';
import { IconNeedle } from '@/components/ui/icons';
import { Spinner } from '@/components/ui/page';
import { useCan, useMe } from '@/lib/auth';
import { LinePage } from './components/line-page';
import { LinePlanPanel } from './components/line-plan-panel';
import type { BatchDto } from '@shared/schemas/batches';

/** Paths of the line area. */
export const linePaths = { plan: { path: '/line', getHref: (batchId?: number) => (batchId ? `/line?batch=${batchId}` : '/line') } } as const;

function AllowPlan({ children }: { children: ReactNode }) {
  const me = useMe();
  const ok = useCan('line:plan');
  if (me.isLoading) return <Spinner />;
  return ok ? <>{children}</> : <Navigate to="/" replace />;
}

function BatchLinePanel({ batch }: { batch: BatchDto }) {
  return useCan('line:plan') ? <LinePlanPanel batch={batch} /> : null;
}

/** The line area's routes, menu entries and panels. */
export const lineManifest: FeatureManifest = {
  routes: [{ path: linePaths.plan.path, element: <AllowPlan><LinePage /></AllowPlan> }],
  nav: [{ to: linePaths.plan.getHref(), label: 'Line plan', icon: IconNeedle, permission: 'line:plan' }],
  batchPanels: [{ key: 'line-plan', Panel: BatchLinePanel }],
};
