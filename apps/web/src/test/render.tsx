import type { QueryClient } from '@tanstack/react-query';
import { render, type RenderResult } from '@testing-library/react';
import userEvent, { type UserEvent } from '@testing-library/user-event';
import type { ReactElement } from 'react';
import { MemoryRouter, useLocation } from 'react-router-dom';
import { AppProvider } from '../app/provider';
import { createQueryClient } from '../lib/query-client';

export function createTestQueryClient(): QueryClient {
  // The app's own client (so mutation errors become notifications), without retries.
  return createQueryClient({ retry: false });
}

let currentPath = '';

/** Records where the router is, so tests can check redirects. */
function LocationProbe() {
  const location = useLocation();
  currentPath = `${location.pathname}${location.search}`;
  return null;
}

export function currentLocation(): string {
  return currentPath;
}

interface RenderOptions {
  route?: string;
  queryClient?: QueryClient;
}

export interface RenderWithProviders extends RenderResult {
  user: UserEvent;
  queryClient: QueryClient;
}

/** Renders inside Potlife's providers (Mantine, modals, notifications, React Query) and a MemoryRouter. */
export function renderWithProviders(
  ui: ReactElement,
  { route = '/', queryClient }: RenderOptions = {},
): RenderWithProviders {
  const client = queryClient ?? createTestQueryClient();
  const result = render(
    <AppProvider queryClient={client} env="test">
      <MemoryRouter initialEntries={[route]}>
        {ui}
        <LocationProbe />
      </MemoryRouter>
    </AppProvider>,
  );
  return { ...result, user: userEvent.setup(), queryClient: client };
}
