import { Alert, Anchor } from '@mantine/core';
import { IconClockExclamation } from '@tabler/icons-react';
import { Link, Navigate, useLocation } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { dismissSignInNotice, useAccessToken, useSignInNotice } from '../../../lib/auth-token';
import { AuthFrame } from '../components/AuthFrame';
import { SignInForm } from '../components/SignInForm';

/** Where the guard was sending the user before it asked them to sign in. */
function returnPath(state: unknown): string {
  if (state && typeof state === 'object' && 'from' in state && typeof state.from === 'string') {
    const from = state.from;
    if (from.startsWith('/') && !from.startsWith('//') && !from.startsWith(paths.signIn)) {
      return from;
    }
  }
  return paths.home;
}

export function SignInRoute() {
  const token = useAccessToken();
  const notice = useSignInNotice();
  const location = useLocation();

  if (token !== null) {
    return <Navigate to={returnPath(location.state)} replace />;
  }

  return (
    <AuthFrame
      title="Sign in to Potlife"
      subtitle="Use the e-mail address your company registered or invited you with."
      footer={
        <>
          New to Potlife?{' '}
          <Anchor component={Link} to={paths.register} fw={600}>
            Register your company
          </Anchor>
        </>
      }
    >
      {notice ? (
        <Alert
          color="resin"
          variant="light"
          icon={<IconClockExclamation size={18} />}
          mb="md"
          withCloseButton
          closeButtonLabel="Dismiss"
          onClose={dismissSignInNotice}
          data-testid="sign-in-notice"
        >
          {notice}
        </Alert>
      ) : null}
      <SignInForm />
    </AuthFrame>
  );
}
