import { lazy, Suspense, type ReactNode } from 'react';
import { useRoutes, type RouteObject } from 'react-router-dom';
import { ErrorBoundary } from '../components/ErrorBoundary';
import { PageLoader } from '../components/PageLoader';
import { rolesFor } from '../config/navigation';
import { paths } from '../config/paths';
import { AppLayout } from './layout/AppLayout';
import { RequireAuth } from './layout/RequireAuth';
import { RequireRole } from './layout/RequireRole';
import { NotFoundRoute } from './routes/NotFoundRoute';

// Each screen is its own chunk, loaded when first opened.
const SignInRoute = lazy(() =>
  import('../features/auth/routes/SignInRoute').then((m) => ({ default: m.SignInRoute })),
);
const RegisterRoute = lazy(() =>
  import('../features/auth/routes/RegisterRoute').then((m) => ({ default: m.RegisterRoute })),
);
const InvitationRoute = lazy(() =>
  import('../features/auth/routes/InvitationRoute').then((m) => ({ default: m.InvitationRoute })),
);
const HomeRoute = lazy(() =>
  import('../features/home/routes/HomeRoute').then((m) => ({ default: m.HomeRoute })),
);
const UsersRoute = lazy(() =>
  import('../features/users/routes/UsersRoute').then((m) => ({ default: m.UsersRoute })),
);
const MailOutboxRoute = lazy(() =>
  import('../features/mail/routes/MailOutboxRoute').then((m) => ({ default: m.MailOutboxRoute })),
);
// The estimator's work: jobs, their roofs, estimates and materials; the calendar; build-ups.
const JobsRoute = lazy(() => import('../features/jobs/routes/JobsRoute').then((m) => ({ default: m.JobsRoute })));
const JobRoute = lazy(() => import('../features/jobs/routes/JobRoute').then((m) => ({ default: m.JobRoute })));
const CalendarRoute = lazy(() =>
  import('../features/calendar/routes/CalendarRoute').then((m) => ({ default: m.CalendarRoute })),
);
const BuildUpsRoute = lazy(() =>
  import('../features/build-ups/routes/BuildUpsRoute').then((m) => ({ default: m.BuildUpsRoute })),
);

function Public({ children }: { children: ReactNode }) {
  return (
    <ErrorBoundary>
      <Suspense fallback={<PageLoader fullScreen />}>{children}</Suspense>
    </ErrorBoundary>
  );
}

export const routes: RouteObject[] = [
  {
    path: paths.signIn,
    element: (
      <Public>
        <SignInRoute />
      </Public>
    ),
  },
  {
    path: paths.register,
    element: (
      <Public>
        <RegisterRoute />
      </Public>
    ),
  },
  {
    path: paths.invitation,
    element: (
      <Public>
        <InvitationRoute />
      </Public>
    ),
  },
  {
    element: (
      <RequireAuth>
        <AppLayout />
      </RequireAuth>
    ),
    children: [
      {
        index: true,
        element: (
          <RequireRole roles={rolesFor('home')}>
            <HomeRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.users,
        element: (
          <RequireRole roles={rolesFor('users')}>
            <UsersRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.mailOutbox,
        element: (
          <RequireRole roles={rolesFor('mailOutbox')}>
            <MailOutboxRoute />
          </RequireRole>
        ),
      },
      // Jobs (the storeman sees them without prices), the calendar, build-ups.
      {
        path: paths.jobs,
        element: (
          <RequireRole roles={rolesFor('jobs')}>
            <JobsRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.job,
        element: (
          <RequireRole roles={rolesFor('jobs')}>
            <JobRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.calendar,
        element: (
          <RequireRole roles={rolesFor('calendar')}>
            <CalendarRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.buildUps,
        element: (
          <RequireRole roles={rolesFor('buildUps')}>
            <BuildUpsRoute />
          </RequireRole>
        ),
      },
      { path: '*', element: <NotFoundRoute /> },
    ],
  },
];

export function AppRoutes() {
  return useRoutes(routes);
}
