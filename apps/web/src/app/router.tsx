import type { Role } from '@evenset/contracts';
import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter, Outlet, RouterProvider, type RouteObject } from 'react-router-dom';
import { RouteError } from '../components/errors/route-error';
import { PageLoading } from '../components/page-loading';
import { paths } from '../config/paths';
import { RequireAuth } from '../features/auth/components/require-auth';
import { RequireRoles } from '../features/auth/components/require-roles';

// Each page is its own chunk: the sign-in page never downloads the frame, grids or charts.
const SignInRoute = lazy(() => import('./routes/sign-in').then((m) => ({ default: m.SignInRoute })));
const AppLayoutRoute = lazy(() => import('./routes/app-layout').then((m) => ({ default: m.AppLayoutRoute })));
const HomeRoute = lazy(() => import('./routes/home').then((m) => ({ default: m.HomeRoute })));
const PeopleRoute = lazy(() => import('./routes/people').then((m) => ({ default: m.PeopleRoute })));
const CertificatesRoute = lazy(() => import('./routes/certificates').then((m) => ({ default: m.CertificatesRoute })));
const VerifyRoute = lazy(() => import('./routes/verify').then((m) => ({ default: m.VerifyRoute })));
const OutboxRoute = lazy(() => import('./routes/outbox').then((m) => ({ default: m.OutboxRoute })));
const AuditLogRoute = lazy(() => import('./routes/audit-log').then((m) => ({ default: m.AuditLogRoute })));
const ForgotPasswordRoute = lazy(() =>
  import('./routes/forgot-password').then((m) => ({ default: m.ForgotPasswordRoute })),
);
const ResetPasswordRoute = lazy(() =>
  import('./routes/reset-password').then((m) => ({ default: m.ResetPasswordRoute })),
);
const SpecsRoute = lazy(() => import('./routes/specs').then((m) => ({ default: m.SpecsRoute })));
const SpecNewRoute = lazy(() => import('./routes/spec-new').then((m) => ({ default: m.SpecNewRoute })));
const SpecDetailRoute = lazy(() => import('./routes/spec-detail').then((m) => ({ default: m.SpecDetailRoute })));
const SpecEditRoute = lazy(() => import('./routes/spec-edit').then((m) => ({ default: m.SpecEditRoute })));
const MaterialsRoute = lazy(() => import('./routes/materials').then((m) => ({ default: m.MaterialsRoute })));
const MastersRoute = lazy(() => import('./routes/masters').then((m) => ({ default: m.MastersRoute })));
const MasterDetailRoute = lazy(() => import('./routes/master-detail').then((m) => ({ default: m.MasterDetailRoute })));
const InstrumentsRoute = lazy(() => import('./routes/instruments').then((m) => ({ default: m.InstrumentsRoute })));
const BenchRoute = lazy(() => import('./routes/bench').then((m) => ({ default: m.BenchRoute })));
const LotsRoute = lazy(() => import('./routes/lots').then((m) => ({ default: m.LotsRoute })));
const LotReviewRoute = lazy(() => import('./routes/lot-review').then((m) => ({ default: m.LotReviewRoute })));
const PartDetailRoute = lazy(() => import('./routes/part-detail').then((m) => ({ default: m.PartDetailRoute })));
const CustomersRoute = lazy(() => import('./routes/customers').then((m) => ({ default: m.CustomersRoute })));
const CustomerDetailRoute = lazy(() =>
  import('./routes/customer-detail').then((m) => ({ default: m.CustomerDetailRoute })),
);
const SetsRoute = lazy(() => import('./routes/sets').then((m) => ({ default: m.SetsRoute })));
const SetBuilderRoute = lazy(() => import('./routes/set-builder').then((m) => ({ default: m.SetBuilderRoute })));
const SetDetailRoute = lazy(() => import('./routes/set-detail').then((m) => ({ default: m.SetDetailRoute })));
const ReplacementCheckRoute = lazy(() =>
  import('./routes/replacement-check').then((m) => ({ default: m.ReplacementCheckRoute })),
);
const GrindRequestsRoute = lazy(() =>
  import('./routes/grind-requests').then((m) => ({ default: m.GrindRequestsRoute })),
);
const GrindRequestRoute = lazy(() => import('./routes/grind-request').then((m) => ({ default: m.GrindRequestRoute })));
const GaugeStudiesRoute = lazy(() => import('./routes/gauge-studies').then((m) => ({ default: m.GaugeStudiesRoute })));
const GaugeStudyRoute = lazy(() => import('./routes/gauge-study').then((m) => ({ default: m.GaugeStudyRoute })));
const GaugeStudyBenchRoute = lazy(() =>
  import('./routes/gauge-study-bench').then((m) => ({ default: m.GaugeStudyBenchRoute })),
);
const TrendsRoute = lazy(() => import('./routes/trends').then((m) => ({ default: m.TrendsRoute })));
const NotFoundRoute = lazy(() => import('./routes/not-found').then((m) => ({ default: m.NotFoundRoute })));

/** A page open only to the roles its path names. */
function guarded(path: { path: string; roles: readonly Role[] }, page: ReactNode): RouteObject {
  return { path: path.path, element: <RequireRoles roles={path.roles}>{page}</RequireRoles> };
}

const router = createBrowserRouter([
  {
    element: (
      <Suspense fallback={<PageLoading />}>
        <Outlet />
      </Suspense>
    ),
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn.path, element: <SignInRoute /> },
      // Public, outside the signed-in frame: anyone holding a certificate may check it.
      { path: paths.verify.path, element: <VerifyRoute /> },
      { path: paths.forgotPassword.path, element: <ForgotPasswordRoute /> },
      { path: paths.resetPassword.path, element: <ResetPasswordRoute /> },
      {
        element: (
          <RequireAuth>
            <AppLayoutRoute />
          </RequireAuth>
        ),
        children: [
          {
            // A failing page is replaced inside the frame; navigation keeps working.
            errorElement: <RouteError />,
            children: [
              guarded(paths.home, <HomeRoute />),
              guarded(paths.people, <PeopleRoute />),
              guarded(paths.certificates, <CertificatesRoute />),
              guarded(paths.outbox, <OutboxRoute />),
              guarded(paths.auditLog, <AuditLogRoute />),
              guarded(paths.specs, <SpecsRoute />),
              guarded(paths.specNew, <SpecNewRoute />),
              guarded(paths.spec, <SpecDetailRoute />),
              guarded(paths.specEdit, <SpecEditRoute />),
              guarded(paths.materials, <MaterialsRoute />),
              guarded(paths.masters, <MastersRoute />),
              guarded(paths.master, <MasterDetailRoute />),
              guarded(paths.instruments, <InstrumentsRoute />),
              guarded(paths.bench, <BenchRoute />),
              guarded(paths.lots, <LotsRoute />),
              guarded(paths.lot, <LotReviewRoute />),
              guarded(paths.part, <PartDetailRoute />),
              guarded(paths.customers, <CustomersRoute />),
              guarded(paths.customer, <CustomerDetailRoute />),
              guarded(paths.sets, <SetsRoute />),
              guarded(paths.setNew, <SetBuilderRoute />),
              guarded(paths.set, <SetDetailRoute />),
              guarded(paths.replacements, <ReplacementCheckRoute />),
              guarded(paths.trends, <TrendsRoute />),
              guarded(paths.gaugeStudies, <GaugeStudiesRoute />),
              guarded(paths.gaugeStudy, <GaugeStudyRoute />),
              guarded(paths.gaugeStudyBench, <GaugeStudyBenchRoute />),
              guarded(paths.grindRequests, <GrindRequestsRoute />),
              guarded(paths.grindRequest, <GrindRequestRoute />),
              { path: '*', element: <NotFoundRoute /> },
            ],
          },
        ],
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
