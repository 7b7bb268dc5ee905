import { z } from 'zod';

// Field rules that more than one form checks before anything is sent.

export const NAME_MAX_LENGTH = 120;
export const EMAIL_MAX_LENGTH = 254;

/** An e-mail address; `whose` words the empty-field message ("your", "their"). */
export function emailField(whose: 'your' | 'their' = 'your') {
  return z
    .string()
    .trim()
    .min(1, `Enter ${whose} e-mail address`)
    .max(EMAIL_MAX_LENGTH, `An e-mail address has at most ${EMAIL_MAX_LENGTH} characters`)
    .pipe(z.email('Enter a whole e-mail address, like name@example.com'));
}

/** A required name; `what` completes "Enter …". */
export function nameField(what: string, minLength = 1) {
  const field = z.string().trim().min(1, `Enter ${what}`);
  return (minLength > 1 ? field.min(minLength, `Use at least ${minLength} characters`) : field).max(
    NAME_MAX_LENGTH,
    `Keep it to ${NAME_MAX_LENGTH} characters`,
  );
}
