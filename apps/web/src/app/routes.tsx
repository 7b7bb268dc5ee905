import { lazy, Suspense, type ReactNode } from 'react';
import { useRoutes, type RouteObject } from 'react-router-dom';
import { ErrorBoundary } from '../components/ErrorBoundary';
import { PageLoader } from '../components/PageLoader';
import { rolesFor } from '../config/navigation';
import { paths } from '../config/paths';
import { useSessionUser } from '../lib/session';
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
// The catalogue and suppliers.
const CatalogueRoute = lazy(() =>
  import('../features/catalogue/routes/CatalogueRoute').then((m) => ({ default: m.CatalogueRoute })),
);
const CatalogueImportRoute = lazy(() =>
  import('../features/catalogue/routes/CatalogueImportRoute').then((m) => ({
    default: m.CatalogueImportRoute,
  })),
);
const MaterialRoute = lazy(() =>
  import('../features/catalogue/routes/MaterialRoute').then((m) => ({ default: m.MaterialRoute })),
);
const SuppliersRoute = lazy(() =>
  import('../features/suppliers/routes/SuppliersRoute').then((m) => ({ default: m.SuppliersRoute })),
);
const SupplierRoute = lazy(() =>
  import('../features/suppliers/routes/SupplierRoute').then((m) => ({ default: m.SupplierRoute })),
);
// The store: receiving, stock, counts, temperatures, and the storeman's home.
const ReceiptsRoute = lazy(() =>
  import('../features/receiving/routes/ReceiptsRoute').then((m) => ({ default: m.ReceiptsRoute })),
);
const ReceiveRoute = lazy(() =>
  import('../features/receiving/routes/ReceiveRoute').then((m) => ({ default: m.ReceiveRoute })),
);
const ReceiptRoute = lazy(() =>
  import('../features/receiving/routes/ReceiptRoute').then((m) => ({ default: m.ReceiptRoute })),
);
const StockRoute = lazy(() =>
  import('../features/stock/routes/StockRoute').then((m) => ({ default: m.StockRoute })),
);
const LotRoute = lazy(() =>
  import('../features/stock/routes/LotRoute').then((m) => ({ default: m.LotRoute })),
);
const CountsRoute = lazy(() =>
  import('../features/counts/routes/CountsRoute').then((m) => ({ default: m.CountsRoute })),
);
const CountRoute = lazy(() =>
  import('../features/counts/routes/CountRoute').then((m) => ({ default: m.CountRoute })),
);
const TemperaturesRoute = lazy(() =>
  import('../features/temperatures/routes/TemperaturesRoute').then((m) => ({ default: m.TemperaturesRoute })),
);
const StoremanHomeRoute = lazy(() =>
  import('../features/storeman-home/routes/StoremanHomeRoute').then((m) => ({
    default: m.StoremanHomeRoute,
  })),
);

/** Home: the storeman's opens on the store's lists; everyone else's on the general page. */
function HomeForRole() {
  const user = useSessionUser();
  return user.role === 'storeman' ? <StoremanHomeRoute /> : <HomeRoute />;
}
// The estimator's work: jobs, their roofs, estimates and materials; the calendar; build-ups.
const JobsRoute = lazy(() =>
  import('../features/jobs/routes/JobsRoute').then((m) => ({ default: m.JobsRoute })),
);
const JobRoute = lazy(() =>
  import('../features/jobs/routes/JobRoute').then((m) => ({ default: m.JobRoute })),
);
const CalendarRoute = lazy(() =>
  import('../features/calendar/routes/CalendarRoute').then((m) => ({ default: m.CalendarRoute })),
);
const CustomersRoute = lazy(() =>
  import('../features/customers/routes/CustomersRoute').then((m) => ({ default: m.CustomersRoute })),
);
const CustomerRoute = lazy(() =>
  import('../features/customers/routes/CustomerRoute').then((m) => ({ default: m.CustomerRoute })),
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
            <HomeForRole />
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
      // The store: reading is for the roles in the table; the API refuses changes to the rest.
      {
        path: paths.receipts,
        element: (
          <RequireRole roles={rolesFor('receipts')}>
            <ReceiptsRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.receiptNew,
        element: (
          <RequireRole roles={rolesFor('receipts')}>
            <ReceiveRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.receipt,
        element: (
          <RequireRole roles={rolesFor('receipts')}>
            <ReceiptRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.stock,
        element: (
          <RequireRole roles={rolesFor('stock')}>
            <StockRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.lot,
        element: (
          <RequireRole roles={rolesFor('stock')}>
            <LotRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.counts,
        element: (
          <RequireRole roles={rolesFor('counts')}>
            <CountsRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.count,
        element: (
          <RequireRole roles={rolesFor('counts')}>
            <CountRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.temperatures,
        element: (
          <RequireRole roles={rolesFor('temperatures')}>
            <TemperaturesRoute />
          </RequireRole>
        ),
      },
      // The catalogue and suppliers: everyone reads; the import is for those who edit.
      {
        path: paths.catalogue,
        element: (
          <RequireRole roles={rolesFor('catalogue')}>
            <CatalogueRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.catalogueImport,
        element: (
          <RequireRole roles={['owner', 'estimator']}>
            <CatalogueImportRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.material,
        element: (
          <RequireRole roles={rolesFor('catalogue')}>
            <MaterialRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.suppliers,
        element: (
          <RequireRole roles={rolesFor('suppliers')}>
            <SuppliersRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.supplier,
        element: (
          <RequireRole roles={rolesFor('suppliers')}>
            <SupplierRoute />
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
        path: paths.customers,
        element: (
          <RequireRole roles={rolesFor('customers')}>
            <CustomersRoute />
          </RequireRole>
        ),
      },
      {
        path: paths.customer,
        element: (
          <RequireRole roles={rolesFor('customers')}>
            <CustomerRoute />
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
