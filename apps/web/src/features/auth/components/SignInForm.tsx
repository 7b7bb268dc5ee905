import { Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAt, IconLock } from '@tabler/icons-react';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useLogin } from '../api/login';
import { signInSchema, type SignInValues } from '../utils/schemas';
import { FormError } from './FormError';

export function SignInForm() {
  const login = useLogin();
  const form = useForm<SignInValues>({
    mode: 'uncontrolled',
    initialValues: { email: '', password: '' },
    validate: zod4Resolver(signInSchema, { errorPriority: 'first' }),
  });

  const submit = form.onSubmit((values) => {
    login.mutate({ email: values.email.trim(), password: values.password });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Sign in">
      <Stack gap="md">
        <TextInput
          label="E-mail"
          type="email"
          autoComplete="username"
          inputMode="email"
          leftSection={<IconAt size={16} />}
          data-testid="sign-in-email"
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          size="md"
          autoComplete="current-password"
          leftSection={<IconLock size={16} />}
          data-testid="sign-in-password"
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <FormError error={login.error} />
        <Button type="submit" size="md" fullWidth loading={login.isPending}>
          Sign in
        </Button>
      </Stack>
    </form>
  );
}
