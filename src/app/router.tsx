import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, redirect, type LoaderFunction, type RouteObject } from 'react-router-dom';
import { RouteError } from '#src/components/errors/route-error.tsx';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import Root, { clientLoader as rootLoader } from './routes/root.tsx';

/**
 * A route module default-exports its page and may export
 * `clientLoader(queryClient)`, which becomes the route's loader.
 */
type RouteModule = {
  default: ComponentType;
  clientLoader?: (queryClient: QueryClient) => LoaderFunction;
};

const convert = (queryClient: QueryClient) => (module: RouteModule) => ({
  Component: module.default,
  ...(module.clientLoader ? { loader: module.clientLoader(queryClient) } : {}),
});

export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const lazy = (load: () => Promise<RouteModule>) => () => load().then(convert(queryClient));

  // Pages inside the shell keep the shell when they fail: their error shows in the content area.
  const page = (path: string, load: () => Promise<RouteModule>): RouteObject => ({
    path,
    lazy: lazy(load),
    ErrorBoundary: RouteError,
  });

  return [
    {
      id: 'root',
      path: '/',
      Component: Root,
      loader: rootLoader(queryClient),
      ErrorBoundary: RouteError,
      HydrateFallback: () => (
        <div className="p-6">
          <PageSkeleton label="Loading Pourscope" />
        </div>
      ),
      children: [
        // Signed out (they send a signed-in visitor on).
        { path: paths.signIn.path, lazy: lazy(() => import('./routes/auth/sign-in.tsx')) },
        { path: paths.signUp.path, lazy: lazy(() => import('./routes/auth/sign-up.tsx')) },
        { path: paths.forgotPassword.path, lazy: lazy(() => import('./routes/auth/forgot-password.tsx')) },
        { path: paths.resetPassword.path, lazy: lazy(() => import('./routes/auth/reset-password.tsx')) },
        { path: paths.invitation.path, lazy: lazy(() => import('./routes/auth/invitation.tsx')) },

        // Signed in.
        {
          lazy: lazy(() => import('./routes/app/protected-layout.tsx')),
          children: [
            { index: true, lazy: lazy(() => import('./routes/app/home.tsx')) },
            {
              lazy: lazy(() => import('./routes/app/shell-layout.tsx')),
              children: [
                page(paths.createWorkshop.path, () => import('./routes/app/create-workshop.tsx')),
                page(paths.settings.path, () => import('./routes/app/settings.tsx')),
                page(paths.safety.path, () => import('./routes/app/safety.tsx')),
                page(paths.devMail.path, () => import('./routes/app/dev-mail.tsx')),
                {
                  path: paths.workshop.path,
                  lazy: lazy(() => import('./routes/app/workshop/workshop-layout.tsx')),
                  ErrorBoundary: RouteError,
                  children: [
                    {
                      index: true,
                      loader: ({ params }) => redirect(paths.heats.getHref(params.workshopId ?? '')),
                    },
                    page(paths.heats.path, () => import('./routes/app/workshop/heats.tsx')),
                    page(paths.gallery.path, () => import('./routes/app/workshop/gallery.tsx')),
                    page(paths.reports.path, () => import('./routes/app/workshop/reports.tsx')),
                    page(paths.guide.path, () => import('./routes/app/workshop/guide.tsx')),
                    page(paths.equipment.path, () => import('./routes/app/workshop/equipment.tsx')),
                    page(paths.calculators.path, () => import('./routes/app/workshop/calculators.tsx')),
                    page(paths.insights.path, () => import('./routes/app/workshop/insights.tsx')),
                    page(paths.heatTreatment.path, () => import('./routes/app/workshop/heat-treatment.tsx')),
                    page(paths.heatTreatmentDetail.path, () => import('./routes/app/workshop/heat-treatment-detail.tsx')),
                    page(paths.heatTreatmentSheet.path, () => import('./routes/app/workshop/heat-treatment-sheet.tsx')),
                    page(paths.members.path, () => import('./routes/app/workshop/members.tsx')),
                    page(paths.heatNew.path, () => import('./routes/app/workshop/heat-new.tsx')),
                    page(paths.heatImport.path, () => import('./routes/app/workshop/heat-import.tsx')),
                    page(paths.heat.path, () => import('./routes/app/workshop/heat-detail.tsx')),
                    page(paths.heatEdit.path, () => import('./routes/app/workshop/heat-edit.tsx')),
                    page(paths.furnace.path, () => import('./routes/app/workshop/furnace-detail.tsx')),
                    page(paths.crucible.path, () => import('./routes/app/workshop/crucible-detail.tsx')),
                    page(paths.guideKind.path, () => import('./routes/app/workshop/guide-kind.tsx')),
                    page(paths.calculator.path, () => import('./routes/app/workshop/calculator.tsx')),
                    page(paths.alloys.path, () => import('./routes/app/workshop/alloys.tsx')),
                    page(paths.photo.path, () => import('./routes/app/workshop/photo.tsx')),
                    page(paths.casting.path, () => import('./routes/app/workshop/casting.tsx')),
                    page(paths.report.path, () => import('./routes/app/workshop/report-detail.tsx')),
                    page(paths.quickCheck.path, () => import('./routes/app/workshop/quick-check.tsx')),
                    page(paths.review.path, () => import('./routes/app/workshop/review.tsx')),
                    page(paths.student.path, () => import('./routes/app/workshop/student.tsx')),
                    page(paths.rules.path, () => import('./routes/app/workshop/rules.tsx')),
                  ],
                },
              ],
            },
          ],
        },

        { path: '*', lazy: lazy(() => import('./routes/not-found.tsx')) },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createAppRoutes(queryClient));
}
