import { Suspense } from 'react';
import { createBrowserRouter, Navigate, Outlet, useRouteError } from 'react-router';
import { Spinner } from '@/components/ui/page';
import { useTranslation } from '@/lib/i18n';
import { AppShell } from '@/components/layouts/app-shell';
import { paths } from '@/config/paths';
import { queryClient } from '@/lib/query-client';
import { lazyPage, requireSignedIn } from '@/lib/routing';
import { SignInPage } from '@/features/auth/components/sign-in-page';
import { batchQueries } from '@/features/batches/api/batch-queries';
import { peopleQueries } from '@/features/people/api/people-queries';
import { styleQueries } from '@/features/styles/api/style-queries';
import { BATCH_PANELS, EXTRA_HOMES, EXTRA_NAV, EXTRA_ROUTES, SIGN_OUT_CHECKS } from './extra-routes';

function SectionError() {
  const error = useRouteError() as Error;
  const { t } = useTranslation();
  return (
    <div role="alert" className="card p-6">
      <h1 className="text-lg font-semibold text-madder-700">{t('common.couldNotLoad')}</h1>
      <p className="mt-2 text-sm text-ink-600">{error?.message ?? t('common.unknownError')}</p>
    </div>
  );
}

export const router = createBrowserRouter([
  { path: paths.signIn.path, element: <SignInPage /> },
  {
    path: paths.newStudio.path,
    HydrateFallback: Spinner,
    lazy: { Component: async () => (await import('@/features/auth/components/new-studio-page')).NewStudioPage },
  },
  {
    path: '/',
    loader: requireSignedIn,
    HydrateFallback: Spinner,
    element: <AppShell extraNav={EXTRA_NAV} signOutChecks={SIGN_OUT_CHECKS} />,
    errorElement: <SectionError />,
    children: [
      {
        errorElement: <SectionError />,
        element: <Suspense fallback={<Spinner />}><Outlet /></Suspense>,
        children: [
          {
            index: true,
            lazy: {
              Component: async () => {
                const { HomePage } = await import('@/features/home/components/home-page');
                return () => <HomePage homes={EXTRA_HOMES} />;
              },
            },
          },
          lazyPage(paths.account.path, undefined, async () => (await import('@/features/auth/components/account-page')).AccountPage),
          lazyPage(paths.styles.path, 'styles:write', async () => (await import('@/features/styles/components/styles-page')).StylesPage, () => queryClient.prefetchQuery(styleQueries.list())),
          lazyPage(paths.newStyle.path, 'styles:write', async () => (await import('@/features/styles/components/style-edit-page')).NewStylePage),
          lazyPage(paths.style.path, 'styles:write', async () => (await import('@/features/styles/components/style-edit-page')).StyleDetailPage, ({ params }) => queryClient.prefetchQuery(styleQueries.detail(Number(params.id)))),
          lazyPage(paths.batches.path, 'batches:write', async () => (await import('@/features/batches/components/batches-page')).BatchesPage, () => queryClient.prefetchQuery(batchQueries.list())),
          lazyPage(paths.newBatch.path, 'batches:write', async () => (await import('@/features/batches/components/new-batch-page')).NewBatchPage),
          lazyPage(paths.batch.path, 'batches:write', async () => {
            const { BatchDetailPage } = await import('@/features/batches/components/batch-detail-page');
            return () => <BatchDetailPage panels={BATCH_PANELS} />;
          }, ({ params }) => queryClient.prefetchQuery(batchQueries.detail(Number(params.id)))),
          lazyPage(paths.people.path, 'people:manage', async () => (await import('@/features/people/components/people-page')).PeoplePage, () => queryClient.prefetchQuery(peopleQueries.list())),
          lazyPage(paths.settings.path, 'studio:manage', async () => (await import('@/features/studio/components/settings-page')).SettingsPage),
          lazyPage(paths.audit.path, 'audit:read', async () => (await import('@/features/audit/components/audit-page')).AuditPage),
          ...EXTRA_ROUTES,
          { path: '*', element: <Navigate to={paths.home.getHref()} replace /> },
        ],
      },
    ],
  },
]);
