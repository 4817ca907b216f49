import { Suspense, type ReactNode } from 'react';
import { createBrowserRouter, Navigate, Outlet, redirect, useRouteError } from 'react-router';
import { can, type Permission } from '@shared/auth/permissions';
import { AppShell } from '@/components/layouts/app-shell';
import { Spinner } from '@/components/ui/page';
import { paths } from '@/config/paths';
import { meQueries, useMe } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { AuditPage } from '@/features/audit/components/audit-page';
import { AccountPage } from '@/features/auth/components/account-page';
import { NewStudioPage } from '@/features/auth/components/new-studio-page';
import { SignInPage } from '@/features/auth/components/sign-in-page';
import { BatchDetailPage } from '@/features/batches/components/batch-detail-page';
import { BatchesPage } from '@/features/batches/components/batches-page';
import { NewBatchPage } from '@/features/batches/components/new-batch-page';
import { HomePage } from '@/features/home/components/home-page';
import { PeoplePage } from '@/features/people/components/people-page';
import { SettingsPage } from '@/features/studio/components/settings-page';
import { NewStylePage, StyleDetailPage } from '@/features/styles/components/style-edit-page';
import { StylesPage } from '@/features/styles/components/styles-page';
import { BATCH_PANELS, EXTRA_HOMES, EXTRA_NAV, EXTRA_ROUTES, SIGN_OUT_CHECKS } from './extra-routes';

function SectionError() {
  const error = useRouteError() as Error;
  return (
    <div role="alert" className="card p-6">
      <h1 className="text-lg font-semibold text-madder-700">This page could not load</h1>
      <p className="mt-2 text-sm text-ink-600">{error?.message ?? 'Unknown error'}</p>
    </div>
  );
}

/** Pages a role may not use redirect home; the server refuses the data anyway. */
export function Guard({ permission, children }: { permission: Permission; children: ReactNode }) {
  const me = useMe().data;
  if (!can(me?.role, permission)) return <Navigate to={paths.home.getHref()} replace />;
  return <Suspense fallback={<Spinner />}>{children}</Suspense>;
}

const requireSignedIn = async () => {
  const me = await queryClient.ensureQueryData(meQueries.me());
  if (!me) throw redirect(paths.signIn.getHref());
  return null;
};

export const router = createBrowserRouter([
  { path: paths.signIn.path, element: <SignInPage /> },
  { path: paths.newStudio.path, element: <NewStudioPage /> },
  {
    path: '/',
    loader: requireSignedIn,
    element: <AppShell extraNav={EXTRA_NAV} signOutChecks={SIGN_OUT_CHECKS} />,
    errorElement: <SectionError />,
    children: [
      {
        errorElement: <SectionError />,
        element: <Suspense fallback={<Spinner />}><Outlet /></Suspense>,
        children: [
          { index: true, element: <HomePage homes={EXTRA_HOMES} /> },
          { path: paths.account.path, element: <AccountPage /> },
          { path: paths.styles.path, element: <Guard permission="styles:write"><StylesPage /></Guard> },
          { path: paths.newStyle.path, element: <Guard permission="styles:write"><NewStylePage /></Guard> },
          { path: paths.style.path, element: <Guard permission="styles:write"><StyleDetailPage /></Guard> },
          { path: paths.batches.path, element: <Guard permission="batches:write"><BatchesPage /></Guard> },
          { path: paths.newBatch.path, element: <Guard permission="batches:write"><NewBatchPage /></Guard> },
          { path: paths.batch.path, element: <Guard permission="batches:write"><BatchDetailPage panels={BATCH_PANELS} /></Guard> },
          { path: paths.people.path, element: <Guard permission="people:manage"><PeoplePage /></Guard> },
          { path: paths.settings.path, element: <Guard permission="studio:manage"><SettingsPage /></Guard> },
          { path: paths.audit.path, element: <Guard permission="audit:read"><AuditPage /></Guard> },
          ...EXTRA_ROUTES,
          { path: '*', element: <Navigate to="/" replace /> },
        ],
      },
    ],
  },
]);
