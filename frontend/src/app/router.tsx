import { LinearProgress } from '@mui/material';
import {
  createBrowserRouter,
  RouterProvider,
  type LazyRouteFunction,
  type RouteObject,
} from 'react-router';
import { SignInRoute } from './routes/sign-in';

/**
 * Each page's code loads with the page (route-level code splitting): the sign-in page carries
 * only what it needs, and the data grid, the charts and the units library come with the pages
 * that use them. `page` picks a route module's component for React Router's `lazy`.
 */
function page<M>(load: () => Promise<M>, pick: (module: M) => React.ComponentType) {
  const lazy: LazyRouteFunction<RouteObject> = async () => ({ Component: pick(await load()) });
  return lazy;
}

/** Shown while the first page's code loads. */
const loadingPage = <LinearProgress aria-label="Loading the page" />;

const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInRoute /> },
  {
    path: '/set-password',
    lazy: page(
      () => import('./routes/set-password'),
      (m) => m.SetPasswordRoute,
    ),
    hydrateFallbackElement: loadingPage,
  },
  {
    path: '/',
    lazy: page(
      () => import('./routes/app-root'),
      (m) => m.AppRoot,
    ),
    hydrateFallbackElement: loadingPage,
    children: [
      {
        index: true,
        lazy: page(
          () => import('./routes/home'),
          (m) => m.HomeRoute,
        ),
      },
      {
        path: 'projects',
        lazy: page(
          () => import('./routes/projects'),
          (m) => m.ProjectsRoute,
        ),
      },
      {
        path: 'projects/:id',
        lazy: page(
          () => import('./routes/project'),
          (m) => m.ProjectRoute,
        ),
      },
      {
        path: 'calculations/:id',
        lazy: page(
          () => import('./routes/calculation'),
          (m) => m.CalculationRoute,
        ),
      },
      {
        path: 'library',
        lazy: page(
          () => import('./routes/library'),
          (m) => m.LibraryRoute,
        ),
      },
      {
        path: 'outbox',
        lazy: page(
          () => import('./routes/outbox'),
          (m) => m.OutboxRoute,
        ),
      },
      {
        path: 'analysis',
        lazy: page(
          () => import('./routes/analysis'),
          (m) => m.AnalysisRoute,
        ),
      },
      {
        path: 'users',
        lazy: page(
          () => import('./routes/users'),
          (m) => m.UsersRoute,
        ),
      },
      {
        path: 'sign-out',
        lazy: page(
          () => import('./routes/sign-out'),
          (m) => m.SignOutRoute,
        ),
      },
      {
        path: 'verification',
        lazy: page(
          () => import('./routes/verification'),
          (m) => m.VerificationRoute,
        ),
      },
      {
        path: '*',
        lazy: page(
          () => import('@/components/errors/not-found'),
          (m) => m.NotFound,
        ),
      },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
