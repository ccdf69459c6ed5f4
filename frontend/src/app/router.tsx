import { createBrowserRouter, RouterProvider } from 'react-router';
import { NotFound } from '@/components/errors/not-found';
import { AnalysisRoute } from './routes/analysis';
import { AppRoot } from './routes/app-root';
import { CalculationRoute } from './routes/calculation';
import { LibraryRoute } from './routes/library';
import { OutboxRoute } from './routes/outbox';
import { ProjectRoute } from './routes/project';
import { ProjectsRoute } from './routes/projects';
import { HomeRoute } from './routes/home';
import { SetPasswordRoute } from './routes/set-password';
import { SignInRoute } from './routes/sign-in';
import { SignOutRoute } from './routes/sign-out';
import { UsersRoute } from './routes/users';
import { VerificationRoute } from './routes/verification';

const router = createBrowserRouter([
  { path: '/sign-in', element: <SignInRoute /> },
  { path: '/set-password', element: <SetPasswordRoute /> },
  {
    path: '/',
    element: <AppRoot />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: 'projects', element: <ProjectsRoute /> },
      { path: 'projects/:id', element: <ProjectRoute /> },
      { path: 'calculations/:id', element: <CalculationRoute /> },
      { path: 'library', element: <LibraryRoute /> },
      { path: 'outbox', element: <OutboxRoute /> },
      { path: 'analysis', element: <AnalysisRoute /> },
      { path: 'users', element: <UsersRoute /> },
      { path: 'sign-out', element: <SignOutRoute /> },
      { path: 'verification', element: <VerificationRoute /> },
      { path: '*', element: <NotFound /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
