import { Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useAcceptInvitation } from '../api/accept-invitation';
import { PASSWORD_MIN_LENGTH, setPasswordSchema, type SetPasswordValues } from '../utils/schemas';
import { FormError } from './FormError';

interface AcceptInvitationFormProps {
  token: string;
  email: string;
  onAccepted: () => void;
}

export function AcceptInvitationForm({ token, email, onAccepted }: AcceptInvitationFormProps) {
  const accept = useAcceptInvitation();
  const form = useForm<SetPasswordValues>({
    mode: 'uncontrolled',
    initialValues: { password: '', confirmPassword: '' },
    validate: zod4Resolver(setPasswordSchema, { errorPriority: 'first' }),
  });

  const submit = form.onSubmit((values) => {
    accept.mutate({ token, password: values.password }, { onSuccess: onAccepted });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Set your password">
      <Stack gap="md">
        <TextInput
          label="E-mail"
          value={email}
          readOnly
          autoComplete="username"
          data-testid="invitation-email"
        />
        <PasswordInput
          label="Password"
          size="md"
          autoComplete="new-password"
          description={`At least ${PASSWORD_MIN_LENGTH} characters`}
          data-testid="invitation-password"
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <PasswordInput
          label="Confirm password"
          size="md"
          autoComplete="new-password"
          data-testid="invitation-confirm-password"
          key={form.key('confirmPassword')}
          {...form.getInputProps('confirmPassword')}
        />
        <FormError error={accept.error} />
        <Button type="submit" size="md" fullWidth loading={accept.isPending}>
          Set password and sign in
        </Button>
      </Stack>
    </form>
  );
}
