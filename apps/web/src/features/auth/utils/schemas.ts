import { z } from 'zod';
import { emailField, nameField } from '../../../lib/validation';

// The rules the sign-in, registration and invitation forms check before anything is sent.

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;

export const newPasswordField = z
  .string()
  .min(1, 'Choose a password')
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters`);

export const signInSchema = z.object({
  email: emailField(),
  password: z.string().min(1, 'Enter your password'),
});

const passwordPair = {
  password: newPasswordField,
  confirmPassword: z.string().min(1, 'Type the password again'),
};

function passwordsMatch(values: { password: string; confirmPassword: string }) {
  return values.password === values.confirmPassword;
}

// Checked as soon as both passwords are typed, even while another field still has an error.
const mismatch = {
  message: 'The two passwords are not the same',
  path: ['confirmPassword'],
  when: (payload: { value: unknown }) => {
    const value = payload.value as { password?: unknown; confirmPassword?: unknown };
    return (
      typeof value.password === 'string' &&
      typeof value.confirmPassword === 'string' &&
      value.confirmPassword !== ''
    );
  },
};

export const registerSchema = z
  .object({
    // The API asks for at least two characters in a company name.
    companyName: nameField("your company's name", 2),
    name: nameField('your name'),
    email: emailField(),
    ...passwordPair,
  })
  .refine(passwordsMatch, mismatch);

export const setPasswordSchema = z.object(passwordPair).refine(passwordsMatch, mismatch);

export type SignInValues = z.input<typeof signInSchema>;
export type RegisterValues = z.input<typeof registerSchema>;
export type SetPasswordValues = z.input<typeof setPasswordSchema>;
