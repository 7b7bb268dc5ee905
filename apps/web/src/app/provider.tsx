import { MantineProvider } from '@mantine/core';
import { ModalsProvider } from '@mantine/modals';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useEffect, useState, type ReactNode } from 'react';
import { getAccessToken, subscribeToAuth } from '../lib/auth-token';
import { createQueryClient } from '../lib/query-client';
import { theme } from '../theme';

/** When the token goes away or changes hands, nothing cached for the old one may be shown. */
function useForgetDataOfPastSessions(queryClient: QueryClient) {
  useEffect(() => {
    let previous = getAccessToken();
    return subscribeToAuth(() => {
      const current = getAccessToken();
      if (previous !== null && current !== previous) {
        queryClient.clear();
      }
      previous = current;
    });
  }, [queryClient]);
}

interface AppProviderProps {
  children: ReactNode;
  /** Tests pass their own; the app makes one. */
  queryClient?: QueryClient;
  /** 'test' turns off Mantine's transitions and portals (for jsdom). */
  env?: 'default' | 'test';
}

export function AppProvider({ children, queryClient: given, env = 'default' }: AppProviderProps) {
  const [queryClient] = useState(() => given ?? createQueryClient());
  useForgetDataOfPastSessions(queryClient);
  return (
    <MantineProvider theme={theme} defaultColorScheme="light" env={env}>
      <QueryClientProvider client={queryClient}>
        <ModalsProvider labels={{ confirm: 'Confirm', cancel: 'Cancel' }}>
          <Notifications position="top-right" limit={4} />
          {children}
        </ModalsProvider>
      </QueryClientProvider>
    </MantineProvider>
  );
}
