import { Navigate, useLocation } from 'react-router-dom';
import type { ReactNode } from 'react';
import { Button, Center, Stack } from '@mantine/core';
import { PageLoader } from '../../components/PageLoader';
import { QueryError } from '../../components/QueryError';
import { paths } from '../../config/paths';
import { clearAccessToken, useAccessToken } from '../../lib/auth-token';
import { SessionUserProvider, useCurrentUserQuery } from '../../lib/session';

/** Screens behind it need a signed-in user; anyone else is sent to sign in and brought back. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const token = useAccessToken();
  const location = useLocation();
  const me = useCurrentUserQuery(token !== null);

  if (token === null) {
    return <Navigate to={paths.signIn} replace state={{ from: `${location.pathname}${location.search}` }} />;
  }
  if (me.isPending) {
    return <PageLoader fullScreen label="Loading your company…" />;
  }
  if (me.isError) {
    // A refused token has already ended the session (and this renders the redirect next);
    // anything else (server down) is shown with a way forward.
    return (
      <Center mih="100dvh" p="md">
        <Stack maw={480}>
          <QueryError
            what="your account"
            error={me.error}
            onRetry={() => void me.refetch()}
            retrying={me.isFetching}
          />
          <Button variant="subtle" onClick={clearAccessToken}>
            Sign out
          </Button>
        </Stack>
      </Center>
    );
  }
  return <SessionUserProvider user={me.data}>{children}</SessionUserProvider>;
}
