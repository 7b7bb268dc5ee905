import { notifications } from '@mantine/notifications';
import { MutationCache, QueryClient } from '@tanstack/react-query';
import { errorMessage, isApiError } from './api-client';

declare module '@tanstack/react-query' {
  interface Register {
    mutationMeta: {
      /** Set false when the form shows the error itself (sign-in, registration). */
      notifyOnError?: boolean;
      /** Title of the error notification; the body is always the server's message. */
      errorTitle?: string;
    };
  }
}

function shouldRetry(failureCount: number, error: unknown): boolean {
  // A 4xx answer will not change by asking again; a network fault or a 5xx may.
  if (isApiError(error) && error.status >= 400 && error.status < 500) {
    return false;
  }
  return failureCount < 2;
}

/** The app's one QueryClient; tests pass `{ retry: false }` so failures show at once. */
export function createQueryClient(overrides: { retry?: false } = {}): QueryClient {
  const retry = overrides.retry ?? shouldRetry;
  return new QueryClient({
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        if (mutation.meta?.notifyOnError === false) {
          return;
        }
        // A refused token sends the user to sign-in, which says so; no second message.
        if (isApiError(error) && error.status === 401) {
          return;
        }
        notifications.show({
          color: 'red',
          title: mutation.meta?.errorTitle ?? 'That did not work',
          message: errorMessage(error),
        });
      },
    }),
    defaultOptions: {
      queries: {
        retry,
        staleTime: 30_000,
        refetchOnWindowFocus: false,
      },
      mutations: {
        retry: false,
      },
    },
  });
}
