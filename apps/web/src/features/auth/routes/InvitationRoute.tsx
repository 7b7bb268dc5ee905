import { Alert, Anchor, Button, Group, Stack, Text } from '@mantine/core';
import { IconLinkOff } from '@tabler/icons-react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageLoader } from '../../../components/PageLoader';
import { QueryError } from '../../../components/QueryError';
import { RoleBadge } from '../../../components/RoleBadge';
import { paths } from '../../../config/paths';
import { isApiError } from '../../../lib/api-client';
import { withArticle } from '../../../lib/roles';
import { useInvitation } from '../api/get-invitation';
import { AuthFrame } from '../components/AuthFrame';
import { AcceptInvitationForm } from '../components/AcceptInvitationForm';

function InvitationGone() {
  return (
    <Stack gap="md">
      <Alert
        color="topcoat"
        variant="light"
        icon={<IconLinkOff size={18} />}
        title="This link no longer works"
      >
        An invitation link works once and for a limited time. This one has been used or has expired. Ask your
        company&apos;s owner to invite you again, or sign in if you have already set your password.
      </Alert>
      <Button component={Link} to={paths.signIn} variant="light">
        Go to sign-in
      </Button>
    </Stack>
  );
}

export function InvitationRoute() {
  const { token = '' } = useParams<{ token: string }>();
  const invitation = useInvitation(token);
  const navigate = useNavigate();

  if (invitation.isPending) {
    return (
      <AuthFrame title="Your invitation">
        <PageLoader label="Checking your invitation…" />
      </AuthFrame>
    );
  }

  if (invitation.isError) {
    const gone =
      isApiError(invitation.error) && (invitation.error.status === 404 || invitation.error.status === 410);
    return (
      <AuthFrame
        title="Your invitation"
        footer={
          <Anchor component={Link} to={paths.signIn} fw={600}>
            Sign in instead
          </Anchor>
        }
      >
        {gone ? (
          <InvitationGone />
        ) : (
          <QueryError
            what="your invitation"
            error={invitation.error}
            onRetry={() => void invitation.refetch()}
            retrying={invitation.isFetching}
          />
        )}
      </AuthFrame>
    );
  }

  const { companyName, name, role, email } = invitation.data;
  return (
    <AuthFrame
      title={`Join ${companyName}`}
      subtitle={`${name}, you are invited to use Potlife as ${withArticle(role)} of ${companyName}. Choose a password to finish; you are then signed in.`}
    >
      <Group gap="xs" mb="md" data-testid="invitation-company">
        <Text size="sm">
          Company: <strong>{companyName}</strong>
        </Text>
        <RoleBadge role={role} />
      </Group>
      <AcceptInvitationForm
        token={token}
        email={email}
        onAccepted={() => void navigate(paths.home, { replace: true })}
      />
    </AuthFrame>
  );
}
