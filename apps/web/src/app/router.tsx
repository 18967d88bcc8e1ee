import type { Role } from '@evenset/contracts';
import { Suspense } from 'react';
import { createBrowserRouter, matchRoutes, Outlet, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '../components/errors/route-error';
import { PageLoading } from '../components/page-loading';
import { paths } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { RequireRoles } from '../features/auth/components/require-roles';
import { lazyPage, type LazyPage, type PreloadHandle } from './lazy-page';

// Each page is its own chunk: the sign-in page never downloads the frame, grids or charts.
const SignInRoute = lazyPage(() => import('./routes/sign-in').then((m) => m.SignInRoute));
const AppLayoutRoute = lazyPage(() => import('./routes/app-layout').then((m) => m.AppLayoutRoute));
const HomeRoute = lazyPage(() => import('./routes/home').then((m) => m.HomeRoute));
const PeopleRoute = lazyPage(() => import('./routes/people').then((m) => m.PeopleRoute));
const CertificatesRoute = lazyPage(() => import('./routes/certificates').then((m) => m.CertificatesRoute));
const VerifyRoute = lazyPage(() => import('./routes/verify').then((m) => m.VerifyRoute));
const OutboxRoute = lazyPage(() => import('./routes/outbox').then((m) => m.OutboxRoute));
const AuditLogRoute = lazyPage(() => import('./routes/audit-log').then((m) => m.AuditLogRoute));
const ForgotPasswordRoute = lazyPage(() => import('./routes/forgot-password').then((m) => m.ForgotPasswordRoute));
const ResetPasswordRoute = lazyPage(() => import('./routes/reset-password').then((m) => m.ResetPasswordRoute));
const SpecsRoute = lazyPage(() => import('./routes/specs').then((m) => m.SpecsRoute));
const SpecNewRoute = lazyPage(() => import('./routes/spec-new').then((m) => m.SpecNewRoute));
const SpecDetailRoute = lazyPage(() => import('./routes/spec-detail').then((m) => m.SpecDetailRoute));
const SpecEditRoute = lazyPage(() => import('./routes/spec-edit').then((m) => m.SpecEditRoute));
const MaterialsRoute = lazyPage(() => import('./routes/materials').then((m) => m.MaterialsRoute));
const MastersRoute = lazyPage(() => import('./routes/masters').then((m) => m.MastersRoute));
const MasterDetailRoute = lazyPage(() => import('./routes/master-detail').then((m) => m.MasterDetailRoute));
const InstrumentsRoute = lazyPage(() => import('./routes/instruments').then((m) => m.InstrumentsRoute));
const BenchRoute = lazyPage(() => import('./routes/bench').then((m) => m.BenchRoute));
const LotsRoute = lazyPage(() => import('./routes/lots').then((m) => m.LotsRoute));
const LotReviewRoute = lazyPage(() => import('./routes/lot-review').then((m) => m.LotReviewRoute));
const PartDetailRoute = lazyPage(() => import('./routes/part-detail').then((m) => m.PartDetailRoute));
const CustomersRoute = lazyPage(() => import('./routes/customers').then((m) => m.CustomersRoute));
const CustomerDetailRoute = lazyPage(() => import('./routes/customer-detail').then((m) => m.CustomerDetailRoute));
const SetsRoute = lazyPage(() => import('./routes/sets').then((m) => m.SetsRoute));
const SetBuilderRoute = lazyPage(() => import('./routes/set-builder').then((m) => m.SetBuilderRoute));
const SetDetailRoute = lazyPage(() => import('./routes/set-detail').then((m) => m.SetDetailRoute));
const ReplacementCheckRoute = lazyPage(() => import('./routes/replacement-check').then((m) => m.ReplacementCheckRoute));
const GrindRequestsRoute = lazyPage(() => import('./routes/grind-requests').then((m) => m.GrindRequestsRoute));
const GrindRequestRoute = lazyPage(() => import('./routes/grind-request').then((m) => m.GrindRequestRoute));
const GaugeStudiesRoute = lazyPage(() => import('./routes/gauge-studies').then((m) => m.GaugeStudiesRoute));
const GaugeStudyRoute = lazyPage(() => import('./routes/gauge-study').then((m) => m.GaugeStudyRoute));
const GaugeStudyBenchRoute = lazyPage(() => import('./routes/gauge-study-bench').then((m) => m.GaugeStudyBenchRoute));
const TrendsRoute = lazyPage(() => import('./routes/trends').then((m) => m.TrendsRoute));
const NotFoundRoute = lazyPage(() => import('./routes/not-found').then((m) => m.NotFoundRoute));

/** A route showing `Page`, its chunk fetched ahead when the route is opened directly. */
function route(path: string, Page: LazyPage): RouteObject {
  return { path, element: <Page />, handle: { preload: Page.preload } satisfies PreloadHandle };
}

/** A page open only to the roles its path names. */
function guarded(path: { path: string; roles: readonly Role[] }, Page: LazyPage): RouteObject {
  return {
    path: path.path,
    element: (
      <RequireRoles roles={path.roles}>
        <Page />
      </RequireRoles>
    ),
    handle: { preload: Page.preload } satisfies PreloadHandle,
  };
}

const routes: RouteObject[] = [
  {
    element: (
      <Suspense fallback={<PageLoading />}>
        <Outlet />
      </Suspense>
    ),
    errorElement: <RouteError />,
    children: [
      route(paths.signIn.path, SignInRoute),
      // Public, outside the signed-in frame: anyone holding a certificate may check it.
      route(paths.verify.path, VerifyRoute),
      route(paths.forgotPassword.path, ForgotPasswordRoute),
      route(paths.resetPassword.path, ResetPasswordRoute),
      {
        element: (
          <RequireAuth>
            <AppLayoutRoute />
          </RequireAuth>
        ),
        handle: { preload: AppLayoutRoute.preload } satisfies PreloadHandle,
        children: [
          {
            // A failing page is replaced inside the frame; navigation keeps working.
            errorElement: <RouteError />,
            children: [
              guarded(paths.home, HomeRoute),
              guarded(paths.people, PeopleRoute),
              guarded(paths.certificates, CertificatesRoute),
              guarded(paths.outbox, OutboxRoute),
              guarded(paths.auditLog, AuditLogRoute),
              guarded(paths.specs, SpecsRoute),
              guarded(paths.specNew, SpecNewRoute),
              guarded(paths.spec, SpecDetailRoute),
              guarded(paths.specEdit, SpecEditRoute),
              guarded(paths.materials, MaterialsRoute),
              guarded(paths.masters, MastersRoute),
              guarded(paths.master, MasterDetailRoute),
              guarded(paths.instruments, InstrumentsRoute),
              guarded(paths.bench, BenchRoute),
              guarded(paths.lots, LotsRoute),
              guarded(paths.lot, LotReviewRoute),
              guarded(paths.part, PartDetailRoute),
              guarded(paths.customers, CustomersRoute),
              guarded(paths.customer, CustomerDetailRoute),
              guarded(paths.sets, SetsRoute),
              guarded(paths.setNew, SetBuilderRoute),
              guarded(paths.set, SetDetailRoute),
              guarded(paths.replacements, ReplacementCheckRoute),
              guarded(paths.trends, TrendsRoute),
              guarded(paths.gaugeStudies, GaugeStudiesRoute),
              guarded(paths.gaugeStudy, GaugeStudyRoute),
              guarded(paths.gaugeStudyBench, GaugeStudyBenchRoute),
              guarded(paths.grindRequests, GrindRequestsRoute),
              guarded(paths.grindRequest, GrindRequestRoute),
              route('*', NotFoundRoute),
            ],
          },
        ],
      },
    ],
  },
];

// The frame's and the page's chunks of the address being opened load now, beside the session
// check, rather than each after the one above it has rendered.
for (const match of matchRoutes(routes, window.location) ?? [])
  void (match.route.handle as PreloadHandle | undefined)?.preload().catch(() => undefined);

const router = createBrowserRouter(routes);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
