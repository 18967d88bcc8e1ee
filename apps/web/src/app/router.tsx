import { lazy, Suspense } from 'react';
import { createBrowserRouter, Outlet, RouterProvider } from 'react-router-dom';
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
const NotFoundRoute = lazy(() => import('./routes/not-found').then((m) => ({ default: m.NotFoundRoute })));

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
              {
                path: paths.home.path,
                element: (
                  <RequireRoles roles={paths.home.roles}>
                    <HomeRoute />
                  </RequireRoles>
                ),
              },
              {
                path: paths.people.path,
                element: (
                  <RequireRoles roles={paths.people.roles}>
                    <PeopleRoute />
                  </RequireRoles>
                ),
              },
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
