import { Button, PasswordInput, Stack, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { zod4Resolver } from 'mantine-form-zod-resolver';
import { useRegisterCompany } from '../api/register';
import { PASSWORD_MIN_LENGTH, registerSchema, type RegisterValues } from '../utils/schemas';
import { FormError } from './FormError';

export function RegisterForm() {
  const register = useRegisterCompany();
  const form = useForm<RegisterValues>({
    mode: 'uncontrolled',
    initialValues: { companyName: '', name: '', email: '', password: '', confirmPassword: '' },
    validate: zod4Resolver(registerSchema, { errorPriority: 'first' }),
  });

  const submit = form.onSubmit((values) => {
    register.mutate({
      companyName: values.companyName.trim(),
      name: values.name.trim(),
      email: values.email.trim(),
      password: values.password,
    });
  });

  return (
    <form onSubmit={submit} noValidate aria-label="Register a company">
      <Stack gap="md">
        <TextInput
          label="Company name"
          description="The roofing firm, as your team and suppliers know it"
          autoComplete="organization"
          data-testid="register-company-name"
          key={form.key('companyName')}
          {...form.getInputProps('companyName')}
        />
        <TextInput
          label="Your name"
          autoComplete="name"
          data-testid="register-name"
          key={form.key('name')}
          {...form.getInputProps('name')}
        />
        <TextInput
          label="E-mail"
          type="email"
          inputMode="email"
          autoComplete="email"
          description="You sign in with it; you will be the company's owner"
          data-testid="register-email"
          key={form.key('email')}
          {...form.getInputProps('email')}
        />
        <PasswordInput
          label="Password"
          size="md"
          autoComplete="new-password"
          description={`At least ${PASSWORD_MIN_LENGTH} characters`}
          data-testid="register-password"
          key={form.key('password')}
          {...form.getInputProps('password')}
        />
        <PasswordInput
          label="Confirm password"
          size="md"
          autoComplete="new-password"
          data-testid="register-confirm-password"
          key={form.key('confirmPassword')}
          {...form.getInputProps('confirmPassword')}
        />
        <FormError error={register.error} />
        <Button type="submit" size="md" fullWidth loading={register.isPending}>
          Register company
        </Button>
      </Stack>
    </form>
  );
}
