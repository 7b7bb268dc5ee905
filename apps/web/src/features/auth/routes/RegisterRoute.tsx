import { Anchor } from '@mantine/core';
import { Link, Navigate } from 'react-router-dom';
import { paths } from '../../../config/paths';
import { useAccessToken } from '../../../lib/auth-token';
import { AuthFrame } from '../components/AuthFrame';
import { RegisterForm } from '../components/RegisterForm';

export function RegisterRoute() {
  const token = useAccessToken();

  // Registered (or already signed in): straight to the company's home.
  if (token !== null) {
    return <Navigate to={paths.home} replace />;
  }

  return (
    <AuthFrame
      title="Register your company"
      subtitle="Set up Potlife for your roofing firm. You become its owner and can then invite your estimators and storemen."
      footer={
        <>
          Already using Potlife?{' '}
          <Anchor component={Link} to={paths.signIn} fw={600}>
            Sign in
          </Anchor>
        </>
      }
    >
      <RegisterForm />
    </AuthFrame>
  );
}
